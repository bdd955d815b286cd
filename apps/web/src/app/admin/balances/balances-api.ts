import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { Balance, BalanceInput, Calibration, CalibrationInput, CalibrationVersion } from '@tunnelwright/contracts';
import { Observable } from 'rxjs';

/** Calls about the lab's balances and their calibration versions (lab managers write; staff read). */
@Injectable({ providedIn: 'root' })
export class BalancesApi {
  private readonly http = inject(HttpClient);

  /** Every balance with its current calibration, by identifier. */
  balances(): Observable<Balance[]> {
    return this.http.get<Balance[]>('/api/balances');
  }

  createBalance(input: BalanceInput): Observable<Balance> {
    return this.http.post<Balance>('/api/balances', input);
  }

  updateBalance(id: string, input: BalanceInput): Observable<Balance> {
    return this.http.put<Balance>(`/api/balances/${id}`, input);
  }

  /** Every calibration version of a balance, newest first. */
  calibrations(balanceId: string): Observable<CalibrationVersion[]> {
    return this.http.get<CalibrationVersion[]>(`/api/balances/${balanceId}/calibrations`);
  }

  /** Records a new version; earlier versions stay on record. */
  recordCalibration(balanceId: string, input: CalibrationInput): Observable<Calibration> {
    return this.http.post<Calibration>(`/api/balances/${balanceId}/calibrations`, input);
  }
}
