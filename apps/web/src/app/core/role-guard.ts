import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import type { Role } from '@tunnelwright/contracts';
import { AuthService } from './auth-service';

/**
 * Lets a route through only for signed-in users whose role is listed. Somebody signed out is sent
 * to sign-in (and brought back afterwards); a signed-in user without the role sees the "not allowed" page.
 */
export function roleGuard(allowed: readonly Role[]): CanActivateFn {
  return (_route, state) => {
    const auth = inject(AuthService);
    const router = inject(Router);
    const role = auth.role();
    if (role === null) {
      return router.createUrlTree(['/sign-in'], { queryParams: { returnUrl: state.url } });
    }
    return allowed.includes(role) ? true : router.createUrlTree(['/not-allowed']);
  };
}
