import { HttpErrorResponse, HttpHandlerFn, HttpInterceptorFn, HttpRequest } from '@angular/common/http';
import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { catchError, switchMap, throwError } from 'rxjs';
import { AuthService } from './auth-service';

/** Routes that manage the session themselves: never given a bearer token, never retried after a refresh. */
const sessionRoutes = /^\/api\/auth\//;

function withToken(request: HttpRequest<unknown>, token: string | null): HttpRequest<unknown> {
  return token ? request.clone({ setHeaders: { Authorization: `Bearer ${token}` } }) : request;
}

/**
 * Attaches the access token to API calls. On a 401 it refreshes the session once and retries the
 * call once; if the refresh fails, or the retry is refused again, the user is sent to sign-in.
 */
export const authInterceptor: HttpInterceptorFn = (request: HttpRequest<unknown>, next: HttpHandlerFn) => {
  if (!request.url.startsWith('/api/') || sessionRoutes.test(request.url)) {
    return next(request);
  }
  const auth = inject(AuthService);
  const router = inject(Router);
  const sendToSignIn = () => {
    auth.clearSession();
    const returnUrl = router.url;
    void router.navigate(['/sign-in'], { queryParams: returnUrl && returnUrl !== '/' ? { returnUrl } : {} });
  };

  return next(withToken(request, auth.accessToken())).pipe(
    catchError((error: unknown) => {
      if (!(error instanceof HttpErrorResponse) || error.status !== 401) {
        return throwError(() => error);
      }
      return auth.refresh().pipe(
        catchError(() => {
          sendToSignIn();
          return throwError(() => error);
        }),
        switchMap((session) =>
          next(withToken(request, session.accessToken)).pipe(
            catchError((retryError: unknown) => {
              if (retryError instanceof HttpErrorResponse && retryError.status === 401) {
                sendToSignIn();
              }
              return throwError(() => retryError);
            }),
          ),
        ),
      );
    }),
  );
};
