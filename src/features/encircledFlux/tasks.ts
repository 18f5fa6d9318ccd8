// Worker tasks of the multimode launch-condition screens (encircled flux, mandrel, offset launch): every guided
// mode of the multimode fiber is solved (tens of milliseconds at 850 nm), then the launch is described by the
// power in each mode and turned into EF(r), its template check and the power per group.
import {
  checkEncircledFlux,
  efTemplateFor,
  encircledFlux,
  gaussianRadialField,
  groupModePowers,
  InputError,
  mandrelFilter,
  multimodeModes,
  offsetLaunchSweep,
  overfilledModePowers,
  recommendedMandrel,
  singleModeToMultimode,
  type EfCheck,
  type EncircledFluxCurve,
  type GroupTransmission,
  type MultimodeFiberSpec,
  type MultimodeModeSet,
  type OffsetPoint,
} from '../../physics';

export interface MandrelSpec {
  mandrelDiameterMm: number;
  cordDiameterMm: number;
  turns: number;
}

/** How the light enters the multimode fiber. */
export type LaunchSpec =
  | { kind: 'overfilled' }
  | { kind: 'single-mode'; mfdUm: number; offsetUm: number }
  | ({ kind: 'mandrel' } & MandrelSpec)
  | { kind: 'groups'; groupPowers: { principal: number; power: number }[] };

export interface EfInput {
  fiber: MultimodeFiberSpec;
  wavelengthNm: number;
  launch: LaunchSpec;
}

export interface EfSummary {
  curve: EncircledFluxCurve;
  /** Absent when no template applies (a 62.5 µm core, a wavelength other than 850/1300 nm). */
  check?: EfCheck;
}

export interface EfOutput extends EfSummary {
  v: number;
  modeCount: number;
  highestGroup: number;
  /** Share of the source power guided (single-mode launches) or left after the wrap (mandrel), 0..1. */
  guidedShare: number;
  lossDb: number;
  method: string;
}

function summarise(fiber: MultimodeFiberSpec, wavelengthNm: number, modes: MultimodeModeSet, powers: number[]): EfSummary {
  const curve = encircledFlux({ modes, powers, coreRadiusUm: fiber.coreRadiusUm });
  const template = efTemplateFor({ coreDiameterUm: 2 * fiber.coreRadiusUm, wavelengthNm });
  return { curve, check: template ? checkEncircledFlux({ curve, template }) : undefined };
}

/** Power per LP mode for a launch, with the guided share and the loss it costs. */
export function launchPowers(fiber: MultimodeFiberSpec, wavelengthNm: number, modes: MultimodeModeSet, launch: LaunchSpec): { powers: number[]; guidedShare: number; lossDb: number } {
  switch (launch?.kind) {
    case 'overfilled':
      return { powers: overfilledModePowers({ modes }), guidedShare: 1, lossDb: 0 };
    case 'single-mode': {
      const r = singleModeToMultimode({ source: gaussianRadialField(launch.mfdUm, wavelengthNm), modes, offsetUm: launch.offsetUm });
      return { powers: r.perMode.map((m) => m.fraction), guidedShare: r.coupledFraction, lossDb: r.lossDb };
    }
    case 'mandrel': {
      const r = mandrelFilter({ fiber, wavelengthNm, modes, mandrelDiameterMm: launch.mandrelDiameterMm, cordDiameterMm: launch.cordDiameterMm, turns: launch.turns });
      return { powers: r.powersAfter, guidedShare: 10 ** (-r.lossDb / 10), lossDb: r.lossDb };
    }
    case 'groups':
      return { powers: groupModePowers({ modes, groupPowers: launch.groupPowers }), guidedShare: 1, lossDb: 0 };
    default:
      throw new InputError('launch', launch, 'an overfilled, single-mode, mandrel or per-group launch');
  }
}

export function efTask(input: EfInput): EfOutput {
  const modes = multimodeModes(input.fiber, input.wavelengthNm);
  const { powers, guidedShare, lossDb } = launchPowers(input.fiber, input.wavelengthNm, modes, input.launch);
  return {
    ...summarise(input.fiber, input.wavelengthNm, modes, powers),
    v: modes.v,
    modeCount: modes.totalModeCount,
    highestGroup: modes.modes.reduce((mx, m) => Math.max(mx, m.principal), 1),
    guidedShare,
    lossDb,
    method: modes.method,
  };
}

// ---------------------------------------------------------------- mandrel screen

export interface MandrelTaskInput extends MandrelSpec {
  fiber: MultimodeFiberSpec;
  wavelengthNm: number;
}

export interface MandrelCase extends EfSummary {
  mandrelDiameterMm: number;
  lossDb: number;
  groupsStripped: number;
  groupsPartly: number;
}

