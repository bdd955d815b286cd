import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, TestRequest, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatPaginatorHarness } from '@angular/material/paginator/testing';
import { MatSortHarness } from '@angular/material/sort/testing';
import { MatTableHarness } from '@angular/material/table/testing';
import { provideRouter } from '@angular/router';
import type { Page, UserSummary } from '@tunnelwright/contracts';
import { UsersPage } from './users-page';

function person(index: number, overrides: Partial<UserSummary> = {}): UserSummary {
  return {
    id: `00000000-0000-4000-8000-${String(index).padStart(12, '0')}`,
    email: `person${index}@example.test`,
    name: `Person ${index}`,
    role: 'technician',
    organisationId: '1d2c3b4a-5f6e-4d7c-8b9a-0f1e2d3c4b5a',
    organisationName: 'Brightwater Aero Lab',
    active: true,
    activated: true,
    createdAt: '2026-01-15T09:00:00.000Z',
    ...overrides,
  };
}

describe('UsersPage', () => {
  let loader: HarnessLoader;
  let backend: HttpTestingController;
  let host: HTMLElement;
  let whenStable: () => Promise<unknown>;

  const pending = (): TestRequest => backend.expectOne((request) => request.url === '/api/users');
  const answer = async (page: Page<UserSummary>) => {
    pending().flush(page);
    await whenStable();
  };
  /**
   * Harness actions wait for the page to settle, and a pending request keeps it busy, so the
   * action runs while the test waits for the request it causes, inspects it, then answers it.
   */
  const during = async (action: Promise<unknown>, respond: (request: TestRequest) => void) => {
    let found: TestRequest[] = [];
    for (let tick = 0; tick < 50 && found.length === 0; tick++) {
      await new Promise((resolve) => setTimeout(resolve, 10));
      found = backend.match((request) => request.url === '/api/users');
    }
    expect(found).toHaveLength(1);
    respond(found[0]);
    await action;
  };

  beforeEach(async () => {
    TestBed.configureTestingModule({
      imports: [UsersPage],
      providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
    });
    const fixture = TestBed.createComponent(UsersPage);
    host = fixture.nativeElement as HTMLElement;
    whenStable = () => fixture.whenStable();
    loader = TestbedHarnessEnvironment.loader(fixture);
    backend = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
  });

  afterEach(() => backend.verify());

  it('asks the server for the first page sorted by name and shows the rows', async () => {
    const request = pending();
    expect(request.request.params.get('sort')).toBe('name');
    expect(request.request.params.get('order')).toBe('asc');
    expect(request.request.params.get('page')).toBe('1');
    expect(request.request.params.get('pageSize')).toBe('10');
    request.flush({
      items: [person(1), person(2, { role: 'customer', organisationName: 'Northgale Bicycles', activated: false })],
      total: 2,
    });
    await whenStable();

    const table = await loader.getHarness(MatTableHarness);
    const rows = await table.getCellTextByColumnName();
    expect(rows['name'].text).toEqual(['Person 1', 'Person 2']);
    expect(rows['role'].text).toEqual(['Technician', 'Customer']);
    expect(rows['status'].text).toEqual(['Active', 'Invited']);
  });

  it('pages on the server through the paginator', async () => {
    await answer({ items: Array.from({ length: 10 }, (_, i) => person(i + 1)), total: 23 });
    const paginator = await loader.getHarness(MatPaginatorHarness);
    expect(await paginator.getRangeLabel()).toBe('1 – 10 of 23');

    await during(paginator.goToNextPage(), (next) => {
      expect(next.request.params.get('page')).toBe('2');
      next.flush({ items: Array.from({ length: 10 }, (_, i) => person(i + 11)), total: 23 });
    });
    expect(await paginator.getRangeLabel()).toBe('11 – 20 of 23');

    await during(paginator.setPageSize(25), (bigger) => {
      expect(bigger.request.params.get('pageSize')).toBe('25');
      bigger.flush({ items: [], total: 23 });
    });
  });

  it('sorts on the server when a header is clicked', async () => {
    await answer({ items: [person(1)], total: 1 });
    const sort = await loader.getHarness(MatSortHarness);
    const [emailHeader] = await sort.getSortHeaders({ label: 'E-mail' });
    await during(emailHeader.click(), (request) => {
      expect(request.request.params.get('sort')).toBe('email');
      expect(request.request.params.get('order')).toBe('asc');
      request.flush({ items: [person(1)], total: 1 });
    });
  });

  it('shows an empty state when nobody is there', async () => {
    await answer({ items: [], total: 0 });
    expect(host.textContent).toContain('No users yet');
  });

  it('turns a failed load into a message with a retry button', async () => {
    pending().flush({ title: 'Service Unavailable', status: 503 }, { status: 503, statusText: 'Service Unavailable' });
    await whenStable();
    expect(host.querySelector('[role=alert]')?.textContent).toContain('Service Unavailable');
    const retry = await loader.getHarness(MatButtonHarness.with({ text: 'Try again' }));
    await during(retry.click(), (request) => request.flush({ items: [person(1)], total: 1 }));
    expect(host.querySelector('[role=alert]')).toBeNull();
  });
});
