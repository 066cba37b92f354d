import { freeAmmonia } from '@shared/chemistry';
import { formatNumber } from '../parameters';
import type { CareProfile } from '../profiles/types';
import { comesBefore, type KnownValue, type TestPosition } from '../readings';
import { isSaltwaterSystem, type SystemType } from '../system-types';
import { indexTests, type TestTimeline } from '../test-timeline';
import { isoDate, toMs } from '../time';
import type { WaterTestInput } from '../types';
import { listOf } from './wording';

/** The parameters free ammonia depends on, whose last known values may stand in for missing ones. */
export const FREE_AMMONIA_INPUTS = ['temperature', 'pH', 'salinity'] as const;
export type FreeAmmoniaInput = (typeof FREE_AMMONIA_INPUTS)[number];
/** The tank's last known temperature, pH and salinity before a test (see lastKnownInputs). */
export type LastKnown = Partial<Record<FreeAmmoniaInput, KnownValue>>;

/**
 * The one rule for what stands in for a temperature, pH or salinity a test lacks: per parameter, the latest value
 * measured on a test before `position` in (takenAt, id) order, however long ago; without a position, the latest of
 * all. The stored free ammonia, the concerns and the form's preview all take their last known values from here.
 */
export function lastKnownInputs(
  tests: readonly WaterTestInput[] | TestTimeline,
  position?: TestPosition,
): LastKnown {
  const timeline = indexTests(tests);
  const known: LastKnown = {};
  let missing = FREE_AMMONIA_INPUTS.length;
  // Walk back from the newest test that may count; each parameter takes the first finite value it meets.
  let i = timeline.length - 1;
  if (position) {
    const limit = toMs(position.takenAt);
    while (i >= 0 && (timeline.times[i] as number) > limit) i--;
  }
  for (; i >= 0 && missing > 0; i--) {
    const test = timeline.tests[i] as WaterTestInput;
    if (position && !comesBefore(test, position)) continue;
    for (const p of FREE_AMMONIA_INPUTS) {
      const value = test.values[p];
      if (known[p] || value === undefined || !Number.isFinite(value)) continue;
      known[p] = { value, takenAt: test.takenAt, testId: test.id };
      missing--;
    }
  }
  return known;
}

export type InputSource = 'this-test' | 'last-known' | 'assumed';

export interface ResolvedInput {
  value: number;
  source: InputSource;
  /** Date of the earlier test used, or why a value was assumed. */
  detail?: string;
}

export interface FreeAmmoniaResult {
  nh3: number;
  tempC: ResolvedInput;
  pH: ResolvedInput;
  salinity: ResolvedInput;
  /** "pH 8.2 and 25 °C from this test; salinity 35 from the test of 2024-05-01". */
  basisText: string;
}

export type FreeAmmoniaOutcome = { ok: true; result: FreeAmmoniaResult } | { ok: false; why: string };

function fromTestOrLastKnown(
  parameter: FreeAmmoniaInput,
  reading: WaterTestInput,
  lastKnown: LastKnown,
): ResolvedInput | null {
  const own = reading.values[parameter];
  if (own !== undefined) return { value: own, source: 'this-test' };
  const known = lastKnown[parameter];
  return known ? { value: known.value, source: 'last-known', detail: isoDate(known.takenAt) } : null;
}

function resolveSalinity(
  reading: WaterTestInput,
  lastKnown: LastKnown,
  systemType: SystemType,
  profile: CareProfile,
): ResolvedInput {
  if (!isSaltwaterSystem(systemType)) return { value: 0, source: 'assumed', detail: 'fresh water' };
  const found = fromTestOrLastKnown('salinity', reading, lastKnown);
  if (found) return found;
  const band = profile.ranges.salinity?.ideal ?? [35, 35];
  return {
    value: (band[0] + band[1]) / 2,
    source: 'assumed',
    detail: 'middle of this profile’s salinity range',
  };
}

/** Groups inputs by where they came from: "pH 8.2 and 24 °C from this test; salinity 35 from the test of …". */
function describeInputs(items: readonly { text: string; input: ResolvedInput }[]): string {
  const groups = new Map<string, string[]>();
  for (const { text, input } of items) {
    const where =
      input.source === 'this-test'
        ? 'from this test'
        : input.source === 'last-known'
          ? `from the test of ${input.detail}`
          : `assumed (${input.detail})`;
    groups.set(where, [...(groups.get(where) ?? []), text]);
  }
  return [...groups].map(([where, texts]) => `${listOf(texts)} ${where}`).join('; ');
}

/**
 * Free (un-ionized) NH3 for a reading. The one place its inputs are decided: each of temperature, pH and salinity
 * from the test itself, else the tank's last known value (`lastKnownInputs`), else, for salinity only, fresh water's
 * 0 or the middle of the profile's band.
 */
export function computeFreeAmmonia(
  reading: WaterTestInput,
  totalAmmonia: number,
  lastKnown: LastKnown,
  systemType: SystemType,
  profile: CareProfile,
): FreeAmmoniaOutcome {
  const tempC = fromTestOrLastKnown('temperature', reading, lastKnown);
  const pH = fromTestOrLastKnown('pH', reading, lastKnown);
  if (!tempC || !pH) {
    const missing = [!pH && 'pH', !tempC && 'temperature'].filter(Boolean).join(' and ');
    return { ok: false, why: `no ${missing} has been recorded for this tank` };
  }
  const salinity = resolveSalinity(reading, lastKnown, systemType, profile);
  try {
    const { nh3 } = freeAmmonia({
      total: totalAmmonia,
      basis: 'NH3',
      tempC: tempC.value,
      pH: pH.value,
      salinity: salinity.value,
    });
    const items = [
      { text: `pH ${formatNumber('pH', pH.value)}`, input: pH },
      { text: `${formatNumber('temperature', tempC.value)} °C`, input: tempC },
    ];
    if (isSaltwaterSystem(systemType))
      items.push({ text: `salinity ${formatNumber('salinity', salinity.value)}`, input: salinity });
    return { ok: true, result: { nh3, tempC, pH, salinity, basisText: describeInputs(items) } };
  } catch (error) {
    if (error instanceof RangeError) return { ok: false, why: error.message };
    throw error;
  }
}
