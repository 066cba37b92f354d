import type { AnyParameterKey, ParameterKey } from '../parameters';
import type { Provenance } from '../provenance';
import type { SystemType } from '../system-types';
import type { TankPhase } from '../types';

export type Band = readonly [min: number, max: number];

/**
 * Inside `ideal`: fine. Outside ideal but inside `caution`: caution. Outside `caution`: danger (urgent).
 * `danger` adds explicit urgent thresholds inside the caution band when a profile needs a hard limit.
 */
export interface ParameterRange {
  ideal: Band;
  caution: Band;
  danger?: { above?: number; below?: number };
  /** Canonical unit label; must equal the one in PARAMETERS. */
  unit: string;
  /** Value to aim for when correcting (e.g. a water change). Defaults to the ideal band's max. */
  target?: number;
  provenance: Provenance;
}

/** Days between tests, per parameter. Parameters absent from the map have no schedule. */
export type Cadence = Partial<Record<ParameterKey, number>>;

export interface CareProfile {
  key: string;
  name: string;
  version: number;
  systemTypes: readonly SystemType[];
  /** Plural noun used in reasons: "seahorses need 0". */
  animals: string;
  ranges: Partial<Record<AnyParameterKey, ParameterRange>>;
  cadences: Record<TankPhase, Cadence> & { provenance: Provenance };
  /** Extra words shown on the stocking checklist. */
  readinessNotes?: { food?: string; quarantine?: string; equipment?: string };
}
