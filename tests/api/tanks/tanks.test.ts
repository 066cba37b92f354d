import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { SYSTEM_TYPES } from '@shared/care/system-types';
import { defaultProfileFor } from '@shared/care/profiles';
import { tankVolume } from '@shared/chemistry/tank-volume';
import { copyProfile } from '@server/modules/care/care-profile.service';
import { Tank } from '@server/modules/tanks/tank.entity';
import { TankEvent } from '@server/modules/tanks/tank-event.entity';
import { resetDatabase } from '@tests/helpers/db';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';
import { makeTankVia, REEF, tankPeople } from './people';

describe('tanks and their livestock', () => {
  let t: TestApp;
  let p: Awaited<ReturnType<typeof tankPeople>>;
  let base: string;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    p = await tankPeople(t);
    base = `/api/clubs/${p.club.id}/tanks`;
  });

  it('when a member creates a tank of each kind, then each is stored with its kind’s default care profile', async () => {
    for (const systemType of SYSTEM_TYPES) {
      const tank = await makeTankVia(p.asKeeper, p.club.id, {
        ...REEF,
        name: `A ${systemType} tank`,
        systemType,
      });
      expect(tank).toMatchObject({
        systemType,
        careProfileKey: defaultProfileFor(systemType).key,
        phase: 'cycling',
        hasLivestock: false,
        archivedAt: null,
        volumeL: 300,
      });
      expect(tank.owner).toEqual({ id: p.keeper.user.id, displayName: 'Kim Keeper' });
    }
    expect(await t.dataSource.getRepository(Tank).countBy({ ownerId: p.keeper.user.id })).toBe(
      SYSTEM_TYPES.length,
    );
  });

  it('when the volume is given as dimensions, then litres are worked out net of displacement and the dimensions are kept', async () => {
    const tank = await makeTankVia(p.asKeeper, p.club.id, {
      name: 'Bow-front',
      systemType: 'seahorse',
      volume: {
        source: 'dimensions',
        shape: 'bowfront',
        length: 90,
        width: 40,
        bowDepth: 8,
        height: 50,
        fillHeight: 45,
        displacementFraction: 0.1,
      },
    });
    const expected = tankVolume({
      shape: 'bowfront',
      dimensionsCm: { length: 90, width: 40, bowDepth: 8, height: 50 },
      fillHeightCm: 45,
      displacementFraction: 0.1,
    });
    expect(tank.volumeL).toBeCloseTo(expected.netL, 9);
    expect(tank.volume).toMatchObject({
      source: 'dimensions',
      shape: 'bowfront',
      dimensionsCm: { length: 90, width: 40, bowDepth: 8, height: 50 },
      fillHeightCm: 45,
      displacementFraction: 0.1,
    });
    expect((tank.volume as { grossL: number }).grossL).toBeCloseTo(expected.grossL, 9);
  });

  it('when dimensions are in inches, then they are stored in centimetres', async () => {
    const tank = await makeTankVia(p.asKeeper, p.club.id, {
      name: 'Cube',
      systemType: 'reef',
      volume: { source: 'dimensions', shape: 'rectangle', unit: 'in', length: 20, width: 20, height: 20 },
    });
    expect(tank.volume).toMatchObject({ dimensionsCm: { length: 50.8, width: 50.8, height: 50.8 } });
    expect(tank.volumeL).toBeCloseTo(50.8 ** 3 / 1000, 6);
  });

  it('when the input is bad, then 400 names each field', async () => {
    const res = await p.asKeeper.post(base, {
      name: '',
      systemType: 'pond',
      volume: { source: 'dimensions', shape: 'rectangle', length: 60, height: 40, fillHeight: 50 },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('bad_request');
    const paths = res.body.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(
      expect.arrayContaining(['name', 'systemType', 'volume.width', 'volume.fillHeight']),
    );
  });

  it('when a care profile for another kind of tank is chosen, then 400 on careProfileKey', async () => {
    const res = await p.asKeeper.post(base, { ...REEF, careProfileKey: 'coldwater' });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([
      { path: 'careProfileKey', message: expect.stringMatching(/coldwater/) },
    ]);
    const ok = await p.asKeeper.post(base, {
      ...REEF,
      systemType: 'seahorse',
      careProfileKey: 'seahorse-dwarf',
    });
    expect(ok.body.tank.careProfileKey).toBe('seahorse-dwarf');
  });

  it('when the club has its own copy of a profile, then a tank of a kind it suits may follow it', async () => {
    const copy = await t.dataSource.transaction((tx) =>
      copyProfile(tx, {
        clubId: p.club.id,
        basedOn: 'seahorse-large',
        name: 'Our warm seahorses',
        actorId: p.mentor.user.id,
      }),
    );
    const res = await p.asKeeper.post(base, { ...REEF, systemType: 'seahorse', careProfileKey: copy.key });
    expect(res.status).toBe(201);
    expect(res.body.tank.careProfileKey).toBe(copy.key);
    expect((await p.asKeeper.post(base, { ...REEF, careProfileKey: copy.key })).status).toBe(400);
    expect(
      (await p.asKeeper.post(base, { ...REEF, careProfileKey: 'no-such-profile' })).body.issues[0].message,
    ).toBe('There is no care profile "no-such-profile".');
  });

  it('when the kind of tank changes, then its default profile follows, and other fields patch alone', async () => {
    const tank = await makeTankVia(p.asKeeper, p.club.id);
    const res = await p.asKeeper.patch(`${base}/${tank.id}`, {
      systemType: 'brackish',
      equipmentNotes: 'Canister filter, 100 W heater',
      setUpOn: '2025-02-01',
    });
    expect(res.status).toBe(200);
    expect(res.body.tank).toMatchObject({
      systemType: 'brackish',
      careProfileKey: 'brackish',
      equipmentNotes: 'Canister filter, 100 W heater',
      setUpOn: '2025-02-01',
      name: REEF.name,
    });
    const phase = await p.asKeeper.patch(`${base}/${tank.id}`, { phase: 'established' });
    expect(phase.body.tank).toMatchObject({
      phase: 'established',
      systemType: 'brackish',
      setUpOn: '2025-02-01',
    });
  });

  it('when listing, then a member sees their own tanks, the mentor the mentee’s, and ?mine=1 narrows to the viewer’s', async () => {
    const mine = await makeTankVia(p.asKeeper, p.club.id);
    const neighbours = await makeTankVia(p.asNeighbour, p.club.id, { ...REEF, name: 'Neighbour tank' });
    const mentorsOwn = await makeTankVia(p.asMentor, p.club.id, { ...REEF, name: 'Mentor tank' });
    const ids = async (c: typeof p.asKeeper, q = '') =>
      ((await c.get(`${base}${q}`)).body.tanks as { id: string }[]).map((x) => x.id).sort();
    expect(await ids(p.asKeeper)).toEqual([mine.id]);
    expect(await ids(p.asNeighbour)).toEqual([neighbours.id]);
    expect(await ids(p.asMentor)).toEqual([mine.id, mentorsOwn.id].sort());
    expect(await ids(p.asMentor, '?mine=1')).toEqual([mentorsOwn.id]);
    expect(await ids(p.asMentor, `?ownerId=${p.keeper.user.id}`)).toEqual([mine.id]);
    expect((await p.asKeeper.get(`${base}?mine=maybe`)).status).toBe(400);
  });

  it('when a tank is archived, then it leaves the list, refuses changes with 409, keeps its history, and comes back on restore', async () => {
    const tank = await makeTankVia(p.asKeeper, p.club.id);
    await p.asKeeper.post(`${base}/${tank.id}/water-tests`, {
      takenAt: new Date().toISOString(),
      entries: { pH: { value: 8.2 } },
    });
    const archived = await p.asKeeper.post(`${base}/${tank.id}/archive`);
    expect(archived.status).toBe(200);
    expect(archived.body.tank.archivedAt).toEqual(expect.any(String));
    expect((await p.asKeeper.get(base)).body.tanks).toEqual([]);
    expect((await p.asKeeper.get(`${base}?includeArchived=1`)).body.tanks).toHaveLength(1);
    const edit = await p.asKeeper.patch(`${base}/${tank.id}`, { name: 'x' });
    expect(edit.status).toBe(409);
    expect(edit.body.error.message).toMatch(/archived/);
    expect(
      (
        await p.asKeeper.post(`${base}/${tank.id}/water-tests`, {
          takenAt: new Date().toISOString(),
          entries: { pH: { value: 8 } },
        })
      ).status,
    ).toBe(409);
    expect((await p.asMentor.get(`${base}/${tank.id}/water-tests`)).body.items).toHaveLength(1);
    const restored = await p.asKeeper.post(`${base}/${tank.id}/restore`);
    expect(restored.body.tank.archivedAt).toBeNull();
    expect((await p.asKeeper.get(base)).body.tanks).toHaveLength(1);
  });

  it('when someone other than the owner writes, then 403; another club’s member gets 404', async () => {
    const tank = await makeTankVia(p.asKeeper, p.club.id);
    expect((await p.asMentor.get(`${base}/${tank.id}`)).status).toBe(200);
    expect((await p.asMentor.patch(`${base}/${tank.id}`, { name: 'Mine now' })).status).toBe(403);
    expect((await p.asNeighbour.get(`${base}/${tank.id}`)).status).toBe(403);
    expect((await p.asStranger.get(`${base}/${tank.id}`)).status).toBe(404);
    expect((await p.asStranger.get(`/api/clubs/${p.other.id}/tanks/${tank.id}`)).status).toBe(404);
    expect((await t.dataSource.getRepository(Tank).findOneByOrFail({ id: tank.id })).name).toBe(REEF.name);
  });

  it('when animals are added and later removed, then hasLivestock follows and the timeline records both', async () => {
    const tank = await makeTankVia(p.asKeeper, p.club.id);
    const added = await p.asKeeper.post(`${base}/${tank.id}/livestock`, {
      speciesCommonName: 'Invented clown goby',
      count: 2,
      addedOn: '2025-03-01',
      source: 'club swap',
      quarantineNotes: '3 weeks in a 40 L tank, ate frozen food',
    });
    expect(added.status).toBe(201);
    const livestockId = added.body.livestock.id as string;
    let detail = (await p.asKeeper.get(`${base}/${tank.id}`)).body.tank;
    expect(detail.hasLivestock).toBe(true);
    expect(detail.livestock).toEqual([
      expect.objectContaining({ speciesCommonName: 'Invented clown goby', count: 2, removedOn: null }),
    ]);

    const early = await p.asKeeper.patch(`${base}/${tank.id}/livestock/${livestockId}`, {
      removedOn: '2025-02-01',
    });
    expect(early.status).toBe(400);
    expect(early.body.issues[0].path).toBe('removedOn');

    const removed = await p.asKeeper.patch(`${base}/${tank.id}/livestock/${livestockId}`, {
      removedOn: '2025-04-10',
      removalReason: 'Rehomed with a friend',
    });
    expect(removed.body.livestock).toMatchObject({
      removedOn: '2025-04-10',
      removalReason: 'Rehomed with a friend',
    });
    detail = (await p.asKeeper.get(`${base}/${tank.id}`)).body.tank;
    expect(detail.hasLivestock).toBe(false);
    expect((await p.asKeeper.get(base)).body.tanks[0].hasLivestock).toBe(false);

    const events = (await p.asKeeper.get(`${base}/${tank.id}/events`)).body.items as {
      kind: string;
      occurredAt: string;
      details: { livestockId: string; reason?: string };
    }[];
    expect(events.map((e) => [e.kind, e.occurredAt.slice(0, 10), e.details.livestockId])).toEqual([
      ['livestock-removed', '2025-04-10', livestockId],
      ['livestock-added', '2025-03-01', livestockId],
    ]);
    expect(events[0]!.details.reason).toBe('Rehomed with a friend');

    const undo = await p.asKeeper.patch(`${base}/${tank.id}/livestock/${livestockId}`, { removedOn: null });
    expect(undo.body.livestock).toMatchObject({ removedOn: null, removalReason: null });
    expect(await t.dataSource.getRepository(TankEvent).countBy({ livestockId })).toBe(1);

    const direct = await p.asKeeper.post(`${base}/${tank.id}/events`, {
      kind: 'livestock-added',
      occurredAt: new Date().toISOString(),
      details: { livestockId, speciesCommonName: 'x', count: 1 },
    });
    expect(direct.status).toBe(400);
    const addedEvent = await t.dataSource.getRepository(TankEvent).findOneByOrFail({ livestockId });
    expect((await p.asKeeper.delete(`${base}/${tank.id}/events/${addedEvent.id}`)).status).toBe(409);

    expect((await p.asKeeper.delete(`${base}/${tank.id}/livestock/${livestockId}`)).status).toBe(204);
    expect(await t.dataSource.getRepository(TankEvent).countBy({ tankId: tank.id })).toBe(0);
  });
});
