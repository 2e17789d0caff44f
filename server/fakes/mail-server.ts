import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { OutboxMessage } from '../../shared/schemas/outbox.js';

const KEEP_AT_MOST = 1000;

/**
 * A local stand-in for a hosted SMTP service: accepts every message on 127.0.0.1 and keeps it
 * in memory (newest first) for the staff Outbox page and the tests.
 */
export class FakeMailServer {
  private server: SMTPServer | null = null;
  private readonly messages: OutboxMessage[] = [];
  port: number | null = null;

  async start(port = 0): Promise<number> {
    this.server = new SMTPServer({
      secure: false,
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      onData: (stream, _session, callback) => {
        simpleParser(stream)
          .then((parsed) => {
            const to = [parsed.to ?? []].flat().flatMap((a) => a.value.map((v) => v.address ?? ''));
            this.messages.unshift({
              id: randomUUID(),
              from: parsed.from?.text ?? '',
              to,
              subject: parsed.subject ?? '(no subject)',
              receivedAt: new Date().toISOString(),
              text: parsed.text ?? '',
              html: typeof parsed.html === 'string' ? parsed.html : null,
            });
            this.messages.length = Math.min(this.messages.length, KEEP_AT_MOST);
            callback();
          })
          .catch((err: Error) => callback(err));
      },
    });
    await new Promise<void>((resolve, reject) => {
      this.server!.once('error', reject);
      this.server!.listen(port, '127.0.0.1', () => resolve());
    });
    this.port = (this.server.server.address() as AddressInfo).port;
    return this.port;
  }

  get running(): boolean {
    return this.server !== null;
  }

  list(): readonly OutboxMessage[] {
    return this.messages;
  }

  get(id: string): OutboxMessage | undefined {
    return this.messages.find((m) => m.id === id);
  }

  clear(): void {
    this.messages.length = 0;
  }

  async stop(): Promise<void> {
    if (!this.server) return;
    await new Promise<void>((resolve) => this.server!.close(() => resolve()));
    this.server = null;
    this.port = null;
  }
}
