import type { ObservationInput, ObservationSigns } from '@shared/care';
import { day } from '../helpers';

let counter = 0;

/** An observation `d` days (fractional allowed) after the care helpers' T0. */
export function seen(d: number, signs: ObservationSigns, id = `o${++counter}`): ObservationInput {
  return { id, observedAt: day(d), ...signs };
}

export const SEAHORSE_TANK = { systemType: 'seahorse' as const, hasLivestock: true };
export const FISH_TANK = { systemType: 'tropical-freshwater' as const, hasLivestock: true };

/** Words a checklist or finding must never contain: illness names and medicines. */
const FORBIDDEN_WORDS = [
  'ich',
  'velvet',
  'oodinium',
  'cryptocaryon',
  'fin rot',
  'dropsy',
  'columnaris',
  'infection',
  'parasite',
  'bacterial',
  'fungus',
  'copper',
  'formalin',
  'malachite',
  'praziquantel',
  'metronidazole',
  'antibiotic',
  'methylene',
  'treat with',
  'diagnos',
];

/** Forbidden words found at the start of a word in `text` (so "which" does not count as "ich"). */
export function forbiddenWordsIn(text: string): string[] {
  return FORBIDDEN_WORDS.filter((w) => new RegExp(`\\b${w}`, 'i').test(text));
}
