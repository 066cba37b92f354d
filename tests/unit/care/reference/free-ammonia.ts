/**
 * Test-only reference: the straightforward implementation as it was before the engine was made fast,
 * kept unchanged so the oracle tests can prove the fast one gives the same answers. Do not optimise.
 */
import { freeAmmonia } from '@shared/chemistry';
import { formatNumber, type ParameterKey } from '@shared/care/parameters';
import type { CareProfile } from '@shared/care/profiles/types';
import { lastKnownValue } from './readings';
import { isSaltwaterSystem, type SystemType } from '@shared/care/system-types';
import { isoDate } from './time';
import type { WaterTestInput } from '@shared/care/types';

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
  history: readonly WaterTestInput[],
): ResolvedInput | null {
  const own = reading.values[parameter];
  if (own !== undefined) return { value: own, source: 'this-test' };
  const known = lastKnownValue(history, parameter, reading.takenAt, reading.id);
  return known ? { value: known.value, source: 'last-known', detail: isoDate(known.takenAt) } : null;
}

function resolveSalinity(
  reading: WaterTestInput,
  history: readonly WaterTestInput[],
  systemType: SystemType,
  profile: CareProfile,
): ResolvedInput {
  if (!isSaltwaterSystem(systemType)) return { value: 0, source: 'assumed', detail: 'fresh water' };
  const found = fromTestOrHistory('salinity', reading, history);
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
  return [...groups]
    .map(([where, texts]) => {
      const list =
        texts.length > 1 ? `${texts.slice(0, -1).join(', ')} and ${texts[texts.length - 1]}` : texts.join('');
      return `${list} ${where}`;
    })
    .join('; ');
}

/** Free (un-ionized) NH3 for a reading, using the tank's last known pH/temperature/salinity where the test lacks them. */
export function computeFreeAmmonia(
  reading: WaterTestInput,
  totalAmmonia: number,
  history: readonly WaterTestInput[],
  systemType: SystemType,
  profile: CareProfile,
): FreeAmmoniaOutcome {
  const tempC = fromTestOrHistory('temperature', reading, history);
  const pH = fromTestOrHistory('pH', reading, history);
  if (!tempC || !pH) {
    const missing = [!pH && 'pH', !tempC && 'temperature'].filter(Boolean).join(' and ');
    return { ok: false, why: `no ${missing} has been recorded for this tank` };
  }
  const salinity = resolveSalinity(reading, history, systemType, profile);
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
