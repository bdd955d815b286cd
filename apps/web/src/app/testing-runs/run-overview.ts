import type { ReductionView, Run } from '@tunnelwright/contracts';
import { Observable, catchError, forkJoin, map, of, switchMap } from 'rxjs';
import type { IngestApi, ReducedPoint } from './ingest-api';

/** One run with its newest reduction and that reduction's points, as the test page lists it. */
export interface RunOverview {
  readonly run: Run;
  /** Newest reduction version, or null when none was made (or the caller may not see reductions). */
  readonly latest: ReductionView | null;
  /** Points of the newest reduction when it is done. */
  readonly points: readonly ReducedPoint[];
  /** Whether the reductions of this run could not be loaded. */
  readonly failed: boolean;
}

/** Loads the runs of a test and, when `withReductions`, each run's newest reduction and its points. */
export function loadRunOverviews(api: IngestApi, testId: string, withReductions: boolean): Observable<RunOverview[]> {
  return api.runs(testId).pipe(
    switchMap((runs) => {
      if (!withReductions || runs.length === 0) {
        return of(runs.map((run): RunOverview => ({ run, latest: null, points: [], failed: false })));
      }
      return forkJoin(runs.map((run) => overviewOf(api, run)));
    }),
  );
}

function overviewOf(api: IngestApi, run: Run): Observable<RunOverview> {
  return api.reductions(run.id).pipe(
    switchMap((reductions) => {
      const latest = reductions[0] ?? null;
      if (!latest || latest.state !== 'done') return of({ run, latest, points: [], failed: false });
      return api.points(latest.id).pipe(map((page) => ({ run, latest, points: page.items, failed: false })));
    }),
    // One run's failure should not hide the others; its row says so instead.
    catchError(() => of({ run, latest: null, points: [], failed: true })),
  );
}
