import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import type { TokenResponse } from '@tunnelwright/contracts';
import { authInterceptor } from './auth-interceptor';
import { AuthService } from './auth-service';

const user = {
  id: '7d1c5a58-4a56-4d4e-9c53-0f3f0cbe2a11',
  email: 'ines.varga@example.test',
  name: 'Ines Varga',
  role: 'lab_manager' as const,
  organisationId: 'a1a8a0b4-2b3c-4d5e-8f90-1234567890ab',
  organisationName: 'Brightwater Aero Lab',
};
const session = (accessToken: string): TokenResponse => ({ accessToken, expiresIn: 900, user });

describe('authInterceptor', () => {
  let http: HttpClient;
  let backend: HttpTestingController;
  let auth: AuthService;
  let router: Router;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([authInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpClient);
    backend = TestBed.inject(HttpTestingController);
    auth = TestBed.inject(AuthService);
    router = TestBed.inject(Router);
  });

  afterEach(() => backend.verify());

  it('attaches the access token to API calls', () => {
    auth.acceptSession(session('token-one'));
    http.get('/api/tunnels').subscribe();
    const request = backend.expectOne('/api/tunnels');
    expect(request.request.headers.get('Authorization')).toBe('Bearer token-one');
    request.flush([]);
  });

  it('sends no token to the session routes', () => {
    auth.acceptSession(session('token-one'));
    http.post('/api/auth/logout', null).subscribe();
    const request = backend.expectOne('/api/auth/logout');
    expect(request.request.headers.has('Authorization')).toBe(false);
    request.flush(null);
  });

  it('refreshes once on a 401 and retries with the new token', () => {
    auth.acceptSession(session('stale'));
    let answer: unknown;
    http.get('/api/users').subscribe((body) => (answer = body));

    backend.expectOne('/api/users').flush(null, { status: 401, statusText: 'Unauthorized' });
    const refresh = backend.expectOne('/api/auth/refresh');
    expect(refresh.request.withCredentials).toBe(true);
    refresh.flush(session('fresh'));

    const retry = backend.expectOne('/api/users');
    expect(retry.request.headers.get('Authorization')).toBe('Bearer fresh');
    retry.flush({ items: [], total: 0 });
    expect(answer).toEqual({ items: [], total: 0 });
  });

  it('shares one refresh between calls that fail together', () => {
    auth.acceptSession(session('stale'));
    http.get('/api/tunnels').subscribe();
    http.get('/api/services').subscribe();
    backend.expectOne('/api/tunnels').flush(null, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/services').flush(null, { status: 401, statusText: 'Unauthorized' });

    backend.expectOne('/api/auth/refresh').flush(session('fresh'));
    backend.expectOne('/api/tunnels').flush([]);
    backend.expectOne('/api/services').flush([]);
  });

  it('does not loop when the retry is refused as well, and sends the user to sign-in', () => {
    const navigate = vi.spyOn(router, 'navigate').mockResolvedValue(true);
    auth.acceptSession(session('stale'));
    let status = 0;
    http.get('/api/users').subscribe({ error: (error: { status: number }) => (status = error.status) });

    backend.expectOne('/api/users').flush(null, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/auth/refresh').flush(session('fresh'));
    backend.expectOne('/api/users').flush(null, { status: 401, statusText: 'Unauthorized' });

    backend.expectNone('/api/auth/refresh');
    expect(status).toBe(401);
    expect(auth.isSignedIn()).toBe(false);
    expect(navigate).toHaveBeenCalledWith(['/sign-in'], expect.anything());
  });

  it('clears the session and sends the user to sign-in when the refresh fails', () => {
    const navigate = vi.spyOn(router, 'navigate').mockResolvedValue(true);
    auth.acceptSession(session('stale'));
    let failed = false;
    http.get('/api/users').subscribe({ error: () => (failed = true) });

    backend.expectOne('/api/users').flush(null, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/auth/refresh').flush(null, { status: 401, statusText: 'Unauthorized' });

    expect(failed).toBe(true);
    expect(auth.user()).toBeNull();
    expect(navigate).toHaveBeenCalledOnce();
  });

  it('passes other errors through untouched', () => {
    auth.acceptSession(session('token-one'));
    let status = 0;
    http.get('/api/users').subscribe({ error: (error: { status: number }) => (status = error.status) });
    backend.expectOne('/api/users').flush(null, { status: 403, statusText: 'Forbidden' });
    backend.expectNone('/api/auth/refresh');
    expect(status).toBe(403);
  });
});
