import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import {
  doseFor,
  maxSafeDailyRise,
  planDoses,
  riseUnitFor,
  SUPPLEMENTS,
  type Supplement,
} from '@shared/chemistry';
import { expectRelative } from './expect-close';

// Worked stoichiometry, by hand, from IUPAC 2021 abridged atomic weights (Prohaska et al. 2022,
// Pure Appl. Chem. 94:573 — from memory): H 1.008, C 12.011, O 15.999, Na 22.990, Mg 24.305, S 32.06,
// Cl 35.45, Ca 40.078. Water of hydration: H2O = 2 × 1.008 + 15.999 = 18.015 g/mol.
// 1 dKH = 10 mg/L CaO equivalent = 2 × 10 / 56.077 = 0.356652 meq/L.

describe('doseFor — alkalinity', () => {
  it('sodium bicarbonate: 100 L, +1 dKH', () => {
    // 0.356652 meq/L × 100 L = 35.6652 meq = 0.0356652 eq; HCO3− + H+ → CO2 + H2O, 1 eq per mole;
    // M(NaHCO3) = 22.990 + 1.008 + 12.011 + 3 × 15.999 = 84.006 g/mol → 0.0356652 × 84.006 = 2.99609 g.
    expectRelative(doseFor({ supplement: 'sodium-bicarbonate', volumeL: 100, rise: 1 }), 2.99609, 1e-5);
  });

  it('sodium carbonate: 100 L, +1 dKH', () => {
    // CO3²− takes two protons → 2 eq per mole: 0.0356652 / 2 = 0.0178326 mol;
    // M(Na2CO3) = 2 × 22.990 + 12.011 + 3 × 15.999 = 105.988 g/mol → 0.0178326 × 105.988 = 1.89004 g.
    expectRelative(doseFor({ supplement: 'sodium-carbonate', volumeL: 100, rise: 1 }), 1.89004, 1e-5);
  });

  it('scales linearly with volume and rise', () => {
    // 250 L × 2 dKH = 5 × (100 L × 1 dKH) → 5 × 2.99609 = 14.98047 g.
    expectRelative(doseFor({ supplement: 'sodium-bicarbonate', volumeL: 250, rise: 2 }), 14.98047, 1e-5);
  });
});

describe('doseFor — calcium and magnesium', () => {
  it('calcium chloride dihydrate: 100 L, +10 mg/L Ca', () => {
    // 10 mg/L × 100 L = 1000 mg = 1.000 g Ca = 1 / 40.078 = 0.0249513 mol;
    // M(CaCl2·2H2O) = 40.078 + 2 × 35.45 + 2 × 18.015 = 147.008 g/mol → 0.0249513 × 147.008 = 3.66805 g.
    expectRelative(
      doseFor({ supplement: 'calcium-chloride-dihydrate', volumeL: 100, rise: 10 }),
      3.66805,
      1e-5,
    );
  });

  it('magnesium chloride hexahydrate: 100 L, +100 mg/L Mg', () => {
    // 100 mg/L × 100 L = 10 g Mg = 10 / 24.305 = 0.411438 mol;
    // M(MgCl2·6H2O) = 24.305 + 70.90 + 6 × 18.015 = 203.295 g/mol → 0.411438 × 203.295 = 83.6433 g.
    expectRelative(
      doseFor({ supplement: 'magnesium-chloride-hexahydrate', volumeL: 100, rise: 100 }),
      83.6433,
      1e-5,
    );
  });

  it('magnesium sulfate heptahydrate: 100 L, +100 mg/L Mg', () => {
    // Same 0.411438 mol Mg; M(MgSO4·7H2O) = 24.305 + 32.06 + 4 × 15.999 + 7 × 18.015 = 246.466 g/mol
    // → 0.411438 × 246.466 = 101.405 g.
    expectRelative(
      doseFor({ supplement: 'magnesium-sulfate-heptahydrate', volumeL: 100, rise: 100 }),
      101.405,
      1e-5,
    );
  });
});

describe('maxSafeDailyRise', () => {
  it('returns the common-practice limits', () => {
    // Common practice, no source: ~1 dKH, ~20 mg/L Ca and ~100 mg/L Mg per day.
    expect(maxSafeDailyRise('alkalinity')).toBe(1);
    expect(maxSafeDailyRise('sodium-carbonate')).toBe(1);
    expect(maxSafeDailyRise('calcium')).toBe(20);
    expect(maxSafeDailyRise('calcium-chloride-dihydrate')).toBe(20);
    expect(maxSafeDailyRise('magnesium-sulfate-heptahydrate')).toBe(100);
    expect(riseUnitFor('magnesium-chloride-hexahydrate')).toBe('mg/L Mg');
    expect(riseUnitFor('sodium-bicarbonate')).toBe('dKH');
  });
});

describe('planDoses', () => {
  it('splits +2.5 dKH into three equal days', () => {
    // 2.5 dKH / 1 dKH per day → 3 days of 0.8333 dKH; each 0.8333 × 2.99609 g (100 L) = 2.49674 g.
    const plan = planDoses({ supplement: 'sodium-bicarbonate', volumeL: 100, rise: 2.5 });
    expect(plan.map((d) => d.day)).toEqual([1, 2, 3]);
    for (const day of plan) {
      expectRelative(day.rise, 2.5 / 3, 1e-12);
      expectRelative(day.grams, 2.49674, 1e-5);
    }
  });

  it('uses one day when the rise fits, none when there is nothing to do', () => {
    expect(planDoses({ supplement: 'calcium-chloride-dihydrate', volumeL: 100, rise: 20 })).toHaveLength(1);
    expect(planDoses({ supplement: 'calcium-chloride-dihydrate', volumeL: 100, rise: 0 })).toEqual([]);
    expect(
      planDoses({ supplement: 'sodium-bicarbonate', volumeL: 100, rise: 3, maxDailyRise: 0.5 }),
    ).toHaveLength(6);
  });

  it('stays within the daily limit and delivers the whole rise (property)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<Supplement>(...SUPPLEMENTS),
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.double({ min: 0.0001, max: 50, noNaN: true }),
        (supplement, volumeL, multiple) => {
          const limit = maxSafeDailyRise(supplement);
          const rise = multiple * limit;
          const plan = planDoses({ supplement, volumeL, rise });
          // Fewest days: one day fewer would need more than the limit per day.
          expect(plan.length).toBeGreaterThanOrEqual(1);
          if (plan.length > 1) expect(rise / (plan.length - 1)).toBeGreaterThan(limit);
          let total = 0;
          let grams = 0;
          for (const day of plan) {
            expect(day.rise).toBeLessThanOrEqual(limit);
            total += day.rise;
            grams += day.grams;
          }
          expectRelative(total, rise, 1e-9);
          expectRelative(grams, doseFor({ supplement, volumeL, rise }), 1e-9);
        },
      ),
      { seed: 42, numRuns: 200 },
    );
  });
});
