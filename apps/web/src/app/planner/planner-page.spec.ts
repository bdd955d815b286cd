import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import type { PlanEvaluation, Tunnel } from '@tunnelwright/contracts';
import { AuthService } from '../core/auth-service';
import { PlannerPage } from './planner-page';
import { sphereFixture } from './testing/shape-fixtures';

const caution = 'Planning estimate only, not a design value: design loads are for a licensed engineer to determine under the local code.';
const sphere = sphereFixture('Invented handbook of drag, table 2');
const tunnel = { id: '5a0c1d2e-3f40-4a5b-8c6d-7e8f90a1b2c3', name: 'Demo tunnel', area: 2.9, maxSpeed: 55, balances: [{ identifier: 'UFB-2', capacities: [450, 450, 1500, 150, 250, 150] }] } as Tunnel;
const evaluation: PlanEvaluation = {
  caution,
  buildUp: {
    parts: [
      {
        label: 'Sphere', shapeId: 'sphere', count: 1, referenceArea: 0.0314, referenceAreaRule: 'π × diameter² / 4', frontalArea: 0.0314,
        characteristicLength: 0.2, reynoldsNumber: 2.05e5, edges: 'rounded', dragCoefficient: 0.25, dragArea: 0.00785, drag: 1.08, dragShare: 1, warnings: [],
      },
    ],
    speed: 15, density: 1.225, viscosity: 1.7894e-5, dynamicPressure: 137.8, interferenceFactor: 1, sumDragArea: 0.00785, totalDragArea: 0.00785, totalDrag: 1.08, assumptions: [],
  },
  tunnel: { id: tunnel.id, name: 'Demo tunnel', kind: 'closed', sectionArea: 2.9, maxSpeed: 55, dragCapacity: 300, capacitySource: 'request', balanceIdentifier: null },
  fit: {
    checks: [
      { id: 'blockage', status: 'pass', reason: 'Blockage 1.1 % of the section.' },
      { id: 'speed-40', status: 'warn', reason: '40 m/s is close to the tunnel maximum.' },
    ],
    overall: 'warn', modelFrontalArea: 0.0314, modelDragArea: 0.00785, loads: [], assumptions: [],
  },
  fullScale: { groundSpeed: 15, windSpeed: 0, windDirection: 0, airspeed: 15, yaw: 0, drag: 1.08, power: 16.2 },
  powerSeries: [{ windSpeed: 0, headwind: { airspeed: 15, drag: 1.08, power: 16.2 }, tailwind: { airspeed: 15, drag: 1.08, power: 16.2 } }],
  duration: { hours: 2, pointHours: 0.5, changeHours: 0.5, setupHours: 1 },
  measured: null,
};

