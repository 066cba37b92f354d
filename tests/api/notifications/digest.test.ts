import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { Club } from '@server/modules/clubs/club.entity';
import { runDigest } from '@server/modules/notifications/digest';
import {
  DIGEST_CRON,
  DIGEST_QUEUE,
  startDigestScheduler,
} from '@server/modules/notifications/digest-scheduler';
import { NotificationDigest } from '@server/modules/notifications/notification-digest.entity';
import { Notification } from '@server/modules/notifications/notification.entity';
import type { NotifyInput } from '@server/modules/notifications';
import { setEmailModes } from '@server/modules/notifications/preferences';
import { createLogger } from '@server/lib/logger';
import { resetDatabase } from '@tests/helpers/db';
import { makeClub, makeMember } from '@tests/helpers/factories';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';
import { mailsTo, settledMailsTo } from './mail-helpers';

type Person = Awaited<ReturnType<typeof makeMember>>;
const HOUR = 3_600_000;

/** 07:05 UTC on the day after today (real time), so every notification made by the test is older. */
function tomorrowAt0705(): Date {
  const d = new Date();
  return new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate() + 1, 7, 5));
}
const isoDate = (d: Date) => d.toISOString().slice(0, 10);

describe('the daily digest, with the clock in the test’s hands', () => {
  let t: TestApp;
  let club: Club;
  let maya: Person;
  let milo: Person;
  let day1: Date;
  const digest = (now: Date) => runDigest(t.dataSource, t.mail.mailer, now, t.config);

  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    club = await makeClub(t.dataSource, 'Mangrove Circle');
    maya = await makeMember(t.dataSource, club, 'Maya Mentor', 'mentor');
    milo = await makeMember(t.dataSource, club, 'Milo Mentor', 'mentor');
    day1 = tomorrowAt0705();
  });

  /** True once `n` sessions wait on a lock while inserting a digest claim. */
  async function waitersOnClaims(n: number): Promise<boolean> {
    const end = Date.now() + 5_000;
    while (Date.now() < end) {
      const [row] = (await t.dataSource.query(
        `SELECT count(*)::int AS n FROM pg_stat_activity WHERE wait_event_type = 'Lock' AND query LIKE '%INSERT INTO notification_digest%' AND datname = current_database()`,
      )) as { n: number }[];
      if (row!.n >= n) return true;
      await new Promise((r) => setTimeout(r, 25));
    }
    return false;
  }

  const send = (userIds: string[], input: Partial<NotifyInput> = {}) =>
    t.dataSource.transaction((tx) =>
      t.deps.notify(tx, {
        userIds,
        clubId: club.id,
        kind: 'question.asked',
        title: 'A question',
        link: '/desk',
        ...input,
      }),
    );

  it('when two workers run the digest at the same moment, then each person gets exactly one e-mail listing their notifications', async () => {
    await send([maya.user.id, milo.user.id], {
      title: 'Ben asked: is 40 ppm nitrate OK?',
      body: 'Tank: Ben’s 60 L community',
      link: '/tanks/b1',
    });
    await send([maya.user.id], {
      kind: 'concern.caution',
      title: 'pH drifting down in Cleo’s reef',
      link: '/tanks/c1',
    });

    // Hold Maya's claim in an open transaction so both runs are certain to be inside her digest at the same time.
    const holder = t.dataSource.createQueryRunner();
    await holder.connect();
    await holder.startTransaction();
    await holder.query(`INSERT INTO notification_digest (user_id, digest_date) VALUES ($1, $2)`, [
      maya.user.id,
      isoDate(day1),
    ]);
    const both = Promise.all([digest(day1), digest(day1)]);
    expect(await waitersOnClaims(2)).toBe(true);
    await holder.rollbackTransaction();
    await holder.release();
    const [a, b] = await both;

    const sent = [...a!.sentTo, ...b!.sentTo].sort();
    expect(sent).toEqual([maya.user.id, milo.user.id].sort());
    // One run sent Maya's digest; the other found it claimed.
    expect(
      [a!, b!].map((r) => [r.sentTo.includes(maya.user.id), r.alreadyClaimed.includes(maya.user.id)]).sort(),
    ).toEqual([
      [false, true],
      [true, false],
    ]);

    const mayaMails = await settledMailsTo(t.dataSource, maya.user.email, 1);
    const miloMails = await mailsTo(t.dataSource, milo.user.email);
    expect(mayaMails).toHaveLength(1);
    expect(miloMails).toHaveLength(1);

    const mail = mayaMails[0]!;
    expect(mail.subject).toBe(`Your Shoalwise digest for ${isoDate(day1)}: 2 updates`);
    expect(mail.text).toContain('Mangrove Circle');
    expect(mail.text).toContain('- Ben asked: is 40 ppm nitrate OK? — Tank: Ben’s 60 L community');
    expect(mail.text).toContain(`${t.config.baseUrl}/tanks/b1`);
    expect(mail.text).toContain('- pH drifting down in Cleo’s reef');
    expect(mail.html).toContain(`href="${t.config.baseUrl}/tanks/c1"`);
    expect(mail.text).toMatch(/Stop the daily digest: https?:\/\/\S+\/api\/unsubscribe\?token=/);
    expect(mail.headers['list-unsubscribe']).toMatch(/^<https?:\/\/\S+\/api\/unsubscribe\?token=\S+>$/);
    expect(miloMails[0]!.subject).toContain(': 1 update');
    expect(miloMails[0]!.text).not.toContain('Cleo');

    const claims = await t.dataSource
      .getRepository(NotificationDigest)
      .find({ order: { notificationCount: 'ASC' } });
    expect(claims.map((c) => [c.digestDate, c.notificationCount])).toEqual([
      [isoDate(day1), 1],
      [isoDate(day1), 2],
    ]);
  });

  it('when it runs again the same day, then nothing more is sent (even for new notifications); the next morning sends only the new ones', async () => {
    await send([maya.user.id], { title: 'First question' });
    expect((await digest(day1)).sentTo).toEqual([maya.user.id]);
    await settledMailsTo(t.dataSource, maya.user.email, 1);

    await send([maya.user.id], { title: 'Second question' });
    const later = await digest(new Date(day1.getTime() + 2 * HOUR));
    expect(later).toEqual({ sentTo: [], alreadyClaimed: [maya.user.id] });
    expect(await settledMailsTo(t.dataSource, maya.user.email, 1)).toHaveLength(1);

    const day2 = new Date(day1.getTime() + 24 * HOUR);
    expect((await digest(day2)).sentTo).toEqual([maya.user.id]);
    const mails = await settledMailsTo(t.dataSource, maya.user.email, 2);
    expect(mails).toHaveLength(2);
    expect(mails[1]!.subject).toBe(`Your Shoalwise digest for ${isoDate(day2)}: 1 update`);
    expect(mails[1]!.text).toContain('Second question');
    expect(mails[1]!.text).not.toContain('First question');
  });

  it('when it is not yet morning where the person lives, then they wait; their own 07:00 sends it, dated their day', async () => {
    await t.dataSource.query(`UPDATE app_user SET time_zone = 'America/New_York' WHERE id = $1`, [
      maya.user.id,
    ]);
    await send([maya.user.id, milo.user.id]);
    // 07:05 UTC is the small hours in New York.
    expect((await digest(day1)).sentTo).toEqual([milo.user.id]);
    const inNewYorkMorning = new Date(day1.getTime() + 5 * HOUR);
    expect((await digest(inNewYorkMorning)).sentTo).toEqual([maya.user.id]);
    expect(
      (await t.dataSource.getRepository(NotificationDigest).findOneByOrFail({ userId: maya.user.id }))
        .digestDate,
    ).toBe(isoDate(day1));
    // Before 07:00 and after the morning, nobody is sent anything.
    await send([milo.user.id], { title: 'late one' });
    const day2 = day1.getTime() + 24 * HOUR;
    expect((await digest(new Date(day2 - 2 * HOUR))).sentTo).toEqual([]);
    expect((await digest(new Date(day2 + 6 * HOUR))).sentTo).toEqual([]);
  });

  it('when notifications were read, e-mailed already, or are of a kind switched off, then the digest leaves them out', async () => {
    await t.dataSource.transaction((tx) => setEmailModes(tx, maya.user.id, { mention: 'off' }));
    await send([maya.user.id], { title: 'Read in the app already' });
    await t.dataSource.query(`UPDATE notification SET read_at = now()`);
    await send([maya.user.id], { kind: 'mention', title: 'A mention (off)' });
    await send([maya.user.id], { kind: 'concern.urgent', title: 'Urgent (sent at once)' });
    await send([maya.user.id], { kind: 'assignment', title: 'You are now mentoring Ben' });
    expect((await digest(day1)).sentTo).toEqual([maya.user.id]);
    const mails = await settledMailsTo(t.dataSource, maya.user.email, 2);
    expect(mails.map((m) => m.subject)).toEqual([
      'Mangrove Circle: Urgent (sent at once)',
      `Your Shoalwise digest for ${isoDate(day1)}: 1 update`,
    ]);
    expect(mails[1]!.text).toContain('You are now mentoring Ben');
    expect(mails[1]!.text).not.toMatch(/Read in the app|A mention|Urgent/);
    const pending = await t.dataSource
      .getRepository(Notification)
      .findOneByOrFail({ title: 'A mention (off)' });
    expect(pending.emailedAt).toBeNull();
  });

  it('when the scheduler starts, then an hourly digest schedule is stored in pg-boss', async () => {
    const scheduler = await startDigestScheduler({
      config: t.config,
      dataSource: t.dataSource,
      mailer: t.mail.mailer,
      logger: createLogger({ logLevel: 'silent' }),
    });
    try {
      const rows: { name: string; cron: string; timezone: string }[] = await t.dataSource.query(
        `SELECT name, cron, timezone FROM pgboss.schedule WHERE name = $1`,
        [DIGEST_QUEUE],
      );
      expect(rows).toEqual([{ name: DIGEST_QUEUE, cron: DIGEST_CRON, timezone: 'UTC' }]);
    } finally {
      await scheduler.stop();
    }
  });
});
