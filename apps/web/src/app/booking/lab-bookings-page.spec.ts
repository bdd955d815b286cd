import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { MatSnackBarHarness } from '@angular/material/snack-bar/testing';
import { provideRouter } from '@angular/router';
import type { UserSummary } from '@tunnelwright/contracts';
import { LabBookingsPage } from './lab-bookings-page';
import { bookingFixture, fixtureBookingId } from './testing/booking-fixtures';

const labId = '1d2c3b4a-5f6e-4d7c-8b9a-0f1e2d3c4b5a';

function technician(index: number, name: string): UserSummary {
  return {
    id: `00000000-0000-4000-8000-${String(index).padStart(12, '0')}`,
    email: `tech${index}@example.test`,
    name,
    role: 'technician',
    organisationId: labId,
    organisationName: 'Brightwater Aero Lab',
    active: true,
    activated: true,
    createdAt: '2026-01-15T09:00:00.000Z',
  };
}

const confirmed = bookingFixture();

describe('LabBookingsPage', () => {
  it('asks the API for active technicians only and offers exactly those in the picker', async () => {
    TestBed.configureTestingModule({
      imports: [LabBookingsPage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
    const fixture = TestBed.createComponent(LabBookingsPage);
    fixture.detectChanges();
    const backend = TestBed.inject(HttpTestingController);
    backend.expectOne('/api/bookings').flush([confirmed]);
    backend.expectOne((request) => request.url === '/api/services').flush([]);
    const users = backend.expectOne((request) => request.url === '/api/users');
    expect(users.request.params.get('role')).toBe('technician');
    expect(users.request.params.get('active')).toBe('true');
    users.flush({ items: [technician(1, 'Rhea Calder'), technician(2, 'Tobias Wren')], total: 2 });
    await fixture.whenStable();

    const picker = await TestbedHarnessEnvironment.loader(fixture).getHarness(MatSelectHarness);
    await picker.open();
    const options = await Promise.all((await picker.getOptions()).map((option) => option.getText()));
    expect(options).toEqual(['Nobody yet', 'Rhea Calder', 'Tobias Wren']);
  });

  it('declines a request with any reason that is not blank, says what is missing, and reloads the list', async () => {
    TestBed.configureTestingModule({
      imports: [LabBookingsPage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([]), { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } }],
    });
    const fixture = TestBed.createComponent(LabBookingsPage);
    fixture.detectChanges();
    const backend = TestBed.inject(HttpTestingController);
    const requested = bookingFixture({ state: 'requested', holdExpiresAt: '2030-09-08T09:00:00.000Z' });
    backend.expectOne('/api/bookings').flush([requested]);
    backend.expectOne((request) => request.url === '/api/services').flush([]);
    backend.expectOne((request) => request.url === '/api/users').flush({ items: [], total: 0 });
    await fixture.whenStable();

    const loader = TestbedHarnessEnvironment.loader(fixture);
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Decline…' }))).click();
    const root = TestbedHarnessEnvironment.documentRootLoader(fixture);
    const dialog = await root.getHarness(MatDialogHarness);
    expect(await dialog.getTitleText()).toBe('Decline the request from Northfield Models?');
    expect(await dialog.getText()).toContain('The customer is told the reason and the slot on Low-speed circuit is freed.');
    const field = await dialog.getHarness(MatFormFieldHarness.with({ floatingLabelText: /^Reason/ }));
    const input = (await field.getControl(MatInputHarness)) as MatInputHarness;
    const decline = await dialog.getHarness(MatButtonHarness.with({ text: 'Decline request' }));
    expect(await (await dialog.getHarness(MatButtonHarness.with({ text: 'Keep the request' }))).isDisabled()).toBe(false);

    await input.setValue('   ');
    await decline.click();
    expect(await field.getTextErrors()).toEqual(['Say why the request is declined']);
    // A short reason is enough here: no count towards a minimum is shown.
    expect(await field.getTextHints()).toEqual([]);
    backend.expectNone(`/api/bookings/${fixtureBookingId}/decline`);

    await input.setValue('  Full week ');
    await decline.click();
    const sent = backend.expectOne(`/api/bookings/${fixtureBookingId}/decline`);
    expect(sent.request.body).toEqual({ reason: 'Full week' });
    sent.flush({ ...requested, state: 'declined', declineReason: 'Full week' });
    // The dialog closes after its exit, and only then does the page reload the list.
    let reloads = backend.match('/api/bookings');
    for (let tick = 0; tick < 100 && reloads.length === 0; tick++) {
      await new Promise((resolve) => setTimeout(resolve, 10));
      reloads = backend.match('/api/bookings');
    }
    expect(reloads).toHaveLength(1);
    reloads[0]?.flush([{ ...requested, state: 'declined', declineReason: 'Full week' }]);
    expect(await (await root.getHarness(MatSnackBarHarness)).getMessage()).toBe('Request declined.');
    expect(await root.getAllHarnesses(MatDialogHarness)).toHaveLength(0);
    backend.verify();
  });
});
