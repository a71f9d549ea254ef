/**
 * The local fake SMTP server for the demo, development and tests: it accepts every message on
 * 127.0.0.1 and writes it, whole, as an .eml file in one folder (`.data/mail/` in the demo).
 * Nothing leaves the machine. Production sets SMTP_URL to a real provider and never starts this.
 */
import fs from 'node:fs';
import path from 'node:path';
import { SMTPServer } from 'smtp-server';

export interface FakeSmtp {
  port: number;
  dir: string;
  /** `smtp://127.0.0.1:<port>`, for SMTP_URL. */
  url: string;
  close(): Promise<void>;
}

/** Largest message accepted, bytes (ours are a few tens of kB). */
const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

let sequence = 0;

/** File names sort by arrival: `<UTC time>-<pid>-<sequence>.eml`. */
function fileName(now: Date): string {
  sequence += 1;
  return `${now.toISOString().replace(/[:.]/g, '-')}-${process.pid}-${String(sequence).padStart(5, '0')}.eml`;
}

export async function startFakeSmtp(options: { dir: string; port?: number; host?: string }): Promise<FakeSmtp> {
  const dir = path.resolve(options.dir);
  fs.mkdirSync(dir, { recursive: true });
  const server = new SMTPServer({
    secure: false,
    disabledCommands: ['STARTTLS', 'AUTH'],
    authOptional: true,
    size: MAX_MESSAGE_BYTES,
    banner: 'Benchlight local fake SMTP server (nothing leaves this machine)',
    logger: false,
    // On close, open connections get a second to finish (tests stop and start it at will).
    closeTimeout: 1000,
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('error', callback);
      stream.on('end', () => {
        if ((stream as unknown as { sizeExceeded?: boolean }).sizeExceeded) {
          callback(Object.assign(new Error('Message too large'), { responseCode: 552 }));
          return;
        }
        // Written under a temporary name and renamed, so a reader never sees half a message.
        const name = fileName(new Date());
        const tmp = path.join(dir, `.${name}.tmp`);
        try {
          fs.writeFileSync(tmp, Buffer.concat(chunks));
          fs.renameSync(tmp, path.join(dir, name));
          callback();
        } catch (err) {
          callback(err as Error);
        }
      });
    },
  });
  const host = options.host ?? '127.0.0.1';
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  server.on('error', () => {
    // A client that drops its connection is not our problem; keep serving.
  });
  const port = (server.server.address() as { port: number }).port;
  return {
    port,
    dir,
    url: `smtp://${host}:${port}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

/** The .eml files in a fake's folder, oldest first. */
export function listMailFiles(dir: string): string[] {
  if (!fs.existsSync(dir)) return [];
  return fs
    .readdirSync(dir)
    .filter((f) => f.endsWith('.eml') && !f.startsWith('.'))
    .sort();
}
