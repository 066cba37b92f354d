import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '@tests/helpers/db';
import { assignMentor, makeClub, makeMember } from '@tests/helpers/factories';
import { signedIn, type Client } from '@tests/helpers/http';
import { waitForMail } from '@tests/helpers/mail';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';

const CALM = {
  temperature: { value: 24, unit: '°C' },
  salinity: { value: 33, unit: 'PSU' },
  pH: { value: 8.1 },
  ammonia: { value: 0, unit: 'mg/L NH3' },
  nitrate: { value: 2, unit: 'mg/L NO3' },
};

describe('concerns through the API', () => {
  let t: TestApp;
  let keeper: Client;
  let mentor: Client;
  let mentorEmail: string;
  let clubId: string;
  let tankId: string;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    const club = await makeClub(t.dataSource, 'Concern Club');
    clubId = club.id;
    const k = await makeMember(t.dataSource, club, 'Kim Keeper');
    const m = await makeMember(t.dataSource, club, 'Max Mentor', 'mentor');
    mentorEmail = m.user.email;
    await assignMentor(t.dataSource, club, m.user, k.user);
    keeper = await signedIn(t.app, k.user.email);
    mentor = await signedIn(t.app, m.user.email);
    const tank = await keeper.post(`/api/clubs/${clubId}/tanks`, {
      name: 'Seahorse tank',
      systemType: 'seahorse',
      phase: 'established',
      volume: { source: 'entered', value: 200 },
    });
    tankId = tank.body.tank.id;
  });

  const save = (nitrite: number) =>
    keeper.post(`/api/clubs/${clubId}/tanks/${tankId}/water-tests`, {
      takenAt: new Date().toISOString(),
      entries: { ...CALM, nitrite: { value: nitrite, unit: 'mg/L NO2' } },
    });

  it('when a keeper saves nitrite 1.0 on a seahorse tank, then an urgent concern is on the tank and the mentor gets an e-mail at once', async () => {
    expect((await save(1.0)).status).toBe(201);
    const care = await keeper.get(`/api/clubs/${clubId}/tanks/${tankId}/care`);
    expect(care.status).toBe(200);
    const nitrite = care.body.concerns.find((c: { parameter: string }) => c.parameter === 'nitrite');
    expect(nitrite).toMatchObject({ severity: 'urgent', status: 'open' });
    expect(nitrite.reason).toMatch(/seahorses need 0/i);
    const mail = await waitForMail(t.dataSource, mentorEmail);
    expect(mail.subject + mail.text).toMatch(/Nitrite/);
  });

  it('when the mentor acknowledges and the keeper resolves, then it leaves the live list but stays in history', async () => {
    await save(1.0);
    const live = (await mentor.get(`/api/clubs/${clubId}/tanks/${tankId}/concerns`)).body.concerns;
    const nitrite = live.find((c: { parameter: string }) => c.parameter === 'nitrite');
    expect(
      (
        await mentor.post(`/api/clubs/${clubId}/concerns/${nitrite.id}/acknowledge`, {
          note: 'Do a 25 % change tonight.',
        })
      ).body.concern.status,
    ).toBe('acknowledged');
    expect(
      (
        await keeper.post(`/api/clubs/${clubId}/concerns/${nitrite.id}/resolve`, {
          note: 'Changed 50 L, nitrite now 0.',
        })
      ).status,
    ).toBe(200);
    const after = (await keeper.get(`/api/clubs/${clubId}/tanks/${tankId}/concerns`)).body.concerns;
    expect(after.find((c: { id: string }) => c.id === nitrite.id)).toBeUndefined();
    const all = (await keeper.get(`/api/clubs/${clubId}/tanks/${tankId}/concerns?status=all`)).body.concerns;
    expect(all.find((c: { id: string }) => c.id === nitrite.id)).toMatchObject({
      status: 'resolved',
      acknowledged: { note: 'Do a 25 % change tonight.' },
      resolved: { note: 'Changed 50 L, nitrite now 0.', byTest: false },
    });
  });

  it('when the same test is edited twice, then there is still one concern for that cause', async () => {
    const saved = await save(1.0);
    const testId = saved.body.waterTest.id;
    await keeper.patch(`/api/clubs/${clubId}/tanks/${tankId}/water-tests/${testId}`, {
      entries: { nitrite: { value: 0.8, unit: 'mg/L NO2' } },
    });
    await keeper.patch(`/api/clubs/${clubId}/tanks/${tankId}/water-tests/${testId}`, {
      entries: { nitrite: { value: 0.9, unit: 'mg/L NO2' } },
    });
    const all = (await keeper.get(`/api/clubs/${clubId}/tanks/${tankId}/concerns?status=all`)).body.concerns;
    expect(all.filter((c: { rule: string; parameter: string }) => c.parameter === 'nitrite')).toHaveLength(1);
  });

  it('when animals go in before a mentor signs off, then the tank is flagged; a keeper cannot sign it off themselves', async () => {
    await save(0);
    await keeper.post(`/api/clubs/${clubId}/tanks/${tankId}/livestock`, {
      speciesCommonName: 'Invented pipefish',
      count: 1,
      addedOn: new Date().toISOString().slice(0, 10),
    });
    const care = (await keeper.get(`/api/clubs/${clubId}/tanks/${tankId}/care`)).body;
    expect(care.concerns.map((c: { rule: string }) => c.rule)).toContain('stocking.without-sign-off');
    expect(care.readiness.ready).toBe(false);
    expect((await keeper.post(`/api/clubs/${clubId}/tanks/${tankId}/sign-off`, {})).status).toBe(403);
  });
});

