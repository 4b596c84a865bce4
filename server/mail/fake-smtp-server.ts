import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import type { DataSource } from 'typeorm';
import { ReceivedMail } from '../entities/received-mail';

/** 5 MB: a regression mail with a full table of 500 failures is about 300 KB. */
const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

/**
 * The local stand-in for a mail relay: an SMTP server on loopback (no auth, no TLS) that
 * stores every message it accepts in `received_mail`, parsed into text and HTML, so the app
 * can show an outbox and tests can count what arrived. It accepts a message only once it is
 * stored, so a sender that sees "250 OK" knows the mail is kept.
 */
export class FakeSmtpServer {
  private server: SMTPServer | null = null;

  constructor(
    private readonly dataSource: DataSource,
    private readonly host = '127.0.0.1',
    /** Stores a message, then waits this long before saying OK: a slow relay, for tests of timeouts. */
    private readonly replyDelayMs = 0,
  ) {}

  /** Starts listening; resolves with the port (pass 0 for any free one). */
  start(port: number): Promise<number> {
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      size: MAX_MESSAGE_BYTES,
      banner: 'Sheetkeeper local mail store',
      logger: false,
      onData: (stream, session, callback) => {
        const chunks: Buffer[] = [];
        stream.on('data', (chunk: Buffer) => chunks.push(chunk));
        stream.on('end', () => {
          if (stream.sizeExceeded) {
            callback(Object.assign(new Error('Message exceeds the size limit'), { responseCode: 552 }));
            return;
          }
          const raw = Buffer.concat(chunks);
          this.store(
            raw,
            session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            session.envelope.rcptTo.map((r) => r.address),
          )
            .then(() => new Promise((resolve) => setTimeout(resolve, this.replyDelayMs)))
            .then(() => callback())
            .catch((err: unknown) => callback(err instanceof Error ? err : new Error(String(err))));
        });
      },
    });
    this.server = server;
    return new Promise((resolve, reject) => {
      server.once('error', reject);
      server.listen(port, this.host, () => {
        server.off('error', reject);
        resolve((server.server.address() as AddressInfo).port);
      });
    });
  }

  stop(): Promise<void> {
    const server = this.server;
    this.server = null;
    return new Promise((resolve) => (server ? server.close(() => resolve()) : resolve()));
  }

  private async store(raw: Buffer, from: string, to: string[]): Promise<void> {
    const parsed = await simpleParser(raw);
    await this.dataSource.getRepository(ReceivedMail).insert({
      messageId: parsed.messageId ?? null,
      envelopeFrom: from,
      envelopeTo: to,
      subject: parsed.subject ?? '',
      textBody: parsed.text ?? '',
      htmlBody: typeof parsed.html === 'string' ? parsed.html : null,
      raw: raw.toString('utf8'),
    });
  }
}
