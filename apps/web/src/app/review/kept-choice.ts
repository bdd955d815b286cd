import type { ReviewRun } from '@tunnelwright/contracts';

/**
 * The run a picker keeps showing: the previous choice while it is still among the runs (or while the list is empty
 * because the review is reloading), otherwise the fallback.
 *
 * @param runs - the runs on offer now
 * @param previous - the earlier choice, if any
 * @param fallback - the run to choose by default
 */
export function keptChoice(runs: readonly ReviewRun[], previous: { value: string | null } | undefined, fallback: () => string | null): string | null {
  if (previous && previous.value !== null && (runs.length === 0 || runs.some((run) => run.id === previous.value))) return previous.value;
  return fallback();
}
