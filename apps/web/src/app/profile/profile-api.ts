import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { ChangePasswordRequest, SessionUser, UpdateProfileRequest } from '@tunnelwright/contracts';
import { Observable } from 'rxjs';

/** The signed-in user's own account. */
@Injectable({ providedIn: 'root' })
export class ProfileApi {
  private readonly http = inject(HttpClient);

  update(request: UpdateProfileRequest): Observable<SessionUser> {
    return this.http.patch<SessionUser>('/api/me', request);
  }

  changePassword(request: ChangePasswordRequest): Observable<void> {
    return this.http.post<void>('/api/me/password', request);
  }
}
