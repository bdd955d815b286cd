import type { AuditEntry } from '@tunnelwright/contracts';

/** Plain words for the actions recorded on a test on its way to a certified sheet. */
export const testAuditActionLabels: Readonly<Record<string, string>> = {
  'submission.submitted': 'Submitted for approval',
  'submission.approved': 'Approved',
  'submission.sent_back': 'Sent back',
  'sheet.issued': 'Result sheet issued',
  'sheet.superseded': 'Result sheet superseded',
  'point.excluded': 'Point left out',
  'point.restored': 'Point taken back in',
  'test.created': 'Test opened',
  'test.updated': 'Test edited',
  'test.completed': 'Test complete',
  'calibration.overridden': 'Overdue calibration allowed',
};

const reasonKeys = ['reason', 'revisionReason', 'decisionReason', 'comment', 'note'] as const;

/** What an audit row says: the action in words (the raw action when unknown) and the reason or note it carried, if any. */
export function auditWording(entry: Pick<AuditEntry, 'action' | 'after'>): { action: string; detail: string } {
  const action = testAuditActionLabels[entry.action] ?? entry.action;
  const after = entry.after && typeof entry.after === 'object' ? (entry.after as Record<string, unknown>) : {};
  const parts: string[] = [];
  const reportNumber = after['reportNumber'];
  if (typeof reportNumber === 'string' && reportNumber !== '') parts.push(reportNumber);
  for (const key of reasonKeys) {
    const value = after[key];
    if (typeof value === 'string' && value.trim() !== '') {
      parts.push(value.trim());
      break;
    }
  }
  return { action, detail: parts.join(' · ') };
}
