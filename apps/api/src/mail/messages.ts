import type { Role } from '@tunnelwright/contracts';
import { roleLabels } from '@tunnelwright/contracts';
import type { OutgoingMail } from './mailer';

/** The invitation e-mail, with its single-use link. */
export function invitationMail(input: {
  to: string;
  name: string;
  role: Role;
  organisationName: string;
  inviterName: string;
  link: string;
  validHours: number;
}): OutgoingMail {
  return {
    to: input.to,
    subject: 'Your Tunnelwright account is ready to set up',
    text: [
      `Hello ${input.name},`,
      '',
      `${input.inviterName} has opened a Tunnelwright account for you at ${input.organisationName}, with the role "${roleLabels[input.role]}".`,
      '',
      'Choose your password here to start:',
      input.link,
      '',
      `The link works once and for ${input.validHours} hours. If it has run out, ask your lab manager for a new one.`,
      'If you were not expecting this message, you can ignore it.',
    ].join('\n'),
  };
}

/** The password-reset e-mail, with its single-use link. */
export function passwordResetMail(input: { to: string; name: string; link: string; validMinutes: number }): OutgoingMail {
  return {
    to: input.to,
    subject: 'Choose a new Tunnelwright password',
    text: [
      `Hello ${input.name},`,
      '',
      'Somebody asked to reset the password of your Tunnelwright account. To choose a new one, open:',
      input.link,
      '',
      `The link works once and for ${input.validMinutes} minutes.`,
      'If you did not ask for this, ignore this message: your password stays as it is.',
    ].join('\n'),
  };
}
