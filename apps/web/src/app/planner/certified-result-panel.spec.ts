import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import type { CertifiedCandidate, MeasuredLink, PlanDetail } from '@tunnelwright/contracts';
import { CertifiedResultPanel } from './certified-result-panel';

const caution = 'Planning estimate only, not a design value: design loads are for a licensed engineer to determine under the local code.';
const planId = '6b1c2d3e-4f50-4a6b-8c7d-8e9f0a1b2c3d';
const sheetId = '7c2d3e4f-5061-4b7c-9d8e-9f0a1b2c3d4e';

const candidate: CertifiedCandidate = {
  sheetId,
  reportNumber: 'TST-2026-0003-R2',
  issueDate: '2026-11-28',
  testTitle: 'Garden globe yaw sweep',
  scale: 4,
  configurations: [{ code: 'A', label: 'Baseline', yaw: 0, sheetDragArea: 0.04, sheetExpandedUncertainty: 0.001, dragArea: 0.64, expandedUncertainty: 0.016 }],
};
const linked: MeasuredLink = {
  dragArea: 0.64,
  expandedUncertainty: 0.016,
  source: 'TST-2026-0003-R2, configuration A (Baseline) at yaw 0.0°',
  certified: {
    sheetId, reportNumber: 'TST-2026-0003-R2', sheetState: 'valid', configurationCode: 'A', configurationLabel: 'Baseline', yaw: 0,
    sheetDragArea: 0.04, sheetExpandedUncertainty: 0.001, scale: 4, linkedBy: 'Ivo Pellham', linkedAt: '2026-11-29T09:00:00.000Z',
  },
};

function plan(measured: MeasuredLink | null): PlanDetail {
  return {
    id: planId, organisationId: 'o', organisationName: 'Example customer', name: 'Garden globe', currentVersion: 2, bookingId: null, measured,
    createdAt: '2026-11-20T09:00:00.000Z', updatedAt: '2026-11-29T09:00:00.000Z', caution,
    latest: { id: 'v', version: 2, input: {} as PlanDetail['latest']['input'], note: '', createdBy: 'x', createdAt: '2026-11-29T09:00:00.000Z' },
    evaluation: {
      measured: measured ? { dragArea: 0.64, expandedUncertainty: 0.016, source: measured.source, estimatedDragArea: 0.7190, differencePercent: 12.34375 } : null,
    } as PlanDetail['evaluation'],
  };
}

