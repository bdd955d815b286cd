/**
 * Local SMTP fake for development and tests: accepts every message on loopback without authentication or TLS
 * and stores it raw as `<ISO timestamp>-<random>.eml` in MAIL_DIR. The API's dev mailbox and the tests read
 * that folder. Started in the background by scripts/services.sh.
 *
 *   SMTP_HOST (default 127.0.0.1), SMTP_PORT (default 2525), MAIL_DIR (default .data/mail)
 */
import { randomBytes } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { rename, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

const host = process.env.SMTP_HOST ?? '127.0.0.1';
const port = Number(process.env.SMTP_PORT ?? 2525);
const mailDir = resolve(process.env.MAIL_DIR ?? '.data/mail');
/** Largest message accepted, in bytes. */
const maxMessageBytes = 25 * 1024 * 1024;

mkdirSync(mailDir, { recursive: true });

/** Writes one message so readers never see a half-written file: a hidden temporary name, then a rename. */
async function storeMessage(raw: Buffer): Promise<string> {
  const name = `${new Date().toISOString()}-${randomBytes(6).toString('hex')}.eml`;
  const temporary = join(mailDir, `.${name}.tmp`);
  await writeFile(temporary, raw);
  await rename(temporary, join(mailDir, name));
  return name;
}

const server = new SMTPServer({
  secure: false,
  authOptional: true,
  disabledCommands: ['AUTH', 'STARTTLS'],
  hideSTARTTLS: true,
  size: maxMessageBytes,
  logger: false,
  onData(stream, session, callback) {
    const chunks: Buffer[] = [];
    stream.on('data', (chunk: Buffer) => chunks.push(chunk));
    stream.on('error', callback);
    stream.on('end', () => {
      if (stream.sizeExceeded) {
        callback(Object.assign(new Error('Message exceeds the size limit'), { responseCode: 552 }));
        return;
      }
      const raw = Buffer.concat(chunks);
      storeMessage(raw)
        .then(async (name) => {
          const parsed = await simpleParser(raw);
          const to = session.envelope.rcptTo.map((recipient) => recipient.address).join(', ');
          console.log(`${new Date().toISOString()} stored ${name} to=${to} subject=${JSON.stringify(parsed.subject ?? '')}`);
          callback();
        })
        .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error))));
    });
  },
});

server.on('error', (error) => {
  console.error(`SMTP fake error: ${error.message}`);
});

server.listen(port, host, () => {
  console.log(`SMTP fake listening on ${host}:${port}, storing mail in ${mailDir}`);
});

function shutDown(signal: string): void {
  console.log(`SMTP fake stopping on ${signal}`);
  server.close(() => process.exit(0));
  // Connections left open by a client must not keep the process alive.
  setTimeout(() => process.exit(0), 2000).unref();
}

process.on('SIGTERM', () => shutDown('SIGTERM'));
process.on('SIGINT', () => shutDown('SIGINT'));
