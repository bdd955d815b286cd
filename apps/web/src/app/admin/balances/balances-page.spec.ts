import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { MatTableHarness } from '@angular/material/table/testing';
import { provideRouter } from '@angular/router';
import type { Balance, CalibrationVersion } from '@tunnelwright/contracts';
import { todayUtc } from './calibration-due';
import { BalancesPage } from './balances-page';

const linear = [0, 1, 2, 3, 4, 5].map((i) => [0, 1, 2, 3, 4, 5].map((j) => (i === j ? 0.002 : 0)));
const inDays = (days: number) => new Date(Date.parse(`${todayUtc()}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

function balance(index: number, dueInDays: number | null): Balance {
  const id = `00000000-0000-4000-8000-${String(index).padStart(12, '0')}`;
  return {
    id,
    identifier: `UFB-0${index}`,
    description: index === 1 ? 'Under-floor balance, road-vehicle turntable' : '',
    capacities: [400, 400, 1200, 120, 200, 120],
  tunnelId: null,
    currentCalibration:
      dueInDays === null
        ? null
        : { id: `00000000-0000-4000-9000-${String(index).padStart(12, '0')}`, balanceId: id, version: index, matrices: { linear }, calibratedOn: '2025-01-10', dueOn: inDays(dueInDays), overdue: dueInDays < 0, enteredBy: '0a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d', createdAt: '2025-01-10T10:00:00.000Z' },
    createdAt: '2024-01-01T09:00:00.000Z',
    updatedAt: '2024-01-01T09:00:00.000Z',
  };
}

describe('BalancesPage', () => {
  let backend: HttpTestingController;
  let fixture: ReturnType<typeof TestBed.createComponent<BalancesPage>>;

  beforeEach(() => {
    TestBed.configureTestingModule({ imports: [BalancesPage], providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    fixture = TestBed.createComponent(BalancesPage);
    backend = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
  });

  afterEach(() => backend.verify());

  const text = () => (fixture.nativeElement as HTMLElement).textContent ?? '';
  const loader = () => TestbedHarnessEnvironment.documentRootLoader(fixture);

  it('lists capacities with units, the current version, its dates and a state chip', async () => {
    backend.expectOne('/api/balances').flush([balance(1, -3), balance(2, 12), balance(3, null)]);
    await fixture.whenStable();
    const table = await loader().getHarness(MatTableHarness.with({ selector: '[aria-label="Balances"]' }));
    const headers = await (await table.getHeaderRows())[0]!.getCellTextByIndex();
    expect(headers.slice(1, 7)).toEqual(['Fx (N)', 'Fy (N)', 'Fz (N)', 'Mx (N·m)', 'My (N·m)', 'Mz (N·m)']);
    const cells = await table.getCellTextByColumnName();
    expect(cells['identifier']!.text[0]).toContain('Under-floor balance, road-vehicle turntable');
    expect(cells['capacity2']!.text).toEqual(['1,200', '1,200', '1,200']);
    expect(cells['version']!.text).toEqual(['v1', 'v2', '—']);
    expect(cells['calibratedOn']!.text[0]).toBe('Jan 10, 2025');
    expect(cells['state']!.text.map((t) => t.replace(/^(error|schedule|check_circle|help)/, '').trim())).toEqual(['Overdue by 3 days', 'Due in 12 days', 'Not calibrated']);
  });

  it('shows an empty state offering to add the first balance', async () => {
    backend.expectOne('/api/balances').flush([]);
    await fixture.whenStable();
    expect(text()).toContain('No balances yet');
    expect(await (await loader().getHarness(MatButtonHarness.with({ text: 'Add a balance' }))).isDisabled()).toBe(false);
  });

  it('says when the list could not be loaded and offers to try again', async () => {
    backend.expectOne('/api/balances').flush({ title: 'Server error', status: 500, detail: 'The database is not answering.' }, { status: 500, statusText: 'Server Error' });
    await fixture.whenStable();
    expect(text()).toContain('The database is not answering.');
  });

  it('opens every calibration version newest first with who entered it', async () => {
    backend.expectOne('/api/balances').flush([balance(2, 12)]);
    await fixture.whenStable();
    // A native click: the harness would wait for the version list the test answers below.
    (fixture.nativeElement as HTMLElement).querySelector<HTMLButtonElement>('button[aria-label="Calibrations of UFB-02"]')!.click();
    fixture.detectChanges();
    const current = balance(2, 12).currentCalibration!;
    const versions: CalibrationVersion[] = [
      { ...current, enteredByName: 'Oriane Fallowfield' },
      { ...current, id: '00000000-0000-4000-9000-000000000099', version: 1, dueOn: '2025-01-10', overdue: true, enteredByName: 'Tamsin Oakhurst' },
    ];
    backend.expectOne(`/api/balances/${current.balanceId}/calibrations`).flush(versions);
    const dialog = await loader().getHarness(MatDialogHarness);
    expect(await dialog.getTitleText()).toBe('Calibrations of UFB-02');
    const table = await dialog.getHarness(MatTableHarness.with({ selector: '[aria-label="Calibration versions"]' }));
    const cells = await table.getCellTextByColumnName();
    expect(cells['version']!.text).toEqual(['v2', 'v1']);
    expect(cells['entered']!.text[0]).toContain('by Oriane Fallowfield');
    expect(cells['state']!.text[1]).toBe('Superseded');
  });
});
