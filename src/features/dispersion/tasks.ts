// Worker task of the dispersion screen: the D(λ) sweep and the zero-dispersion search
// (several milliseconds on a laptop, several times that on a phone), off the main thread.
import { dispersionFiberFromNa, dispersionSweep, zeroDispersion, type DispersionFiber, type DispersionPoint, type ZeroDispersion } from '../../physics';

export const DISPERSION_SWEEP = { fromNm: 1200, toNm: 1650, stepNm: 1 };

export interface DispersionCurveInput {
  coreRadiusUm: number;
  na: number;
  referenceWavelengthNm: number;
}

export interface DispersionCurveOutput {
  model: DispersionFiber;
  sweep: DispersionPoint[];
  zero: ZeroDispersion | undefined;
}

export function dispersionCurveTask(input: DispersionCurveInput): DispersionCurveOutput {
  const model = dispersionFiberFromNa(input);
  return { model, sweep: dispersionSweep(model, DISPERSION_SWEEP), zero: zeroDispersion(model) };
}

export const tasks = {
  'dispersion.curve': dispersionCurveTask,
};
