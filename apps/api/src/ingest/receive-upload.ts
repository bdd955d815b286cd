import { randomUUID } from 'node:crypto';
import { createWriteStream } from 'node:fs';
import { mkdir, unlink } from 'node:fs/promises';
import { join } from 'node:path';
import { pipeline } from 'node:stream/promises';
import type { Request, Response } from 'express';
import multer, { MulterError, type StorageEngine } from 'multer';
import { HashingStream } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';

/** An upload spooled to a temporary file, hashed while it streamed in. */
export interface ReceivedUpload {
  path: string;
  originalName: string;
  size: number;
  sha256: string;
  /** The other multipart fields, as text. */
  fields: Record<string, string>;
  /** Removes the temporary file. */
  discard(): Promise<void>;
}

type HashedFile = Express.Multer.File & { sha256: string };

/** A multer storage engine that writes each file to `dir` while hashing it with SHA-256. */
function hashingDiskStorage(dir: string): StorageEngine {
  return {
    _handleFile(_req, file, callback) {
      const path = join(dir, `${randomUUID()}.upload`);
      const hashing = new HashingStream();
      mkdir(dir, { recursive: true })
        .then(() => pipeline(file.stream, hashing, createWriteStream(path, { flags: 'wx' })))
        .then(() => callback(null, { path, size: hashing.size, sha256: hashing.digest() } as Partial<HashedFile>))
        .catch(async (error: unknown) => {
          await unlink(path).catch(() => undefined);
          callback(error as Error);
        });
    },
    _removeFile(_req, file, callback) {
      unlink(file.path).then(
        () => callback(null),
        () => callback(null),
      );
    },
  };
}

/**
 * Reads a multipart request with one file part named `file` into a temporary file of `dir`, at most
 * `limitBytes` long. Over the limit → 413; no file → 400; anything else unreadable → 400.
 */
export async function receiveUpload(req: Request, res: Response, options: { dir: string; limitBytes: number }): Promise<ReceivedUpload> {
  const middleware = multer({ storage: hashingDiskStorage(options.dir), limits: { fileSize: options.limitBytes, files: 1, fields: 20, fieldSize: 64 * 1024 } }).single('file');
  try {
    await new Promise<void>((resolve, reject) => middleware(req, res, (error?: unknown) => (error ? reject(error) : resolve())));
  } catch (error) {
    if (error instanceof MulterError) {
      if (error.code === 'LIMIT_FILE_SIZE') {
        throw new HttpError(413, 'File too large', `The file is larger than the ${options.limitBytes} bytes this server accepts; nothing was stored.`);
      }
      throw new HttpError(400, 'Upload not readable', `The upload could not be read (${error.code}): send one file in a multipart field named "file".`);
    }
    throw new HttpError(400, 'Upload not readable', 'The multipart body could not be read; nothing was stored.');
  }
  const file = req.file as HashedFile | undefined;
  if (!file) throw HttpError.field('file', 'Attach the run file in a multipart field named "file"');
  const fields: Record<string, string> = {};
  for (const [name, value] of Object.entries((req.body ?? {}) as Record<string, unknown>)) {
    if (typeof value === 'string') fields[name] = value;
  }
  return {
    path: file.path,
    // Browsers send the name as latin1 bytes of UTF-8; keep only the base name.
    originalName: Buffer.from(file.originalname, 'latin1').toString('utf8').split(/[\\/]/).pop() || 'run-file',
    size: file.size,
    sha256: file.sha256,
    fields,
    discard: () => unlink(file.path).catch(() => undefined),
  };
}
