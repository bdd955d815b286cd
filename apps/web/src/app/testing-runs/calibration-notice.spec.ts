import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import type { TestCalibrationState } from '@tunnelwright/contracts';
import { CalibrationNotice } from './calibration-notice';

const testId = '3c2b1a09-8f7e-4d6c-9b5a-4f3e2d1c0b9a';
const overdue: TestCalibrationState = {
  balanceId: '6f1e2d3c-4b5a-4968-8776-655443322110',
  balanceIdentifier: 'UFB-07',
  calibration: { id: '7a6b5c4d-3e2f-4a1b-9c8d-7e6f5a4b3c2d', version: 3, calibratedOn: '2025-01-10', dueOn: '2025-07-10', overdue: true },
  override: null,
};

describe('CalibrationNotice', () => {
  let backend: HttpTestingController;
  let fixture: ReturnType<typeof TestBed.createComponent<CalibrationNotice>>;

  function render(state: TestCalibrationState | null, isLabManager: boolean) {
    TestBed.configureTestingModule({ imports: [CalibrationNotice], providers: [provideHttpClient(), provideHttpClientTesting()] });
    fixture = TestBed.createComponent(CalibrationNotice);
    fixture.componentRef.setInput('testId', testId);
    fixture.componentRef.setInput('state', state);
    fixture.componentRef.setInput('isLabManager', isLabManager);
    backend = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
  }

  afterEach(() => backend.verify());
  const text = () => (fixture.nativeElement as HTMLElement).textContent ?? '';
  const loader = () => TestbedHarnessEnvironment.documentRootLoader(fixture);

  it('warns technicians and analysts that uploads are refused, without the override button', async () => {
    render(overdue, false);
    expect(text()).toContain('Balance calibration overdue');
    expect(text()).toContain('Calibration version 3 of balance UFB-07 was due on Jul 10, 2025.');
    expect(text()).toContain('Uploads of run files for this test are refused');
    expect(await loader().getAllHarnesses(MatButtonHarness.with({ text: 'Allow overdue calibration…' }))).toHaveLength(0);
  });

  it('says nothing while the calibration is current or the test names no balance', () => {
    render({ ...overdue, calibration: { ...overdue.calibration!, dueOn: '2099-01-01', overdue: false } }, true);
    expect(text().trim()).toBe('');
    fixture.componentRef.setInput('state', null);
    fixture.detectChanges();
    expect(text().trim()).toBe('');
  });

  it('lets a lab manager allow it only with a reason of at least 10 characters, then reports the change', async () => {
    render(overdue, true);
    const changed = vi.fn();
    fixture.componentInstance.changed.subscribe(changed);
    await (await loader().getHarness(MatButtonHarness.with({ text: 'Allow overdue calibration…' }))).click();
    const dialog = await loader().getHarness(MatDialogHarness);
    expect(await dialog.getTitleText()).toBe('Allow the overdue calibration for this test?');
    const confirm = await dialog.getHarness(MatButtonHarness.with({ text: 'Allow overdue calibration' }));
    await confirm.click();
    expect(await dialog.getText()).toContain('Say why the overdue calibration may be used');
    backend.expectNone(`/api/tests/${testId}/calibration-overrides`);

    const reason = document.querySelector<HTMLTextAreaElement>('mat-dialog-container textarea')!;
    reason.value = 'Check loading on 2026-11-28 agreed within 0.1 %';
    reason.dispatchEvent(new Event('input'));
    await confirm.click();
    const request = backend.expectOne(`/api/tests/${testId}/calibration-overrides`);
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toEqual({ reason: 'Check loading on 2026-11-28 agreed within 0.1 %' });
    request.flush({ id: '11111111-2222-4333-8444-555555555555', testId, calibrationId: overdue.calibration!.id, reason: 'Check loading on 2026-11-28 agreed within 0.1 %', grantedBy: '0a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d', createdAt: '2026-12-02T10:00:00.000Z' });
    for (let tick = 0; tick < 100 && changed.mock.calls.length === 0; tick++) await new Promise((resolve) => setTimeout(resolve, 10));
    expect(changed).toHaveBeenCalledTimes(1);
  });

  it('shows the override on record with who allowed it and why, and no button', async () => {
    render(
      {
        ...overdue,
        override: { id: '11111111-2222-4333-8444-555555555555', testId, calibrationId: overdue.calibration!.id, reason: 'Check loading agreed within 0.1 %', grantedBy: '0a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d', grantedByName: 'Ilse Vantongeren', createdAt: '2026-12-02T10:00:00.000Z' },
      },
      true,
    );
    expect(text()).toContain('Overdue calibration allowed for this test');
    expect(text()).toContain('Ilse Vantongeren allowed it on');
    expect(text()).toContain('“Check loading agreed within 0.1 %”');
    expect(text()).not.toContain('Uploads of run files for this test are refused');
    expect(await loader().getAllHarnesses(MatButtonHarness.with({ text: 'Allow overdue calibration…' }))).toHaveLength(0);
  });
});
