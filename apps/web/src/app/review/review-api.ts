import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { FullScaleEstimate, FullScaleInput, PointExclusion, TestReview } from '@tunnelwright/contracts';
import type { Observable } from 'rxjs';

/** Calls behind the analyst's review of a test. */
@Injectable({ providedIn: 'root' })
export class ReviewApi {
  private readonly http = inject(HttpClient);

  /** Every run of the test; `reductionIds` picks the version shown for their runs (others show the newest). */
  testReview(testId: string, reductionIds: readonly string[]): Observable<TestReview> {
    const params: Record<string, string> = reductionIds.length > 0 ? { reductionIds: reductionIds.join(',') } : {};
    return this.http.get<TestReview>(`/api/review/tests/${testId}`, { params });
  }

  fullScale(reductionId: string, input: FullScaleInput): Observable<FullScaleEstimate> {
    return this.http.post<FullScaleEstimate>(`/api/review/reductions/${reductionId}/full-scale`, input);
  }

  /** Leaves a point out of the result with the written reason. */
  exclude(reductionId: string, pointIndex: number, reason: string): Observable<PointExclusion> {
    return this.http.put<PointExclusion>(`/api/reductions/${reductionId}/points/${pointIndex}/exclusion`, { reason });
  }

  /** Puts an excluded point back. */
  restore(reductionId: string, pointIndex: number): Observable<void> {
    return this.http.delete<void>(`/api/reductions/${reductionId}/points/${pointIndex}/exclusion`);
  }
}
