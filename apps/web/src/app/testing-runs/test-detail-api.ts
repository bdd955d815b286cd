import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { CalibrationOverrideView, TestDetail } from '@tunnelwright/contracts';
import { Observable } from 'rxjs';

/** One test as its page shows it, with where its balance calibration stands, and the lab manager's override of an overdue one. */
@Injectable({ providedIn: 'root' })
export class TestDetailApi {
  private readonly http = inject(HttpClient);

  /** The test with where it stands; staff also get its calibration state. */
  test(id: string): Observable<TestDetail> {
    return this.http.get<TestDetail>(`/api/tests/${id}`);
  }

  /** Lets runs of the test be reduced with its balance's overdue calibration; the reason is audited. */
  allowOverdueCalibration(testId: string, reason: string): Observable<CalibrationOverrideView> {
    return this.http.post<CalibrationOverrideView>(`/api/tests/${testId}/calibration-overrides`, { reason });
  }
}
