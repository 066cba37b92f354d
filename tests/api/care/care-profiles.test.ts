import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { SEAHORSE_LARGE_PROFILE } from '@shared/care';
import { resetDatabase } from '@tests/helpers/db';
import { makeClub, makeMember } from '@tests/helpers/factories';
import { signedIn, type Client } from '@tests/helpers/http';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';

describe('club care profiles: copy, adjust, versioned history', () => {
  let t: TestApp;
  let mentor: Client;
  let mentorId: string;
  let clubId: string;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    const club = await makeClub(t.dataSource, 'Profile Club');
    clubId = club.id;
    const m = await makeMember(t.dataSource, club, 'Pia Mentor', 'mentor');
    mentorId = m.user.id;
    mentor = await signedIn(t.app, m.user.email);
  });

  it('when a mentor copies the seahorse profile and loosens nitrate, then version 2 records who changed what', async () => {
    const copy = await mentor.post(`/api/clubs/${clubId}/care-profiles`, {
      basedOn: 'seahorse-large',
      name: 'Our seahorse room',
    });
    expect(copy.status).toBe(201);
    const listed = await mentor.get(`/api/clubs/${clubId}/care-profiles`);
    expect(listed.body.profiles.map((p: { key: string }) => p.key)).toContain(copy.body.key);
    expect(
      listed.body.profiles.filter((p: { source: string }) => p.source === 'built-in').length,
    ).toBeGreaterThanOrEqual(5);

    const before = (await mentor.get(`/api/clubs/${clubId}/care-profiles/${copy.body.key}`)).body.profile;
    const nitrate = before.ranges.nitrate;
    const edited = {
      ...before,
      ranges: {
        ...before.ranges,
        nitrate: {
          ...nitrate,
          ideal: [0, nitrate.ideal[1] + 5],
          caution: [0, Math.max(nitrate.caution[1], nitrate.ideal[1] + 5)],
        },
      },
    };
    const put = await mentor.put(`/api/clubs/${clubId}/care-profiles/${copy.body.id}`, {
      definition: edited,
      baseVersion: 1,
      note: 'Weekly 20 % changes keep us steady.',
    });
    expect(put.status).toBe(200);
    expect(put.body.profile.version).toBe(2);
    expect(put.body.changes).toContain(
      `ranges.nitrate.ideal: 0–${nitrate.ideal[1]} → 0–${nitrate.ideal[1] + 5}`,
    );

    const after = await mentor.get(`/api/clubs/${clubId}/care-profiles/${copy.body.key}`);
    expect(after.body.profile.ranges.nitrate.ideal).toEqual([0, nitrate.ideal[1] + 5]);
    expect(after.body.history.map((h: { version: number }) => h.version)).toEqual([2, 1]);
    expect(after.body.history[0]).toMatchObject({
      changedById: mentorId,
      note: 'Weekly 20 % changes keep us steady.',
    });
    // The shipped profile is untouched.
    expect(SEAHORSE_LARGE_PROFILE.ranges.nitrate!.ideal).toEqual(nitrate.ideal);
  });

  it('when two people edit the same version, then the second gets 409 and nothing is lost', async () => {
    const copy = await mentor.post(`/api/clubs/${clubId}/care-profiles`, {
      basedOn: 'reef',
      name: 'Reef copy',
    });
    const def = (await mentor.get(`/api/clubs/${clubId}/care-profiles/${copy.body.key}`)).body.profile;
    const first = await mentor.put(`/api/clubs/${clubId}/care-profiles/${copy.body.id}`, {
      definition: { ...def, name: 'Reef copy A' },
      baseVersion: 1,
      note: 'first edit',
    });
    const second = await mentor.put(`/api/clubs/${clubId}/care-profiles/${copy.body.id}`, {
      definition: { ...def, name: 'Reef copy B' },
      baseVersion: 1,
      note: 'second edit',
    });
    expect(first.status).toBe(200);
    expect(second.status).toBe(409);
    expect((await mentor.get(`/api/clubs/${clubId}/care-profiles/${copy.body.key}`)).body.profile.name).toBe(
      'Reef copy A',
    );
  });

  it('when an edit puts the ideal band outside the caution band, then 400 names the field', async () => {
    const copy = await mentor.post(`/api/clubs/${clubId}/care-profiles`, {
      basedOn: 'reef',
      name: 'Broken reef',
    });
    const def = (await mentor.get(`/api/clubs/${clubId}/care-profiles/${copy.body.key}`)).body.profile;
    const bad = { ...def, ranges: { ...def.ranges, pH: { ...def.ranges.pH, ideal: [6, 9.9] } } };
    const res = await mentor.put(`/api/clubs/${clubId}/care-profiles/${copy.body.id}`, {
      definition: bad,
      baseVersion: 1,
      note: 'oops',
    });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path)).toContain('definition.ranges.pH');
  });

  it('when copying from a key that does not exist, then 400 on basedOn', async () => {
    const res = await mentor.post(`/api/clubs/${clubId}/care-profiles`, {
      basedOn: 'no-such-profile',
      name: 'Nothing',
    });
    expect(res.status).toBe(400);
    expect(res.body.issues[0].path).toBe('basedOn');
  });
});
