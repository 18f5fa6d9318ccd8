// Worker task of the joint-loss screen: the exact LP01 overlap, its curve over offset and the field picture.
import { singleModeJointComparison, type JointComparison, type StepFiber } from '../../physics';

export interface JointExactInput {
  fiber1: StepFiber;
  fiber2: StepFiber;
  wavelengthNm: number;
  lateralOffsetUm: number;
}

export const tasks = {
  'jointLoss.exact': (input: JointExactInput): JointComparison => singleModeJointComparison(input),
};
