// Worker tasks of the bend-loss screen: the 200-radius sweeps behind the loss-versus-radius plot.
import { bendLossSweep, type BendFiber } from '../../physics';

export interface BendSweepInput {
  fiber: BendFiber;
  wavelengthNm: number;
  minRadiusMm: number;
  maxRadiusMm: number;
  count: number;
}

export interface BendSweepOutput {
  stressCorrected: [number, number][];
  geometric: [number, number][];
}

export function bendSweepTask(input: BendSweepInput): BendSweepOutput {
  const run = (radiusModel: 'stress-corrected' | 'geometric') =>
    bendLossSweep({ ...input.fiber, wavelengthNm: input.wavelengthNm, minRadiusMm: input.minRadiusMm, maxRadiusMm: input.maxRadiusMm, count: input.count, radiusModel }).map(
      (p): [number, number] => [p.bendRadiusMm, p.lossDbPerTurn],
    );
  return { stressCorrected: run('stress-corrected'), geometric: run('geometric') };
}

export const tasks = {
  'bendLoss.sweep': bendSweepTask,
};
