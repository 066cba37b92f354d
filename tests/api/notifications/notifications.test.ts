import { IsNull } from 'typeorm';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { DEFAULT_EMAIL_MODES } from '@shared/constants/notifications';
import type { Club } from '@server/modules/clubs/club.entity';
import { Notification } from '@server/modules/notifications/notification.entity';
import type { NotifyInput } from '@server/modules/notifications';
import { resetDatabase } from '@tests/helpers/db';
import { makeClub, makeMember } from '@tests/helpers/factories';
import { signedIn, type Client } from '@tests/helpers/http';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';

type Person = Awaited<ReturnType<typeof makeMember>>;

describe('in-app notifications', () => {
  let t: TestApp;
  let club: Club;
  let mina: Person;
  let milo: Person;
  let mc: Client;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    club = await makeClub(t.dataSource, 'Driftwood Keepers');
    mina = await makeMember(t.dataSource, club, 'Mina Member');
    milo = await makeMember(t.dataSource, club, 'Milo Mentor', 'mentor');
    mc = await signedIn(t.app, mina.user.email);
  });

  const send = (input: Partial<NotifyInput> = {}) =>
    t.dataSource.transaction((tx) =>
      t.deps.notify(tx, {
        userIds: [mina.user.id],
        clubId: club.id,
        kind: 'question.answered',
        title: 'Milo answered your question',
        body: 'Nitrate at 20 is fine.',
        link: '/tanks/abc',
        ...input,
      }),
    );

  it('when notified, then only that person lists it, with the club name and an unread count', async () => {
    await send({ subject: { type: 'Question', id: 'q-1' } });
    const res = await mc.get('/api/me/notifications');
    expect(res.status).toBe(200);
    expect(res.body.unreadCount).toBe(1);
    expect(res.body.nextCursor).toBeNull();
    expect(res.body.notifications).toEqual([
      expect.objectContaining({
        kind: 'question.answered',
        title: 'Milo answered your question',
        body: 'Nitrate at 20 is fine.',
        link: '/tanks/abc',
        clubName: 'Driftwood Keepers',
        subject: { type: 'Question', id: 'q-1' },
        readAt: null,
      }),
    ]);
    const other = await signedIn(t.app, milo.user.email);
    expect((await other.get('/api/me/notifications')).body).toEqual({
      notifications: [],
      unreadCount: 0,
      nextCursor: null,
    });
  });

  it('when marked read one by one or all at once, then the unread count follows; another person’s id is 404', async () => {
    await send({ title: 'one' });
    await send({ title: 'two' });
    await send({ title: 'three' });
    const list = (await mc.get('/api/me/notifications')).body.notifications as {
      id: string;
      title: string;
    }[];
    const one = await mc.post(`/api/me/notifications/${list[0]!.id}/read`);
    expect(one.status).toBe(200);
    expect(one.body.unreadCount).toBe(2);
    expect(one.body.notification.readAt).not.toBeNull();
    // Marking twice keeps the first time.
    const twice = await mc.post(`/api/me/notifications/${list[0]!.id}/read`);
    expect(twice.body.notification.readAt).toBe(one.body.notification.readAt);
    expect(
      (await mc.get('/api/me/notifications?unreadOnly=true')).body.notifications.map(
        (n: { title: string }) => n.title,
      ),
    ).toEqual(['two', 'one']);

    const milos = await signedIn(t.app, milo.user.email);
    expect((await milos.post(`/api/me/notifications/${list[1]!.id}/read`)).status).toBe(404);
    expect((await mc.post('/api/me/notifications/not-a-uuid/read')).status).toBe(400);

    const all = await mc.post('/api/me/notifications/read-all');
    expect(all.body).toEqual({ updated: 2, unreadCount: 0 });
    expect(
      await t.dataSource.getRepository(Notification).countBy({ userId: mina.user.id, readAt: IsNull() }),
    ).toBe(0);
  });

  it('when there are more than a page, then pages follow each other with no gaps or repeats', async () => {
    for (let i = 1; i <= 5; i++) await send({ title: `n${i}` });
    const seen: string[] = [];
    let cursor: string | null = null;
    do {
      const query: string = cursor ? `?limit=2&before=${cursor}` : '?limit=2';
      const res = await mc.get(`/api/me/notifications${query}`);
      expect(res.status).toBe(200);
      seen.push(...res.body.notifications.map((n: { title: string }) => n.title));
      cursor = res.body.nextCursor;
    } while (cursor);
    expect(seen).toEqual(['n5', 'n4', 'n3', 'n2', 'n1']);
    for (const bad of ['?limit=0', '?limit=51', '?before=yesterday', '?unreadOnly=maybe', '?page=2']) {
      const res = await mc.get(`/api/me/notifications${bad}`);
      expect(res.status, bad).toBe(400);
    }
    const res = await mc.get('/api/me/notifications?limit=abc');
    expect(res.body.issues).toEqual([expect.objectContaining({ path: 'query.limit' })]);
  });

  it('when the caller’s transaction rolls back, or the person is not an active member, then nothing is stored', async () => {
    await expect(
      t.dataSource.transaction(async (tx) => {
        await t.deps.notify(tx, {
          userIds: [mina.user.id],
          clubId: club.id,
          kind: 'mention',
          title: 'x',
          link: '/',
        });
        throw new Error('the caller failed');
      }),
    ).rejects.toThrow('the caller failed');
    const suspended = await makeMember(t.dataSource, club, 'Sid Suspended', 'member', 'suspended');
    const outsider = await makeMember(
      t.dataSource,
      await makeClub(t.dataSource, 'Elsewhere'),
      'Olga Outsider',
    );
    const rows = await send({ userIds: [suspended.user.id, outsider.user.id, mina.user.id, mina.user.id] });
    expect(rows.map((r) => r.userId)).toEqual([mina.user.id]);
    expect(await t.dataSource.getRepository(Notification).count()).toBe(1);
  });

  it('when a link leaves the app, then notify refuses it', async () => {
    for (const link of [
      'https://elsewhere.example/x',
      '//elsewhere.example',
      '/\\elsewhere.example',
      'tanks/1',
    ]) {
      await expect(send({ link }), link).rejects.toThrow(/link must be a path inside the app/);
    }
  });

  it('when a membership is suspended later, then that club’s notifications disappear from the list and the count', async () => {
    await send();
    await t.dataSource.query(`UPDATE membership SET status = 'suspended' WHERE id = $1`, [
      mina.membership.id,
    ]);
    expect((await mc.get('/api/me/notifications')).body).toEqual({
      notifications: [],
      unreadCount: 0,
      nextCursor: null,
    });
  });
});

