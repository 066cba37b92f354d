import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import {
  ATOMIC_WEIGHTS,
  convert,
  MEQ_PER_L_PER_DKH,
  MG_PER_L_CACO3_PER_DKH,
  MOLAR_MASSES,
  UNIT_FAMILIES,
  UNITS,
  unitFamily,
  type Unit,
} from '@shared/chemistry';
import { expectAbsolute, expectRelative } from './expect-close';

// Atomic weights: IUPAC/CIAAW abridged standard atomic weights, Prohaska et al. 2022, "Standard
// atomic weights of the elements 2021 (IUPAC Technical Report)", Pure Appl. Chem. 94:573 — from memory:
// H 1.008, C 12.011, N 14.007, O 15.999, Na 22.990, Mg 24.305, S 32.06, Cl 35.45, Ca 40.078.

describe('atomic weights and molar masses', () => {
  it('holds the IUPAC 2021 abridged values', () => {
    // Source: Prohaska et al. 2022, Pure Appl. Chem. 94:573, abridged table (from memory).
    expect(ATOMIC_WEIGHTS).toEqual({
      H: 1.008,
      C: 12.011,
      N: 14.007,
      O: 15.999,
      Na: 22.99,
      Mg: 24.305,
      S: 32.06,
      Cl: 35.45,
      Ca: 40.078,
    });
  });

  it('builds molar masses by adding atomic weights', () => {
    // Hand sums from the IUPAC 2021 abridged weights above.
    expectRelative(MOLAR_MASSES.NO3, 14.007 + 3 * 15.999, 1e-12); // 62.004
    expectRelative(MOLAR_MASSES.CaCO3, 40.078 + 12.011 + 3 * 15.999, 1e-12); // 100.086
    expectRelative(MOLAR_MASSES['MgSO4·7H2O'], 24.305 + 32.06 + 4 * 15.999 + 7 * (2 * 1.008 + 15.999), 1e-12); // 246.466
  });
});

describe('convert — nitrogen species (stoichiometry from IUPAC 2021 atomic weights)', () => {
  it('nitrate ↔ nitrate-N', () => {
    // 10 mg/L NO3 × M(N)/M(NO3) = 10 × 14.007/62.004 = 2.25905 mg/L NO3-N.
    expectRelative(convert(10, 'mg/L NO3', 'mg/L NO3-N'), 2.25905, 1e-4);
    // 1 mg/L NO3-N = 62.004/14.007 = 4.42664 mg/L NO3 (the familiar "× 4.43", common practice).
    expectRelative(convert(1, 'mg/L NO3-N', 'mg/L NO3'), 4.42664, 1e-4);
  });

  it('nitrite ↔ nitrite-N', () => {
    // M(NO2) = 14.007 + 2 × 15.999 = 46.005; 1 mg/L NO2-N = 46.005/14.007 = 3.28443 mg/L NO2.
    expectRelative(convert(1, 'mg/L NO2-N', 'mg/L NO2'), 3.28443, 1e-4);
  });

  it('total ammonia in its four reporting forms', () => {
    // M(NH3) = 14.007 + 3 × 1.008 = 17.031, M(NH4) = 14.007 + 4 × 1.008 = 18.039.
    expectRelative(convert(1, 'mg/L NH3-N', 'mg/L NH3'), 17.031 / 14.007, 1e-4); // 1.21589
    expectRelative(convert(1, 'mg/L NH3-N', 'mg/L NH4'), 1.28786, 1e-4); // 18.039/14.007
    expectRelative(convert(1, 'mg/L NH3', 'mg/L NH4'), 1.05919, 1e-4); // 18.039/17.031, same moles of N
    expect(convert(2.5, 'mg/L NH4-N', 'mg/L NH3-N')).toBe(2.5); // both are mg/L of nitrogen
  });

  it('refuses to turn one substance into another', () => {
    expect(() => convert(1, 'mg/L NO3', 'mg/L NO2')).toThrow(RangeError);
    expect(() => convert(1, 'mg/L NO3-N', 'mg/L NH3-N')).toThrow(/nitrate.*total-ammonia/);
    expect(() => convert(1, 'mg/L NO2', 'mg/L NH4')).toThrow(RangeError);
  });
});

