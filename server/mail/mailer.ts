import nodemailer, { type Transporter } from 'nodemailer';
import type { MailConfig } from '../config.js';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** Sends mail over SMTP: to the configured server, or to the local fake mail server. */
export class Mailer {
  private readonly transport: Transporter;

  constructor(private readonly config: MailConfig, fakePort: number | null) {
    this.transport = config.host
      ? nodemailer.createTransport({
          host: config.host,
          port: config.port,
          secure: config.secure,
          auth: config.user ? { user: config.user, pass: config.password ?? '' } : undefined,
        })
      : nodemailer.createTransport({ host: '127.0.0.1', port: fakePort ?? 0, secure: false, ignoreTLS: true });
  }

  async send(mail: OutgoingMail): Promise<void> {
    await this.transport.sendMail({ from: this.config.from, ...mail });
  }

  close(): void {
    this.transport.close();
  }
}
