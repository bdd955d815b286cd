import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { provideRouter } from '@angular/router';
import type { ResultSheet, Role, Submission } from '@tunnelwright/contracts';
import { AuthService } from '../core/auth-service';
import { ApprovalPanel } from './approval-panel';

const testId = '7a6b5c4d-3e2f-4a1b-9c8d-7e6f5a4b3c2d';
const me = { id: '1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f', name: 'Ottilie Brande' };
const colleague = { id: '2d3e4f5a-6b7c-4d8e-9f0a-1b2c3d4e5f6a', name: 'Caspar Lindqvist' };

function submission(overrides: Partial<Submission> = {}): Submission {
  return {
    id: '3e4f5a6b-7c8d-4e9f-8a1b-2c3d4e5f6a7b',
    testId,
    sequence: 1,
    state: 'awaiting_approval',
    note: 'Both yaw sweeps',
    submittedBy: colleague,
    submittedAt: '2026-11-30T10:00:00.000Z',
    decidedBy: null,
    decidedAt: null,
    decisionReason: null,
    reductions: [
      {
        reductionId: '4f5a6b7c-8d9e-4f0a-9b1c-2d3e4f5a6b7c',
        runId: '5a6b7c8d-9e0f-4a1b-8c2d-3e4f5a6b7c8d',
        runNumber: 1,
        runKind: 'data',
        configurationLabel: 'baseline',
        version: 2,
        uploadedBy: colleague,
        excludedPoints: 1,
      },
    ],
    sheet: null,
    ...overrides,
  };
}

const validSheet: ResultSheet = {
  id: '6b7c8d9e-0f1a-4b2c-9d3e-4f5a6b7c8d9e',
  testId,
  testTitle: 'Lattice mast section, 1:10 (invented)',
  organisationId: '7c8d9e0f-1a2b-4c3d-8e4f-5a6b7c8d9e0f',
  organisationName: 'Fernhollow Masts',
  series: 'BAL-2026-0009',
  revision: 1,
  reportNumber: 'BAL-2026-0009-R1',
  state: 'valid',
  issueDate: '2026-11-28',
  issuedAt: '2026-11-28T15:00:00.000Z',
  sha256: 'a'.repeat(64),
  size: 120_000,
  pageCount: 3,
  revisionReason: null,
  supersedes: null,
  supersededBy: null,
  authorisedBy: { name: me.name, role: 'analyst' },
  verificationUrl: 'http://localhost/verify/BAL-2026-0009-R1',
  caution: 'Tunnel results are not design loads.',
};

describe('ApprovalPanel', () => {
  let backend: HttpTestingController;
  let loader: HarnessLoader;
  let host: HTMLElement;
  let whenStable: () => Promise<unknown>;

  async function open(role: Role, submissions: Submission[], sheets: ResultSheet[], holds: boolean): Promise<void> {
    TestBed.configureTestingModule({
      imports: [ApprovalPanel],
      providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
    });
    TestBed.inject(AuthService).updateUser({ ...me, email: 'ottilie@example.test', role, organisationId: validSheet.organisationId, organisationName: 'Lab' });
    const fixture = TestBed.createComponent(ApprovalPanel);
    fixture.componentRef.setInput('testId', testId);
    host = fixture.nativeElement as HTMLElement;
    whenStable = () => fixture.whenStable();
    loader = TestbedHarnessEnvironment.documentRootLoader(fixture);
    backend = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
    backend.expectOne(`/api/tests/${testId}/submissions`).flush(submissions);
    backend.expectOne((request) => request.url === '/api/result-sheets' && request.params.get('testId') === testId).flush(sheets);
    if (role === 'analyst' || role === 'lab_manager') {
      backend.expectOne('/api/me/signing-right').flush({ holds, right: null });
    }
    await whenStable();
  }

  afterEach(() => backend.verify());

  it('offers an analyst with a signing right who uploaded nothing the decision buttons, with who submitted what', async () => {
    await open('analyst', [submission()], [], true);
    expect(host.textContent).toContain('Waiting for approval');
    expect(host.textContent).toContain('by Caspar Lindqvist');
    expect(host.textContent).toContain('Run 1 (Data, baseline), v2, uploaded by Caspar Lindqvist, 1 point(s) left out');
    expect(await loader.getHarnessOrNull(MatButtonHarness.with({ text: 'Approve' }))).not.toBeNull();
    expect(await loader.getHarnessOrNull(MatButtonHarness.with({ text: 'Send back' }))).not.toBeNull();
  });

  it('tells the uploader why they may not approve their own run', async () => {
    const own = submission({ reductions: [{ ...submission().reductions[0], uploadedBy: me }] });
    await open('analyst', [own], [], true);
    expect(await loader.getHarnessOrNull(MatButtonHarness.with({ text: 'Approve' }))).toBeNull();
    expect(host.querySelector('[role=note]')?.textContent).toContain('You uploaded the raw file of run 1');
  });

  it('tells an analyst without a signing right why they may not decide', async () => {
    await open('analyst', [submission()], [], false);
    expect(await loader.getHarnessOrNull(MatButtonHarness.with({ text: 'Approve' }))).toBeNull();
    expect(host.querySelector('[role=note]')?.textContent).toContain('You hold no signing right');
  });

  it('stops a technician from submitting twice while one waits', async () => {
    await open('technician', [submission()], [], false);
    const button = await loader.getHarness(MatButtonHarness.with({ text: /Submit for approval/ }));
    expect(await button.isDisabled()).toBe(true);
    expect(host.textContent).toContain('already waiting for approval');
  });

  it('asks a revision reason when the test already has a valid sheet and shows the server’s refusal', async () => {
    await open('lab_manager', [submission({ state: 'approved', decidedBy: colleague, decidedAt: '2026-12-01T09:00:00.000Z', decisionReason: 'Checked' })], [validSheet], false);
    expect(host.textContent).toContain('Approved, sheet not issued yet');
    expect(host.textContent).toContain('BAL-2026-0009-R1');
    expect(host.textContent).toContain('Tunnel results are not design loads.');
    await (await loader.getHarness(MatButtonHarness.with({ text: /Issue result sheet/ }))).click();
    const dialog = await loader.getHarness(MatDialogHarness);
    expect(await dialog.getText()).toContain('BAL-2026-0009-R1 will be marked superseded');

    const input = document.querySelector<HTMLTextAreaElement>('mat-dialog-container textarea');
    expect(input).not.toBeNull();
    input!.value = 'too short';
    input!.dispatchEvent(new Event('input'));
    await (await dialog.getHarness(MatButtonHarness.with({ text: 'Issue result sheet' }))).click();
    expect(await dialog.getText()).toContain('Write at least 10 characters');
    backend.expectNone(`/api/submissions/${submission().id}/issue`);

    input!.value = 'Reference area corrected after re-measuring the model';
    input!.dispatchEvent(new Event('input'));
    await (await dialog.getHarness(MatButtonHarness.with({ text: 'Issue result sheet' }))).click();
    const issue = backend.expectOne(`/api/submissions/${submission().id}/issue`);
    expect(issue.request.body).toEqual({ revisionReason: 'Reference area corrected after re-measuring the model' });
    expect(document.querySelector('mat-dialog-container [role=status]')?.textContent).toContain('Rendering the result sheet');
    issue.flush(
      { type: 'about:blank', title: 'Conflict', status: 409, detail: 'This submission was issued already as BAL-2026-0009-R2.' },
      { status: 409, statusText: 'Conflict' },
    );
    await whenStable();
    expect(await dialog.getText()).toContain('This submission was issued already as BAL-2026-0009-R2.');
  });
});
