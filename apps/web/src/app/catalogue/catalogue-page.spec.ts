import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting, type TestRequest } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import type { Tunnel } from '@tunnelwright/contracts';
import { CataloguePage } from './catalogue-page';

const tunnel: Tunnel = {
  id: '3f1c2b4a-5d6e-4f70-8a9b-0c1d2e3f4a5b',
  name: 'Low-speed circuit',
  kind: 'closed',
  description: '',
  width: 2.4,
  height: 1.8,
  area: 4.32,
  length: 5,
  minSpeed: 5,
  maxSpeed: 60,
  pressureGradient: 0,
  shapeFactor: 0.86,
  openJetConstants: {},
  capabilities: { yawRange: 30 },
  balances: [{ identifier: 'SB-3', capacities: [400, 400, 1200, 120, 200, 120] }],
  archived: false,
  createdAt: '2026-01-01T00:00:00.000Z',
  updatedAt: '2026-01-01T00:00:00.000Z',
};

/** Waits for the week's occupancy request of the tunnel and returns it unanswered. */
async function occupancyRequest(backend: HttpTestingController): Promise<TestRequest> {
  const url = `/api/tunnels/${tunnel.id}/occupancy`;
  let pending = backend.match((request) => request.url === url);
  while (pending.length === 0) {
    await new Promise((done) => setTimeout(done, 20));
    pending = backend.match((request) => request.url === url);
  }
  return pending[0]!;
}

describe('CataloguePage', () => {
  async function open() {
    TestBed.configureTestingModule({ imports: [CataloguePage], providers: [provideHttpClient(), provideHttpClientTesting()] });
    const fixture = TestBed.createComponent(CataloguePage);
    fixture.detectChanges();
    const backend = TestBed.inject(HttpTestingController);
    backend.expectOne('/api/tunnels').flush([tunnel]);
    backend.expectOne('/api/services').flush([]);
    backend.expectOne('/api/bookings/settings').flush({ holdHours: 48, lateCancellationDays: 7, lateCancellationPercent: 50, timeZone: 'Europe/London' });
    await fixture.whenStable();
    return { fixture, backend, loader: TestbedHarnessEnvironment.loader(fixture) };
  }

  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('shows the capacities of the balance installed in each tunnel, forces in N and moments in N·m', async () => {
    const { fixture } = await open();
    expect((fixture.nativeElement as HTMLElement).querySelector('.facts')?.textContent).toContain('SB-3: Fx 400, Fy 400, Fz 1,200 N; Mx 120, My 200, Mz 120 N·m');
  });

  it('opens a tunnel’s week of free and busy time on request, showing others’ bookings only as busy', async () => {
    const { fixture, backend, loader } = await open();
    const page = fixture.nativeElement as HTMLElement;
    expect(page.querySelector('tw-tunnel-occupancy-week')).toBeNull();
    backend.expectNone((request) => request.url.endsWith('/occupancy'));

    const toggle = await loader.getHarness(MatButtonHarness.with({ text: /Free and busy times/ }));
    // The harness waits for the page to settle, which includes the week's pending request: click, then answer it.
    const clicked = toggle.click();
    const week = await occupancyRequest(backend);
    const from = week.request.params.get('from')!;
    const start = new Date(Date.parse(from) + 10 * 3_600_000).toISOString();
    const end = new Date(Date.parse(start) + 3 * 3_600_000).toISOString();
    week.flush({ tunnelId: tunnel.id, timeZone: 'Europe/London', from, to: week.request.params.get('to'), slots: [{ status: 'busy', period: { start, end, hours: 3 } }] });
    await clicked;
    await fixture.whenStable();

    const region = page.querySelector('[role="region"]');
    expect(region?.getAttribute('aria-label')).toBe('Free and busy times of Low-speed circuit');
    expect(region?.querySelector('tw-calendar-grid')?.textContent).toContain('Busy');
    // Only shown here: the hint about choosing a stretch belongs to the request form.
    expect(region?.textContent).not.toContain('Choose a free stretch');
    const hide = await loader.getHarness(MatButtonHarness.with({ text: /Hide free and busy times/ }));
    expect(await (await hide.host()).getAttribute('aria-expanded')).toBe('true');

    await hide.click();
    expect(page.querySelector('tw-tunnel-occupancy-week')).toBeNull();
  });
});