describe('e-mail preferences', () => {
  let t: TestApp;
  let c: Client;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    c = await signedIn(
      t.app,
      (await makeMember(t.dataSource, await makeClub(t.dataSource), 'Pia Prefs')).user.email,
    );
  });

  it('when nothing was chosen, then urgent concerns and meetups (reminders, changes, a freed place) are immediate and the rest go in the digest', async () => {
    const res = await c.get('/api/me/notification-preferences');
    expect(res.status).toBe(200);
    expect(res.body.preferences).toEqual(DEFAULT_EMAIL_MODES);
    expect(res.body.preferences['concern.urgent']).toBe('immediate');
    expect(res.body.preferences.meetup).toBe('immediate');
    expect(
      new Set(
        Object.entries(res.body.preferences)
          .filter(([k]) => k !== 'concern.urgent' && k !== 'meetup')
          .map(([, v]) => v),
      ),
    ).toEqual(new Set(['digest']));
  });

  it('when some kinds change, then only those change and it sticks', async () => {
    const res = await c.patch('/api/me/notification-preferences', {
      'concern.caution': 'immediate',
      mention: 'off',
    });
    expect(res.status).toBe(200);
    expect(res.body.preferences).toEqual({
      ...DEFAULT_EMAIL_MODES,
      'concern.caution': 'immediate',
      mention: 'off',
    });
    await c.patch('/api/me/notification-preferences', { mention: 'digest' });
    expect((await c.get('/api/me/notification-preferences')).body.preferences).toEqual({
      ...DEFAULT_EMAIL_MODES,
      'concern.caution': 'immediate',
    });
  });

  it('when a value or a kind is not known, then 400 names the field and nothing changes', async () => {
    const bad = await c.patch('/api/me/notification-preferences', { 'concern.urgent': 'sometimes' });
    expect(bad.status).toBe(400);
    expect(bad.body).toMatchObject({
      error: { code: 'bad_request' },
      issues: [{ path: 'concern.urgent', message: expect.stringContaining('immediate') }],
    });
    const unknown = await c.patch('/api/me/notification-preferences', { 'tank.exploded': 'off' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.issues[0].message).toMatch(/tank\.exploded/);
    expect((await c.patch('/api/me/notification-preferences', {})).status).toBe(400);
    expect((await c.patch('/api/me/notification-preferences', ['off'])).status).toBe(400);
    expect((await c.get('/api/me/notification-preferences')).body.preferences).toEqual(DEFAULT_EMAIL_MODES);
  });
});
