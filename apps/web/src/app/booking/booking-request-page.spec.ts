import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { provideRouter } from '@angular/router';
import { BookingRequestPage } from './booking-request-page';

const tunnelId = '3f1c2b4a-5d6e-4f70-8a9b-0c1d2e3f4a5b';

async function open(): Promise<{ fixture: ComponentFixture<BookingRequestPage>; loader: HarnessLoader; backend: HttpTestingController }> {
  TestBed.configureTestingModule({
    imports: [BookingRequestPage],
    providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
  });
  const fixture = TestBed.createComponent(BookingRequestPage);
  fixture.detectChanges();
  const backend = TestBed.inject(HttpTestingController);
  backend.expectOne('/api/tunnels').flush([{ id: tunnelId, name: 'Low-speed circuit' }]);
  backend.expectOne('/api/services').flush([]);
  backend.expectOne('/api/bookings/settings').flush({ holdHours: 48, lateCancellationDays: 7, lateCancellationPercent: 50, timeZone: 'Europe/London' });
  await fixture.whenStable();
  return { fixture, loader: TestbedHarnessEnvironment.loader(fixture), backend };
}

const field = (loader: HarnessLoader, label: RegExp) => loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
const input = async (loader: HarnessLoader, label: RegExp) => (await (await field(loader, label)).getControl(MatInputHarness)) as MatInputHarness;
const send = async (loader: HarnessLoader) => (await loader.getHarness(MatButtonHarness.with({ text: 'Send request' }))).click();

describe('BookingRequestPage', () => {
  it('explains every missing field and sends nothing', async () => {
    const { loader, backend } = await open();
    await send(loader);
    expect(await (await field(loader, /^Tunnel/)).getTextErrors()).toEqual(['Choose a tunnel']);
    expect(await (await field(loader, /^Start/)).getTextErrors()).toEqual(['Choose when the test starts']);
    expect(await (await field(loader, /^Article name/)).getTextErrors()).toEqual(['Name the article']);
    expect(await (await field(loader, /^Coefficients based on/)).getTextErrors()).toEqual(['Choose the reference area']);
    backend.expectNone('/api/bookings');
  });

  it('refuses a period that ends before it starts and speeds that are not numbers', async () => {
    const { fixture, loader, backend } = await open();
    await (await input(loader, /^Start/)).setValue('2030-10-05T17:00');
    await (await input(loader, /^End/)).setValue('2030-10-05T09:00');
    await (await input(loader, /^Speeds/)).setValue('20, fast');
    await send(loader);
    const text = (fixture.nativeElement as HTMLElement).textContent ?? '';
    expect(text).toContain('The end must be after the start.');
    expect(await (await field(loader, /^Speeds/)).getTextErrors()).toEqual(['List speeds in m/s above zero, separated by commas']);
    backend.expectNone('/api/bookings');
  });

  it('shows the chosen tunnel’s busy times, then sends the period as lab wall time with its offset, and the test plan', async () => {
    const { fixture, loader, backend } = await open();
    const tunnel = await (await field(loader, /^Tunnel/)).getControl(MatSelectHarness);
    await tunnel?.open();
    // The harness waits for the page to settle, which includes the week's pending occupancy request.
    const choosing = tunnel?.clickOptions({ text: 'Low-speed circuit' });
    let pending = backend.match((request) => request.url === `/api/tunnels/${tunnelId}/occupancy`);
    while (pending.length === 0) {
      await new Promise((done) => setTimeout(done, 20));
      pending = backend.match((request) => request.url === `/api/tunnels/${tunnelId}/occupancy`);
    }
    const week = pending[0]!;
    const monday = new Date(Date.parse(week.request.params.get('from') ?? '') + 10 * 3_600_000).toISOString();
    const mondayEnd = new Date(Date.parse(monday) + 2 * 3_600_000).toISOString();
    week.flush({ tunnelId, timeZone: 'Europe/London', from: monday, to: mondayEnd, slots: [{ status: 'busy', period: { start: monday, end: mondayEnd, hours: 2 } }] });
    await choosing;
    await fixture.whenStable();
    expect((fixture.nativeElement as HTMLElement).querySelector('tw-calendar-grid')?.textContent).toContain('Busy');
    await (await input(loader, /^Start/)).setValue('2030-10-07T09:00');
    await (await input(loader, /^End/)).setValue('2030-10-07T17:00');
    await (await input(loader, /^Article name/)).setValue('Hatchback model, 1:4');
    const kind = await (await field(loader, /^Coefficients based on/)).getControl(MatSelectHarness);
    await kind?.open();
    await kind?.clickOptions({ text: 'Frontal area' });
    await (await input(loader, /^Speeds/)).setValue('20, 30 40');
    await (await input(loader, /^Yaw from/)).setValue('-10');
    await (await input(loader, /^Yaw to/)).setValue('10');
    await (await input(loader, /^Configurations/)).setValue('Baseline\nSpoiler fitted');
    await send(loader);
    const request = backend.expectOne('/api/bookings');
    expect(request.request.body).toMatchObject({
      tunnelId,
      serviceId: null,
      start: '2030-10-07T09:00:00+01:00',
      end: '2030-10-07T17:00:00+01:00',
      articles: [{ name: 'Hatchback model, 1:4', referenceAreaKind: 'frontal' }],
      testPlan: { speeds: [20, 30, 40], yawRange: { from: -10, to: 10 }, configurations: [{ label: 'Baseline' }, { label: 'Spoiler fitted' }] },
    });
  }, 20_000);
});
