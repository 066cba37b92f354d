import { computeFreeAmmonia, type ResolvedInput } from '../care/evaluation/free-ammonia';
import type { ParameterKey } from '../care/parameters';
import { builtInProfile, defaultProfileFor, type CareProfile } from '../care/profiles';
import type { KnownValue } from '../care/readings';
import type { SystemType } from '../care/system-types';
import type { WaterTestInput } from '../care/types';

/** The parameters free ammonia depends on, whose last known values may stand in for missing ones. */
export const FREE_AMMONIA_INPUTS = ['temperature', 'pH', 'salinity'] as const;
export type FreeAmmoniaInput = (typeof FREE_AMMONIA_INPUTS)[number];
export type LastKnown = Partial<Record<FreeAmmoniaInput, KnownValue>>;

export interface DerivedInput {
  value: number;
  source: 'this-test' | 'last-known' | 'assumed';
  /** The earlier test a last-known value came from. */
  testId?: string;
  takenAt?: string;
  /** Why a value was assumed ("fresh water"). */
  detail?: string;
}

export type FreeAmmoniaDerivation =
  | { value: number; unit: 'mg/L NH3'; inputs: Record<FreeAmmoniaInput, DerivedInput>; basisText: string }
  | { value: null; reason: string };

export interface TankChemistryContext {
  systemType: SystemType;
  /** The tank's care profile (a club's own copy included); else the built-in one named by careProfileKey; else the default. */
  profile?: CareProfile;
  careProfileKey?: string;
}

function traced(input: ResolvedInput, known: KnownValue | undefined): DerivedInput {
  if (input.source === 'last-known' && known) return { value: input.value, source: 'last-known', testId: known.testId, takenAt: known.takenAt };
  return { value: input.value, source: input.source, ...(input.detail && input.source === 'assumed' ? { detail: input.detail } : {}) };
}

/**
 * Free (un-ionized) NH3 from a test's total ammonia, with the same rules the care evaluation uses: the test's own
 * temperature, pH and salinity, else the tank's last known ones, else an assumption — and it records which.
 * Undefined when the test has no ammonia reading.
 */
export function deriveFreeAmmonia(
  reading: { id: string; takenAt: string; values: Partial<Record<ParameterKey, number>> },
  lastKnown: LastKnown,
  tank: TankChemistryContext,
): FreeAmmoniaDerivation | undefined {
  const total = reading.values.ammonia;
  if (total === undefined) return undefined;
  const history: WaterTestInput[] = FREE_AMMONIA_INPUTS.flatMap((p) => {
    const known = lastKnown[p];
    return known && known.testId !== reading.id ? [{ id: known.testId, takenAt: known.takenAt, values: { [p]: known.value } }] : [];
  });
  const profile = tank.profile ?? ((tank.careProfileKey && builtInProfile(tank.careProfileKey)) || defaultProfileFor(tank.systemType));
  const outcome = computeFreeAmmonia({ id: reading.id, takenAt: reading.takenAt, values: reading.values }, total, history, tank.systemType, profile);
  if (!outcome.ok) return { value: null, reason: outcome.why };
  const r = outcome.result;
  return {
    value: r.nh3,
    unit: 'mg/L NH3',
    inputs: {
      temperature: traced(r.tempC, lastKnown.temperature),
      pH: traced(r.pH, lastKnown.pH),
      salinity: traced(r.salinity, lastKnown.salinity),
    },
    basisText: r.basisText,
  };
}
