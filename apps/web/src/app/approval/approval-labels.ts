import type { CustomerTestStage, ResultSheetState, Submission, SubmissionState, TestProgress } from '@tunnelwright/contracts';

/** Plain words for each submission state. */
export const submissionStateLabels: Readonly<Record<SubmissionState, string>> = {
  awaiting_approval: 'Waiting for approval',
  sent_back: 'Sent back',
  approved: 'Approved',
};

/** Plain words for each state of an issued sheet. */
export const sheetStateLabels: Readonly<Record<ResultSheetState, string>> = {
  valid: 'Valid',
  superseded: 'Superseded',
};

/** Where a customer's test stands, as the customer reads it. */
export const customerStageLabels: Readonly<Record<CustomerTestStage, string>> = {
  booked: 'Booked',
  in_test: 'In test',
  being_checked: 'Being checked',
  certified: 'Certified',
};

/** A submission's state in words, naming the sheet once one was issued from it. */
export function submissionStateText(submission: Pick<Submission, 'state' | 'sheet'>): string {
  if (submission.state === 'approved' && submission.sheet) {
    return `Approved, issued as ${submission.sheet.reportNumber}`;
  }
  if (submission.state === 'approved') {
    return 'Approved, sheet not issued yet';
  }
  return submissionStateLabels[submission.state];
}

/** A sheet's calendar issue date (`YYYY-MM-DD`, the laboratory's day) as people read it, e.g. "2 Dec 2026", never shifted by the browser's zone. */
export function issueDateText(issueDate: string): string {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(issueDate);
  if (!match) return issueDate;
  const day = new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3])));
  return new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' }).format(day);
}

/** Where a test stands, in the words its reader needs: the customer's stage, or for staff the approval state. */
export function progressText(progress: TestProgress | undefined, forCustomer: boolean): string {
  if (!progress) return '';
  if (forCustomer) {
    const stage = customerStageLabels[progress.customerStage];
    return progress.customerStage === 'certified' && progress.approval.reportNumber ? `${stage}: ${progress.approval.reportNumber}` : stage;
  }
  switch (progress.approval.state) {
    case 'none':
      return 'Not submitted for approval';
    case 'awaiting_approval':
      return 'Waiting for approval';
    case 'sent_back':
      return 'Sent back';
    case 'approved':
      return 'Approved, sheet not issued yet';
    case 'issued':
      return progress.approval.reportNumber ? `Certified: ${progress.approval.reportNumber}` : 'Sheet issued';
  }
}
