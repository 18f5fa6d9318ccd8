// Offset launch: a single-mode fiber butted against a multimode core at a lateral offset, the way a
// mode-conditioning cord launches a long-wavelength laser into multimode fiber.
//
// The power in each mode comes from the overlap integrals of src/physics/coupling.ts (singleModeToMultimode);
// this file sweeps the offset and sums by principal group. A centred spot excites only the few lowest groups,
// whose light travels near the axis; many older multimode fibers have an index dip or peak on the axis from
// manufacture, so those groups arrive at different times (differential mode delay) and a centre launch can close
// the eye on a link a full launch would carry. Moving the spot off the axis spreads the power over the middle
// groups and away from the axis (IEEE 802.3 clause 38.11.4 introduces the offset-launch cord for 1000BASE-LX for
// this reason; the physics of the dip: Gloge & Marcatili 1973 on delay per group in near-parabolic profiles).
import { InputError, requireNumber } from './errors';
import { MAX_LAUNCH_OFFSET_UM, singleModeToMultimode, type MultimodeModeSet, type RadialField } from './coupling';
import { encircledFlux, encircledFluxAt, type GroupPower } from './encircledFlux';

export interface OffsetPoint {
  offsetUm: number;
  /** Share of the single-mode power guided by the multimode fiber, 0..1. */
  coupledFraction: number;
  lossDb: number;
  /** Share of the guided power per principal group (ascending g), summing to 1. */
  perGroup: GroupPower[];
  /** Share of the guided power within CENTRE_RADIUS_UM of the axis (the near-field EF there). */
  centreShare: number;
  /** Power per LP mode of the set (guided share of the launched power). */
  powers: number[];
}

/** Radius of the "near the axis" share (µm): where an on-axis index defect sits; the 802.3aq launch study used EF at 4.5–6 µm. */
export const CENTRE_RADIUS_UM = 5;

/** Most offsets in one sweep (each is one full set of overlap integrals). */
export const MAX_OFFSET_POINTS = 64;

/**
 * Offsets of the mode-conditioning cords by core size: IEEE 802.3 clause 38.11.4 (1000BASE-LX), 17 to 23 µm for
 * 62.5 µm fiber and 10 to 16 µm for 50 µm fiber — from memory; consistent with the 802.3aq launch study's draft
 * notes (15 Dec 2004), which give "20 ± 3 µm" and "13 ± 3 µm" offset single-mode launches for OM1 and OM2.
 */
export const MODE_CONDITIONING_OFFSETS: readonly { coreDiameterUm: number; minUm: number; maxUm: number; source: string }[] = [
  { coreDiameterUm: 62.5, minUm: 17, maxUm: 23, source: 'IEEE 802.3 clause 38.11.4 (from memory; 20 ± 3 µm in the 802.3aq launch study notes)' },
  { coreDiameterUm: 50, minUm: 10, maxUm: 16, source: 'IEEE 802.3 clause 38.11.4 (from memory; 13 ± 3 µm in the 802.3aq launch study notes)' },
];

/** The cord offset range for this core size, or undefined. */
export function modeConditioningOffset(input: { coreDiameterUm: number }): { minUm: number; maxUm: number; source: string } | undefined {
  const d = requireNumber('coreDiameterUm', input?.coreDiameterUm, { min: 0, minInclusive: false, max: 1000, unit: 'µm' });
  const row = MODE_CONDITIONING_OFFSETS.find((r) => Math.abs(r.coreDiameterUm - d) <= 2.5);
  return row ? { minUm: row.minUm, maxUm: row.maxUm, source: row.source } : undefined;
}

/** Power per group, coupled share and share near the axis for a single-mode spot at each offset. */
export function offsetLaunchSweep(input: { source: RadialField; modes: MultimodeModeSet; coreRadiusUm: number; offsetsUm: readonly number[] }): OffsetPoint[] {
  const offsets = input?.offsetsUm;
  if (!Array.isArray(offsets) || offsets.length === 0 || offsets.length > MAX_OFFSET_POINTS) throw new InputError('offsetsUm', offsets, `a list of 1 to ${MAX_OFFSET_POINTS} offsets`);
  return offsets.map((d, i) => {
    const offsetUm = requireNumber(`offsetsUm[${i}]`, d, { min: 0, max: MAX_LAUNCH_OFFSET_UM, unit: 'µm' });
    const launch = singleModeToMultimode({ source: input.source, modes: input.modes, offsetUm });
    const powers = launch.perMode.map((m) => m.fraction);
    const curve = encircledFlux({ modes: input.modes, powers, coreRadiusUm: input.coreRadiusUm });
    return {
      offsetUm,
      coupledFraction: launch.coupledFraction,
      lossDb: launch.lossDb,
      perGroup: curve.perGroup,
      centreShare: encircledFluxAt({ curve, radiusUm: CENTRE_RADIUS_UM }),
      powers,
    };
  });
}
