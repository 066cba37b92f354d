import {
  computeFreeAmmonia,
  type FreeAmmoniaInput,
  type LastKnown,
  type ResolvedInput,
} from '../care/evaluation/free-ammonia';
import type { ParameterKey } from '../care/parameters';
import { builtInProfile, defaultProfileFor, type CareProfile } from '../care/profiles';
import type { KnownValue } from '../care/readings';
import type { SystemType } from '../care/system-types';

export {
  FREE_AMMONIA_INPUTS,
  lastKnownInputs,
  type FreeAmmoniaInput,
  type LastKnown,
} from '../care/evaluation/free-ammonia';

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
  if (input.source === 'last-known' && known)
    return { value: input.value, source: 'last-known', testId: known.testId, takenAt: known.takenAt };
  return {
    value: input.value,
    source: input.source,
    ...(input.detail && input.source === 'assumed' ? { detail: input.detail } : {}),
  };
}

/**
 * Free (un-ionized) NH3 from a test's total ammonia, as stored with the test: `computeFreeAmmonia`, the same the care
 * evaluation uses, with a record of where each input came from. `lastKnown` is `lastKnownInputs` at the test's
 * position. Undefined when the test has no ammonia reading.
 */
export function deriveFreeAmmonia(
  reading: { id: string; takenAt: string; values: Partial<Record<ParameterKey, number>> },
  lastKnown: LastKnown,
  tank: TankChemistryContext,
): FreeAmmoniaDerivation | undefined {
  const total = reading.values.ammonia;
  if (total === undefined) return undefined;
  // A test never stands in for its own missing readings (an edit can drop one).
  const earlier: LastKnown = Object.fromEntries(
    Object.entries(lastKnown).filter(([, k]) => k.testId !== reading.id),
  );
  const profile =
    tank.profile ??
    ((tank.careProfileKey && builtInProfile(tank.careProfileKey)) || defaultProfileFor(tank.systemType));
  const outcome = computeFreeAmmonia(
    { id: reading.id, takenAt: reading.takenAt, values: reading.values },
    total,
    earlier,
    tank.systemType,
    profile,
  );
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
