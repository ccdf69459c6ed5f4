import { MikroORM } from '@mikro-orm/knex';
import type { INestApplication } from '@nestjs/common';
import type { App } from 'supertest/types';
import { MailMessage } from '../src/mail/mail-message.entity';
import { MailService } from '../src/mail/mail.service';
import { createTestApp } from './support/test-app';

/** Queues messages as an action would, without asking for delivery (as if the server died). */
async function queueWithoutSending(app: INestApplication<App>, subjects: string[]) {
  const em = app.get(MikroORM).em.fork();
  for (const subject of subjects) {
    em.create(MailMessage, {
      status: 'queued',
      from: 'Tiermode <no-reply@tiermode.test>',
      to: 'someone@tiermode.test',
      subject,
      text: `About ${subject}`,
    });
  }
  await em.flush();
}

async function messages(app: INestApplication<App>, subject: string) {
  return app.get(MikroORM).em.fork().find(MailMessage, { subject });
}

/** The catcher's copies of `subject`, once `count` have arrived (or after 5 s). */
async function received(app: INestApplication<App>, subject: string, count: number) {
  let copies: MailMessage[] = [];
  for (let i = 0; i < 50; i += 1) {
    copies = (await messages(app, subject)).filter((m) => m.status === 'received');
    if (copies.length >= count) break;
    await new Promise((r) => setTimeout(r, 100));
  }
  return copies;
}

describe('Mail delivery across restarts and app servers', () => {
  it('sends what a server left queued when it stopped, once the next one starts', async () => {
    const first = await createTestApp();
    await queueWithoutSending(first, ['Left behind']);
    await first.close();
    const stored = await createTestApp();
    try {
      // Nothing else happens on the new server: its start-up alone sends the message.
      await stored.get(MailService).settled();
      const [message] = (await messages(stored, 'Left behind')).filter(
        (m) => m.status !== 'received',
      );
      expect(message).toMatchObject({
        status: 'sent',
        attempts: 1,
        lastError: null,
        claimedUntil: null,
      });
      expect(await received(stored, 'Left behind', 1)).toHaveLength(1);
    } finally {
      await stored.close();
    }
  });

  it('leaves a message another server holds, and takes it over once the hold runs out', async () => {
    const app = await createTestApp();
    try {
      await queueWithoutSending(app, ['Held elsewhere']);
      const em = app.get(MikroORM).em.fork();
      const held = await em.findOneOrFail(MailMessage, { subject: 'Held elsewhere' });
      held.claimedUntil = new Date(Date.now() + 60_000);
      await em.flush();
      app.get(MailService).kick();
      await app.get(MailService).settled();
      expect((await em.fork().findOneOrFail(MailMessage, { id: held.id })).status).toBe('queued');

      held.claimedUntil = new Date(Date.now() - 1_000);
      await em.flush();
      app.get(MailService).kick();
      await app.get(MailService).settled();
      expect(await em.fork().findOneOrFail(MailMessage, { id: held.id })).toMatchObject({
        status: 'sent',
        attempts: 1,
      });
    } finally {
      await app.close();
    }
  });

  it('sends each message once when two app servers on one database deliver at the same moment', async () => {
    const one = await createTestApp();
    const two = await createTestApp();
    try {
      const subjects = Array.from({ length: 6 }, (_, i) => `Shared ${i + 1}`);
      await queueWithoutSending(one, subjects);
      one.get(MailService).kick();
      two.get(MailService).kick();
      await Promise.all([one.get(MailService).settled(), two.get(MailService).settled()]);
      for (const subject of subjects) {
        const [sent] = (await messages(one, subject)).filter((m) => m.status !== 'received');
        expect(sent).toMatchObject({ status: 'sent', attempts: 1 });
        expect(await received(one, subject, 1)).toHaveLength(1);
      }
      // A second copy would have arrived by now: the catchers store what they receive at once.
      await new Promise((r) => setTimeout(r, 300));
      for (const subject of subjects) {
        const copies = (await messages(one, subject)).filter((m) => m.status === 'received');
        expect(copies).toHaveLength(1);
      }
    } finally {
      await Promise.all([one.close(), two.close()]);
    }
  });
});
