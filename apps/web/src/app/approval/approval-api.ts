import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { AuditEntry, Page, ResultSheet, SigningRight, Submission, Verification, VerificationCheck } from '@tunnelwright/contracts';
import { Observable, map } from 'rxjs';

/** Whether the caller holds a signing right now, and which. */
export interface MySigningRight {
  readonly holds: boolean;
  readonly right: SigningRight | null;
}

/** A file fetched through the session, with the name the server gave it. */
export interface DownloadedFile {
  readonly blob: Blob;
  readonly filename: string;
}

/** Submissions for approval, signing rights, issued result sheets and their public check. */
@Injectable({ providedIn: 'root' })
export class ApprovalApi {
  private readonly http = inject(HttpClient);

  /** Submissions of a test, newest first. */
  submissions(testId: string): Observable<Submission[]> {
    return this.http.get<Submission[]>(`/api/tests/${testId}/submissions`);
  }

  submit(testId: string, reductionIds: readonly string[], note: string): Observable<Submission> {
    return this.http.post<Submission>(`/api/tests/${testId}/submissions`, { reductionIds, note });
  }

  approve(submissionId: string, comment: string): Observable<Submission> {
    return this.http.post<Submission>(`/api/submissions/${submissionId}/approve`, { comment });
  }

  sendBack(submissionId: string, reason: string): Observable<Submission> {
    return this.http.post<Submission>(`/api/submissions/${submissionId}/send-back`, { reason });
  }

  /** Renders, stores and publishes the sheet; takes a second or two. */
  issue(submissionId: string, revisionReason: string): Observable<ResultSheet> {
    return this.http.post<ResultSheet>(`/api/submissions/${submissionId}/issue`, { revisionReason });
  }

  /** Issued sheets, newest first; a customer gets only their organisation's. */
  sheets(testId?: string): Observable<ResultSheet[]> {
    return this.http.get<ResultSheet[]>('/api/result-sheets', { params: testId ? { testId } : {} });
  }

  sheet(id: string): Observable<ResultSheet> {
    return this.http.get<ResultSheet>(`/api/result-sheets/${id}`);
  }

  sheetPdf(sheet: Pick<ResultSheet, 'id' | 'reportNumber'>): Observable<DownloadedFile> {
    return this.file(`/api/result-sheets/${sheet.id}/pdf`, `${sheet.reportNumber}.pdf`);
  }

  sheetCsv(sheet: Pick<ResultSheet, 'id' | 'reportNumber'>): Observable<DownloadedFile> {
    return this.file(`/api/result-sheets/${sheet.id}/points.csv`, `${sheet.reportNumber}-points.csv`);
  }

  mySigningRight(): Observable<MySigningRight> {
    return this.http.get<MySigningRight>('/api/me/signing-right');
  }

  /** Every signing right ever granted (current ones only with `current`). */
  signingRights(current = false): Observable<SigningRight[]> {
    return this.http.get<SigningRight[]>('/api/signing-rights', { params: current ? { current: 'true' } : {} });
  }

  grantSigningRight(userId: string, scopeNote: string): Observable<SigningRight> {
    return this.http.post<SigningRight>('/api/signing-rights', { userId, scopeNote });
  }

  revokeSigningRight(id: string, reason: string): Observable<SigningRight> {
    return this.http.post<SigningRight>(`/api/signing-rights/${id}/revoke`, { reason });
  }

  /** What anyone may see of an issued sheet, without signing in. */
  verification(reportNumber: string): Observable<Verification> {
    return this.http.get<Verification>(`/api/verify/${encodeURIComponent(reportNumber)}`);
  }

  /** Sends a file's raw bytes to be compared with the issued sheet. */
  verifyFile(reportNumber: string, file: Blob): Observable<VerificationCheck> {
    return this.http.post<VerificationCheck>(`/api/verify/${encodeURIComponent(reportNumber)}`, file, {
      headers: { 'Content-Type': 'application/octet-stream' },
    });
  }

  /** The audit trail of one test, newest first. */
  testAudit(testId: string, page: number, pageSize: number): Observable<Page<AuditEntry>> {
    return this.http.get<Page<AuditEntry>>('/api/audit', { params: { entity: 'test', entityId: testId, page: String(page), pageSize: String(pageSize) } });
  }

  private file(url: string, fallbackName: string): Observable<DownloadedFile> {
    return this.http
      .get(url, { responseType: 'blob', observe: 'response' })
      .pipe(map((response) => ({ blob: response.body as Blob, filename: attachmentName(response.headers.get('Content-Disposition')) ?? fallbackName })));
  }
}

/** The file name of a `Content-Disposition: attachment` header, or null when it has none. */
export function attachmentName(header: string | null): string | null {
  if (!header) return null;
  const encoded = /filename\*\s*=\s*(?:UTF-8'[^']*')?([^;]+)/i.exec(header);
  if (encoded) {
    try {
      return decodeURIComponent(encoded[1].trim().replace(/^"|"$/g, ''));
    } catch {
      // Fall through to the plain parameter.
    }
  }
  const plain = /filename\s*=\s*("([^"]*)"|[^;]+)/i.exec(header);
  if (!plain) return null;
  const name = (plain[2] ?? plain[1]).trim();
  return name === '' ? null : name;
}

/** Hands a fetched file to the browser as a download. */
export function saveFile(file: DownloadedFile): void {
  const url = URL.createObjectURL(file.blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = file.filename;
  link.click();
  URL.revokeObjectURL(url);
}
