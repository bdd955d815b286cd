import { HttpEventType, provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting, type TestRequest } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatProgressBarHarness } from '@angular/material/progress-bar/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { By } from '@angular/platform-browser';
import { provideRouter } from '@angular/router';
import type { PlanSummary } from '@tunnelwright/contracts';
import { DateTime } from 'luxon';
import { AttachmentPicker } from './attachment-picker';
import { BookingRequestPage } from './booking-request-page';

const tunnelId = '3f1c2b4a-5d6e-4f70-8a9b-0c1d2e3f4a5b';

const planId = '6a7b8c9d-0e1f-4a2b-8c3d-4e5f6a7b8c9d';
const bookingId = '9e8d7c6b-5a4f-4e3d-8c2b-1a0f9e8d7c6b';
const savedPlan = { id: planId, name: 'Trailer with cycle rack', bookingId: null } as PlanSummary;

async function open(options: { planId?: string; plans?: PlanSummary[]; planHours?: number } = {}): Promise<{ fixture: ComponentFixture<BookingRequestPage>; loader: HarnessLoader; backend: HttpTestingController }> {
  TestBed.configureTestingModule({
    imports: [BookingRequestPage],
    providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([{ path: 'bookings', children: [] }])],
  });
  const fixture = TestBed.createComponent(BookingRequestPage);
  if (options.planId) fixture.componentRef.setInput('planId', options.planId);
  fixture.detectChanges();
  const backend = TestBed.inject(HttpTestingController);
  backend.expectOne('/api/tunnels').flush([{ id: tunnelId, name: 'Low-speed circuit' }]);
  backend.expectOne('/api/services').flush([]);
  backend.expectOne('/api/bookings/settings').flush({ holdHours: 48, lateCancellationDays: 7, lateCancellationPercent: 50, timeZone: 'Europe/London' });
  backend.expectOne('/api/plans').flush({ items: options.plans ?? [], caution: 'Estimates only.' });
  if (options.planId) {
    // The plan named in the address is opened at once; the page is stable only once it has answered.
    const plan = options.plans?.find((candidate) => candidate.id === options.planId);
    backend.expectOne(`/api/plans/${options.planId}`).flush({ ...plan, evaluation: { duration: { hours: options.planHours ?? 1 } }, caution: 'Planner estimates are not design values.' });
  }
  await fixture.whenStable();
  return { fixture, loader: TestbedHarnessEnvironment.loader(fixture), backend };
}

/** Waits for the page to ask for the tunnel's week of occupancy, and returns that request unanswered. */
async function occupancyRequest(backend: HttpTestingController): Promise<TestRequest> {
  let pending = backend.match((request) => request.url === `/api/tunnels/${tunnelId}/occupancy`);
  while (pending.length === 0) {
    await new Promise((done) => setTimeout(done, 20));
    pending = backend.match((request) => request.url === `/api/tunnels/${tunnelId}/occupancy`);
  }
  return pending[0]!;
}

/** Chooses the tunnel and answers the week's occupancy request the choice starts; returns that request's range. */
async function chooseTunnel(loader: HarnessLoader, backend: HttpTestingController, slots: (from: string) => unknown[] = () => []): Promise<void> {
  const tunnel = await (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: /^Tunnel/ }))).getControl(MatSelectHarness);
  await tunnel?.open();
  // The harness waits for the page to settle, which includes the week's pending occupancy request.
  const choosing = tunnel?.clickOptions({ text: 'Low-speed circuit' });
  const week = await occupancyRequest(backend);
  const from = week.request.params.get('from') ?? '';
  week.flush({ tunnelId, timeZone: 'Europe/London', from, to: from, slots: slots(from) });
  await choosing;
}

/** Moves the tunnel's week on by one and answers the occupancy request that starts, with nothing booked. */
async function nextWeek(loader: HarnessLoader, backend: HttpTestingController): Promise<void> {
  const moving = (await loader.getHarness(MatButtonHarness.with({ selector: '[aria-label="Next week"]' }))).click();
  const week = await occupancyRequest(backend);
  const from = week.request.params.get('from') ?? '';
  week.flush({ tunnelId, timeZone: 'Europe/London', from, to: from, slots: [] });
  await moving;
}

