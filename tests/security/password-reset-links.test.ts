import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '@server/app';
import { createBackgroundTasks } from '@server/lib/background-tasks';
import type { Mailer, OutgoingMail } from '@server/lib/mail/mailer';
import { makeUser, uniqueEmail } from '../api/support/factories';
import { client, createTestContext, TEST_APP_URL, type TestContext } from '../api/support/test-app';

// A reset link is a key to the account: only the newest may work, and asking for one must not
// tell a stranger whether the e-mail has an account.

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

async function requestLink(email: string): Promise<string> {
  await client(ctx).post('/api/auth/password-reset').send({ email });
  await ctx.background.settled();
  const link = ctx.smtp.mailbox.latestTo(email)!.links.find((l) => l.startsWith(`${TEST_APP_URL}/reset-password`))!;
  return new URL(link).searchParams.get('token')!;
}

const useLink = (token: string, password = 'a brand new password') =>
  client(ctx).post('/api/auth/password-reset/confirm').send({ token, password });

describe('password reset links', () => {
  it('stop working once a newer one is asked for', async () => {
    const user = await makeUser(ctx);
    const older = await requestLink(user.email);
    const newer = await requestLink(user.email);
    expect((await useLink(older)).body.error.code).toBe('reset_link_invalid');
    expect((await useLink(newer)).status).toBe(200);
  });

  it('stop working, all of them, once one was used', async () => {
    const user = await makeUser(ctx);
    const first = await requestLink(user.email);
    expect((await useLink(first)).status).toBe(200);
    expect((await useLink(first, 'yet another password')).status).toBe(400);
  });
});

describe('asking for a reset link', () => {
  /** A mailer whose deliveries wait until the test lets them go. */
  function heldMailer() {
    const held: { mail: OutgoingMail; deliver: () => void }[] = [];
    const mailer: Mailer = {
      send: (mail) => new Promise<void>((resolve) => held.push({ mail, deliver: resolve })),
    };
    return { mailer, held };
  }

  it('answers before any e-mail is sent, for a known e-mail as for an unknown one', async () => {
    const { mailer, held } = heldMailer();
    const background = createBackgroundTasks();
    const app = createApp({ db: ctx.db, mailer, config: ctx.config, background });
    const user = await makeUser(ctx);

    const known = await request(app)
      .post('/api/auth/password-reset')
      .set('Origin', TEST_APP_URL)
      .send({ email: user.email });
    const unknown = await request(app)
      .post('/api/auth/password-reset')
      .set('Origin', TEST_APP_URL)
      .send({ email: uniqueEmail('nobody') });

    expect([known.status, unknown.status]).toEqual([202, 202]);
    expect(known.body).toEqual(unknown.body);
    // Both answers are in while the one real e-mail is still waiting to go out.
    await new Promise((resolve) => setImmediate(resolve));
    expect(held.map((h) => h.mail.to)).toEqual([user.email]);
    held.forEach((h) => h.deliver());
    await background.settled();
  });
});