export interface MandrelTaskOutput {
  chosen: MandrelCase;
  perGroup: GroupTransmission[];
  highestGroup: number;
  glogeGuidedModeShare: number;
  effectiveRadiusMm: number;
  fiberBendRadiusMm: number;
  /** The table's mandrel for this core and cord, computed the same way (absent when the table has none). */
  table?: MandrelCase & { turns: number };
  /** Overfilled launch with no mandrel, for comparison. */
  unwrapped: EfSummary;
  /** Loss against mandrel diameter (same cord and turns), for the steps of the picture. */
  sweep: [diameterMm: number, lossDb: number][];
  method: string;
}

/** Diameters of the loss-versus-mandrel picture (mm). */
const SWEEP_MIN_MM = 6;
const SWEEP_MAX_MM = 60;
const SWEEP_POINTS = 55;

export function mandrelTask(input: MandrelTaskInput): MandrelTaskOutput {
  const { fiber, wavelengthNm } = input;
  const modes = multimodeModes(fiber, wavelengthNm);
  const run = (mandrelDiameterMm: number, turns: number) => mandrelFilter({ fiber, wavelengthNm, modes, mandrelDiameterMm, cordDiameterMm: input.cordDiameterMm, turns });
  const chosen = run(input.mandrelDiameterMm, input.turns);
  const asCase = (d: number, r: ReturnType<typeof run>): MandrelCase => ({ mandrelDiameterMm: d, lossDb: r.lossDb, groupsStripped: r.groupsStripped, groupsPartly: r.groupsPartly, ...summarise(fiber, wavelengthNm, modes, r.powersAfter) });
  const rec = recommendedMandrel({ coreDiameterUm: 2 * fiber.coreRadiusUm, cordDiameterMm: input.cordDiameterMm });
  const tableRun = rec ? run(rec.mandrelDiameterMm, rec.turns) : undefined;
  const sweep: [number, number][] = [];
  for (let i = 0; i < SWEEP_POINTS; i++) {
    const d = SWEEP_MIN_MM + ((SWEEP_MAX_MM - SWEEP_MIN_MM) * i) / (SWEEP_POINTS - 1);
    try {
      sweep.push([d, run(d, input.turns).lossDb]);
    } catch {
      // A mandrel so small that nothing is left: no point on the picture (the chosen one says so in words).
    }
  }
  return {
    chosen: asCase(input.mandrelDiameterMm, chosen),
    perGroup: chosen.perGroup,
    highestGroup: chosen.highestGroup,
    glogeGuidedModeShare: chosen.glogeGuidedModeShare,
    effectiveRadiusMm: chosen.effectiveRadiusMm,
    fiberBendRadiusMm: chosen.fiberBendRadiusMm,
    table: rec && tableRun ? { ...asCase(rec.mandrelDiameterMm, tableRun), turns: rec.turns } : undefined,
    unwrapped: summarise(fiber, wavelengthNm, modes, overfilledModePowers({ modes })),
    sweep,
    method: chosen.method,
  };
}

// ---------------------------------------------------------------- offset-launch screen

export interface OffsetTaskInput {
  fiber: MultimodeFiberSpec;
  wavelengthNm: number;
  /** MFD of the single-mode spot at the wavelength (µm). */
  mfdUm: number;
  offsetUm: number;
}

export interface OffsetTaskOutput {
  at: OffsetPoint & EfSummary;
  sweep: Omit<OffsetPoint, 'powers'>[];
  highestGroup: number;
}

/** Offsets of the sweep: 0 to the core radius in 1 µm steps (at most MAX_OFFSET_POINTS). */
export function offsetTask(input: OffsetTaskInput): OffsetTaskOutput {
  const { fiber, wavelengthNm } = input;
  const modes = multimodeModes(fiber, wavelengthNm);
  const source = gaussianRadialField(input.mfdUm, wavelengthNm);
  const steps = Math.min(40, Math.max(2, Math.round(fiber.coreRadiusUm)));
  const offsets = Array.from({ length: steps + 1 }, (_, i) => (fiber.coreRadiusUm * i) / steps);
  const sweep = offsetLaunchSweep({ source, modes, coreRadiusUm: fiber.coreRadiusUm, offsetsUm: offsets }).map(({ powers: _powers, ...rest }) => rest);
  const [at] = offsetLaunchSweep({ source, modes, coreRadiusUm: fiber.coreRadiusUm, offsetsUm: [input.offsetUm] });
  return { at: { ...at, ...summarise(fiber, wavelengthNm, modes, at.powers) }, sweep, highestGroup: modes.modes.reduce((mx, m) => Math.max(mx, m.principal), 1) };
}

export const tasks = {
  'encircledFlux.ef': efTask,
  'encircledFlux.mandrel': mandrelTask,
  'encircledFlux.offset': offsetTask,
};
