import { isParameterKey, PARAMETER_KEYS, type ParameterKey } from '@shared/care/parameters';
import type { CareProfile } from '@shared/care/profiles';
import type { TankPhase } from '@shared/care/types';
import { isFilled, type RememberedEntry, type WaterTestDraft } from './water-test-draft';

/** What a member tested on a tank last time, and how: kept on the device, per tank. */
export interface EntryMemory {
  parameters: ParameterKey[];
  entries: Partial<Record<ParameterKey, RememberedEntry>>;
}

const keyFor = (tankId: string) => `shoalwise.water-test.${tankId}`;

export function loadEntryMemory(tankId: string): EntryMemory {
  try {
    const raw = JSON.parse(localStorage.getItem(keyFor(tankId)) ?? 'null') as Partial<EntryMemory> | null;
    const parameters = (raw?.parameters ?? []).filter(
      (p): p is ParameterKey => typeof p === 'string' && isParameterKey(p),
    );
    return { parameters, entries: raw?.entries && typeof raw.entries === 'object' ? raw.entries : {} };
  } catch {
    return { parameters: [], entries: {} };
  }
}

/** Remembers the parameters just entered and their units, methods and SG references (never the values). */
export function saveEntryMemory(tankId: string, draft: WaterTestDraft): void {
  const parameters = PARAMETER_KEYS.filter((k) => isFilled(draft.entries[k]));
  if (parameters.length === 0) return;
  const before = loadEntryMemory(tankId);
  const entries = { ...before.entries };
  for (const k of parameters) {
    const e = draft.entries[k];
    entries[k] = {
      unit: e.unit,
      method: e.method,
      ...(k === 'salinity' ? { referenceTempC: e.referenceTempC } : {}),
    };
  }
  try {
    localStorage.setItem(keyFor(tankId), JSON.stringify({ parameters, entries } satisfies EntryMemory));
  } catch {
    // Storage full or blocked (private browsing): the form just starts from the defaults next time.
  }
}

/** The parameters shown first: those tested last time, else the ones the profile asks for in this phase. */
export function firstParameters(memory: EntryMemory, profile: CareProfile, phase: TankPhase): ParameterKey[] {
  if (memory.parameters.length) return PARAMETER_KEYS.filter((k) => memory.parameters.includes(k));
  const asked = Object.keys(profile.cadences[phase]);
  const fromProfile = PARAMETER_KEYS.filter((k) => asked.includes(k));
  return fromProfile.length ? fromProfile : ['temperature', 'pH', 'ammonia', 'nitrite', 'nitrate'];
}
