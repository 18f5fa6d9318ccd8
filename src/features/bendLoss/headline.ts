// Which bend-loss figure leads the screen. A bend-insensitive (G.657) category is not a step-index
// fiber: the step-index model overstates its loss many times over, so the screen leads with the
// category's specified limit, scaled to the person's turns, and keeps the model below as a comparison.
// A fiber with a real step-index profile leads with the model.
//
// Pure: no DOM, no formatting; tested in tests/ui/bendHeadline.test.ts against the printed limits.
import { MACROBEND_LIMITS, type MacrobendLimit } from '../../physics';

/** Wavelengths the macrobend limits are specified at (ITU-T G.657, G.652). */
export type LimitWavelengthNm = 1550 | 1625;

/** Radii closer than this (mm) count as the specified radius itself (a typed 7.50 is 7.5). */
const SAME_RADIUS_MM = 0.01;

export interface BendHeadlineInput {
  /** The fiber's ITU-T category, if it has one ('G.657.A2'); undefined for a typed or measured fiber. */
  category: string | undefined;
  wavelengthNm: number;
  bendRadiusMm: number;
  turns: number;
  /** The limit table (default: MACROBEND_LIMITS). */
  limits?: readonly MacrobendLimit[];
}

/** One specified bend: N turns at R, with its maximum loss at the limit wavelength. */
export interface SpecifiedBend {
  bendRadiusMm: number;
  turns: number;
  maxLossDb: number;
}

export type BendHeadlineChoice =
  | {
      lead: 'category';
      category: string;
      /** Loss for the person's turns from the category limit (dB): a maximum, not a typical value. */
      totalDb: number;
      perTurnDb: number;
      /**
       * 'specified': the radius is one the standard specifies: the limit itself, scaled to the turns;
       * 'between': an estimate between the two specified radii around it (log-linear in the loss per turn);
       * 'gentler': larger than every specified radius: the limit at the largest one bounds it.
       */
      basis: 'specified' | 'between' | 'gentler';
      /** The specified bend(s) used: one, or the two around the radius. */
      from: SpecifiedBend[];
      limitWavelengthNm: LimitWavelengthNm;
      /** True when the person's wavelength is shorter than the limit's: the limit is then an upper bound. */
      shorterWavelength: boolean;
      /** True when the person's turns differ from the specified turns (the limit was scaled per turn). */
      scaledTurns: boolean;
    }
  | {
      /** A G.657 category, but the standard says nothing for this bend or wavelength. */
      lead: 'category-silent';
      category: string;
      why: 'tighter-than-specified' | 'wavelength-beyond-specified';
      /** The tightest specified radius (mm) or the longest specified wavelength (nm). */
      limitValue: number;
    }
  | { lead: 'model' };

/** True for the bend-insensitive categories, whose real profile is not a step. */
export function isBendInsensitiveCategory(category: string | undefined): boolean {
  return category !== undefined && category.startsWith('G.657');
}

/**
 * Chooses the headline of the bend-loss screen. For a G.657 category: the category's limit at the
 * person's radius (specified radius: the limit itself; between two: an estimate; gentler than all:
 * the largest radius's limit as a bound), per turn × turns, at 1550 nm for wavelengths up to 1550 nm
 * and at 1625 nm up to 1625 nm (bend loss grows with wavelength, so the next specified wavelength
 * bounds a shorter one). For any other fiber: the step-index model.
 */
export function chooseBendHeadline(input: BendHeadlineInput): BendHeadlineChoice {
  const { category, wavelengthNm, bendRadiusMm, turns } = input;
  if (!isBendInsensitiveCategory(category)) return { lead: 'model' };
  const cat = category!;
  if (wavelengthNm > 1625) return { lead: 'category-silent', category: cat, why: 'wavelength-beyond-specified', limitValue: 1625 };
  const limitWavelengthNm: LimitWavelengthNm = wavelengthNm <= 1550 ? 1550 : 1625;
  const rows: SpecifiedBend[] = (input.limits ?? MACROBEND_LIMITS)
    .filter((l) => l.category === cat)
    .map((l) => ({ bendRadiusMm: l.bendRadiusMm, turns: l.turns, maxLossDb: limitWavelengthNm === 1550 ? l.maxLossDb1550 : l.maxLossDb1625 }))
    .filter((l): l is SpecifiedBend => l.maxLossDb !== undefined)
    .sort((a, b) => a.bendRadiusMm - b.bendRadiusMm);
  // A G.657 category with no limit in the table: nothing specified to lead with, so the model leads.
  if (rows.length === 0) return { lead: 'model' };
  const tightest = rows[0]!;
  if (bendRadiusMm < tightest.bendRadiusMm - SAME_RADIUS_MM) {
    return { lead: 'category-silent', category: cat, why: 'tighter-than-specified', limitValue: tightest.bendRadiusMm };
  }
  const perTurn = (r: SpecifiedBend) => r.maxLossDb / r.turns;
  const same = rows.find((r) => Math.abs(r.bendRadiusMm - bendRadiusMm) <= SAME_RADIUS_MM);
  let basis: 'specified' | 'between' | 'gentler';
  let from: SpecifiedBend[];
  let perTurnDb: number;
  if (same) {
    basis = 'specified';
    from = [same];
    perTurnDb = perTurn(same);
  } else {
    const above = rows.find((r) => r.bendRadiusMm > bendRadiusMm);
    if (!above) {
      const largest = rows[rows.length - 1]!;
      basis = 'gentler';
      from = [largest];
      perTurnDb = perTurn(largest);
    } else {
      const below = [...rows].reverse().find((r) => r.bendRadiusMm < bendRadiusMm)!;
      basis = 'between';
      from = [below, above];
      // Bend loss falls about exponentially with the radius (Marcuse 1976): interpolate its logarithm.
      const t = (bendRadiusMm - below.bendRadiusMm) / (above.bendRadiusMm - below.bendRadiusMm);
      perTurnDb = Math.exp((1 - t) * Math.log(perTurn(below)) + t * Math.log(perTurn(above)));
    }
  }
  return {
    lead: 'category',
    category: cat,
    totalDb: perTurnDb * turns,
    perTurnDb,
    basis,
    from,
    limitWavelengthNm,
    shorterWavelength: wavelengthNm < limitWavelengthNm,
    scaledTurns: from.some((r) => r.turns !== turns),
  };
}
