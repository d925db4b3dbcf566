import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';

/** One message the sink received: who it was for and the raw RFC 5322 text. */
export interface SunkMessage {
  from: string | null;
  to: string[];
  raw: Buffer;
  receivedAt: Date;
}

/** Messages the sink keeps in memory; the mail_log row is the durable record, this is for reading them back. */
export const SINK_KEEPS = 500;
// A demo message is a few kilobytes; anything this big is a mistake, not mail.
const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

/**
 * An SMTP server on 127.0.0.1 that accepts every message and keeps the last few hundred in memory.
 * It stands in for the shop's mail service in development, the demo and tests.
 */
export class SmtpSink {
  private readonly kept: SunkMessage[] = [];
  private readonly server: SMTPServer;
  private listening = false;
  private boundPort = 0;

  constructor() {
    this.server = new SMTPServer({
      authOptional: true,
      // Plain SMTP on the loopback interface only: no STARTTLS certificate, no sign-in.
      disabledCommands: ['AUTH', 'STARTTLS'],
      logger: false,
      banner: 'Dwell mail sink',
      size: MAX_MESSAGE_BYTES,
      rejectOversized: true,
      onData: (stream, session, callback) => {
        const chunks: Buffer[] = [];
        stream.on('data', (chunk: Buffer) => chunks.push(chunk));
        stream.on('error', callback);
        stream.on('end', () => {
          const { mailFrom, rcptTo } = session.envelope;
          this.keep({ from: mailFrom ? mailFrom.address : null, to: rcptTo.map((r) => r.address), raw: Buffer.concat(chunks), receivedAt: new Date() });
          callback(null, 'Kept by the Dwell mail sink');
        });
      },
    });
    this.server.on('error', () => {
      // A broken client connection is no concern of the hub's; the sender sees its own error.
    });
  }

  /** Starts listening on 127.0.0.1 (a random free port unless one is given); answers the port. */
  async start(port = 0): Promise<number> {
    await new Promise<void>((resolve, reject) => {
      this.server.server.once('error', reject);
      this.server.listen(port, '127.0.0.1', () => {
        this.server.server.off('error', reject);
        resolve();
      });
    });
    this.listening = true;
    this.boundPort = (this.server.server.address() as AddressInfo).port;
    return this.boundPort;
  }

  /** The port it listens on (0 before start). */
  get port(): number {
    return this.boundPort;
  }

  /** An smtp:// URL nodemailer can send to. */
  get url(): string {
    return `smtp://127.0.0.1:${this.boundPort}`;
  }

  /** The messages kept so far, oldest first. */
  get messages(): readonly SunkMessage[] {
    return this.kept;
  }

  /** Stops listening; kept messages stay readable. */
  async close(): Promise<void> {
    if (!this.listening) return;
    this.listening = false;
    await new Promise<void>((resolve) => this.server.close(() => resolve()));
  }

  private keep(message: SunkMessage): void {
    this.kept.push(message);
    if (this.kept.length > SINK_KEEPS) this.kept.splice(0, this.kept.length - SINK_KEEPS);
  }
}
