import { TestBed } from '@angular/core/testing';
import { ActivatedRouteSnapshot, Router, RouterStateSnapshot, UrlTree, provideRouter } from '@angular/router';
import type { Role } from '@tunnelwright/contracts';
import { AuthService } from './auth-service';
import { roleGuard } from './role-guard';

function signInAs(role: Role): void {
  TestBed.inject(AuthService).acceptSession({
    accessToken: 't',
    expiresIn: 900,
    user: {
      id: '0c9b8a7d-6e5f-4a3b-9c2d-1e0f9a8b7c6d',
      email: 'someone@example.test',
      name: 'Someone',
      role,
      organisationId: '1d2c3b4a-5f6e-4d7c-8b9a-0f1e2d3c4b5a',
      organisationName: 'Example organisation',
    },
  });
}

function run(allowed: readonly Role[], url = '/admin/users'): boolean | UrlTree {
  return TestBed.runInInjectionContext(() =>
    roleGuard(allowed)({} as ActivatedRouteSnapshot, { url } as RouterStateSnapshot),
  ) as boolean | UrlTree;
}

describe('roleGuard', () => {
  beforeEach(() => TestBed.configureTestingModule({ providers: [provideRouter([])] }));

  it('sends somebody signed out to sign-in, remembering where they were going', () => {
    const result = run(['lab_manager']);
    const router = TestBed.inject(Router);
    expect(result instanceof UrlTree && router.serializeUrl(result)).toBe('/sign-in?returnUrl=%2Fadmin%2Fusers');
  });

  it('lets a listed role through', () => {
    signInAs('lab_manager');
    expect(run(['lab_manager'])).toBe(true);
  });

  it.each<Role>(['customer', 'technician', 'analyst'])('turns a %s away to the not-allowed page', (role) => {
    signInAs(role);
    const result = run(['lab_manager']);
    expect(result instanceof UrlTree && TestBed.inject(Router).serializeUrl(result)).toBe('/not-allowed');
  });

  it('accepts any of several roles', () => {
    signInAs('analyst');
    expect(run(['technician', 'analyst'])).toBe(true);
  });
});
