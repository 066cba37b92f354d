/**
 * Where a number comes from. `fromMemory` marks a published figure that was recalled,
 * not re-read in the source for this code: treat it as needing a check against the original.
 */
export type Provenance =
  | { kind: 'published'; citation: string; short?: string; fromMemory?: boolean; note?: string }
  | { kind: 'common-practice'; note?: string };

export const COMMON_PRACTICE: Provenance = { kind: 'common-practice' };

export function commonPractice(note: string): Provenance {
  return { kind: 'common-practice', note };
}

/** Short label for the UI: "US EPA 1976 …" or "common practice, no source". */
export function provenanceLabel(p: Provenance): string {
  if (p.kind === 'common-practice') return 'common practice, no source';
  return p.fromMemory ? `${p.citation} (figure from memory)` : p.citation;
}

export const SOURCES = {
  /**
   * 0.02 mg/L un-ionized ammonia (NH3) as the criterion for freshwater aquatic life.
   * The figure is recalled; the later EPA criteria documents (1986 Gold Book, 1999 update)
   * that refer back to it exist in the reference material consulted.
   */
  epa1976RedBook: {
    kind: 'published',
    short: 'US EPA 1976',
    citation:
      'US EPA (1976), Quality Criteria for Water (the "Red Book"), Washington DC: 0.02 mg/L un-ionized ammonia (NH3) for freshwater aquatic life',
    fromMemory: true,
    note: 'Freshwater guidance; applied to marine and brackish tanks as a conservative limit.',
  },
  /** Title and number checked; the tentative 0.025 mg/L NH3 limit inside it is recalled. */
  eifac1970: {
    kind: 'published',
    short: 'EIFAC 1970',
    citation:
      'EIFAC (1970), Water quality criteria for European freshwater fish: report on ammonia and inland fisheries, EIFAC Technical Paper 11, FAO Rome: about 0.025 mg/L NH3',
    fromMemory: true,
  },
  /** Natural seawater near salinity 35 holds ~412 mg/kg calcium and ~1284 mg/kg magnesium (recalled). */
  millero2008: {
    kind: 'published',
    short: 'Millero et al. 2008',
    citation:
      'Millero, Feistel, Wright & McDougall (2008), The composition of Standard Seawater and the definition of the Reference-Composition Salinity Scale, Deep-Sea Research I 55: 50–72',
    fromMemory: true,
  },
  /**
   * Seahorses have no true stomach and pass food quickly, so in aquariums they are fed several times a
   * day and weaken fast when they stop eating. Recalled, not re-read for this code.
   */
  koldewey2005: {
    kind: 'published',
    short: 'Koldewey 2005',
    citation:
      'Koldewey, H. (2005), Syngnathid Husbandry in Public Aquariums: 2005 Manual, Project Seahorse and Zoological Society of London',
    fromMemory: true,
  },
  /**
   * Fish breathing hard or gasping at the surface is a sign of too little oxygen reaching the gills, most
   * often from the water (low oxygen, ammonia, nitrite); and when several fish show signs together the
   * environment is looked at first. Recalled, not re-read for this code.
   */
  noga2010: {
    kind: 'published',
    short: 'Noga 2010',
    citation: 'Noga, E. J. (2010), Fish Disease: Diagnosis and Treatment, 2nd edition, Wiley-Blackwell',
    fromMemory: true,
  },
} as const satisfies Record<string, Provenance>;
