import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface CaughtMail {
  from: string;
  to: string;
  subject: string;
  text: string;
}

/**
 * The local mail catcher: a real SMTP server (the smtp-server package) on a loopback port that
 * takes every message in, parses it (mailparser) and hands it on. Used when SMTP_URL is unset.
 */
export class MailCatcher {
  private readonly server: SMTPServer;

  constructor(onMail: (mail: CaughtMail) => Promise<void>) {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      banner: 'Tiermode local mail catcher',
      size: 1024 * 1024,
      logger: false,
      onData(stream, _session, callback) {
        simpleParser(stream)
          .then((parsed) => {
            const to = Array.isArray(parsed.to) ? parsed.to : parsed.to ? [parsed.to] : [];
            return onMail({
              from: parsed.from?.text ?? '',
              to: to.map((a) => a.text).join(', '),
              subject: parsed.subject ?? '',
              text: parsed.text ?? '',
            });
          })
          .then(
            () => callback(),
            (error: Error) => callback(error),
          );
      },
    });
  }

  /** Listens on 127.0.0.1 and a free port; resolves with the port. */
  listen(): Promise<number> {
    return new Promise((resolve, reject) => {
      this.server.once('error', reject);
      this.server.listen(0, '127.0.0.1', () =>
        resolve((this.server.server.address() as AddressInfo).port),
      );
    });
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}
