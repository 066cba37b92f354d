import { describe, expect, it } from 'vitest';
import {
  BUILT_IN_PROFILES,
  MARINE_FISH_ONLY_PROFILE,
  PARAMETERS,
  REEF_PROFILE,
  SEAHORSE_DWARF_PROFILE,
  SEAHORSE_LARGE_PROFILE,
  SYSTEM_TYPES,
  careProfileSchema,
  defaultProfileFor,
  parameterInfo,
  type CareProfile,
} from '@shared/care';

describe('canonical parameters', () => {
  it('stores each reading in one canonical unit', () => {
    const units = Object.fromEntries(PARAMETERS.map((p) => [p.key, p.unit]));
    expect(units).toEqual({
      temperature: '°C',
      salinity: 'PSU',
      pH: 'pH',
      ammonia: 'mg/L NH3',
      nitrite: 'mg/L NO2',
      nitrate: 'mg/L NO3',
      alkalinity: 'dKH',
      calcium: 'mg/L Ca',
      magnesium: 'mg/L Mg',
      phosphate: 'mg/L PO4',
    });
    expect(parameterInfo('freeAmmonia').unit).toBe('mg/L NH3');
  });
});

describe('built-in profiles', () => {
  it.each(BUILT_IN_PROFILES.map((p) => [p.key, p] as const))(
    '%s passes the profile schema',
    (_key, profile) => {
      expect(careProfileSchema.safeParse(profile).success).toBe(true);
    },
  );

  it('has unique keys and a default for every system type', () => {
    expect(new Set(BUILT_IN_PROFILES.map((p) => p.key)).size).toBe(BUILT_IN_PROFILES.length);
    for (const type of SYSTEM_TYPES) expect(defaultProfileFor(type).systemTypes).toContain(type);
    expect(defaultProfileFor('seahorse')).toBe(SEAHORSE_LARGE_PROFILE);
  });

  it('every range carries a provenance and the canonical unit', () => {
    for (const profile of BUILT_IN_PROFILES) {
      for (const [key, range] of Object.entries(profile.ranges)) {
        expect(range?.provenance.kind, `${profile.key}.${key}`).toMatch(/^(published|common-practice)$/);
        if (range?.provenance.kind === 'published')
          expect(range.provenance.citation.length).toBeGreaterThan(10);
      }
    }
  });

  // Common practice, no source: an established tank reads zero ammonia and nitrite.
  it('ammonia and nitrite are ideal only at 0 on every profile', () => {
    for (const p of BUILT_IN_PROFILES) {
      expect(p.ranges.ammonia?.ideal, p.key).toEqual([0, 0]);
      expect(p.ranges.nitrite?.ideal, p.key).toEqual([0, 0]);
    }
  });

  // Common practice, no source: seahorses are kept with much less nitrate than fish-only tanks.
  it('keeps seahorse nitrate far below fish-only marine', () => {
    for (const p of [SEAHORSE_LARGE_PROFILE, SEAHORSE_DWARF_PROFILE]) {
      expect(p.ranges.nitrate?.ideal[1]).toBeLessThanOrEqual(10);
    }
    expect(MARINE_FISH_ONLY_PROFILE.ranges.nitrate?.ideal[1]).toBe(40);
  });

  // Common practice, no source: dwarf seahorses are kept warmer than the larger species.
  it('keeps dwarf seahorses warmer than the larger species', () => {
    const dwarf = SEAHORSE_DWARF_PROFILE.ranges.temperature?.ideal;
    const large = SEAHORSE_LARGE_PROFILE.ranges.temperature?.ideal;
    expect(large).toEqual([22, 25]);
    expect(dwarf?.[1]).toBeGreaterThan(large?.[1] ?? Infinity);
  });

  // US EPA 1976, Quality Criteria for Water: 0.02 mg/L un-ionized NH3 (figure from memory).
  it('uses the published 0.02 mg/L free-ammonia guidance on every profile', () => {
    for (const p of BUILT_IN_PROFILES) {
      expect(p.ranges.freeAmmonia?.caution[1]).toBe(0.02);
      expect(p.ranges.freeAmmonia?.provenance).toMatchObject({ kind: 'published', fromMemory: true });
    }
  });

  // Cadences, common practice, no source.
  it('tests ammonia and nitrite daily while cycling', () => {
    for (const p of BUILT_IN_PROFILES) expect(p.cadences.cycling).toMatchObject({ ammonia: 1, nitrite: 1 });
  });

  it('tests nitrate, temperature and salinity at least weekly on established marine tanks', () => {
    for (const p of [
      MARINE_FISH_ONLY_PROFILE,
      REEF_PROFILE,
      SEAHORSE_LARGE_PROFILE,
      SEAHORSE_DWARF_PROFILE,
    ]) {
      for (const key of ['nitrate', 'temperature', 'salinity'] as const) {
        expect(p.cadences.established[key], `${p.key}.${key}`).toBeLessThanOrEqual(7);
      }
    }
  });

  it('tests alkalinity, calcium and magnesium monthly on reef and seahorse tanks', () => {
    for (const p of [REEF_PROFILE, SEAHORSE_LARGE_PROFILE]) {
      expect(p.cadences.established).toMatchObject({ alkalinity: 30, calcium: 30, magnesium: 30 });
    }
  });
});

describe('careProfileSchema rejects bad club copies', () => {
  const base: CareProfile = REEF_PROFILE;
  const withRanges = (ranges: CareProfile['ranges']) => ({ ...base, ranges: { ...base.ranges, ...ranges } });

  it('rejects a non-canonical unit', () => {
    const bad = withRanges({ temperature: { ...base.ranges.temperature!, unit: '°F' } });
    expect(careProfileSchema.safeParse(bad).success).toBe(false);
  });

  it('rejects an ideal band outside the caution band', () => {
    const bad = withRanges({ nitrate: { ...base.ranges.nitrate!, ideal: [0, 30], target: 5 } });
    expect(careProfileSchema.safeParse(bad).success).toBe(false);
  });

  it('rejects an unknown system type and a missing provenance', () => {
    expect(careProfileSchema.safeParse({ ...base, systemTypes: ['pond'] }).success).toBe(false);
    const { provenance: _p, ...noProvenance } = base.ranges.pH!;
    expect(careProfileSchema.safeParse(withRanges({ pH: noProvenance as never })).success).toBe(false);
  });

  it('accepts an edited copy with its own cadence', () => {
    const copy = {
      ...base,
      key: 'club-reef',
      version: 2,
      cadences: { ...base.cadences, established: { nitrate: 3 } },
    };
    expect(careProfileSchema.parse(copy).cadences.established).toEqual({ nitrate: 3 });
  });
});
