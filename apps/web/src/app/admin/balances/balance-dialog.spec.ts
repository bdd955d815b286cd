import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import type { Balance } from '@tunnelwright/contracts';
import { BalanceDialog } from './balance-dialog';

const existing: Balance = {
  id: '6f1e2d3c-4b5a-4968-8776-655443322110',
  identifier: 'UFB-07',
  description: 'Under-floor six-component balance',
  capacities: [400, 400, 1200, 120, 200, 120],
  tunnelId: '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d',
  currentCalibration: null,
  createdAt: '2026-02-01T09:00:00.000Z',
  updatedAt: '2026-02-01T09:00:00.000Z',
};

function setUp(data: Balance | null) {
  const close = vi.fn();
  TestBed.configureTestingModule({
    imports: [BalanceDialog],
    providers: [provideHttpClient(), provideHttpClientTesting(), { provide: MAT_DIALOG_DATA, useValue: data }, { provide: MatDialogRef, useValue: { close } }],
  });
  const fixture = TestBed.createComponent(BalanceDialog);
  fixture.detectChanges();
  const backend = TestBed.inject(HttpTestingController);
  // The "Installed in" choices: the live catalogue's tunnels.
  backend.expectOne('/api/tunnels').flush([
    { id: existing.tunnelId, name: 'Tunnel 1 — closed section' },
    { id: '2b3c4d5e-6f7a-4b8c-9d0e-1f2a3b4c5d6e', name: 'Tunnel 2 — open jet' },
  ]);
  const loader: HarnessLoader = TestbedHarnessEnvironment.loader(fixture);
  return { fixture, loader, close, backend };
}

describe('BalanceDialog', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  const labels = ['Fx capacity (N)', 'Fy capacity (N)', 'Fz capacity (N)', 'Mx capacity (N·m)', 'My capacity (N·m)', 'Mz capacity (N·m)'];

  it('names each missing field and each capacity that is not above zero', async () => {
    const { loader, fixture, backend } = setUp(null);
    await fixture.whenStable();
    const field = (label: string) => loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
    for (const label of labels) expect(await (await field(label)).getLabel()).toBe(label);
    await (await (await field('My capacity (N·m)')).getControl(MatInputHarness))?.setValue('0');
    await (await (await field('Fz capacity (N)')).getControl(MatInputHarness))?.setValue('-5');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Create balance' }))).click();
    expect(await (await field('Identifier')).getTextErrors()).toEqual(['Enter the identifier']);
    expect(await (await field('Fx capacity (N)')).getTextErrors()).toEqual(['Enter the Fx capacity']);
    expect(await (await field('Fz capacity (N)')).getTextErrors()).toEqual(['Fz capacity must be greater than zero']);
    expect(await (await field('My capacity (N·m)')).getTextErrors()).toEqual(['My capacity must be greater than zero']);
    backend.expectNone('/api/balances');
  });

  it('sends the six capacities in component order and closes with the saved balance', async () => {
    const { loader, fixture, backend, close } = setUp(null);
    await fixture.whenStable();
    const input = async (label: string) => (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }))).getControl(MatInputHarness);
    await (await input('Identifier'))?.setValue('  SB-12 ');
    const values = ['250', '250', '900', '60', '110', '60'];
    for (const [index, label] of labels.entries()) await (await input(label))?.setValue(values[index] ?? '');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Create balance' }))).click();
    const request = backend.expectOne('/api/balances');
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toEqual({ identifier: 'SB-12', description: '', capacities: [250, 250, 900, 60, 110, 60], tunnelId: null });
    request.flush({ ...existing, identifier: 'SB-12' });
    expect(close).toHaveBeenCalledWith(expect.objectContaining({ identifier: 'SB-12' }));
  });

  it('installs the balance in the tunnel chosen, or in none', async () => {
    const { loader, fixture, backend } = setUp(existing);
    await fixture.whenStable();
    const select = await (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: 'Installed in' }))).getControl(MatSelectHarness);
    expect(await select?.getValueText()).toBe('Tunnel 1 — closed section');
    await select?.open();
    expect(await Promise.all((await select!.getOptions()).map((o) => o.getText()))).toEqual(['No tunnel', 'Tunnel 1 — closed section', 'Tunnel 2 — open jet']);
    await select?.clickOptions({ text: 'Tunnel 2 — open jet' });
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Save changes' }))).click();
    const request = backend.expectOne(`/api/balances/${existing.id}`);
    expect(request.request.body.tunnelId).toBe('2b3c4d5e-6f7a-4b8c-9d0e-1f2a3b4c5d6e');
    request.flush({ ...existing, tunnelId: '2b3c4d5e-6f7a-4b8c-9d0e-1f2a3b4c5d6e' });
  });

  it('edits with PUT and shows the API field errors where they belong', async () => {
    const { loader, fixture, backend, close } = setUp(existing);
    await fixture.whenStable();
    const field = (label: string) => loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
    expect(await (await (await field('Mz capacity (N·m)')).getControl(MatInputHarness))?.getValue()).toBe('120');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Save changes' }))).click();
    const request = backend.expectOne(`/api/balances/${existing.id}`);
    expect(request.request.method).toBe('PUT');
    // The tunnel it is installed in is kept unless changed.
    expect(request.request.body.tunnelId).toBe(existing.tunnelId);
    request.flush(
      { type: 'about:blank', title: 'Invalid request', status: 400, detail: 'Check the highlighted fields.', errors: [{ field: 'identifier', message: 'Another balance has this identifier' }, { field: 'capacities', message: 'Every capacity must be greater than zero' }] },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();
    expect(await (await field('Identifier')).getTextErrors()).toEqual(['Another balance has this identifier']);
    const text = (fixture.nativeElement as HTMLElement).textContent ?? '';
    expect(text).toContain('Every capacity must be greater than zero');
    expect(text).toContain('Check the highlighted fields.');
    expect(close).not.toHaveBeenCalled();
  });
});
