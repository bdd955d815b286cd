import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { SMTPServer } from 'smtp-server';

/** A throw-away SMTP server for one test run; each message lands in `mailDir` as an `.eml` file. */
export interface MailCatcher {
  readonly port: number;
  readonly mailDir: string;
  stop(): Promise<void>;
}

/** Starts the catcher on a free loopback port. The API's dev mailbox reads the same folder. */
export async function startMailCatcher(): Promise<MailCatcher> {
  const mailDir = mkdtempSync(join(tmpdir(), 'tw-e2e-mail-'));
  let counter = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        counter += 1;
        writeFileSync(join(mailDir, `${Date.now()}-${String(counter).padStart(4, '0')}.eml`), Buffer.concat(chunks));
        callback();
      });
    },
  });
  const port = await new Promise<number>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.server.address();
      resolve(typeof address === 'object' && address ? address.port : 0);
    });
  });
  return {
    port,
    mailDir,
    stop: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