describe('CertifiedResultPanel', () => {
  let http: HttpTestingController | undefined;

  function setUp(detail: PlanDetail, canManage: boolean) {
    TestBed.configureTestingModule({
      imports: [CertifiedResultPanel],
      providers: [provideHttpClient(), provideHttpClientTesting(), { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } }],
    });
    const fixture = TestBed.createComponent(CertifiedResultPanel);
    fixture.componentRef.setInput('plan', detail);
    fixture.componentRef.setInput('canManage', canManage);
    const emitted: PlanDetail[] = [];
    fixture.componentInstance.changed.subscribe((p) => emitted.push(p));
    fixture.detectChanges();
    const backend = TestBed.inject(HttpTestingController);
    http = backend;
    const text = () => (fixture.nativeElement as HTMLElement).textContent ?? '';
    return { fixture, backend, text, emitted, loader: TestbedHarnessEnvironment.loader(fixture), root: TestbedHarnessEnvironment.documentRootLoader(fixture) };
  }

  afterEach(() => http?.verify());

  it('shows a customer the linked value with U, the comparison in percent and the caution, and asks for no sheets', async () => {
    const { fixture, backend, text } = setUp(plan(linked), false);
    backend.expectNone(`/api/plans/${planId}/certified-candidates`);
    await fixture.whenStable();
    expect(text()).toContain(caution);
    expect(text()).toContain('0.64 m²');
    expect(text()).toContain('± 0.016 m² (U, k = 2)');
    expect(text()).toContain(linked.source);
    expect(text()).toContain('above the measured value by 12.3 %');
    expect(text()).not.toContain('Unlink');
  });

  it('tells a customer when nothing is linked yet', async () => {
    const { fixture, text } = setUp(plan(null), false);
    await fixture.whenStable();
    expect(text()).toContain('No certified result is linked to this plan yet');
    expect(text()).toContain(caution);
  });

  it('shows staff the empty state when the customer has no valid sheet, and an error with a retry when the list fails', async () => {
    const { fixture, backend, text } = setUp(plan(null), true);
    backend.expectOne(`/api/plans/${planId}/certified-candidates`).flush({ title: 'Server error', status: 500 }, { status: 500, statusText: 'Server Error' });
    await fixture.whenStable();
    expect(text()).toContain('Server error');
    // The reload keeps the resource loading until answered, so the button is pressed without waiting for stability.
    (fixture.nativeElement as HTMLElement).querySelector<HTMLButtonElement>('tw-error-banner button')?.click();
    fixture.detectChanges();
    backend.expectOne(`/api/plans/${planId}/certified-candidates`).flush({ items: [], caution });
    await fixture.whenStable();
    expect(text()).toContain('No valid result sheet has been issued for Example customer yet.');
  });

  it('links the chosen sheet (its only configuration chosen with it) and hands back the plan; a refusal shows the field message', async () => {
    const { fixture, backend, text, loader, emitted } = setUp(plan(null), true);
    backend.expectOne(`/api/plans/${planId}/certified-candidates`).flush({ items: [candidate], caution });
    await fixture.whenStable();
    await (await loader.getHarness(MatSelectHarness.with({ selector: '.row mat-select' }))).clickOptions({ text: /TST-2026-0003-R2/ });
    expect(text()).toContain('Takes the point at yaw 0.0° (nearest 0°)');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Link' }))).click();
    const refused = backend.expectOne((r) => r.method === 'PUT' && r.url === `/api/plans/${planId}/certified-result`);
    expect(refused.request.body).toEqual({ sheetId, configurationCode: 'A' });
    const message = 'TST-2026-0003-R2 is superseded; link the valid revision instead';
    refused.flush({ title: 'Some fields need attention', status: 400, detail: message, errors: [{ field: 'sheetId', message }] }, { status: 400, statusText: 'Bad Request' });
    // A refusal reads the sheets again, in case one was superseded meanwhile.
    fixture.detectChanges();
    backend.expectOne(`/api/plans/${planId}/certified-candidates`).flush({ items: [candidate], caution });
    await fixture.whenStable();
    expect(text()).toContain(message);
    expect(emitted).toHaveLength(0);

    await (await loader.getHarness(MatButtonHarness.with({ text: 'Link' }))).click();
    backend.expectOne((r) => r.method === 'PUT' && r.url === `/api/plans/${planId}/certified-result`).flush(plan(linked));
    expect(emitted.map((p) => p.measured?.source)).toEqual([linked.source]);
  });

  it('unlinks only after the confirmation, then reads the plan again', async () => {
    const { fixture, backend, root, loader, emitted } = setUp(plan(linked), true);
    backend.expectOne(`/api/plans/${planId}/certified-candidates`).flush({ items: [candidate], caution });
    await fixture.whenStable();
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Unlink' }))).click();
    let dialog = await root.getHarness(MatDialogHarness);
    expect(await dialog.getTitleText()).toBe('Unlink the certified result?');
    await (await root.getHarness(MatButtonHarness.with({ text: 'Cancel' }))).click();
    backend.expectNone((r) => r.method === 'DELETE');

    await (await loader.getHarness(MatButtonHarness.with({ text: 'Unlink' }))).click();
    dialog = await root.getHarness(MatDialogHarness);
    await (await dialog.getHarness(MatButtonHarness.with({ text: 'Unlink' }))).click();
    backend.expectOne((r) => r.method === 'DELETE' && r.url === `/api/plans/${planId}/certified-result`).flush(null, { status: 204, statusText: 'No Content' });
    backend.expectOne(`/api/plans/${planId}`).flush(plan(null));
    expect(emitted.map((p) => p.measured)).toEqual([null]);
  });
});
