import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';

/** Largest message the catcher keeps (notices are a few kB). */
const MAX_MESSAGE_BYTES = 1024 * 1024;

/**
 * The built-in SMTP catcher used when no SMTP_URL is set (development, demo and tests): a real
 * SMTP server (smtp-server) on 127.0.0.1 at a free port that accepts every message without
 * delivering it and hands the raw message (headers and body) to `onMessage`.
 */
export class MailCatcher {
  private readonly server: SMTPServer;

  private constructor(onMessage: (raw: string) => Promise<void>) {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      banner: 'Poreline mail catcher (nothing is delivered)',
      size: MAX_MESSAGE_BYTES,
      rejectOversized: true,
      logger: false,
      onData(stream, _session, callback) {
        const chunks: Buffer[] = [];
        stream.on('data', (c: Buffer) => chunks.push(c));
        stream.on('end', () => {
          onMessage(Buffer.concat(chunks).toString('utf8')).then(
            () => callback(),
            (error: Error) => callback(error),
          );
        });
      },
    });
  }

  /** Starts a catcher on 127.0.0.1 at a free port. */
  static async start(onMessage: (raw: string) => Promise<void>): Promise<MailCatcher> {
    const catcher = new MailCatcher(onMessage);
    await new Promise<void>((resolve, reject) => {
      catcher.server.once('error', reject);
      catcher.server.listen(0, '127.0.0.1', () => resolve());
    });
    return catcher;
  }

  get port(): number {
    return (this.server.server.address() as AddressInfo).port;
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}

/** The Message-ID header of a raw message (without the angle brackets), or null. */
export function messageIdOf(raw: string): string | null {
  const head = raw.split(/\r?\n\r?\n/, 1)[0];
  const m = /^message-id:\s*<?([^>\r\n]+)>?/im.exec(head);
  return m ? m[1].trim() : null;
}
