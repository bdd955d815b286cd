import type { Submission, TestProgress } from '@tunnelwright/contracts';
import { progressText, submissionStateText } from './approval-labels';
import { decisionBlock, defaultPicks, isRevision, issueBlock, pickedReductionIds, picksProblem, runChoices, type Caller } from './approval-rules';

const uploader = { id: '0b7e5a3c-1d2f-4e6a-9b8c-7d6e5f4a3b2c', name: 'Nell Ashgrove' };
const analyst: Caller = { id: '5c4b3a29-8f7e-4d6c-9b5a-4f3e2d1c0b9a', role: 'analyst', holdsSigningRight: true };

function reduction(runNumber: number, uploadedBy = uploader): Submission['reductions'][number] {
  return {
    reductionId: `00000000-0000-4000-8000-${String(runNumber).padStart(12, '0')}`,
    runId: `00000000-0000-4000-9000-${String(runNumber).padStart(12, '0')}`,
    runNumber,
    runKind: 'data',
    configurationLabel: 'baseline',
    version: 1,
    uploadedBy,
    excludedPoints: 0,
  };
}

const waiting = { state: 'awaiting_approval' as const, reductions: [reduction(1), reduction(2)], submittedBy: uploader, sheet: null };

describe('decisionBlock', () => {
  it('lets an analyst with a signing right who uploaded none of the runs decide', () => {
    expect(decisionBlock(waiting, analyst)).toBeNull();
  });

  it('refuses an analyst without a signing right and says who grants one', () => {
    expect(decisionBlock(waiting, { ...analyst, holdsSigningRight: false })).toMatch(/no signing right.*lab manager grants/);
  });

  it('refuses the uploader of any chosen run, naming the runs (four-eyes)', () => {
    const own = { ...waiting, reductions: [reduction(1), reduction(3, { id: analyst.id, name: 'Me' }), reduction(2, { id: analyst.id, name: 'Me' })] };
    expect(decisionBlock(own, analyst)).toBe('You uploaded the raw file of runs 2 and 3, so a second person must check it: another analyst with a signing right decides.');
    const one = { ...waiting, reductions: [reduction(4, { id: analyst.id, name: 'Me' })] };
    expect(decisionBlock(one, analyst)).toMatch(/raw file of run 4,/);
  });

  it('refuses whoever submitted the results, even without uploading any', () => {
    const submitter = { ...waiting, submittedBy: { id: analyst.id, name: 'Me' } };
    expect(decisionBlock(submitter, analyst)).toMatch(/^You submitted these results, so a second person must check them/);
  });

  it('refuses other roles and decided submissions', () => {
    expect(decisionBlock(waiting, { ...analyst, role: 'lab_manager' })).toMatch(/Only an analyst/);
    expect(decisionBlock(waiting, { ...analyst, role: 'technician' })).toMatch(/Only an analyst/);
    expect(decisionBlock({ ...waiting, state: 'approved' }, analyst)).toMatch(/already been decided/);
  });
});

describe('issueBlock', () => {
  const approved = { state: 'approved' as const, sheet: null, sequence: 1 };

  it('lets a lab manager or an analyst with a signing right issue an approved submission', () => {
    expect(issueBlock(approved, analyst)).toBeNull();
    expect(issueBlock(approved, { ...analyst, role: 'lab_manager', holdsSigningRight: false })).toBeNull();
  });

  it('refuses an analyst without a signing right, a technician, and submissions not approved or already issued', () => {
    expect(issueBlock(approved, { ...analyst, holdsSigningRight: false })).toMatch(/no signing right/);
    expect(issueBlock(approved, { ...analyst, role: 'technician' })).toMatch(/lab manager, or an analyst/);
    expect(issueBlock({ state: 'sent_back', sheet: null, sequence: 1 }, analyst)).toMatch(/Only an approved/);
    expect(issueBlock({ state: 'approved', sheet: { id: uploader.id, reportNumber: 'BAL-2026-0003-R1', state: 'valid' }, sequence: 1 }, analyst)).toBe('Already issued as BAL-2026-0003-R1.');
  });

  it('refuses older approved results once newer ones are approved, but not because of newer ones sent back', () => {
    const others = [approved, { state: 'sent_back' as const, sequence: 2 }, { state: 'approved' as const, sequence: 3 }, { state: 'approved' as const, sequence: 4 }];
    expect(issueBlock(approved, analyst, others)).toBe('Submission 3 was approved after this one, so its results are the ones to issue.');
    expect(issueBlock({ ...approved, sequence: 4 }, analyst, others)).toBeNull();
    expect(issueBlock(approved, analyst, [approved, { state: 'sent_back', sequence: 2 }])).toBeNull();
  });
});

