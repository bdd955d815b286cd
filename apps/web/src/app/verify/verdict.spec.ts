import type { VerificationCheck } from '@tunnelwright/contracts';
import { tidyReportNumber, verdictOf } from './verdict';

const check: VerificationCheck = {
  reportNumber: 'BAL-2026-0007-R1',
  issueDate: '2026-11-30',
  state: 'valid',
  successor: null,
  sha256: 'c'.repeat(64),
  matches: true,
  fileSha256: 'c'.repeat(64),
  fileSize: 81_920,
};

describe('verdictOf', () => {
  it('says a matching copy of a valid sheet is exactly the issued file', () => {
    expect(verdictOf(check, 'sheet.pdf')).toEqual({
      matches: true,
      headline: 'sheet.pdf is exactly the issued file of BAL-2026-0007-R1.',
      detail: 'Its SHA-256 is identical to the one recorded at issue. The sheet is valid.',
    });
  });

  it('warns that a matching copy of a superseded sheet is no longer current, naming the successor', () => {
    const verdict = verdictOf({ ...check, state: 'superseded', successor: { reportNumber: 'BAL-2026-0007-R2', issueDate: '2026-12-01' } }, 'old.pdf');
    expect(verdict.matches).toBe(true);
    expect(verdict.detail).toContain('superseded by BAL-2026-0007-R2; use the newer sheet');
  });

  it('says plainly that a file with another hash is not the issued file', () => {
    const verdict = verdictOf({ ...check, matches: false, fileSha256: 'd'.repeat(64) }, 'edited.pdf');
    expect(verdict.matches).toBe(false);
    expect(verdict.headline).toBe('edited.pdf is not the issued file of BAL-2026-0007-R1.');
  });
});

describe('tidyReportNumber', () => {
  it('drops the spaces and line breaks a copy from a PDF brings along', () => {
    expect(tidyReportNumber(' BAL-2026-\n0007-R1 ')).toBe('BAL-2026-0007-R1');
  });
});
