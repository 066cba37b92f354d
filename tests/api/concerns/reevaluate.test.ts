import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { planWaterChanges } from '@shared/chemistry';
import { MAX_WATER_CHANGE_FRACTION, SEAHORSE_LARGE_PROFILE } from '@shared/care';
import { formatLitres } from '@shared/care/evaluation/wording';
import { ConcernRow } from '@server/modules/concerns/concern.entity';
import { reevaluateTank } from '@server/modules/concerns/reevaluate-tank';
import { resetDatabase } from '@tests/helpers/db';
import { makeClub, makeMember } from '@tests/helpers/factories';
import { insertTank, insertWaterTest } from '@tests/helpers/tank-rows';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';

const HOUR = 3_600_000;
/** Everything a large-seahorse tank wants, so only the parameter under test raises a concern. */
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

describe('stored concerns follow the readings', () => {
  let t: TestApp;
  let tankId: string;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    const club = await makeClub(t.dataSource);
    const owner = await makeMember(t.dataSource, club, 'Hal Hippocampus');
    tankId = await insertTank(t.dataSource, {
      clubId: club.id,
      ownerId: owner.user.id,
      systemType: 'seahorse',
      phase: 'established',
      volumeL: 200,
    });
  });

  const live = () =>
    t.dataSource.getRepository(ConcernRow).find({ where: { tankId }, order: { raisedAt: 'ASC' } });

  it('when nitrite reads 1.0 on an established seahorse tank, then one urgent concern is stored and re-evaluating does not duplicate it', async () => {
    // Trade fact (common practice, no source): an established tank should read zero nitrite; seahorses tolerate none.
    await insertWaterTest(t.dataSource, tankId, new Date(), { ...CALM, nitrite: 1.0 });
    const first = await t.dataSource.transaction((tx) => reevaluateTank(tx, tankId));
    const nitrite = first.raised.filter((c) => c.parameter === 'nitrite');
    expect(nitrite).toHaveLength(1);
    expect(nitrite[0]!.severity).toBe('urgent');
    await t.dataSource.transaction((tx) => reevaluateTank(tx, tankId));
    await t.dataSource.transaction((tx) => reevaluateTank(tx, tankId));
    const rows = (await live()).filter((c) => c.parameter === 'nitrite');
    expect(rows).toHaveLength(1);
    expect(rows[0]!.status).toBe('open');
  });

  it('when a later test reads nitrite 0, then the concern is resolved by that test and kept in history', async () => {
    await insertWaterTest(t.dataSource, tankId, new Date(Date.now() - 2 * HOUR), { ...CALM, nitrite: 1.0 });
    await t.dataSource.transaction((tx) => reevaluateTank(tx, tankId));
    await insertWaterTest(t.dataSource, tankId, new Date(), { ...CALM, nitrite: 0 });
    const second = await t.dataSource.transaction((tx) => reevaluateTank(tx, tankId));
    expect(second.cleared.map((c) => c.parameter)).toContain('nitrite');
    const rows = (await live()).filter((c) => c.parameter === 'nitrite');
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: 'resolved', resolvedByTest: true });
  });

  it('when a later test does not measure nitrite at all, then the nitrite concern stays open', async () => {
    await insertWaterTest(t.dataSource, tankId, new Date(Date.now() - 2 * HOUR), { ...CALM, nitrite: 1.0 });
    await t.dataSource.transaction((tx) => reevaluateTank(tx, tankId));
    await insertWaterTest(t.dataSource, tankId, new Date(), { temperature: 24 });
    await t.dataSource.transaction((tx) => reevaluateTank(tx, tankId));
    expect((await live()).find((c) => c.parameter === 'nitrite')?.status).toBe('open');
  });

  it('when nitrate is above the seahorse limit, then the stored next steps carry the litres planWaterChanges computes', async () => {
    await insertWaterTest(t.dataSource, tankId, new Date(), { ...CALM, nitrate: 30 });
    const { raised } = await t.dataSource.transaction((tx) => reevaluateTank(tx, tankId));
    const nitrate = raised.find((c) => c.parameter === 'nitrate')!;
    expect(nitrate).toBeDefined();
    const range = SEAHORSE_LARGE_PROFILE.ranges.nitrate!;
    const target = range.target ?? range.ideal[1];
    const plan = planWaterChanges({
      current: 30,
      target,
      source: 0,
      volumeL: 200,
      maxFractionPerChange: MAX_WATER_CHANGE_FRACTION,
    });
    expect(nitrate.waterChanges).toEqual(plan);
    expect(nitrate.nextSteps.join(' ')).toContain(`${formatLitres(plan[0]!.litres)} L`);
  });
});
