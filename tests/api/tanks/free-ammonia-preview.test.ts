import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { builtInProfile } from '@shared/care';
import type { TankDetailView, WaterTestDetailView, WaterTestView } from '@shared/schemas/tank-views';
import {
  draftFromTest,
  draftToInput,
  draftToPatch,
  newDraft,
  type WaterTestDraft,
} from '@client/features/readings/lib/water-test-draft';
import { previewConcerns, previewDraft } from '@client/features/readings/lib/water-test-preview';
import type { UnitPrefs } from '@client/lib/display-units';
import { resetDatabase } from '@tests/helpers/db';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';
import { makeTankVia, tankPeople } from './people';
import { DAY_MS } from '@shared/care/time';

const daysAgo = (d: number) => new Date(Date.now() - d * DAY_MS).toISOString();
const PREFS: UnitPrefs = { temperatureUnit: 'C', volumeUnit: 'L', salinityDisplay: 'ppt' };
const PROFILE = builtInProfile('reef')!;

/** A draft with only an ammonia reading, as a keeper types it at the tank. */
function ammoniaOnly(draft: WaterTestDraft, value: string): WaterTestDraft {
  return {
    ...draft,
    entries: { ...draft.entries, ammonia: { ...draft.entries.ammonia, value, unit: 'mg/L NH3' } },
  };
}

interface ConcernRowView {
  rule: string;
  parameter: string;
  severity: string;
  reason: string;
  value: number | null;
}

/**
 * The form's preview and the server work free ammonia out by one rule (computeFreeAmmonia with lastKnownInputs): the
 * preview, fed the last known values the server hands the form, shows exactly what is stored and what is flagged.
 */
describe('free ammonia: the form’s preview and the server agree', () => {
  let t: TestApp;
  let p: Awaited<ReturnType<typeof tankPeople>>;
  let base: string;
  let tank: TankDetailView;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    p = await tankPeople(t);
    const { id } = await makeTankVia(p.asKeeper, p.club.id, {
      name: 'Reef with history',
      systemType: 'reef',
      phase: 'established',
      volume: { source: 'entered', value: 300 },
    });
    base = `/api/clubs/${p.club.id}/tanks/${id}`;
    // Temperature and salinity were last measured long ago (past the care history's 120 days), pH last week.
    expect(
      (
        await p.asKeeper.post(`${base}/water-tests`, {
          takenAt: daysAgo(200),
          entries: {
            temperature: { value: 27, unit: '°C' },
            salinity: { value: 35, unit: 'PSU' },
            pH: { value: 8.0 },
          },
        })
      ).status,
    ).toBe(201);
    expect(
      (await p.asKeeper.post(`${base}/water-tests`, { takenAt: daysAgo(7), entries: { pH: { value: 8.3 } } }))
        .status,
    ).toBe(201);
    tank = (await p.asKeeper.get(base)).body.tank;
  });

  const freeAmmoniaConcern = (concerns: readonly ConcernRowView[]) =>
    concerns.find((c) => c.parameter === 'freeAmmonia');
  const liveConcerns = async () =>
    (await p.asKeeper.get(`${base}/concerns?status=live`)).body.concerns as ConcernRowView[];
  const preview = (draft: WaterTestDraft, lastKnown: TankDetailView['lastKnown'], testId?: string) => {
    const now = new Date().toISOString();
    const ctx = {
      systemType: tank.systemType,
      careProfileKey: tank.careProfileKey,
      profile: PROFILE,
      lastKnown,
      now,
      ...(testId ? { testId } : {}),
    };
    const { normalized } = previewDraft(draft, PREFS, ctx);
    return { normalized, concerns: previewConcerns(normalized, { tank, profile: PROFILE, lastKnown, now }) };
  };
  const expectSame = (
    shown: ReturnType<typeof preview>,
    stored: WaterTestView,
    judged: readonly ConcernRowView[],
  ) => {
    expect(stored.freeAmmonia).not.toBeNull();
    expect(stored.freeAmmonia).toBe(shown.normalized.freeAmmonia);
    expect(stored.derived.freeAmmonia).toEqual(shown.normalized.derived.freeAmmonia);
    const onServer = freeAmmoniaConcern(judged);
    expect(onServer).toBeDefined();
    expect(onServer).toMatchObject(freeAmmoniaConcern(shown.concerns as unknown as ConcernRowView[])!);
  };

  it('when a new test has only ammonia, then the preview’s free ammonia and its concern are the stored value and the raised concern, to the digit', async () => {
    expect(tank.lastKnown).toMatchObject({
      pH: { value: 8.3 },
      temperature: { value: 27 },
      salinity: { value: 35 },
    });
    const draft = ammoniaOnly(newDraft(PREFS, {}), '0.5');
    const shown = preview(draft, tank.lastKnown);
    expect(shown.normalized.derived.freeAmmonia).toMatchObject({
      inputs: { temperature: { source: 'last-known' }, pH: { source: 'last-known', value: 8.3 } },
    });

    const saved = await p.asKeeper.post(`${base}/water-tests`, draftToInput(draft, PREFS));
    expect(saved.status).toBe(201);
    expectSame(shown, saved.body.waterTest, await liveConcerns());
  });

  it('when a test is edited, then the preview fed that test’s own last known values matches what the edit stores and flags', async () => {
    const first = await p.asKeeper.post(
      `${base}/water-tests`,
      draftToInput(ammoniaOnly(newDraft(PREFS, {}), '0.3'), PREFS),
    );
    // A later pH must not stand in for the edited test's missing one: the test's lastKnown comes from before it.
    expect(
      (
        await p.asKeeper.post(`${base}/water-tests`, {
          takenAt: new Date().toISOString(),
          entries: { pH: { value: 7.9 } },
        })
      ).status,
    ).toBe(201);
    const loaded: WaterTestDetailView = (
      await p.asKeeper.get(`${base}/water-tests/${first.body.waterTest.id}`)
    ).body;
    expect(loaded.lastKnown.pH?.value).toBe(8.3);

    const draft = ammoniaOnly(draftFromTest(loaded.waterTest, PREFS), '0.8');
    const shown = preview(draft, loaded.lastKnown, loaded.waterTest.id);
    const edited = await p.asKeeper.patch(
      `${base}/water-tests/${loaded.waterTest.id}`,
      draftToPatch(draftToInput(draft, PREFS), loaded.waterTest),
    );
    expect(edited.status).toBe(200);
    expect(edited.body.waterTest.freeAmmonia).toBe(shown.normalized.freeAmmonia);
    expect(edited.body.waterTest.derived.freeAmmonia).toEqual(shown.normalized.derived.freeAmmonia);
  });
});
