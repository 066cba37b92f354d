import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { Club } from '@server/modules/clubs/club.entity';
import { Notification } from '@server/modules/notifications/notification.entity';
import type { NotifyInput } from '@server/modules/notifications';
import { emailModesOf } from '@server/modules/notifications/preferences';
import { signUnsubscribeToken } from '@server/modules/notifications/unsubscribe-token';
import { resetDatabase } from '@tests/helpers/db';
import { makeClub, makeMember } from '@tests/helpers/factories';
import { linkIn, waitForMail } from '@tests/helpers/mail';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';
import { settledMailsTo } from './mail-helpers';

type Person = Awaited<ReturnType<typeof makeMember>>;

describe('notification e-mails and unsubscribing', () => {
  let t: TestApp;
  let club: Club;
  let mentor: Person;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    club = await makeClub(t.dataSource, 'Brackish Bay Club');
    mentor = await makeMember(t.dataSource, club, 'Maya Mentor', 'mentor');
  });

  const send = (input: Partial<NotifyInput> = {}) =>
    t.dataSource.transaction((tx) =>
      t.deps.notify(tx, {
        userIds: [mentor.user.id],
        clubId: club.id,
        kind: 'concern.urgent',
        title: 'Ammonia 2 ppm in Ben’s 60 L',
        body: 'Free ammonia is at a harmful level. Ben has been asked to change 50% of the water.',
        link: '/tanks/7f1c',
        ...input,
      }),
    );

  it('when an urgent concern is notified, then the mentor gets an e-mail at once with the club, a link and unsubscribe links', async () => {
    // A digest-kind notification first: had it been e-mailed, it would have arrived before the urgent one.
    await send({ kind: 'question.asked', title: 'Ben asked a question' });
    const [row] = await send();
    const [mail, ...others] = await settledMailsTo(t.dataSource, mentor.user.email, 1);
    expect(others).toEqual([]);
    expect(mail!.subject).toBe('Brackish Bay Club: Ammonia 2 ppm in Ben’s 60 L');
    expect(mail!.text).toContain('Free ammonia is at a harmful level.');
    expect(mail!.text).toContain(`${t.config.baseUrl}/tanks/7f1c`);
    expect(mail!.html).toContain('Brackish Bay Club');
    expect(mail!.html).toContain(`href="${t.config.baseUrl}/tanks/7f1c"`);
    const unsubscribe = linkIn(mail!, '/api/unsubscribe');
    expect(unsubscribe.origin).toBe(new URL(t.config.baseUrl).origin);
    expect(mail!.headers['list-unsubscribe']).toBe(`<${unsubscribe.href}>`);
    expect(mail!.headers['list-unsubscribe-post']).toBe('List-Unsubscribe=One-Click');
    const stored = await t.dataSource.getRepository(Notification).findOneByOrFail({ id: row!.id });
    expect(stored.emailedAt).not.toBeNull();
    expect(
      (await t.dataSource.getRepository(Notification).findOneByOrFail({ title: 'Ben asked a question' }))
        .emailedAt,
    ).toBeNull();
  });

  it('when the notifying transaction rolls back, then its e-mail is never sent either', async () => {
    await t.dataSource
      .transaction(async (tx) => {
        await t.deps.notify(tx, {
          userIds: [mentor.user.id],
          clubId: club.id,
          kind: 'concern.urgent',
          title: 'Rolled back',
          link: '/',
        });
        throw new Error('the caller failed');
      })
      .catch(() => undefined);
    await send({ title: 'Committed' });
    const mails = await settledMailsTo(t.dataSource, mentor.user.email, 1);
    expect(mails.map((m) => m.subject)).toEqual(['Brackish Bay Club: Committed']);
  });

  it('when the link is followed without a session, then it asks first, and the button turns that kind off', async () => {
    await send();
    const link = linkIn(await waitForMail(t.dataSource, mentor.user.email), '/api/unsubscribe');
    const path = `${link.pathname}${link.search}`;

    // Opening the link (as a mail client's link scanner would) changes nothing.
    const page = await request(t.app).get(path);
    expect(page.status).toBe(200);
    expect(page.type).toBe('text/html');
    expect(page.text).toContain('Urgent water concerns');
    expect(page.text).toMatch(
      /<form method="post" action="\/api\/unsubscribe\?token=[^"]+"><button type="submit">Yes, stop them<\/button>/,
    );
    expect((await emailModesOf(t.dataSource.manager, mentor.user.id))['concern.urgent']).toBe('immediate');

    const action = page.text.match(/action="([^"]+)"/)![1]!.replaceAll('&amp;', '&');
    const done = await request(t.app).post(action).type('form').send('');
    expect(done.status).toBe(200);
    expect(done.text).toContain('e-mails stopped');
    const modes = await emailModesOf(t.dataSource.manager, mentor.user.id);
    expect(modes['concern.urgent']).toBe('off');
    expect(modes['concern.caution']).toBe('digest');

    await t.dataSource.query(`DELETE FROM captured_mail`);
    const [later] = await send({ title: 'Another urgent one' });
    expect(await settledMailsTo(t.dataSource, mentor.user.email, 0)).toEqual([]);
    expect(
      (await t.dataSource.getRepository(Notification).findOneByOrFail({ id: later!.id })).emailedAt,
    ).toBeNull();
  });

  it('when a mail client uses one-click unsubscribe (RFC 8058), then the POST alone turns it off', async () => {
    await send();
    const link = linkIn(await waitForMail(t.dataSource, mentor.user.email), '/api/unsubscribe');
    const res = await request(t.app)
      .post(`${link.pathname}${link.search}`)
      .type('form')
      .send('List-Unsubscribe=One-Click');
    expect(res.status).toBe(200);
    expect((await emailModesOf(t.dataSource.manager, mentor.user.id))['concern.urgent']).toBe('off');
  });

  it('when the "stop every e-mail" link is used, then every kind is off', async () => {
    await send();
    const mail = await waitForMail(t.dataSource, mentor.user.email);
    const links = [...mail.text.matchAll(/https?:\/\/\S*\/api\/unsubscribe\?token=\S+/g)].map(
      (m) => new URL(m[0]),
    );
    expect(links).toHaveLength(2);
    const all = links[1]!;
    expect((await request(t.app).post(`${all.pathname}${all.search}`)).status).toBe(200);
    expect(new Set(Object.values(await emailModesOf(t.dataSource.manager, mentor.user.id)))).toEqual(
      new Set(['off']),
    );
  });

  it('when the token is tampered with, then 400 and nothing changes', async () => {
    const secret = t.config.sessionSecret;
    const good = signUnsubscribeToken(secret, { userId: mentor.user.id, scope: 'concern.urgent' });
    const [payload, signature] = good.split('.') as [string, string];
    const someoneElse = Buffer.from(
      `${(await makeMember(t.dataSource, club, 'Victim')).user.id}:all`,
    ).toString('base64url');
    const flipped = `${signature.slice(0, -2)}${signature.at(-2) === 'A' ? 'B' : 'A'}${signature.at(-1)}`;
    const tampered = [
      `${someoneElse}.${signature}`,
      `${payload}.${flipped}`,
      payload,
      `${payload}.${signature}.x`,
      signUnsubscribeToken('another-secret-of-at-least-32-characters!', {
        userId: mentor.user.id,
        scope: 'all',
      }),
      '',
    ];
    for (const token of tampered) {
      for (const method of ['get', 'post'] as const) {
        const res = await request(t.app)[method](`/api/unsubscribe?token=${encodeURIComponent(token)}`);
        expect(res.status, `${method} ${token}`).toBe(400);
        expect(res.type).toBe('text/html');
        expect(res.text).toContain('This link does not work');
      }
    }
    expect((await request(t.app).get('/api/unsubscribe')).status).toBe(400);
    expect((await emailModesOf(t.dataSource.manager, mentor.user.id))['concern.urgent']).toBe('immediate');
    expect((await request(t.app).get(`/api/unsubscribe?token=${encodeURIComponent(good)}`)).status).toBe(200);
  });
});