describe('isRevision', () => {
  it('is a revision only when a valid sheet exists', () => {
    expect(isRevision([])).toBe(false);
    expect(isRevision([{ state: 'superseded' }])).toBe(false);
    expect(isRevision([{ state: 'superseded' }, { state: 'valid' }])).toBe(true);
  });
});

describe('run choices', () => {
  const version = (id: string, v: number, state: 'done' | 'failed' | 'queued') => ({ id, version: v, pointCount: 7, state, createdAt: '2026-11-30T10:00:00.000Z' });
  const run = (id: string, runNumber: number) => ({ id, runNumber, kind: 'data' as const, configurationLabel: '' });

  it('keeps done versions newest first, drops runs with none and orders runs by number', () => {
    const choices = runChoices([
      { run: run('r2', 2), reductions: [version('a', 1, 'done'), version('c', 3, 'failed'), version('b', 2, 'done')] },
      { run: run('r3', 3), reductions: [version('d', 1, 'queued')] },
      { run: run('r1', 1), reductions: [version('e', 1, 'done')] },
    ]);
    expect(choices.map((choice) => choice.run.id)).toEqual(['r1', 'r2']);
    expect(choices[1].versions.map((v) => v.version)).toEqual([2, 1]);
    expect(defaultPicks(choices)).toEqual({ r1: 'e', r2: 'b' });
  });

  it('asks for at least one pick, and at least one data run among them', () => {
    const choices = [
      { run: { ...run('z', 1), kind: 'wind_off_zero' as const }, versions: [version('z1', 1, 'done')] },
      { run: run('d', 2), versions: [version('d1', 1, 'done')] },
    ];
    expect(picksProblem(choices, { z: '', d: '' })).toBe('Choose a version of at least one run.');
    expect(picksProblem(choices, { z: 'z1', d: '' })).toMatch(/at least one data run/);
    expect(picksProblem(choices, { z: 'z1', d: 'd1' })).toBeNull();
  });

  it('sends one reduction per run and leaves out runs set aside', () => {
    expect(pickedReductionIds({ r1: 'e', r2: '', r3: 'f' })).toEqual(['e', 'f']);
  });
});

describe('submissionStateText', () => {
  it('says the state plainly and names the issued sheet', () => {
    expect(submissionStateText({ state: 'awaiting_approval', sheet: null })).toBe('Waiting for approval');
    expect(submissionStateText({ state: 'sent_back', sheet: null })).toBe('Sent back');
    expect(submissionStateText({ state: 'approved', sheet: null })).toBe('Approved, sheet not issued yet');
    expect(submissionStateText({ state: 'approved', sheet: { id: uploader.id, reportNumber: 'BAL-2026-0003-R2', state: 'valid' } })).toBe('Approved, issued as BAL-2026-0003-R2');
  });
});

describe('progressText', () => {
  const progress = (customerStage: TestProgress['customerStage'], state: TestProgress['approval']['state'], reportNumber: string | null = null): TestProgress => ({
    customerStage,
    approval: { state, submissionId: null, sheetId: null, reportNumber },
  });

  it('gives customers the stage, naming the certified sheet', () => {
    expect(progressText(progress('booked', 'none'), true)).toBe('Booked');
    expect(progressText(progress('in_test', 'none'), true)).toBe('In test');
    expect(progressText(progress('being_checked', 'sent_back'), true)).toBe('Being checked');
    expect(progressText(progress('certified', 'issued', 'BAL-2026-0002-R1'), true)).toBe('Certified: BAL-2026-0002-R1');
  });

  it('gives staff the approval state', () => {
    expect(progressText(progress('in_test', 'none'), false)).toBe('Not submitted for approval');
    expect(progressText(progress('being_checked', 'awaiting_approval'), false)).toBe('Waiting for approval');
    expect(progressText(progress('being_checked', 'approved'), false)).toBe('Approved, sheet not issued yet');
    expect(progressText(progress('certified', 'issued', 'BAL-2026-0002-R2'), false)).toBe('Certified: BAL-2026-0002-R2');
    expect(progressText(undefined, false)).toBe('');
  });
});
