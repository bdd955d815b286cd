import { readdir, readFile, stat } from 'node:fs/promises';
import { join } from 'node:path';
import type { MailSummary } from '@tunnelwright/contracts';
import { simpleParser, type AddressObject } from 'mailparser';

const linkPattern = /https?:\/\/[^\s<>"')]+/g;

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? v.name)).filter((a): a is string => Boolean(a));
}

/** Reads the `.eml` files the SMTP fake stored in `mailDir`, newest first, with the links in each text. */
export async function readMailbox(mailDir: string, limit = 100): Promise<MailSummary[]> {
  let names: string[];
  try {
    names = (await readdir(mailDir)).filter((n) => n.endsWith('.eml'));
  } catch {
    return [];
  }
  const files = await Promise.all(names.map(async (name) => ({ name, mtime: (await stat(join(mailDir, name))).mtimeMs })));
  files.sort((a, b) => b.mtime - a.mtime || b.name.localeCompare(a.name));
  return Promise.all(
    files.slice(0, limit).map(async ({ name, mtime }) => {
      const parsed = await simpleParser(await readFile(join(mailDir, name)));
      const text = parsed.text ?? '';
      return {
        id: name.replace(/\.eml$/, ''),
        from: addresses(parsed.from)[0] ?? '',
        to: addresses(parsed.to),
        subject: parsed.subject ?? '',
        date: (parsed.date ?? new Date(mtime)).toISOString(),
        text,
        links: [...new Set(text.match(linkPattern) ?? [])],
        attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? 'attachment', contentType: a.contentType, size: a.size })),
      };
    }),
  );
}
