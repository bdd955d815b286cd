import type { FitStatus } from '@tunnelwright/contracts';

/** Words and icons for the tunnel-fit outcomes. */
export const fitStatusLabels: Readonly<Record<FitStatus, { text: string; icon: string }>> = {
  pass: { text: 'Pass', icon: 'check_circle' },
  warn: { text: 'Warning', icon: 'warning' },
  fail: { text: 'Fail', icon: 'cancel' },
};
