import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { DeskView } from '@shared/schemas/desk.schema';
import { reevaluateTank } from '@server/modules/concerns/reevaluate-tank';
import { resetDatabase } from '@tests/helpers/db';
import { assignMentor, makeClub, makeMember } from '@tests/helpers/factories';
import { signedIn } from '@tests/helpers/http';
import { insertTank, insertWaterTest } from '@tests/helpers/tank-rows';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';

const CALM = {
  temperature: 24,
  salinity: 33,
  pH: 8.1,
  ammonia: 0,
  nitrite: 0,
  nitrate: 2,
  alkalinity: 8,
  calcium: 420,
  magnesium: 1300,
};

describe('the mentor desk', () => {
  let t: TestApp;
  let clubId: string;
  let emails: Record<'mentor' | 'admin' | 'member', string>;
  let tanks: Record<'troubled' | 'calm' | 'cycling' | 'notMine', string>;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    const club = await makeClub(t.dataSource, 'Desk Club');
    clubId = club.id;
    const mentor = await makeMember(t.dataSource, club, 'Desk Mentor', 'mentor');
    const admin = await makeMember(t.dataSource, club, 'Desk Admin', 'admin');
    const a = await makeMember(t.dataSource, club, 'Ann Troubled');
    const b = await makeMember(t.dataSource, club, 'Ben Calm');
    const c = await makeMember(t.dataSource, club, 'Cy Cycling');
    const stranger = await makeMember(t.dataSource, club, 'Dee Elsewhere');
    for (const mentee of [a, b, c]) await assignMentor(t.dataSource, club, mentor.user, mentee.user);
    emails = { mentor: mentor.user.email, admin: admin.user.email, member: a.user.email };
    const tank = (ownerId: string, phase: 'cycling' | 'established', name: string) =>
      insertTank(t.dataSource, { clubId, ownerId, systemType: 'seahorse', phase, name });
    tanks = {
      troubled: await tank(a.user.id, 'established', 'Troubled'),
      calm: await tank(b.user.id, 'established', 'Calm'),
      cycling: await tank(c.user.id, 'cycling', 'Cycling'),
      notMine: await tank(stranger.user.id, 'established', 'Not mine'),
    };
    const now = Date.now();
    for (const id of Object.values(tanks))
      await insertWaterTest(t.dataSource, id, new Date(now - 3_600_000), CALM);
    await insertWaterTest(t.dataSource, tanks.troubled, new Date(now - 60_000), { ...CALM, nitrite: 1.0 });
    for (const id of Object.values(tanks)) await t.dataSource.transaction((tx) => reevaluateTank(tx, id));
  });

  it('when a mentor opens the desk, then only their mentees’ tanks come back, the urgent one first with its reason and sparkline', async () => {
    const res = await (await signedIn(t.app, emails.mentor)).get(`/api/clubs/${clubId}/desk`);
    expect(res.status).toBe(200);
    const desk = res.body as DeskView;
    expect(desk.rows.map((r) => r.name).sort()).toEqual(['Calm', 'Cycling', 'Troubled']);
    expect(desk.rows[0]!.name).toBe('Troubled');
    expect(desk.rows[0]!.worstConcern).toMatchObject({ severity: 'urgent', parameter: 'nitrite' });
    expect(desk.rows[0]!.sparkline!.points.map((p) => p.value)).toEqual([0, 1]);
    expect(desk.rows[0]!.why[0]!.label).toMatch(/urgent/);
    expect(desk.rows[0]!.score).toBeGreaterThan(desk.rows[1]!.score);
  });

  it('when filtering, then urgent-only and cycling narrow the list and total still counts all', async () => {
    const mentor = await signedIn(t.app, emails.mentor);
    const urgent = (await mentor.get(`/api/clubs/${clubId}/desk?urgentOnly=1`)).body as DeskView;
    expect(urgent.rows.map((r) => r.name)).toEqual(['Troubled']);
    expect(urgent.total).toBe(3);
    const cycling = (await mentor.get(`/api/clubs/${clubId}/desk?cycling=1`)).body as DeskView;
    expect(cycling.rows.map((r) => r.name)).toEqual(['Cycling']);
  });

  it('when a mentee asks about a test, then their row counts it as unanswered and the filter finds it', async () => {
    const [test] = await t.dataSource.query(
      `SELECT id FROM water_test WHERE tank_id = $1 ORDER BY taken_at DESC LIMIT 1`,
      [tanks.calm],
    );
    const ben = await signedIn(
      t.app,
      (
        await t.dataSource.query(
          `SELECT u.email FROM app_user u JOIN tank t ON t.owner_id = u.id WHERE t.id = $1`,
          [tanks.calm],
        )
      )[0].email,
    );
    const asked = await ben.post(`/api/clubs/${clubId}/tanks/${tanks.calm}/questions`, {
      title: 'Is nitrate 2 fine?',
      body: 'For my seahorses?',
      waterTestId: test.id,
    });
    expect(asked.status).toBe(201);
    const desk = (await (await signedIn(t.app, emails.mentor)).get(`/api/clubs/${clubId}/desk?unanswered=1`))
      .body as DeskView;
    expect(desk.rows.map((r) => [r.name, r.unansweredQuestions])).toEqual([['Calm', 1]]);
  });

  it('when an admin opens the desk, then every tank of the club is there; a member gets 403', async () => {
    const desk = (await (await signedIn(t.app, emails.admin)).get(`/api/clubs/${clubId}/desk`))
      .body as DeskView;
    expect(desk.rows.map((r) => r.name).sort()).toEqual(['Calm', 'Cycling', 'Not mine', 'Troubled']);
    expect((await (await signedIn(t.app, emails.member)).get(`/api/clubs/${clubId}/desk`)).status).toBe(403);
  });
});
