import type { VerificationCheck } from '@tunnelwright/contracts';

/** What the check of one file means, for the person holding it: a headline and the detail. */
export interface Verdict {
  readonly matches: boolean;
  readonly headline: string;
  readonly detail: string;
}

/** Words for the answer to a checked file; a matching copy of a superseded sheet is genuine but no longer current. */
export function verdictOf(check: VerificationCheck, fileName: string): Verdict {
  if (!check.matches) {
    return {
      matches: false,
      headline: `${fileName} is not the issued file of ${check.reportNumber}.`,
      detail:
        'Its SHA-256 differs from the one recorded when the sheet was issued, so its bytes are not exactly those issued: it may have been altered, re-saved or be another document. Ask the laboratory for the issued file.',
    };
  }
  const current =
    check.state === 'valid'
      ? 'The sheet is valid.'
      : `But the sheet has been superseded${check.successor ? ` by ${check.successor.reportNumber}` : ''}; use the newer sheet.`;
  return {
    matches: true,
    headline: `${fileName} is exactly the issued file of ${check.reportNumber}.`,
    detail: `Its SHA-256 is identical to the one recorded at issue. ${current}`,
  };
}

/** A report number as typed or pasted, without the spaces and line breaks that copying from a PDF brings along. */
export function tidyReportNumber(typed: string): string {
  return typed.replace(/\s+/g, '');
}
