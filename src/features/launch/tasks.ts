// Worker task of the launch screen: every guided mode of the multimode fiber and the overlaps both ways.
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

export interface LaunchOutput {
  singleModeMfdUm: number;
  singleModeV: number;
  forward: LaunchResult;
  backward: LaunchResult;
}

export function launchTask(input: LaunchInput): LaunchOutput {
  const mfd = modeFieldDiameterUm({ ...input.singleMode, wavelengthNm: input.wavelengthNm, definition: 'petermann2' });
  const field = input.fieldModel === 'gaussian' ? gaussianRadialField(mfd.mfdUm, input.wavelengthNm) : lp01RadialField(input.singleMode, input.wavelengthNm);
  const modes = multimodeModes(input.multimode, input.wavelengthNm);
  return {
    singleModeMfdUm: mfd.mfdUm,
    singleModeV: mfd.v,
    forward: singleModeToMultimode({ source: field, modes, offsetUm: input.offsetUm }),
    backward: multimodeToSingleMode({ target: field, modes, distribution: input.distribution, offsetUm: input.offsetUm }),
  };
}

export const tasks = {
  'launch.couple': launchTask,
};
