import nodemailer from 'nodemailer';

/** One plain-text message. */
export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  /** Files sent along, e.g. a calendar invitation (`text/calendar; method=REQUEST`). */
  attachments?: { filename: string; content: string; contentType: string }[];
}

/** Sends mail; the app only depends on this shape, so tests and the demo use the same SMTP fake. */
export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

/** A mailer over SMTP at `smtpUrl` (e.g. `smtp://127.0.0.1:2525`). */
export function createSmtpMailer(smtpUrl: string, from: string): Mailer {
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    async send(mail) {
      await transport.sendMail({ from, to: mail.to, subject: mail.subject, text: mail.text, attachments: mail.attachments });
    },
    close() {
      transport.close();
    },
  };
}
