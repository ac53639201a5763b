import { FindingStep } from './finding-step';
import { MeasureStep } from './measure-step';
import { ObserveStep } from './observe-step';
import type { StepProps } from './step-props';
import { TaskStep } from './task-step';

/** The screen for the current check, by its kind. */
export function CheckStep(props: StepProps) {
  const { check } = props;
  switch (check.kind) {
    case 'measure':
      return <MeasureStep {...props} check={check} />;
    case 'observe':
      return <ObserveStep {...props} check={check} />;
    case 'task':
      return <TaskStep {...props} check={check} />;
    case 'finding':
      return <FindingStep {...props} check={check} />;
  }
}
