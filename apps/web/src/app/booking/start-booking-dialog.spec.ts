import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { MatSelectHarness } from '@angular/material/select/testing';
import { provideRouter } from '@angular/router';
import { StartBookingDialog } from './start-booking-dialog';
import { bookingFixture, fixtureBookingId } from './testing/booking-fixtures';

const booking = bookingFixture();
const test = (id: string, title: string, overrides: Record<string, unknown> = {}) => ({ id, title, organisationId: booking.organisationId, tunnelId: booking.tunnelId, bookingId: null, state: 'planned', ...overrides });

async function open(tests: unknown[]) {
  const closed: unknown[] = [];
  TestBed.configureTestingModule({
    imports: [StartBookingDialog],
    providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([]), { provide: MAT_DIALOG_DATA, useValue: booking }, { provide: MatDialogRef, useValue: { close: (v: unknown) => closed.push(v) } }],
  });
  const fixture = TestBed.createComponent(StartBookingDialog);
  fixture.detectChanges();
  const backend = TestBed.inject(HttpTestingController);
  backend.expectOne('/api/tests').flush(tests);
  await fixture.whenStable();
  return { fixture, backend, closed, loader: TestbedHarnessEnvironment.loader(fixture), text: () => (fixture.nativeElement as HTMLElement).textContent ?? '' };
}

describe('StartBookingDialog', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('offers only the customer’s free tests in the booked tunnel and links the one chosen', async () => {
    const { loader, backend, closed } = await open([
      test('11111111-1111-4111-8111-111111111111', 'Hatchback yaw sweep'),
      test('22222222-2222-4222-8222-222222222222', 'Held by another booking', { bookingId: '99999999-9999-4999-8999-999999999999' }),
      test('33333333-3333-4333-8333-333333333333', 'Other tunnel', { tunnelId: '44444444-4444-4444-8444-444444444444' }),
      test('55555555-5555-4555-8555-555555555555', 'Other customer', { organisationId: '66666666-6666-4666-8666-666666666666' }),
      test('77777777-7777-4777-8777-777777777777', 'Cancelled one', { state: 'cancelled' }),
    ]);
    const select = await loader.getHarness(MatSelectHarness);
    await select.open();
    expect(await Promise.all((await select.getOptions()).map((o) => o.getText()))).toEqual(['Link a test later', 'Hatchback yaw sweep']);
    await select.clickOptions({ text: 'Hatchback yaw sweep' });
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Mark in test' }))).click();
    const sent = backend.expectOne(`/api/bookings/${fixtureBookingId}/start`);
    expect(sent.request.body).toEqual({ testId: '11111111-1111-4111-8111-111111111111' });
    const started = bookingFixture({ state: 'in_test' });
    sent.flush(started);
    expect(closed).toEqual([started]);
  });

  it('says when there is no test to link, points to opening one, and can start without', async () => {
    const { loader, backend, text } = await open([]);
    expect(text()).toContain('Northfield Models has no test in Low-speed circuit to link yet.');
    expect(await loader.getAllHarnesses(MatSelectHarness)).toHaveLength(0);
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Mark in test' }))).click();
    expect(backend.expectOne(`/api/bookings/${fixtureBookingId}/start`).request.body).toEqual({});
  });
});
