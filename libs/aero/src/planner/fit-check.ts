/** Outcome of one tunnel-fit check. */
export type FitStatus = 'pass' | 'warn' | 'fail';

/** One tunnel-fit check: a stable id, its outcome, and the reason in words with the numbers behind it. */
export interface FitCheck {
  id: string;
  status: FitStatus;
  reason: string;
  /** The checked quantity (ratio, fraction, Mach number …), when there is one. */
  value?: number;
}
