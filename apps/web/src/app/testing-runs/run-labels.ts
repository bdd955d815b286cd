import type { ReductionState, RunKind, TestState } from '@tunnelwright/contracts';

/** Plain words for each kind of run. */
export const runKindLabels: Readonly<Record<RunKind, string>> = {
  data: 'Data',
  wind_off_zero: 'Wind-off zero',
  weight_tare: 'Weight tare',
  sphere_calibration: 'Sphere calibration',
};

/** Plain words for each reduction state. */
export const reductionStateLabels: Readonly<Record<ReductionState, string>> = {
  queued: 'Waiting',
  running: 'Reducing',
  done: 'Reduced',
  failed: 'Failed',
};

/** Plain words for each test state. */
export const testStateLabels: Readonly<Record<TestState, string>> = {
  planned: 'Planned',
  running: 'Under way',
  complete: 'Complete',
  cancelled: 'Cancelled',
};

/** The text of one reduction warning, whatever shape the engine gave it. */
export function warningText(warning: Readonly<Record<string, unknown>>): string {
  const message = warning['message'];
  const code = warning['code'];
  if (typeof message === 'string' && message !== '') return message;
  if (typeof code === 'string') return code;
  return JSON.stringify(warning);
}
