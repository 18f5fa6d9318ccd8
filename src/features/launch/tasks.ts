// Worker task of the launch screen: every guided mode of the multimode fiber and the overlaps both
// ways, and everything the screen draws from them (bars per mode group, counts), so the main thread
// receives a small, ready-to-draw answer instead of the per-mode lists.
import {
  gaussianRadialField,
  lp01RadialField,
  modeFieldDiameterUm,
  multimodeModes,
  multimodeToSingleMode,
  singleModeToMultimode,
  type LaunchResult,
  type ModePowerDistribution,
  type MultimodeFiberSpec,
  type StepFiber,
} from '../../physics';

export interface LaunchInput {
  singleMode: StepFiber;
  /** 'exact': LP01 of the (equivalent) step fiber; 'gaussian': Gaussian of its Petermann II MFD. */
  fieldModel: 'exact' | 'gaussian';
  multimode: MultimodeFiberSpec;
  wavelengthNm: number;
  offsetUm: number;
  distribution: ModePowerDistribution;
}

/** One direction of the launch, as the screen shows it. */
export interface LaunchSide {
  coupledFraction: number;
  lossDb: number;
  modesFor90Percent: number;
  /** LP modes of the multimode fiber (the per-mode list stays in the worker). */
  lpModeCount: number;
  multimodeV: number;
  multimodeModeCount: number;
  /** Share of the power per mode group, in percent, labelled by principal mode number. */
  bars: { label: string; value: number }[];
}

export interface LaunchOutput {
  singleModeMfdUm: number;
  singleModeV: number;
  forward: LaunchSide;
  backward: LaunchSide;
}

export function launchSide(r: LaunchResult): LaunchSide {
  return {
    coupledFraction: r.coupledFraction,
    lossDb: r.lossDb,
    modesFor90Percent: r.modesFor90Percent,
    lpModeCount: r.perMode.length,
    multimodeV: r.multimodeV,
    multimodeModeCount: r.multimodeModeCount,
    bars: r.perGroup.map((g) => ({ label: String(g.principal), value: g.fraction * 100 })),
  };
}

export function launchTask(input: LaunchInput): LaunchOutput {
  const mfd = modeFieldDiameterUm({ ...input.singleMode, wavelengthNm: input.wavelengthNm, definition: 'petermann2' });
  const field = input.fieldModel === 'gaussian' ? gaussianRadialField(mfd.mfdUm, input.wavelengthNm) : lp01RadialField(input.singleMode, input.wavelengthNm);
  const modes = multimodeModes(input.multimode, input.wavelengthNm);
  return {
    singleModeMfdUm: mfd.mfdUm,
    singleModeV: mfd.v,
    forward: launchSide(singleModeToMultimode({ source: field, modes, offsetUm: input.offsetUm })),
    backward: launchSide(multimodeToSingleMode({ target: field, modes, distribution: input.distribution, offsetUm: input.offsetUm })),
  };
}

export const tasks = {
  'launch.couple': launchTask,
};
