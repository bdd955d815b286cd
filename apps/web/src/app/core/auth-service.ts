import { HttpClient } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import type { LoginRequest, Role, SessionUser, TokenResponse } from '@tunnelwright/contracts';
import { Observable, catchError, finalize, firstValueFrom, map, of, shareReplay, tap, throwError } from 'rxjs';

/**
 * Holds who is signed in. The access token lives only in memory; the refresh token is an httpOnly
 * cookie that the browser sends to `/api/auth`, so a reload restores the session through `refresh()`.
 */
@Injectable({ providedIn: 'root' })
export class AuthService {
  private readonly http = inject(HttpClient);

  private readonly accessTokenState = signal<string | null>(null);
  private readonly userState = signal<SessionUser | null>(null);
  private pendingRefresh: Observable<TokenResponse> | null = null;

  /** The signed-in user, or null. */
  readonly user = this.userState.asReadonly();
  /** The current access token, or null when signed out. */
  readonly accessToken = this.accessTokenState.asReadonly();
  /** Whether somebody is signed in. */
  readonly isSignedIn = computed(() => this.userState() !== null);
  /** The signed-in user's role, or null. */
  readonly role = computed<Role | null>(() => this.userState()?.role ?? null);

  /** Signs in with e-mail and password; errors are left for the caller to show. */
  signIn(request: LoginRequest): Observable<SessionUser> {
    return this.http
      .post<TokenResponse>('/api/auth/login', request, { withCredentials: true })
      .pipe(map((response) => this.acceptSession(response)));
  }

  /**
   * Exchanges the refresh cookie for a new access token. Concurrent callers share one request, so
   * several 401s at once cause a single refresh. On failure the session is cleared.
   */
  refresh(): Observable<TokenResponse> {
    if (!this.pendingRefresh) {
      this.pendingRefresh = this.http
        .post<TokenResponse>('/api/auth/refresh', null, { withCredentials: true })
        .pipe(
          tap((response) => this.acceptSession(response)),
          catchError((error: unknown) => {
            this.clearSession();
            return throwError(() => error);
          }),
          finalize(() => (this.pendingRefresh = null)),
          shareReplay({ bufferSize: 1, refCount: false }),
        );
    }
    return this.pendingRefresh;
  }

  /** Restores a session from the refresh cookie on start-up; a missing or expired cookie just means signed out. */
  restoreSession(): Promise<void> {
    return firstValueFrom(
      this.refresh().pipe(
        map(() => undefined),
        catchError(() => of(undefined)),
      ),
    );
  }

  /** Revokes the refresh token on the server and forgets the session here, even if the server is unreachable. */
  signOut(): Observable<void> {
    return this.http.post<void>('/api/auth/logout', null, { withCredentials: true }).pipe(
      catchError(() => of(undefined)),
      map(() => undefined),
      finalize(() => this.clearSession()),
    );
  }

  /** Takes over a session answered by login, refresh or invitation acceptance. */
  acceptSession(response: TokenResponse): SessionUser {
    this.accessTokenState.set(response.accessToken);
    this.userState.set(response.user);
    return response.user;
  }

  /** Replaces the stored user after a profile change. */
  updateUser(user: SessionUser): void {
    this.userState.set(user);
  }

  /** Forgets the token and user. */
  clearSession(): void {
    this.accessTokenState.set(null);
    this.userState.set(null);
  }
}
