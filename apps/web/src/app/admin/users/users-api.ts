import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type {
  CreateInvitationRequest,
  Organisation,
  Page,
  Role,
  UpdateUserRequest,
  UserSummary,
} from '@tunnelwright/contracts';
import { Observable } from 'rxjs';

/** Columns the user list can be sorted by. */
export type UserSortField = 'name' | 'email' | 'role' | 'createdAt';

/** One request for a page of users. `page` counts from 1, as the API does. */
export interface UserQuery {
  readonly q: string;
  readonly sort: UserSortField;
  readonly order: 'asc' | 'desc';
  readonly page: number;
  readonly pageSize: number;
  /** Only users of this role. */
  readonly role?: Role;
  /** Only accounts that may sign in (true) or only deactivated ones (false). */
  readonly active?: boolean;
}

/** Lab-manager calls about accounts, organisations and invitations. */
@Injectable({ providedIn: 'root' })
export class UsersApi {
  private readonly http = inject(HttpClient);

  list(query: UserQuery): Observable<Page<UserSummary>> {
    const params: Record<string, string> = {
      sort: query.sort,
      order: query.order,
      page: String(query.page),
      pageSize: String(query.pageSize),
    };
    if (query.q) {
      params['q'] = query.q;
    }
    if (query.role) {
      params['role'] = query.role;
    }
    if (query.active !== undefined) {
      params['active'] = String(query.active);
    }
    return this.http.get<Page<UserSummary>>('/api/users', { params });
  }

  update(id: string, request: UpdateUserRequest): Observable<UserSummary> {
    return this.http.patch<UserSummary>(`/api/users/${id}`, request);
  }

  organisations(): Observable<Organisation[]> {
    return this.http.get<Organisation[]>('/api/organisations');
  }

  invite(request: CreateInvitationRequest): Observable<unknown> {
    return this.http.post('/api/invitations', request);
  }
}
