import { createHash, randomBytes } from 'node:crypto';
import { mkdir, readFile, rename, stat, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';

/** Where attachment contents live: `ATTACHMENT_DIR`, else `.data/attachments`. One file per SHA-256. */
export function attachmentDirectory(env: NodeJS.ProcessEnv = process.env): string {
  return resolve(env.ATTACHMENT_DIR ?? '.data/attachments');
}

/** The kinds of file a booking takes, by extension, with the bytes each must start with. */
export const attachmentKinds: Record<string, { contentType: string; magic: Buffer[] }> = {
  pdf: { contentType: 'application/pdf', magic: [Buffer.from('%PDF-')] },
  png: { contentType: 'image/png', magic: [Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])] },
  jpg: { contentType: 'image/jpeg', magic: [Buffer.from([0xff, 0xd8, 0xff])] },
  jpeg: { contentType: 'image/jpeg', magic: [Buffer.from([0xff, 0xd8, 0xff])] },
  dwg: { contentType: 'image/vnd.dwg', magic: [Buffer.from('AC1')] },
  dxf: { contentType: 'image/vnd.dxf', magic: [] },
};

/** Whether `content` starts the way a file of `extension` must; DXF is text and has no fixed start. */
export function looksLike(extension: string, content: Buffer): boolean {
  const kind = attachmentKinds[extension];
  if (!kind) return false;
  if (kind.magic.length === 0) return true;
  return kind.magic.some((m) => content.subarray(0, m.length).equals(m));
}

/** Stores `content` under its SHA-256 (once: the same bytes are never written twice) and returns the hash. */
export async function storeAttachment(content: Buffer, directory = attachmentDirectory()): Promise<string> {
  const sha256 = createHash('sha256').update(content).digest('hex');
  await mkdir(directory, { recursive: true });
  const target = join(directory, sha256);
  const present = await stat(target).then(
    () => true,
    () => false,
  );
  if (!present) {
    // Write beside it and rename, so a reader never sees half a file.
    const partial = `${target}.${randomBytes(6).toString('hex')}.partial`;
    await writeFile(partial, content);
    await rename(partial, target);
  }
  return sha256;
}

/** Reads stored content back by its SHA-256. */
export async function readAttachment(sha256: string, directory = attachmentDirectory()): Promise<Buffer> {
  if (!/^[0-9a-f]{64}$/.test(sha256)) throw new Error('readAttachment requires a SHA-256 hex digest');
  return readFile(join(directory, sha256));
}
