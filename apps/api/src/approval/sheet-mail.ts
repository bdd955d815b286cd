import { DESIGN_CAUTION } from '@tunnelwright/aero';
import type { ResultSheet, User } from '@tunnelwright/db';
import type { OutgoingMail } from '../mail/mailer';

/** The message that tells a customer a certified result sheet is ready, with the link to it and to its check. */
export function sheetIssuedMail(input: { to: User; sheet: Pick<ResultSheet, 'id' | 'reportNumber' | 'revision' | 'issueDate'>; testTitle: string; labName: string; publicUrl: string; replaces?: string }): OutgoingMail {
  const link = `${input.publicUrl}/documents/${input.sheet.id}`;
  const verify = `${input.publicUrl}/verify/${encodeURIComponent(input.sheet.reportNumber)}`;
  return {
    to: input.to.email,
    subject: `Result sheet ${input.sheet.reportNumber} is ready: ${input.testTitle}`,
    text: [
      `Hello ${input.to.name},`,
      '',
      `${input.labName} has issued the certified result sheet ${input.sheet.reportNumber} for "${input.testTitle}", dated ${input.sheet.issueDate}.`,
      ...(input.replaces ? ['', `It replaces ${input.replaces}, which is now marked superseded. Please use the new sheet from now on.`] : []),
      '',
      'Sign in to read and download it, with its points as CSV:',
      link,
      '',
      'Anyone you pass the PDF to can check that it is the issued, current file here, without signing in:',
      verify,
      '',
      DESIGN_CAUTION,
    ].join('\n'),
  };
}
