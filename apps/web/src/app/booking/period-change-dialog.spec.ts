import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { PeriodChangeDialog, type PeriodChange } from './period-change-dialog';
import { bookingFixture, fixtureBookingId } from './testing/booking-fixtures';

async function open(change: PeriodChange) {
  const closed: unknown[] = [];
  const booking = bookingFixture({ state: change === 'reschedule' ? 'confirmed' : 'requested', timeZone: 'Europe/London' });
  TestBed.configureTestingModule({
    imports: [PeriodChangeDialog],
    providers: [
      provideHttpClient(),
      provideHttpClientTesting(),
      { provide: MAT_DIALOG_DATA, useValue: { booking, change } },
      { provide: MatDialogRef, useValue: { close: (value: unknown) => closed.push(value) } },
    ],
  });
  const fixture = TestBed.createComponent(PeriodChangeDialog);
  fixture.detectChanges();
  await fixture.whenStable();
  const loader = TestbedHarnessEnvironment.loader(fixture);
  const input = async (label: RegExp): Promise<MatInputHarness> => {
    const control = await (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }))).getControl(MatInputHarness);
    if (!control) throw new Error(`no input labelled ${label}`);
    return control;
  };
  return { fixture, loader, backend: TestBed.inject(HttpTestingController), closed, input, text: () => (fixture.nativeElement as HTMLElement).textContent ?? '' };
}

describe('PeriodChangeDialog', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('moves a confirmed booking: says the customer gets the replacing calendar entry, posts the period in lab time and closes with the booking', async () => {
    const { loader, backend, closed, input, text } = await open('reschedule');
    expect(text()).toContain('Move the booking');
    expect(text()).toContain('Booked for:');
    expect(text()).toContain('updated calendar entry that replaces the old one');
    await (await input(/^Start/)).setValue('2030-10-08T09:00');
    await (await input(/^End/)).setValue('2030-10-08T17:00');
    await (await input(/^Note to the customer/)).setValue('  The balance is needed elsewhere.  ');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Move booking' }))).click();
    const sent = backend.expectOne(`/api/bookings/${fixtureBookingId}/reschedule`);
    // Europe/London keeps summer time (UTC+1) until the last Sunday of October (IANA time zone database).
    expect(sent.request.body).toEqual({ start: '2030-10-08T09:00:00+01:00', end: '2030-10-08T17:00:00+01:00', note: 'The balance is needed elsewhere.' });
    const moved = bookingFixture({ state: 'confirmed' });
    sent.flush(moved);
    expect(closed).toEqual([moved]);
  });

  it('offers another period for a request, and shows the server’s reason when the period is taken', async () => {
    const { fixture, loader, backend, closed, input, text } = await open('counter-proposal');
    expect(text()).toContain('Offer another period');
    expect(text()).toContain('Asked for:');
    await (await input(/^Start/)).setValue('2030-10-08T09:00');
    await (await input(/^End/)).setValue('2030-10-08T08:00');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Offer this period' }))).click();
    expect(text()).toContain('The end must be after the start.');
    backend.expectNone(() => true);

    await (await input(/^End/)).setValue('2030-10-08T12:00');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Offer this period' }))).click();
    backend
      .expectOne(`/api/bookings/${fixtureBookingId}/counter-proposal`)
      .flush({ title: 'Period taken', detail: 'Tunnel 1 is booked from 09:00 to 11:00 that day.' }, { status: 409, statusText: 'Conflict' });
    fixture.detectChanges();
    await fixture.whenStable();
    expect(text()).toContain('Tunnel 1 is booked from 09:00 to 11:00 that day.');
    expect(closed).toEqual([]);
  });
});
