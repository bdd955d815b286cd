import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { AuditEntry, Page } from '@tunnelwright/contracts';
import { Observable } from 'rxjs';

/** One request for a page of the audit log. `page` counts from 1. */
export interface AuditQuery {
  readonly entity: string;
  readonly page: number;
  readonly pageSize: number;
}

/** The lab's audit trail, newest first. */
@Injectable({ providedIn: 'root' })
export class AuditApi {
  private readonly http = inject(HttpClient);

  list(query: AuditQuery): Observable<Page<AuditEntry>> {
    const params: Record<string, string> = { page: String(query.page), pageSize: String(query.pageSize) };
    if (query.entity) {
      params['entity'] = query.entity;
    }
    return this.http.get<Page<AuditEntry>>('/api/audit', { params });
  }
}
