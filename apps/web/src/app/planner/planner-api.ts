import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { Balance, CertifiedCandidateList, CertifiedResultLinkBody, PlanDetail, PlanEvaluation, PlanInputDraft, PlanList, PlanVersionList, ShapeList } from '@tunnelwright/contracts';
import { Observable } from 'rxjs';

/** What the planner page sends when it saves: a name and the input as the form holds it. */
export interface PlanSaveDraft {
  name: string;
  input: PlanInputDraft;
  organisationId?: string;
  note?: string;
}

/** The test planner's calls: the shape library, stateless evaluation, and versioned plans. */
@Injectable({ providedIn: 'root' })
export class PlannerApi {
  private readonly http = inject(HttpClient);

  shapes(): Observable<ShapeList> {
    return this.http.get<ShapeList>('/api/shapes');
  }

  evaluate(input: PlanInputDraft): Observable<PlanEvaluation> {
    return this.http.post<PlanEvaluation>('/api/plans/evaluate', input);
  }

  plans(): Observable<PlanList> {
    return this.http.get<PlanList>('/api/plans');
  }

  plan(id: string): Observable<PlanDetail> {
    return this.http.get<PlanDetail>(`/api/plans/${id}`);
  }

  versions(id: string): Observable<PlanVersionList> {
    return this.http.get<PlanVersionList>(`/api/plans/${id}/versions`);
  }

  create(save: PlanSaveDraft): Observable<PlanDetail> {
    return this.http.post<PlanDetail>('/api/plans', save);
  }

  /** Saves again: the API keeps the older versions and answers with the new one. */
  update(id: string, save: PlanSaveDraft): Observable<PlanDetail> {
    return this.http.put<PlanDetail>(`/api/plans/${id}`, save);
  }

  /** Staff: the valid result sheets of the plan's customer a plan can be linked to. */
  certifiedCandidates(id: string): Observable<CertifiedCandidateList> {
    return this.http.get<CertifiedCandidateList>(`/api/plans/${id}/certified-candidates`);
  }

  /** Staff: links a configuration of a valid sheet; answers with the plan as it now reads. */
  linkCertified(id: string, body: CertifiedResultLinkBody): Observable<PlanDetail> {
    return this.http.put<PlanDetail>(`/api/plans/${id}/certified-result`, body);
  }

  /** Staff: removes the link. */
  unlinkCertified(id: string): Observable<void> {
    return this.http.delete<void>(`/api/plans/${id}/certified-result`);
  }

  /** Staff: the lab's balances, for the capacity check (customers cannot list them). */
  balances(): Observable<Balance[]> {
    return this.http.get<Balance[]>('/api/balances');
  }
}
