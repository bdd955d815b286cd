import { HttpClient, HttpEventType, HttpResponse, type HttpEvent } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { Preview, ReductionOverrides, ReductionView, Run, RunInput, TestWithProgress } from '@tunnelwright/contracts';
import { Observable, filter, map } from 'rxjs';

/** A page of reduced points as the API sends it. */
export interface PointPage {
  readonly items: readonly ReducedPoint[];
  readonly total: number;
  readonly caution: string;
}

/** One reduced point, key columns only. */
export interface ReducedPoint {
  readonly index: number;
  readonly pointNumber: number;
  readonly sampleCount: number;
  readonly yaw: number;
  readonly pitch: number;
  readonly dynamicPressure: number | null;
  readonly speed: number | null;
  readonly reynoldsNumber: number | null;
  readonly cdUncorrected: number | null;
  readonly cdCorrected: number | null;
  readonly clCorrected: number | null;
  readonly csCorrected: number | null;
  readonly dragCounts: number | null;
  readonly result: Readonly<Record<string, unknown>>;
}

/** Two versions side by side in drag counts. */
export interface VersionComparison {
  readonly from: number;
  readonly to: number;
  readonly rows: readonly {
    pointNumber: number;
    yaw: number | null;
    fromDragCounts: number | null;
    toDragCounts: number | null;
    differenceDragCounts: number | null;
  }[];
  readonly caution: string;
}

/** The stored file and the queued reduction of an accepted upload. */
export interface UploadResult {
  readonly rawFile: Run['rawFiles'][number];
  readonly reduction: ReductionView | null;
}

/** What an upload reports while it runs: bytes sent so far, then the answer. */
export type UploadEvent = { readonly kind: 'progress'; readonly fraction: number } | { readonly kind: 'done'; readonly result: UploadResult };

/** Calls for tests, runs, raw files and reduction versions. */
@Injectable({ providedIn: 'root' })
export class IngestApi {
  private readonly http = inject(HttpClient);

  /** Tests with where each stands on its way to a certified sheet. */
  tests(): Observable<TestWithProgress[]> {
    return this.http.get<TestWithProgress[]>('/api/tests');
  }

  test(id: string): Observable<TestWithProgress> {
    return this.http.get<TestWithProgress>(`/api/tests/${id}`);
  }

  runs(testId: string): Observable<Run[]> {
    return this.http.get<Run[]>(`/api/tests/${testId}/runs`);
  }

  run(id: string): Observable<Run> {
    return this.http.get<Run>(`/api/runs/${id}`);
  }

  createRun(testId: string, input: RunInput): Observable<Run> {
    return this.http.post<Run>(`/api/tests/${testId}/runs`, input);
  }

  /** Checks a file without keeping it, read through the saved import profile `profileId` when one is given. */
  preview(file: File, profileId?: string): Observable<Preview> {
    return this.http.post<Preview>('/api/runs/preview', fileForm(file, profileId));
  }

  /** Sends a raw file to a run, reporting the share of bytes sent; `profileId` names the import profile to read it with. */
  upload(runId: string, file: File, profileId?: string): Observable<UploadEvent> {
    return this.http.post<UploadResult>(`/api/runs/${runId}/files`, fileForm(file, profileId), { reportProgress: true, observe: 'events' }).pipe(
      filter((event: HttpEvent<UploadResult>) => event.type === HttpEventType.UploadProgress || event.type === HttpEventType.Response),
      map((event): UploadEvent => {
        if (event.type === HttpEventType.UploadProgress) {
          return { kind: 'progress', fraction: event.total ? event.loaded / event.total : 0 };
        }
        return { kind: 'done', result: (event as HttpResponse<UploadResult>).body as UploadResult };
      }),
    );
  }

  /** The raw file exactly as stored, with the SHA-256 the server computed. */
  rawFile(runId: string, fileId: string): Observable<{ blob: Blob; sha256: string | null }> {
    return this.http
      .get(`/api/runs/${runId}/raw`, { params: { fileId }, responseType: 'blob', observe: 'response' })
      .pipe(map((response) => ({ blob: response.body as Blob, sha256: response.headers.get('X-Content-SHA256') })));
  }

  reductions(runId: string): Observable<ReductionView[]> {
    return this.http.get<ReductionView[]>(`/api/runs/${runId}/reductions`);
  }

  reduction(id: string): Observable<ReductionView> {
    return this.http.get<ReductionView>(`/api/reductions/${id}`);
  }

  points(reductionId: string): Observable<PointPage> {
    return this.http.get<PointPage>(`/api/reductions/${reductionId}/points`, { params: { limit: 5000, full: true } });
  }

  /** Queues a new reduction version with other settings; the older versions stay. */
  reduceAgain(runId: string, overrides: ReductionOverrides): Observable<ReductionView> {
    return this.http.post<ReductionView>(`/api/runs/${runId}/reductions`, overrides);
  }

  compare(runId: string, from: number, to: number): Observable<VersionComparison> {
    return this.http.get<VersionComparison>(`/api/runs/${runId}/reductions/compare`, { params: { from, to } });
  }
}

function fileForm(file: File, profileId?: string): FormData {
  const form = new FormData();
  if (profileId) form.append('profileId', profileId);
  form.append('file', file, file.name);
  return form;
}
