import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import type { Service } from '@tunnelwright/contracts';
import { ServiceDialog, ServiceDialogData } from './service-dialog';

const existing: Service = {
  id: '8e7d6c5b-4a39-4281-9f0e-1d2c3b4a5968',
  name: 'Flow visualisation',
  description: '',
  unit: 'half_day',
  rate: 48050,
  currency: 'EUR',
  tunnelId: null,
  archived: false,
  createdAt: '2026-01-10T08:00:00.000Z',
  updatedAt: '2026-01-10T08:00:00.000Z',
};

async function open(data: ServiceDialogData) {
  TestBed.configureTestingModule({
    imports: [ServiceDialog],
    providers: [
      provideHttpClient(),
      provideHttpClientTesting(),
      { provide: MAT_DIALOG_DATA, useValue: data },
      { provide: MatDialogRef, useValue: { close: vi.fn() } },
    ],
  });
  const fixture = TestBed.createComponent(ServiceDialog);
  await fixture.whenStable();
  return { loader: TestbedHarnessEnvironment.loader(fixture), backend: TestBed.inject(HttpTestingController) };
}

describe('ServiceDialog', () => {
  let loader: HarnessLoader;
  let backend: HttpTestingController;
  const rate = async () =>
    (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: /^Rate/ }))).getControl(MatInputHarness);

  it('shows an existing rate as a decimal amount and sends it back as minor units', async () => {
    ({ loader, backend } = await open({ service: existing, tunnels: [] }));
    expect(await (await rate())?.getValue()).toBe('480.5');
    await (await rate())?.setValue('512.35');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Save changes' }))).click();
    const request = backend.expectOne(`/api/services/${existing.id}`);
    expect(request.request.method).toBe('PUT');
    expect(request.request.body).toMatchObject({ rate: 51235, currency: 'EUR', unit: 'half_day' });
    request.flush({ ...existing, rate: 51235 });
  });

  it('refuses a negative rate with a message', async () => {
    ({ loader, backend } = await open({ service: null, tunnels: [] }));
    await (await rate())?.setValue('-5');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Create service' }))).click();
    const field = await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: /^Rate/ }));
    expect(await field.getTextErrors()).toEqual(['Rate cannot be negative']);
    backend.expectNone('/api/services');
  });
});
