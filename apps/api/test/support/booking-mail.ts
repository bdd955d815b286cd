import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { simpleParser } from 'mailparser';

/** A booking mail as the SMTP fake stored it, with its calendar attachment's text if it has one. */
export interface BookingMail {
  subject: string;
  text: string;
  ics?: string;
  icsContentType?: string;
}

/**
 * Polls MAIL_DIR until a message to `to` whose subject matches `subject` (and whose text holds
 * `textIncludes`, when given) arrives, and reads it with
 * mailparser, calendar attachment included. Fails after `timeoutMs`.
 */
export async function waitForBookingMail(mailDir: string, to: string, subject: RegExp, options: { textIncludes?: string; timeoutMs?: number } = {}): Promise<BookingMail> {
  const timeoutMs = options.timeoutMs ?? 10_000;
  const deadline = Date.now() + timeoutMs;
  const seen = new Set<string>();
  while (Date.now() < deadline) {
    const names = await readdir(mailDir).catch(() => [] as string[]);
    for (const name of names.filter((n) => n.endsWith('.eml') && !seen.has(n))) {
      seen.add(name);
      const parsed = await simpleParser(await readFile(join(mailDir, name)));
      const recipients = (Array.isArray(parsed.to) ? parsed.to : parsed.to ? [parsed.to] : []).flatMap((a) => a.value.map((v) => (v.address ?? '').toLowerCase()));
      if (!recipients.includes(to.toLowerCase()) || !subject.test(parsed.subject ?? '')) continue;
      if (options.textIncludes && !(parsed.text ?? '').includes(options.textIncludes)) continue;
      const calendar = parsed.attachments.find((a) => a.contentType === 'text/calendar');
      return { subject: parsed.subject ?? '', text: parsed.text ?? '', ics: calendar?.content.toString('utf8'), icsContentType: calendar?.headers.get('content-type')?.toString() };
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`No mail to ${to} with a subject like ${String(subject)} arrived in ${mailDir} within ${timeoutMs} ms`);
}