describe('PlannerPage', { timeout: 20_000 }, () => {
  let fixture: ComponentFixture<PlannerPage>;
  let loader: HarnessLoader;
  let backend: HttpTestingController;

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [PlannerPage], providers: [provideHttpClient(), provideHttpClientTesting()] });
    TestBed.inject(AuthService).acceptSession({
      accessToken: 't',
      expiresIn: 900,
      user: { id: '2b3c4d5e-6f70-4812-9a3b-4c5d6e7f8091', email: 'ada.brisk@example.test', name: 'Ada Brisk', role: 'customer', organisationId: '1d2c3b4a-5f6e-4d7c-8b9a-0f1e2d3c4b5a', organisationName: 'Example organisation' },
    });
    fixture = TestBed.createComponent(PlannerPage);
    loader = TestbedHarnessEnvironment.loader(fixture);
    backend = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
    backend.expectOne('/api/plans').flush({ items: [], caution });
    backend.expectOne('/api/shapes').flush({ items: [sphere], caution });
    backend.expectOne('/api/tunnels').flush([tunnel]);
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  const text = () => (fixture.nativeElement as HTMLElement).textContent ?? '';
  const input = async (label: string) => (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }))).getControl(MatInputHarness);
  const settle = async () => {
    await new Promise((done) => setTimeout(done, 450));
    await fixture.whenStable();
  };

  async function completePlan(): Promise<void> {
    await (await loader.getHarness(MatSelectHarness.with({ selector: '.parts mat-select' }))).clickOptions({ text: 'Sphere' });
    await (await input('Diameter (m)'))?.setValue('0.2');
    await (await loader.getHarness(MatSelectHarness.with({ selector: '[formcontrolname="tunnelId"]' }))).clickOptions({ text: /Demo tunnel/ });
    await (await input('Balance drag capacity (N)'))?.setValue('300');
  }

  it('shows the empty states before anything is planned', () => {
    expect(text()).toContain('No saved plans yet');
    expect(text()).toContain('Nothing to estimate yet');
  });

  it('evaluates once the typing settles and shows the checks in words with the caution', async () => {
    await completePlan();
    backend.expectNone('/api/plans/evaluate');
    await settle();
    const call = backend.expectOne('/api/plans/evaluate');
    expect(call.request.body).toMatchObject({ tunnelId: tunnel.id, dragCapacity: 300, speeds: [20, 30, 40], yawMargin: 0.25, parts: [{ type: 'shape', shapeId: 'sphere', dimensions: { diameter: 0.2 }, count: 1 }] });
    call.flush(evaluation);
    await fixture.whenStable();
    expect(text()).toContain(caution);
    expect(text()).toContain('Fit in Demo tunnel: 1 pass, 1 warning, 0 fail');
    expect(text()).toContain('40 m/s is close to the tunnel maximum.');
    expect(text()).toContain('Tunnel time: 2 h');
  });

  it('turns a failed evaluation into a message with a retry that asks again', async () => {
    await completePlan();
    await settle();
    backend.expectOne('/api/plans/evaluate').flush({ title: 'Some fields need attention', status: 400, detail: 'Sphere needs its diameter (m)', errors: [] }, { status: 400, statusText: 'Bad Request' });
    await fixture.whenStable();
    expect(text()).toContain('Sphere needs its diameter (m)');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Try again' }))).click();
    backend.expectOne('/api/plans/evaluate').flush(evaluation);
    await fixture.whenStable();
    expect(text()).toContain('Fit in Demo tunnel');
  });

  it('names the plan before saving, then saves version 1', async () => {
    await completePlan();
    await settle();
    backend.expectOne('/api/plans/evaluate').flush(evaluation);
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Save plan' }))).click();
    backend.expectNone('/api/plans');
    expect(text()).toContain('Name the plan to save it');
    await (await input('Plan name'))?.setValue('Garden globe');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Save plan' }))).click();
    const save = backend.expectOne((request) => request.method === 'POST' && request.url === '/api/plans');
    expect(save.request.body).toMatchObject({ name: 'Garden globe', input: { tunnelId: tunnel.id } });
    save.flush({ id: '7c1d2e3f-4a5b-4c6d-8e7f-9a0b1c2d3e4f', name: 'Garden globe', currentVersion: 1, latest: {}, evaluation, caution });
    fixture.detectChanges();
    // Saving reloads the list so the new plan appears in it.
    backend.expectOne('/api/plans').flush({ items: [], caution });
    backend.expectOne('/api/plans/7c1d2e3f-4a5b-4c6d-8e7f-9a0b1c2d3e4f/versions').flush({
      items: [{ id: '8d2e3f40-5b6c-4d7e-9f80-a1b2c3d4e5f6', version: 1, input: {}, note: 'First try', createdBy: 'x', createdAt: '2026-11-30T10:00:00.000Z' }],
      caution,
    });
    await settle();
    backend.match('/api/plans/evaluate').forEach((request) => request.flush(evaluation));
    await fixture.whenStable();
    expect(text()).toContain('Saved “Garden globe” as version 1.');
    expect(text()).toContain('First try');
    expect(await loader.getHarness(MatButtonHarness.with({ selector: '[aria-label="Load version 1 into the editor"]' }))).toBeTruthy();
  });
});

