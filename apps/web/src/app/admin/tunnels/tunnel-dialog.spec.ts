import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { TunnelDialog } from './tunnel-dialog';

describe('TunnelDialog', () => {
  let loader: HarnessLoader;
  let backend: HttpTestingController;
  const close = vi.fn();

  beforeEach(async () => {
    close.mockReset();
    TestBed.configureTestingModule({
      imports: [TunnelDialog],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: MAT_DIALOG_DATA, useValue: null },
        { provide: MatDialogRef, useValue: { close } },
      ],
    });
    const fixture = TestBed.createComponent(TunnelDialog);
    loader = TestbedHarnessEnvironment.loader(fixture);
    backend = TestBed.inject(HttpTestingController);
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  const field = (label: string) => loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
  const input = async (label: string) => (await field(label)).getControl(MatInputHarness);
  const create = async () => (await loader.getHarness(MatButtonHarness.with({ text: 'Create tunnel' }))).click();

  it('shows the units in the labels', async () => {
    for (const label of ['Width (m)', 'Height (m)', 'Area (m²)', 'Length (m)', 'Maximum speed (m/s)', 'Pressure gradient dp/dx (Pa/m)']) {
      expect(await (await field(label)).getLabel()).toBe(label);
    }
  });

  it('names each missing field when an empty form is submitted', async () => {
    await create();
    expect(await (await field('Name')).getTextErrors()).toEqual(['Enter a name']);
    expect(await (await field('Width (m)')).getTextErrors()).toEqual(['Enter the width']);
    expect(await (await field('Maximum speed (m/s)')).getTextErrors()).toEqual(['Enter the maximum speed']);
    backend.expectNone('/api/tunnels');
  });

  it('refuses zero and negative sizes with a message', async () => {
    await (await input('Width (m)'))?.setValue('0');
    await (await input('Minimum speed (m/s)'))?.setValue('-2');
    await create();
    expect(await (await field('Width (m)')).getTextErrors()).toEqual(['Width must be greater than zero']);
    expect(await (await field('Minimum speed (m/s)')).getTextErrors()).toEqual(['Minimum speed cannot be negative']);
  });

  it('sends a complete tunnel in SI units and closes with the answer', async () => {
    await (await input('Name'))?.setValue('Return-circuit tunnel B');
    await (await input('Width (m)'))?.setValue('2.4');
    await (await input('Height (m)'))?.setValue('1.8');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Set area to width × height' }))).click();
    await (await input('Length (m)'))?.setValue('5');
    await (await input('Maximum speed (m/s)'))?.setValue('65');
    await create();

    const request = backend.expectOne('/api/tunnels');
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toMatchObject({
      name: 'Return-circuit tunnel B',
      kind: 'closed',
      width: 2.4,
      height: 1.8,
      area: 4.32,
      length: 5,
      minSpeed: 0,
      maxSpeed: 65,
      shapeFactor: 0.86,
    });
    request.flush({ ...request.request.body, id: '6f5e4d3c-2b1a-4f9e-8d7c-6b5a4f3e2d1c', archived: false });
    expect(close).toHaveBeenCalledOnce();
  });
});