describe('a profile edit re-judges the tanks that follow it', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('when a mentor tightens nitrate on the club profile, then an existing reading becomes a concern without a new test', async () => {
    await resetDatabase(t.dataSource);
    const club = await makeClub(t.dataSource, 'Profile Club');
    const k = await makeMember(t.dataSource, club, 'Kim Keeper');
    const m = await makeMember(t.dataSource, club, 'Max Mentor', 'mentor');
    await assignMentor(t.dataSource, club, m.user, k.user);
    const keeper = await signedIn(t.app, k.user.email);
    const mentor = await signedIn(t.app, m.user.email);
    const copy = (
      await mentor.post(`/api/clubs/${club.id}/care-profiles`, {
        basedOn: 'marine-fish-only',
        name: 'Strict fish room',
      })
    ).body;
    const tank = (
      await keeper.post(`/api/clubs/${club.id}/tanks`, {
        name: 'Fish tank',
        systemType: 'marine-fish-only',
        phase: 'established',
        careProfileKey: copy.key,
        volume: { source: 'entered', value: 300 },
      })
    ).body.tank;
    await keeper.post(`/api/clubs/${club.id}/tanks/${tank.id}/water-tests`, {
      takenAt: new Date().toISOString(),
      entries: { ...CALM, nitrite: { value: 0, unit: 'mg/L NO2' }, nitrate: { value: 15, unit: 'mg/L NO3' } },
    });
    const before = (await keeper.get(`/api/clubs/${club.id}/tanks/${tank.id}/care`)).body.concerns;
    expect(before.find((c: { parameter: string }) => c.parameter === 'nitrate')).toBeUndefined();

    const def = (await mentor.get(`/api/clubs/${club.id}/care-profiles/${copy.key}`)).body.profile;
    const nitrate = { ...def.ranges.nitrate, ideal: [0, 5], caution: [0, 10], target: undefined };
    const put = await mentor.put(`/api/clubs/${club.id}/care-profiles/${copy.id}`, {
      definition: { ...def, ranges: { ...def.ranges, nitrate } },
      baseVersion: 1,
      note: 'We keep sensitive fish.',
    });
    expect(put.status).toBe(200);
    const after = (await keeper.get(`/api/clubs/${club.id}/tanks/${tank.id}/care`)).body.concerns;
    expect(after.find((c: { parameter: string }) => c.parameter === 'nitrate')).toMatchObject({
      severity: 'urgent',
    });
  });
});
