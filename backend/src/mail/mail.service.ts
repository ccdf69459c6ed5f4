import { EntityManager, MikroORM } from '@mikro-orm/knex';
import {
  Injectable,
  Logger,
  OnApplicationBootstrap,
  OnModuleDestroy,
  OnModuleInit,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { MailMessageDto } from '@tiermode/shared-types';
import { createTransport, type Transporter } from 'nodemailer';
import type { AppEnvironment } from '../config/environment';
import { MailCatcher } from './mail-catcher';
import { MailMessage } from './mail-message.entity';

const FROM = 'Tiermode <no-reply@tiermode.test>';

/** The caution every message ends with (product.md, "Cautions"). */
export const MAIL_CAUTION =
  'Tiermode is an aid to an engineer’s judgement: the locally adopted building code governs, ' +
  'the engineer of record decides, and a calc is preliminary until a licensed reviewer locks it.';
/** Wait before each further attempt; after the last, the message is marked failed. */
const RETRY_DELAYS_MS = [2_000, 10_000, 60_000, 300_000];
/** How long a server holds a message it is sending; past it, another may take it over. */
const CLAIM_MS = 120_000;
/**
 * How often each server looks for messages due: those a restart left queued, those another
 * server failed to send and whose next attempt has come, those whose claim ran out.
 */
export const MAIL_SWEEP_MS = 30_000;

export interface OutgoingMail {
  to: string[];
  subject: string;
  text: string;
}

/**
 * Every message goes out over SMTP (nodemailer): to SMTP_URL, or, when it is unset, to the local
 * catcher this service starts on a loopback port. A message is queued in the same flush as the
 * action that causes it and delivered after that flush, so a mail failure never loses the
 * action: the message is retried, and its failure is visible in the outbox.
 *
 * What is queued survives a restart: the server sends it once it has started, and looks again
 * every MAIL_SWEEP_MS. With several app servers on one database, each message is claimed by one
 * of them (a conditional update only one can win) before it is sent, so it is sent once.
 */
@Injectable()
export class MailService implements OnModuleInit, OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('Mail');
  private transport?: Transporter;
  private catcher?: MailCatcher;
  private readonly timers = new Set<NodeJS.Timeout>();
  private sweep?: NodeJS.Timeout;
  private delivering: Promise<void> = Promise.resolve();

  constructor(
    private readonly orm: MikroORM,
    private readonly config: ConfigService<AppEnvironment, true>,
  ) {}

  async onModuleInit(): Promise<void> {
    const smtpUrl = this.config.get('smtpUrl', { infer: true });
    if (smtpUrl) {
      this.transport = createTransport(smtpUrl);
      return;
    }
    this.catcher = new MailCatcher((mail) => this.storeCaught(mail));
    const port = await this.catcher.listen();
    this.transport = createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
    this.logger.log(`Local mail catcher listening on 127.0.0.1:${port}`);
  }

  /** The database is prepared by now (DatabaseLifecycle, while the modules initialise). */
  onApplicationBootstrap(): void {
    this.kick();
    this.sweep = setInterval(() => this.kick(), MAIL_SWEEP_MS);
    this.sweep.unref();
  }

  async onModuleDestroy(): Promise<void> {
    clearInterval(this.sweep);
    this.timers.forEach((t) => clearTimeout(t));
    await this.delivering.catch(() => undefined);
    this.transport?.close();
    await this.catcher?.close();
  }

  /**
   * Queues a message, ending with the caution line; it is written by the caller's next flush,
   * with the action.
   */
  queue(em: EntityManager, mail: OutgoingMail): void {
    if (mail.to.length === 0) return;
    em.create(MailMessage, {
      status: 'queued',
      from: FROM,
      to: mail.to.join(', '),
      subject: mail.subject,
      text: `${mail.text}\n\n-- \n${MAIL_CAUTION}`,
    });
  }

  /** Delivers whatever is queued, in the background; never throws to the caller. */
  kick(): void {
    this.delivering = this.delivering
      .then(() => this.deliverQueued())
      .catch((error: unknown) => {
        this.logger.error(
          `Mail delivery failed: ${error instanceof Error ? error.message : String(error)}`,
        );
      });
  }

  /** For tests and shutdown: resolves when the current delivery round is over. */
  settled(): Promise<void> {
    return this.delivering;
  }

  /**
   * Each message the app sent, once: the copy the local catcher receives of it is kept apart
   * (status `received`, read by the tests as the recipient got it) and not listed again.
   */
  async outbox(): Promise<MailMessageDto[]> {
    const messages = await this.orm.em
      .fork()
      .find(MailMessage, { status: { $ne: 'received' } }, { orderBy: { createdAt: 'desc' } });
    return messages.map((m) => ({
      id: m.id,
      status: m.status,
      from: m.from,
      to: m.to,
      subject: m.subject,
      // The mail itself carries the link; the outbox shows it masked, so an admin reading it
      // cannot take over the account.
      text: maskSetPasswordLinks(m.text),
      attempts: m.attempts,
      lastError: m.lastError,
      createdAt: m.createdAt.toISOString(),
    }));
  }

  private async deliverQueued(): Promise<void> {
    const em = this.orm.em.fork();
    const now = new Date();
    const free = {
      status: 'queued' as const,
      $or: [{ claimedUntil: null }, { claimedUntil: { $lte: now } }],
    };
    const due = await em.find(MailMessage, free, { orderBy: { createdAt: 'asc' } });
    for (const message of due) {
      // Only one server's update finds the message still free; the others leave it alone.
      const claimedUntil = new Date(Date.now() + CLAIM_MS);
      if (
        (await em.nativeUpdate(MailMessage, { id: message.id, ...free }, { claimedUntil })) !== 1
      ) {
        continue;
      }
      // Read again as the row now is (claimed), so that what follows is compared with that.
      await em.refresh(message);
      message.attempts += 1;
      try {
        await this.transport?.sendMail({
          from: message.from,
          to: message.to,
          subject: message.subject,
          text: message.text,
        });
        message.status = 'sent';
        message.sentAt = new Date();
        message.lastError = null;
        message.claimedUntil = null;
      } catch (error) {
        message.lastError = error instanceof Error ? error.message : String(error);
        const delay = RETRY_DELAYS_MS[message.attempts - 1];
        if (delay === undefined) {
          message.status = 'failed';
          message.claimedUntil = null;
        } else {
          // Not before then, on any server: this one tries again when it is due.
          message.claimedUntil = new Date(Date.now() + delay);
          this.retryIn(delay);
        }
      }
      await em.flush();
    }
  }

  private retryIn(delayMs: number): void {
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      this.kick();
    }, delayMs);
    timer.unref();
    this.timers.add(timer);
  }

  private async storeCaught(mail: { from: string; to: string; subject: string; text: string }) {
    const em = this.orm.em.fork();
    em.create(MailMessage, { status: 'received', ...mail, sentAt: new Date() });
    await em.flush();
  }
}

/** `…/set-password?token=abc…` becomes `…/set-password?token=(hidden)`. */
export function maskSetPasswordLinks(text: string): string {
  return text.replace(/(\/set-password\?token=)[A-Za-z0-9_-]+/g, '$1(hidden)');
}