describe('PlannerPage balance picker', { timeout: 20_000 }, () => {
  const balance = { id: '9e3f4a5b-6c7d-4e8f-a091-b2c3d4e5f607', identifier: 'Demo six-component balance', description: '', capacities: [450, 450, 900, 60, 60, 60], currentCalibration: null, createdAt: '2026-01-01T00:00:00.000Z', updatedAt: '2026-01-01T00:00:00.000Z' };

  function start(role: 'lab_manager' | 'customer') {
    TestBed.configureTestingModule({ imports: [PlannerPage], providers: [provideHttpClient(), provideHttpClientTesting()] });
    TestBed.inject(AuthService).acceptSession({
      accessToken: 't',
      expiresIn: 900,
      user: { id: '3c4d5e6f-7081-4923-8a4b-5c6d7e8f9012', email: 'lab.lead@example.test', name: 'Lab Lead', role, organisationId: '1d2c3b4a-5f6e-4d7c-8b9a-0f1e2d3c4b5a', organisationName: 'Example organisation' },
    });
    const fixture = TestBed.createComponent(PlannerPage);
    const backend = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
    backend.expectOne('/api/plans').flush({ items: [], caution });
    backend.expectOne('/api/shapes').flush({ items: [sphere], caution });
    backend.expectOne('/api/tunnels').flush([tunnel]);
    return { fixture, backend, loader: TestbedHarnessEnvironment.loader(fixture) };
  }

  it('lets a lab manager take the drag capacity from a balance instead of typing it', async () => {
    const { fixture, backend, loader } = start('lab_manager');
    backend.expectOne('/api/organisations').flush([]);
    backend.expectOne('/api/balances').flush([balance]);
    await fixture.whenStable();
    await (await loader.getHarness(MatSelectHarness.with({ selector: '.parts mat-select' }))).clickOptions({ text: 'Sphere' });
    await (await (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: 'Diameter (m)' }))).getControl(MatInputHarness))?.setValue('0.2');
    await (await loader.getHarness(MatSelectHarness.with({ selector: '[formcontrolname="tunnelId"]' }))).clickOptions({ text: /Demo tunnel/ });
    await (await loader.getHarness(MatSelectHarness.with({ selector: '[formcontrolname="balanceId"]' }))).clickOptions({ text: 'Demo six-component balance · Fx 450 N' });
    expect(await loader.getHarnessOrNull(MatFormFieldHarness.with({ floatingLabelText: 'Balance drag capacity (N)' }))).toBeNull();
    await new Promise((done) => setTimeout(done, 450));
    await fixture.whenStable();
    const call = backend.expectOne('/api/plans/evaluate');
    expect(call.request.body.balanceId).toBe(balance.id);
    expect(call.request.body).not.toHaveProperty('dragCapacity');
    call.flush(evaluation);
    backend.verify();
  });

  it('offers a customer the drag capacity of the balance the catalogue lists in the chosen tunnel', async () => {
    const { fixture, backend, loader } = start('customer');
    await fixture.whenStable();
    await (await loader.getHarness(MatSelectHarness.with({ selector: '.parts mat-select' }))).clickOptions({ text: 'Sphere' });
    await (await (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: 'Diameter (m)' }))).getControl(MatInputHarness))?.setValue('0.2');
    expect(await loader.getHarnessOrNull(MatButtonHarness.with({ text: /^Use UFB-2/ }))).toBeNull();
    await (await loader.getHarness(MatSelectHarness.with({ selector: '[formcontrolname="tunnelId"]' }))).clickOptions({ text: /Demo tunnel/ });
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Use UFB-2, fitted in this tunnel: Fx 450 N' }))).click();
    const typed = await (await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: 'Balance drag capacity (N)' }))).getControl(MatInputHarness);
    expect(await typed?.getValue()).toBe('450');
    await new Promise((done) => setTimeout(done, 450));
    await fixture.whenStable();
    const call = backend.expectOne('/api/plans/evaluate');
    expect(call.request.body.dragCapacity).toBe(450);
    call.flush(evaluation);
    backend.expectNone('/api/balances');
  });

  it('asks customers for a typed capacity and never lists the lab’s balances', async () => {
    const { fixture, backend, loader } = start('customer');
    await fixture.whenStable();
    backend.expectNone('/api/balances');
    expect(await loader.getHarnessOrNull(MatSelectHarness.with({ selector: '[formcontrolname="balanceId"]' }))).toBeNull();
    expect(await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: 'Balance drag capacity (N)' }))).toBeTruthy();
    backend.verify();
  });
});
