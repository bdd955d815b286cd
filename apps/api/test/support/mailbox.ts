import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { simpleParser, type ParsedMail } from 'mailparser';

/** One message found in the SMTP fake's folder, with the links of its text part. */
export interface ReceivedMail {
  to: string[];
  subject: string;
  text: string;
  links: string[];
}

function recipients(mail: ParsedMail): string[] {
  const list = Array.isArray(mail.to) ? mail.to : mail.to ? [mail.to] : [];
  return list.flatMap((a) => a.value.map((v) => (v.address ?? '').toLowerCase()));
}

/**
 * Polls MAIL_DIR (where the SMTP fake stores each message as `.eml`) until a message to `to` arrives,
 * parsing each with mailparser. Fails after `timeoutMs`.
 */
export async function waitForMail(mailDir: string, to: string, options: { subject?: RegExp; timeoutMs?: number } = {}): Promise<ReceivedMail> {
  const deadline = Date.now() + (options.timeoutMs ?? 10_000);
  const seen = new Set<string>();
  while (Date.now() < deadline) {
    const names = await readdir(mailDir).catch(() => [] as string[]);
    for (const name of names.filter((n) => n.endsWith('.eml') && !seen.has(n))) {
      const parsed = await simpleParser(await readFile(join(mailDir, name)));
      const mail: ReceivedMail = { to: recipients(parsed), subject: parsed.subject ?? '', text: parsed.text ?? '', links: parsed.text?.match(/https?:\/\/\S+/g) ?? [] };
      if (mail.to.includes(to.toLowerCase()) && (!options.subject || options.subject.test(mail.subject))) return mail;
      seen.add(name);
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`No mail to ${to} arrived in ${mailDir} within ${options.timeoutMs ?? 10_000} ms`);
}

/** The `token` query parameter of a link. */
export function tokenFromLink(link: string): string {
  const token = new URL(link).searchParams.get('token');
  if (!token) throw new Error(`Link ${link} has no token`);
  return token;
}
