import { auditWording } from './audit-wording';

describe('auditWording', () => {
  it('words the approval actions and carries the reason', () => {
    expect(auditWording({ action: 'submission.sent_back', after: { submissionId: 'x', reason: '  Run 2 yaw offset not applied  ' } })).toEqual({
      action: 'Sent back',
      detail: 'Run 2 yaw offset not applied',
    });
  });

  it('names the sheet and its revision reason', () => {
    expect(auditWording({ action: 'sheet.issued', after: { reportNumber: 'BAL-2026-0004-R2', revisionReason: 'Corrected reference area' } })).toEqual({
      action: 'Result sheet issued',
      detail: 'BAL-2026-0004-R2 · Corrected reference area',
    });
  });

  it('says the test was completed by the sheet that ended it', () => {
    expect(auditWording({ action: 'test.completed', after: { state: 'complete', reportNumber: 'BAL-2026-0004-R1' } })).toEqual({ action: 'Test complete', detail: 'BAL-2026-0004-R1' });
  });

  it('keeps an unknown action as recorded and copes with an empty record', () => {
    expect(auditWording({ action: 'test.renamed', after: null })).toEqual({ action: 'test.renamed', detail: '' });
  });
});