/** Next Monday at `time` as a `datetime-local` value in the lab's zone. */
const nextMondayAt = (days: number, time: string) => `${DateTime.now().setZone('Europe/London').startOf('week').plus({ weeks: 1, days }).toFormat('yyyy-LL-dd')}T${time}`;

const field = (loader: HarnessLoader, label: RegExp) => loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
const input = async (loader: HarnessLoader, label: RegExp) => (await (await field(loader, label)).getControl(MatInputHarness)) as MatInputHarness;
/** Names the one article and bases its coefficients on the frontal area. */
async function nameArticle(loader: HarnessLoader, name: string): Promise<void> {
  await (await input(loader, /^Article name/)).setValue(name);
  const kind = await (await field(loader, /^Coefficients based on/)).getControl(MatSelectHarness);
  await kind?.open();
  await kind?.clickOptions({ text: 'Frontal area' });
}
/** Types the period into the Start and End fields, as `datetime-local` values. */
async function setPeriod(loader: HarnessLoader, start: string, end: string): Promise<void> {
  await (await input(loader, /^Start/)).setValue(start);
  await (await input(loader, /^End/)).setValue(end);
}
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
    await chooseTunnel(loader, backend, (from) => {
      const monday = new Date(Date.parse(from) + 10 * 3_600_000).toISOString();
      const mondayEnd = new Date(Date.parse(monday) + 2 * 3_600_000).toISOString();
      return [{ status: 'busy', period: { start: monday, end: mondayEnd, hours: 2 } }];
    });
    await fixture.whenStable();
    expect((fixture.nativeElement as HTMLElement).querySelector('tw-calendar-grid')?.textContent).toContain('Busy');
    await setPeriod(loader, '2030-10-07T09:00', '2030-10-07T17:00');
    await nameArticle(loader, 'Hatchback model, 1:4');
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

  it('takes a saved plan from the address, sets the end from its tunnel hours and sends the plan', async () => {
    const { fixture, loader, backend } = await open({ planId, plans: [savedPlan], planHours: 3.5 });
    const plan = await (await field(loader, /^Saved test plan/)).getControl(MatSelectHarness);
    expect(await plan?.getValueText()).toBe('Trailer with cycle rack');
    expect((fixture.nativeElement as HTMLElement).querySelector('[data-testid="plan-duration"]')?.textContent).toContain('estimates 3.5 h of tunnel time');
    expect((fixture.nativeElement as HTMLElement).textContent).toContain('Planner estimates are not design values.');
    await (await input(loader, /^Start/)).setValue('2030-10-07T09:00');
    expect(await (await input(loader, /^End/)).getValue()).toBe('2030-10-07T12:30');
    await chooseTunnel(loader, backend);
    await nameArticle(loader, 'Trailer, 1:5');
    await send(loader);
    expect(backend.expectOne('/api/bookings').request.body).toMatchObject({ planId, start: '2030-10-07T09:00:00+01:00', end: '2030-10-07T12:30:00+01:00' });
  }, 20_000);

  it('says when there are no saved plans to attach', async () => {
    const { fixture, loader } = await open();
    expect((fixture.nativeElement as HTMLElement).textContent).toContain('You have no saved plans yet.');
    expect(await loader.getAllHarnesses(MatFormFieldHarness.with({ floatingLabelText: /^Saved test plan/ }))).toEqual([]);
  });

  it('leaves out files the lab would refuse, then sends each chosen file with its own progress after the request', async () => {
    const { fixture, loader, backend } = await open();
    const picker = fixture.debugElement.query(By.directive(AttachmentPicker));
    picker.triggerEventHandler('added', [new File(['notes'], 'notes.docx'), new File([new Uint8Array(64)], 'side-view.png', { type: 'image/png' })]);
    await fixture.whenStable();
    const text = () => (fixture.nativeElement as HTMLElement).textContent ?? '';
    expect(text()).toContain('notes.docx: only PDF, PNG, JPEG, DWG and DXF files are accepted.');
    expect(text()).toContain('side-view.png');
    expect(await loader.getAllHarnesses(MatButtonHarness.with({ selector: '[aria-label="Remove notes.docx"]' }))).toEqual([]);

    await chooseTunnel(loader, backend);
    await setPeriod(loader, '2030-10-07T09:00', '2030-10-07T17:00');
    await nameArticle(loader, 'Trailer, 1:5');
    await send(loader);
    backend.expectOne('/api/bookings').flush({ id: bookingId, tunnelName: 'Low-speed circuit' });
    const upload = backend.expectOne(`/api/bookings/${bookingId}/attachments`);
    expect((upload.request.body as FormData).getAll('files').map((file) => (file as File).name)).toEqual(['side-view.png']);
    upload.event({ type: HttpEventType.UploadProgress, loaded: 32, total: 64 });
    const progress = await loader.getHarness(MatProgressBarHarness.with({ selector: '[aria-label="Sending side-view.png"]' }));
    expect(await progress.getValue()).toBe(50);
    upload.flush([{ id: '1f2e3d4c-5b6a-4978-8a9b-0c1d2e3f4a5b', filename: 'side-view.png', contentType: 'image/png', sizeBytes: 64, sha256: 'ab', createdAt: '2030-10-01T08:00:00Z' }]);
    await fixture.whenStable();
    expect(await progress.getValue()).toBe(100);
    expect(text()).toContain('Attached');
  }, 20_000);

  it('keeps the request and offers to send again a file that could not be attached', async () => {
    const { fixture, loader, backend } = await open();
    fixture.debugElement.query(By.directive(AttachmentPicker)).triggerEventHandler('added', [new File([new Uint8Array(8)], 'frame.pdf')]);
    await chooseTunnel(loader, backend);
    await setPeriod(loader, '2030-10-07T09:00', '2030-10-07T17:00');
    await nameArticle(loader, 'Trailer, 1:5');
    await send(loader);
    backend.expectOne('/api/bookings').flush({ id: bookingId, tunnelName: 'Low-speed circuit' });
    backend.expectOne(`/api/bookings/${bookingId}/attachments`).flush({ title: 'Invalid request', detail: 'frame.pdf is not a valid .pdf file' }, { status: 400, statusText: 'Bad Request' });
    await fixture.whenStable();
    expect((fixture.nativeElement as HTMLElement).textContent).toContain('The request was sent, but one file could not be attached.');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Try again' }))).click();
    backend.expectOne(`/api/bookings/${bookingId}/attachments`);
    backend.expectNone('/api/bookings');
  }, 20_000);

  it('makes a free stretch chosen on the tunnel’s week the period, in lab wall time', async () => {
    const { fixture, loader, backend } = await open();
    await chooseTunnel(loader, backend);
    await nextWeek(loader, backend);
    const monday = (fixture.nativeElement as HTMLElement).querySelector<HTMLButtonElement>('tw-calendar-grid button.free-slot');
    expect(monday?.textContent?.trim()).toBe('Free all day');
    monday?.click();
    await fixture.whenStable();
    expect(await (await input(loader, /^Start/)).getValue()).toBe(nextMondayAt(0, '00:00'));
    expect(await (await input(loader, /^End/)).getValue()).toBe(nextMondayAt(1, '00:00'));
    expect((fixture.nativeElement as HTMLElement).querySelector('[data-testid="slot-note"]')?.textContent).toContain('Period set to Mon');
  }, 20_000);

  it('with a saved plan, takes the start from the chosen free stretch and the end from the plan’s hours', async () => {
    const { fixture, loader, backend } = await open({ planId, plans: [savedPlan], planHours: 3 });
    await chooseTunnel(loader, backend);
    await nextWeek(loader, backend);
    (fixture.nativeElement as HTMLElement).querySelectorAll<HTMLButtonElement>('tw-calendar-grid button.free-slot')[2]?.click();
    await fixture.whenStable();
    expect(await (await input(loader, /^Start/)).getValue()).toBe(nextMondayAt(2, '00:00'));
    expect(await (await input(loader, /^End/)).getValue()).toBe(nextMondayAt(2, '03:00'));
    expect((fixture.nativeElement as HTMLElement).querySelector('[data-testid="slot-note"]')?.textContent).toContain('the end follows the plan’s 3 h');
  }, 20_000);
});
