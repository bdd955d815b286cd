import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { Router, provideRouter } from '@angular/router';
import { AuthService } from '../core/auth-service';
import { AcceptInvitationPage } from './accept-invitation-page';

const token = 'k7Qw2mZp9RtY4vBn8LcX3sDf';

async function open(withToken: string | undefined) {
  TestBed.configureTestingModule({
    imports: [AcceptInvitationPage],
    providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
  });
  const fixture = TestBed.createComponent(AcceptInvitationPage);
  if (withToken !== undefined) {
    fixture.componentRef.setInput('token', withToken);
  }
  fixture.detectChanges();
  return { fixture, host: fixture.nativeElement as HTMLElement, backend: TestBed.inject(HttpTestingController) };
}

describe('AcceptInvitationPage', () => {
  it('explains a used or expired link (410) without offering a retry', async () => {
    const { fixture, host, backend } = await open(token);
    backend
      .expectOne(`/api/auth/invitations/${token}`)
      .flush({ title: 'Gone', status: 410 }, { status: 410, statusText: 'Gone' });
    await fixture.whenStable();
    const alert = host.querySelector('[role=alert]');
    expect(alert?.textContent).toContain('This link was already used or has expired. Ask your lab manager for a new one.');
    expect(alert?.querySelector('button')).toBeNull();
  });

  it('asks for the link when the page is opened without a token', async () => {
    const { fixture, host, backend } = await open(undefined);
    await fixture.whenStable();
    backend.expectNone(() => true);
    expect(host.textContent).toContain('This page needs the link from your invitation e-mail');
  });

  it('shows who is invited, then signs the new user in with the chosen password', async () => {
    const { fixture, host, backend } = await open(token);
    backend.expectOne(`/api/auth/invitations/${token}`).flush({
      email: 'petra.lind@example.test',
      name: 'Petra Lind',
      role: 'analyst',
      organisationName: 'Brightwater Aero Lab',
      expiresAt: '2026-12-05T10:00:00.000Z',
    });
    await fixture.whenStable();
    expect(host.textContent).toContain('You are invited as Analyst for Brightwater Aero Lab');

    const navigate = vi.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    const loader = TestbedHarnessEnvironment.loader(fixture);
    for (const label of ['New password', 'Repeat the password']) {
      const field = await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
      await (await field.getControl(MatInputHarness))?.setValue('Lichen-Tram-Quarry-Sings-41');
    }
    // The click settles only once the request is answered, so answer it while the click is pending.
    const clicked = (await loader.getHarness(MatButtonHarness.with({ text: 'Set password and sign in' }))).click();
    let accept = backend.match('/api/auth/accept-invitation')[0];
    for (let tick = 0; !accept && tick < 50; tick++) {
      await new Promise((resolve) => setTimeout(resolve, 10));
      accept = backend.match('/api/auth/accept-invitation')[0];
    }
    expect(accept.request.body).toEqual({ token, password: 'Lichen-Tram-Quarry-Sings-41' });
    accept.flush({
      accessToken: 'new-access',
      expiresIn: 900,
      user: {
        id: '4c3b2a19-0f8e-4d7c-9b6a-5f4e3d2c1b0a',
        email: 'petra.lind@example.test',
        name: 'Petra Lind',
        role: 'analyst',
        organisationId: '1d2c3b4a-5f6e-4d7c-8b9a-0f1e2d3c4b5a',
        organisationName: 'Brightwater Aero Lab',
      },
    });
    await clicked;
    expect(TestBed.inject(AuthService).user()?.name).toBe('Petra Lind');
    expect(navigate).toHaveBeenCalledWith('/');
  });
});
