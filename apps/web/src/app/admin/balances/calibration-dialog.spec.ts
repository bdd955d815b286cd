import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatCheckboxHarness } from '@angular/material/checkbox/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import type { Balance } from '@tunnelwright/contracts';
import { CalibrationDialog } from './calibration-dialog';

/** Invented sensitivities, mV/V per N or N·m. */
const linear = [0, 1, 2, 3, 4, 5].map((i) => [0, 1, 2, 3, 4, 5].map((j) => (i === j ? 0.002 + 0.0001 * i : 0)));
const rowsText = (values: number[][]) => values.map((row) => row.join(' ')).join('\n');

const balance: Balance = {
  id: '6f1e2d3c-4b5a-4968-8776-655443322110',
  identifier: 'UFB-07',
  description: '',
  capacities: [400, 400, 1200, 120, 200, 120],
  tunnelId: null,
  currentCalibration: {
    id: '7a6b5c4d-3e2f-4a1b-9c8d-7e6f5a4b3c2d',
    balanceId: '6f1e2d3c-4b5a-4968-8776-655443322110',
    version: 3,
    matrices: { linear },
    calibratedOn: '2025-01-10',
    dueOn: '2025-07-10',
    overdue: true,
    enteredBy: '0a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d',
    createdAt: '2025-01-10T10:00:00.000Z',
  },
  createdAt: '2024-01-01T09:00:00.000Z',
  updatedAt: '2024-01-01T09:00:00.000Z',
};

describe('CalibrationDialog', () => {
  const close = vi.fn();
  let fixture: ReturnType<typeof TestBed.createComponent<CalibrationDialog>>;
  let backend: HttpTestingController;

  beforeEach(async () => {
    close.mockReset();
    TestBed.configureTestingModule({
      imports: [CalibrationDialog],
      providers: [provideHttpClient(), provideHttpClientTesting(), { provide: MAT_DIALOG_DATA, useValue: balance }, { provide: MatDialogRef, useValue: { close } }],
    });
    fixture = TestBed.createComponent(CalibrationDialog);
    backend = TestBed.inject(HttpTestingController);
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  const loader = () => TestbedHarnessEnvironment.loader(fixture);
  const text = () => (fixture.nativeElement as HTMLElement).textContent ?? '';
  const input = async (label: string) => (await loader().getHarness(MatFormFieldHarness.with({ floatingLabelText: label }))).getControl(MatInputHarness);
  const click = async (label: string) => (await loader().getHarness(MatButtonHarness.with({ text: label }))).click();
  const cell = (label: string) => (fixture.nativeElement as HTMLElement).querySelector<HTMLInputElement>(`input[aria-label="${label}"]`);

  it('says the new version is added and earlier ones are kept', () => {
    expect(text()).toContain('This becomes version 4.');
    expect(text()).toContain('Version 3 and every earlier version stay on record');
  });

  it('lists the pasted rows that are wrong by row and column, and leaves the grid empty', async () => {
    const bad = rowsText(linear).split('\n');
    bad[2] = '0 0 0.0022 O.01 0 0';
    bad[4] = '0 0 0 0 0.0024';
    await (await input('Or paste the linear matrix as text'))?.setValue(bad.join('\n'));
    await click('Fill the grid from the text');
    expect(text()).toContain('Row 3, column 4 (Mx): “O.01” is not a number');
    expect(text()).toContain('Row 5 has 5 numbers; it needs 6');
    expect(cell('Row 1, column 1 (Fx)')?.value).toBe('');
  });

  it('refuses to save an empty grid, naming the cells, and a due date before the calibration date', async () => {
    await (await input('Calibrated on'))?.setValue('2026-12-01');
    await (await input('Due on'))?.setValue('2026-11-01');
    await click('Record version 4');
    expect(text()).toContain('The due date cannot be before the calibration date');
    expect(text()).toContain('Row 1, column 1 (Fx): enter a number');
    expect(text()).toContain('Row 6, column 6 (Mz): enter a number');
    expect(cell('Row 6, column 6 (Mz)')?.getAttribute('aria-invalid')).toBe('true');
    backend.expectNone(`/api/balances/${balance.id}/calibrations`);
  });

  it('fills the grid from pasted rows and posts the dates and the linear matrix', async () => {
    await (await input('Or paste the linear matrix as text'))?.setValue(rowsText(linear));
    await click('Fill the grid from the text');
    expect(cell('Row 2, column 2 (Fy)')?.value).toBe('0.0021');
    await (await input('Calibrated on'))?.setValue('2026-11-20');
    await (await input('Due on'))?.setValue('2027-11-20');
    await click('Record version 4');
    const request = backend.expectOne(`/api/balances/${balance.id}/calibrations`);
    expect(request.request.body).toEqual({ calibratedOn: '2026-11-20', dueOn: '2027-11-20', matrices: { linear } });
    request.flush({ ...balance.currentCalibration, version: 4, calibratedOn: '2026-11-20', dueOn: '2027-11-20', overdue: false });
    expect(close).toHaveBeenCalledWith(expect.objectContaining({ version: 4 }));
  });

  it('checks an interaction matrix row by row and puts API cell errors on the grid', async () => {
    await click('Start from version 3');
    await (await input('Due on'))?.setValue('2099-01-01');
    await (await loader().getHarness(MatCheckboxHarness)).check();
    const rows = Array.from({ length: 6 }, () => Array(21).fill('0').join(' '));
    rows[3] = Array(20).fill('0').join(' ');
    await (await input('Interaction matrix as text'))?.setValue(rows.join('\n'));
    await click('Record version 4');
    expect(text()).toContain('Row 4 has 20 numbers; it needs 21');
    backend.expectNone(`/api/balances/${balance.id}/calibrations`);

    rows[3] = Array(21).fill('0').join(' ');
    await (await input('Interaction matrix as text'))?.setValue(rows.join('\n'));
    await click('Record version 4');
    const request = backend.expectOne(`/api/balances/${balance.id}/calibrations`);
    expect(request.request.body.matrices.interaction).toHaveLength(6);
    request.flush(
      { type: 'about:blank', title: 'Invalid request', status: 400, detail: 'Check the highlighted fields.', errors: [{ field: 'matrices.linear.1.2', message: 'Expected number, received string' }] },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();
    expect(text()).toContain('Row 2, column 3 (Fz): Expected number, received string');
    expect(cell('Row 2, column 3 (Fz)')?.getAttribute('aria-invalid')).toBe('true');
    expect(close).not.toHaveBeenCalled();
  });
});
