import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { TokenResponse } from '@tunnelwright/contracts';
import { AuthService } from './auth-service';

const answer: TokenResponse = {
  accessToken: 'access-1',
  expiresIn: 900,
  user: {
    id: '3f0b9f7e-9c1e-4a35-9e07-2f4f8f6d2c10',
    email: 'tomas.reyne@example.test',
    name: 'Tomas Reyne',
    role: 'customer',
    organisationId: '5b0f6f1c-8d7e-4e2f-9a3b-6c5d4e3f2a1b',
    organisationName: 'Northgale Bicycles',
  },
};

describe('AuthService', () => {
  let auth: AuthService;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    auth = TestBed.inject(AuthService);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it('starts signed out', () => {
    expect(auth.isSignedIn()).toBe(false);
    expect(auth.role()).toBeNull();
  });

  it('signs in and keeps the token only in memory', () => {
    auth.signIn({ email: 'tomas.reyne@example.test', password: 'secret' }).subscribe();
    const request = backend.expectOne('/api/auth/login');
    expect(request.request.method).toBe('POST');
    expect(request.request.withCredentials).toBe(true);
    request.flush(answer);
    expect(auth.accessToken()).toBe('access-1');
    expect(auth.role()).toBe('customer');
    expect(localStorage.length + sessionStorage.length).toBe(0);
  });

  it('restores a session from the refresh cookie', async () => {
    const restored = auth.restoreSession();
    backend.expectOne('/api/auth/refresh').flush(answer);
    await restored;
    expect(auth.user()?.name).toBe('Tomas Reyne');
  });

  it('treats a refused refresh on start-up as signed out, without throwing', async () => {
    const restored = auth.restoreSession();
    backend.expectOne('/api/auth/refresh').flush(null, { status: 401, statusText: 'Unauthorized' });
    await expect(restored).resolves.toBeUndefined();
    expect(auth.isSignedIn()).toBe(false);
  });

  it('signs out locally even when the server cannot be reached', () => {
    auth.acceptSession(answer);
    let done = false;
    auth.signOut().subscribe({ complete: () => (done = true) });
    backend.expectOne('/api/auth/logout').error(new ProgressEvent('error'));
    expect(done).toBe(true);
    expect(auth.isSignedIn()).toBe(false);
  });
});