describe('convert — alkalinity', () => {
  it('uses 1 dKH = 10 mg/L CaO = 0.357 meq/L = 17.848 mg/L CaCO3', () => {
    // German degree: 10 mg/L CaO (DIN 38409 definition, from memory). CaO = 40.078 + 15.999 = 56.077;
    // 2 × 10/56.077 = 0.356652 meq/L; × M(CaCO3)/2 = 0.356652 × 50.043 = 17.8480 mg/L CaCO3.
    expectRelative(MEQ_PER_L_PER_DKH, 0.356652, 1e-5);
    expectRelative(convert(1, 'dKH', 'meq/L'), 0.356652, 1e-4);
    expectRelative(convert(1, 'dKH', 'mg/L CaCO3'), 17.848, 1e-4);
    expectRelative(MG_PER_L_CACO3_PER_DKH, 17.848, 1e-4);
    // 1 meq/L = half a millimole of CaCO3 = 100.086/2 = 50.043 mg/L CaCO3.
    expectRelative(convert(1, 'meq/L', 'mg/L CaCO3'), 50.043, 1e-4);
    // Common practice, no source: "2.8 dKH per meq/L". 1/0.356652 = 2.80387.
    expectRelative(convert(1, 'meq/L', 'dKH'), 2.8, 0.002);
  });
});

describe('convert — temperature and volume', () => {
  it('temperature', () => {
    // SI definitions (BIPM SI Brochure, 9th ed. 2019): T/K = t/°C + 273.15; t/°F = 9/5 t/°C + 32.
    expectAbsolute(convert(25, '°C', 'K'), 298.15, 1e-12);
    expectAbsolute(convert(77, '°F', '°C'), 25, 1e-12);
    expectAbsolute(convert(-40, '°C', '°F'), -40, 1e-12);
    expectAbsolute(convert(0, 'K', '°F'), -459.67, 1e-9);
    expect(() => convert(-300, '°C', 'K')).toThrow(/absolute zero/);
  });

  it('volume', () => {
    // US gallon = 231 in³ = 3.785411784 L exactly; imperial gallon = 4.54609 L exactly (definitions).
    expectRelative(convert(1, 'US gal', 'L'), 3.785411784, 1e-12);
    expectRelative(convert(1, 'UK gal', 'L'), 4.54609, 1e-12);
    expectRelative(convert(10, 'US gal', 'UK gal'), 37.85411784 / 4.54609, 1e-12); // 8.32674
  });

  it('refuses pairs from different families', () => {
    expect(() => convert(1, '°C', 'L')).toThrow(/cannot convert '°C' \(temperature\) to 'L' \(volume\)/);
    expect(() => convert(1, 'dKH', 'mg/L NO3')).toThrow(RangeError);
    expect(() => convert(1, 'L', 'K')).toThrow(RangeError);
  });
});

describe('unit lists', () => {
  it('exports every unit once and files each under exactly one family', () => {
    expect(new Set(UNITS).size).toBe(UNITS.length);
    expect(UNITS).toHaveLength(17);
    const filed = Object.values(UNIT_FAMILIES).flat();
    expect([...filed].sort()).toEqual([...UNITS].sort());
    for (const [family, units] of Object.entries(UNIT_FAMILIES)) {
      for (const unit of units) expect(unitFamily(unit)).toBe(family);
    }
  });
});

describe('convert — round trips (property)', () => {
  const samePairs: Array<[Unit, Unit]> = Object.values(UNIT_FAMILIES).flatMap((units) =>
    units.flatMap((a) => units.map((b) => [a, b] as [Unit, Unit])),
  );

  it('converting there and back returns the value', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...samePairs),
        fc.double({ min: 0, max: 1000, noNaN: true }),
        ([from, to], value) => {
          const back = convert(convert(value, from, to), to, from);
          expect(Math.abs(back - value)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(value)));
        },
      ),
      { seed: 42, numRuns: 200 },
    );
  });
});
