import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { HarnessLoader } from '@angular/cdk/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { Router, provideRouter } from '@angular/router';
import { SignInPage } from './sign-in-page';

describe('SignInPage', () => {
  let loader: HarnessLoader;
  let backend: HttpTestingController;
  let host: HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      imports: [SignInPage],
      providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
    });
    const fixture = TestBed.createComponent(SignInPage);
    host = fixture.nativeElement as HTMLElement;
    loader = TestbedHarnessEnvironment.loader(fixture);
    backend = TestBed.inject(HttpTestingController);
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  const field = (label: string) => loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
  const signInButton = () => loader.getHarness(MatButtonHarness.with({ text: 'Sign in' }));

  it('asks for both fields when submitted empty, without calling the API', async () => {
    await (await signInButton()).click();
    expect(await (await field('E-mail')).getTextErrors()).toEqual(['Enter your e-mail address']);
    expect(await (await field('Password')).getTextErrors()).toEqual(['Enter your password']);
    expect(document.activeElement).toBe(host.querySelector('input[type=email]'));
    backend.expectNone('/api/auth/login');
  });

  it('explains a malformed e-mail address', async () => {
    const email = await loader.getHarness(MatInputHarness.with({ selector: '[type=email]' }));
    await email.setValue('not-an-address');
    await email.blur();
    expect(await (await field('E-mail')).getTextErrors()).toEqual(['Enter a valid e-mail address']);
  });

  it('signs in and shows the problem detail when the API refuses', async () => {
    await (await loader.getHarness(MatInputHarness.with({ selector: '[type=email]' }))).setValue('olga.marsh@example.test');
    await (await loader.getHarness(MatInputHarness.with({ selector: '[type=password]' }))).setValue('wrong password');
    await (await signInButton()).click();

    const request = backend.expectOne('/api/auth/login');
    expect(request.request.body).toEqual({ email: 'olga.marsh@example.test', password: 'wrong password' });
    request.flush(
      { type: 'about:blank', title: 'Unauthorized', status: 401, detail: 'E-mail or password is wrong.' },
      { status: 401, statusText: 'Unauthorized' },
    );
    await (await signInButton()).getText();
    expect(host.querySelector('[role=alert]')?.textContent).toContain('E-mail or password is wrong.');
  });

  it('tells the user when to try again after too many attempts', async () => {
    await (await loader.getHarness(MatInputHarness.with({ selector: '[type=email]' }))).setValue('olga.marsh@example.test');
    await (await loader.getHarness(MatInputHarness.with({ selector: '[type=password]' }))).setValue('again');
    await (await signInButton()).click();
    backend
      .expectOne('/api/auth/login')
      .flush(
        { type: 'about:blank', title: 'Too many attempts', status: 429, detail: 'Too many failed sign-in attempts.' },
        { status: 429, statusText: 'Too Many Requests', headers: { 'Retry-After': '120' } },
      );
    await (await signInButton()).getText();
    expect(host.querySelector('[role=alert]')?.textContent).toContain('Too many failed sign-in attempts. Try again in 2 minutes.');
  });

  it('goes to the start page after signing in', async () => {
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    await (await loader.getHarness(MatInputHarness.with({ selector: '[type=email]' }))).setValue('olga.marsh@example.test');
    await (await loader.getHarness(MatInputHarness.with({ selector: '[type=password]' }))).setValue('right password');
    await (await signInButton()).click();
    backend.expectOne('/api/auth/login').flush({
      accessToken: 'a',
      expiresIn: 900,
      user: {
        id: '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d',
        email: 'olga.marsh@example.test',
        name: 'Olga Marsh',
        role: 'analyst',
        organisationId: '1d2c3b4a-5f6e-4d7c-8b9a-0f1e2d3c4b5a',
        organisationName: 'Brightwater Aero Lab',
      },
    });
    expect(navigate).toHaveBeenCalledWith('/');
  });
});
