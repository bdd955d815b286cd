import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type {
  AcceptInvitationRequest,
  ForgotPasswordRequest,
  InvitationPreview,
  ResetPasswordRequest,
  TokenResponse,
} from '@tunnelwright/contracts';
import { Observable } from 'rxjs';

/** The public account calls: invitations and password reset. */
@Injectable({ providedIn: 'root' })
export class AccountApi {
  private readonly http = inject(HttpClient);

  previewInvitation(token: string): Observable<InvitationPreview> {
    return this.http.get<InvitationPreview>(`/api/auth/invitations/${encodeURIComponent(token)}`);
  }

  acceptInvitation(request: AcceptInvitationRequest): Observable<TokenResponse> {
    return this.http.post<TokenResponse>('/api/auth/accept-invitation', request, { withCredentials: true });
  }

  forgotPassword(request: ForgotPasswordRequest): Observable<void> {
    return this.http.post<void>('/api/auth/forgot-password', request);
  }

  resetPassword(request: ResetPasswordRequest): Observable<void> {
    return this.http.post<void>('/api/auth/reset-password', request);
  }
}
