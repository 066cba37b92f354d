import { freeAmmonia } from '@shared/chemistry';
import { formatNumber, type ParameterKey } from '../parameters';
import type { CareProfile } from '../profiles/types';
import { isSaltwaterSystem, type SystemType } from '../system-types';
import { indexTests, type TestTimeline } from '../test-timeline';
import { isoDate, toMs } from '../time';
import type { WaterTestInput } from '../types';
import { listOf } from './wording';

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

function fromTestOrHistory(
  parameter: ParameterKey,
  reading: WaterTestInput,
  history: TestTimeline,
  readingMs: number,
): ResolvedInput | null {
  const own = reading.values[parameter];
  if (own !== undefined) return { value: own, source: 'this-test' };
  const known = history.lastKnown(parameter, readingMs, reading.id);
  return known ? { value: known.value, source: 'last-known', detail: isoDate(known.takenAt) } : null;
}

function resolveSalinity(
  reading: WaterTestInput,
  history: TestTimeline,
  readingMs: number,
  systemType: SystemType,
  profile: CareProfile,
): ResolvedInput {
  if (!isSaltwaterSystem(systemType)) return { value: 0, source: 'assumed', detail: 'fresh water' };
  const found = fromTestOrHistory('salinity', reading, history, readingMs);
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
 * Free (un-ionized) NH3 for a reading, using the tank's last known pH/temperature/salinity where the test
 * lacks them. Tests in `history` with the reading's id are never used.
 */
export function computeFreeAmmonia(
  reading: WaterTestInput,
  totalAmmonia: number,
  tests: readonly WaterTestInput[] | TestTimeline,
  systemType: SystemType,
  profile: CareProfile,
): FreeAmmoniaOutcome {
  const history = indexTests(tests);
  const readingMs = toMs(reading.takenAt);
  const tempC = fromTestOrHistory('temperature', reading, history, readingMs);
  const pH = fromTestOrHistory('pH', reading, history, readingMs);
  if (!tempC || !pH) {
    const missing = [!pH && 'pH', !tempC && 'temperature'].filter(Boolean).join(' and ');
    return { ok: false, why: `no ${missing} has been recorded for this tank` };
  }
  const salinity = resolveSalinity(reading, history, readingMs, systemType, profile);
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
