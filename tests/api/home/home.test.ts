import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import type { HomeView } from '../../../shared/schemas/home-views';
import { reevaluateTank } from '../../../server/modules/concerns/reevaluate-tank';
import { resetDatabase } from '../../helpers/db';
import { assignMentor, makeClub, makeMember } from '../../helpers/factories';
import { signedIn, type Client } from '../../helpers/http';
import { insertTank, insertWaterTest } from '../../helpers/tank-rows';
import { createTestApp, type TestApp } from '../../helpers/test-app';

const HOUR = 3_600_000;
// A tropical tank mid-cycle: ammonia and nitrite are up, which is expected while cycling.
const CYCLING = { temperature: 26, pH: 7.4, ammonia: 1, nitrite: 0.5, nitrate: 5 };

describe('the home', () => {
  let t: TestApp;
  let clubId: string;
  let keeper: Client;
  let mentor: Client;
  let ids: { keeper: string; mentor: string; cyclingTank: string; otherTank: string };
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    const club = await makeClub(t.dataSource, 'Home Club');
    clubId = club.id;
    const m = await makeMember(t.dataSource, club, 'Hana Mentor', 'mentor');
    const k = await makeMember(t.dataSource, club, 'Kit Keeper');
    const other = await makeMember(t.dataSource, club, 'Oren Other');
    await assignMentor(t.dataSource, club, m.user, k.user);
    const cyclingTank = await insertTank(t.dataSource, {
      clubId,
      ownerId: k.user.id,
      systemType: 'tropical-freshwater',
      phase: 'cycling',
      name: 'Kit’s first tank',
      createdAt: new Date(Date.now() - 20 * 24 * HOUR),
    });
    const otherTank = await insertTank(t.dataSource, { clubId, ownerId: other.user.id, name: 'Not Kit’s' });
    // Tested a little over a day ago: the daily ammonia and nitrite are due again, nitrate (every 2 days) is not.
    await insertWaterTest(t.dataSource, cyclingTank, new Date(Date.now() - 49 * HOUR), {
      ...CYCLING,
      ammonia: 0.5,
      nitrite: 0.25,
    });
    await insertWaterTest(t.dataSource, cyclingTank, new Date(Date.now() - 25 * HOUR), CYCLING);
    await t.dataSource.transaction((tx) => reevaluateTank(tx, cyclingTank));
    ids = { keeper: k.user.id, mentor: m.user.id, cyclingTank, otherTank };
    keeper = await signedIn(t.app, k.user.email);
    mentor = await signedIn(t.app, m.user.email);
  });

  const homeOf = async (c: Client) => {
    const res = await c.get(`/api/clubs/${clubId}/home`);
    expect(res.status).toBe(200);
    return res.body as HomeView;
  };

  it('when a keeper opens it, then only their own tanks come back with cycle stage, tests due and the latest test', async () => {
    const home = await homeOf(keeper);
    expect(home.tanks.map((x) => x.name)).toEqual(['Kit’s first tank']);
    const tank = home.tanks[0]!;
    expect(tank).toMatchObject({
      id: ids.cyclingTank,
      phase: 'cycling',
      cycleStage: 'nitrite-rising',
      systemType: 'tropical-freshwater',
    });
    const status = Object.fromEntries(tank.due.map((d) => [d.parameter, d.status]));
    // Tropical freshwater while cycling (common practice, no source): ammonia and nitrite daily, nitrate every 2 days.
    expect(status).toMatchObject({
      ammonia: 'due',
      nitrite: 'due',
      nitrate: 'ok',
      pH: 'ok',
      temperature: 'ok',
    });
    expect(tank.lastTest?.values).toMatchObject({ ammonia: 1, nitrite: 0.5 });
  });

  it('when a mentor opens it, then their mentee’s tank is not on it (that is the desk’s job)', async () => {
    const home = await homeOf(mentor);
    expect(home.tanks).toEqual([]);
  });

  it('when the tank has concerns of several severities, then the worst is shown, the newest among equals', async () => {
    const raise = (severity: string, parameter: string, hoursAgo: number) =>
      t.dataSource.query(
        `INSERT INTO concern (club_id, tank_id, owner_id, rule, parameter, severity, reason, raised_at, last_seen_at)
         VALUES ($1, $2, $3, $4, $5, $6, $7, now() - make_interval(hours => $8), now())`,
        [
          clubId,
          ids.cyclingTank,
          ids.keeper,
          `test.${parameter}.${severity}`,
          parameter,
          severity,
          `${parameter} is ${severity}`,
          hoursAgo,
        ],
      );
    await t.dataSource.query(`DELETE FROM concern`);
    await raise('info', 'nitrate', 1);
    await raise('urgent', 'temperature', 30);
    await raise('urgent', 'pH', 3);
    await raise('caution', 'nitrite', 2);
    const tank = (await homeOf(keeper)).tanks[0]!;
    expect(tank.liveConcerns).toBe(4);
    expect(tank.worstConcern).toMatchObject({ severity: 'urgent', parameter: 'pH', reason: 'pH is urgent' });
  });

  it('when the mentor replies to a question, then it lists with their words and the unread notification, until read and answered', async () => {
    const testId = (
      await t.dataSource.query(`SELECT id FROM water_test WHERE tank_id = $1 ORDER BY taken_at DESC`, [
        ids.cyclingTank,
      ])
    )[0].id as string;
    const asked = await keeper.post(`/api/clubs/${clubId}/tanks/${ids.cyclingTank}/questions`, {
      title: 'Is ammonia 1 normal now?',
      body: 'Week three of cycling.',
      waterTestId: testId,
    });
    expect(asked.status).toBe(201);
    const questionId = asked.body.question.id as string;
    let home = await homeOf(keeper);
    expect(home.questions).toMatchObject([
      { id: questionId, status: 'open', lastReply: null, unreadNotificationIds: [] },
    ]);

    const long = `Yes, that is what cycling looks like. ${'Keep testing daily. '.repeat(12)}`;
    expect(
      (await mentor.post(`/api/clubs/${clubId}/questions/${questionId}/replies`, { body: long })).status,
    ).toBe(201);
    home = await homeOf(keeper);
    const q = home.questions[0]!;
    expect(q.lastReply?.author.displayName).toBe('Hana Mentor');
    expect(q.lastReply?.excerpt.startsWith('Yes, that is what cycling looks like.')).toBe(true);
    expect(q.lastReply!.excerpt.length).toBeLessThanOrEqual(160);
    expect(q.lastReply!.excerpt.endsWith('…')).toBe(true);
    expect(q.unreadNotificationIds).toHaveLength(1);

    // Marked answered it would leave the home, but not while the reply is unread.
    expect(
      (await keeper.post(`/api/clubs/${clubId}/questions/${questionId}/answered`, { answered: true })).status,
    ).toBe(200);
    expect((await homeOf(keeper)).questions.map((x) => x.id)).toEqual([questionId]);
    expect((await keeper.post(`/api/me/notifications/${q.unreadNotificationIds[0]}/read`)).status).toBe(200);
    expect((await homeOf(keeper)).questions).toEqual([]);
  });

  it('when the mentor resolves a concern or signs the tank off, then it is good news; the keeper resolving their own is not', async () => {
    await insertWaterTest(t.dataSource, ids.cyclingTank, new Date(Date.now() - HOUR), {
      ...CYCLING,
      pH: 8.6,
      temperature: 33,
    });
    await t.dataSource.transaction((tx) => reevaluateTank(tx, ids.cyclingTank));
    const concerns = (await t.dataSource.query(
      `SELECT id FROM concern WHERE tank_id = $1 AND status = 'open' ORDER BY raised_at`,
      [ids.cyclingTank],
    )) as { id: string }[];
    expect(concerns.length).toBeGreaterThanOrEqual(2);
    expect(
      (
        await mentor.post(`/api/clubs/${clubId}/concerns/${concerns[0]!.id}/resolve`, {
          note: 'Water change done, well handled.',
        })
      ).status,
    ).toBe(200);
    expect((await keeper.post(`/api/clubs/${clubId}/concerns/${concerns[1]!.id}/resolve`, {})).status).toBe(
      200,
    );
    await t.dataSource.query(
      `INSERT INTO tank_readiness (tank_id, signed_off_by_id, signed_off_at, sign_off_note) VALUES ($1, $2, now() - interval '1 hour', 'Ready for fish.')`,
      [ids.cyclingTank, ids.mentor],
    );
    // A sign-off from a month ago is no longer news, and another keeper's is none of Kit's.
    const older = await insertTank(t.dataSource, { clubId, ownerId: ids.keeper, name: 'Kit’s older tank' });
    await t.dataSource.query(
      `INSERT INTO tank_readiness (tank_id, signed_off_by_id, signed_off_at) VALUES ($1, $2, now() - interval '30 days')`,
      [older, ids.mentor],
    );
    await t.dataSource.query(
      `INSERT INTO tank_readiness (tank_id, signed_off_by_id, signed_off_at) VALUES ($1, $2, now() - interval '1 hour')`,
      [ids.otherTank, ids.mentor],
    );

    const news = (await homeOf(keeper)).goodNews;
    expect(news.map((n) => [n.kind, n.by.displayName, n.note])).toEqual([
      ['concern-resolved', 'Hana Mentor', 'Water change done, well handled.'],
      ['signed-off', 'Hana Mentor', 'Ready for fish.'],
    ]);
  });

  it('when the keeper has more tanks, then the home still takes the same number of queries', async () => {
    const count = async () => {
      const spy = vi.spyOn(t.dataSource.logger, 'logQuery');
      await homeOf(keeper);
      const n = spy.mock.calls.length;
      spy.mockRestore();
      return n;
    };
    const withOne = await count();
    expect(withOne).toBeGreaterThan(0);
    for (let i = 0; i < 4; i++) {
      const id = await insertTank(t.dataSource, {
        clubId,
        ownerId: ids.keeper,
        systemType: 'reef',
        phase: 'established',
        name: `Extra ${i}`,
      });
      await insertWaterTest(t.dataSource, id, new Date(Date.now() - i * 24 * HOUR), {
        temperature: 25,
        salinity: 35,
        pH: 8.1,
        ammonia: 0,
        nitrite: 0,
        nitrate: 5,
      });
    }
    expect((await homeOf(keeper)).tanks).toHaveLength(5);
    expect(await count()).toBe(withOne);
  });

  it('when the club id is not an id, then 400 names the field', async () => {
    const res = await keeper.get('/api/clubs/not-a-club/home');
    expect(res.status).toBe(400);
    expect(res.body.issues[0].path).toBe('params.clubId');
  });
});
