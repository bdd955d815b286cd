import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatNavListHarness } from '@angular/material/list/testing';
import { provideRouter } from '@angular/router';
import type { Role } from '@tunnelwright/contracts';
import { AppShell } from './app-shell';
import { AuthService } from './auth-service';

async function renderAs(role: Role, demoMode: boolean) {
  TestBed.configureTestingModule({
    imports: [AppShell],
    providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
  });
  TestBed.inject(AuthService).acceptSession({
    accessToken: 't',
    expiresIn: 900,
    user: {
      id: '2b3c4d5e-6f70-4812-9a3b-4c5d6e7f8091',
      email: 'mara.quist@example.test',
      name: 'Mara Quist',
      role,
      organisationId: '1d2c3b4a-5f6e-4d7c-8b9a-0f1e2d3c4b5a',
      organisationName: 'Example organisation',
    },
  });
  const fixture = TestBed.createComponent(AppShell);
  fixture.detectChanges();
  const backend = TestBed.inject(HttpTestingController);
  backend.match('/api/health').forEach((request) => request.flush({ status: 'ok', demoMode }));
  await fixture.whenStable();
  const list = await TestbedHarnessEnvironment.loader(fixture).getHarness(MatNavListHarness);
  const items = await list.getItems();
  return { host: fixture.nativeElement as HTMLElement, labels: await Promise.all(items.map((item) => item.getTitle())) };
}

describe('AppShell', () => {
  it('lists the catalogue, the test planner, the bookings and the tests for a customer, and asks nothing about demo mode', async () => {
    const { labels, host } = await renderAs('customer', true);
    expect(labels).toEqual(['Catalogue', 'Test planner', 'My bookings', 'Tests', 'Documents']);
    expect(host.textContent).toContain('Mara Quist');
    expect(host.textContent).toContain('Customer');
    TestBed.inject(HttpTestingController).expectNone('/api/health');
  });

  it('lists the administration sections and the dev mailbox for a lab manager in demo mode', async () => {
    const { labels } = await renderAs('lab_manager', true);
    expect(labels).toEqual(['Catalogue', 'Test planner', 'Bookings', 'Calendar', 'Tests', 'Test articles', 'Import profiles', 'Documents', 'Users', 'Signing rights', 'Tunnels', 'Services', 'Balances', 'Booking rules', 'Audit log', 'Dev mailbox']);
  });

  it('leaves the dev mailbox out when demo mode is off', async () => {
    const { labels } = await renderAs('lab_manager', false);
    expect(labels).not.toContain('Dev mailbox');
  });

  it('carries the caution that tunnel data are not design values', async () => {
    const { host } = await renderAs('analyst', false);
    expect(host.querySelector('footer')?.textContent).toContain('licensed engineer');
  });
});
