import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import {
  concentrationAfterChange,
  concentrationAfterChanges,
  DEFAULT_MIX_GRAMS_PER_LITRE_PER_PSU,
  fractionToReach,
  planWaterChanges,
  saltForNewWater,
  seawaterDensity,
  t90FromT68,
} from '@shared/chemistry';
import { expectAbsolute, expectRelative } from './expect-close';

// All worked examples are mass balances computed by hand (no external source): a change removes a
// fraction of the tank water with its dissolved load and adds the same volume of new water.

describe('concentrationAfterChange', () => {
  it('25 % change with nitrate-free water', () => {
    // 100 L at 40 mg/L holds 4000 mg; removing 25 L removes 1000 mg → 3000 mg; adding 25 L at 0 mg/L
    // leaves 3000 mg in 100 L = 30 mg/L.
    expect(concentrationAfterChange({ current: 40, source: 0, fraction: 0.25 })).toBeCloseTo(30, 12);
  });

  it('25 % change with tap water at 10 mg/L', () => {
    // 3000 mg stay; 25 L × 10 mg/L = 250 mg added → 3250 mg / 100 L = 32.5 mg/L.
    expect(concentrationAfterChange({ current: 40, source: 10, fraction: 0.25 })).toBeCloseTo(32.5, 12);
  });

  it('raises a value when the new water is richer (e.g. topping salinity up)', () => {
    // 10 % of a tank at salinity 30 replaced with 35: 0.9 × 30 + 0.1 × 35 = 27 + 3.5 = 30.5.
    expect(concentrationAfterChange({ current: 30, source: 35, fraction: 0.1 })).toBeCloseTo(30.5, 12);
  });
});

describe('concentrationAfterChanges', () => {
  it('three 20 % changes', () => {
    // c_n = s + (c − s)(1 − f)^n = 5 + 45 × 0.8³ = 5 + 45 × 0.512 = 5 + 23.04 = 28.04.
    expect(concentrationAfterChanges({ current: 50, source: 5, fraction: 0.2, count: 3 })).toBeCloseTo(
      28.04,
      12,
    );
  });

  it('equals repeated single changes', () => {
    let c = 50;
    for (let i = 0; i < 7; i++) c = concentrationAfterChange({ current: c, source: 5, fraction: 0.15 });
    expect(concentrationAfterChanges({ current: 50, source: 5, fraction: 0.15, count: 7 })).toBeCloseTo(
      c,
      10,
    );
  });

  it('never undershoots (or overshoots) the source concentration (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1000, noNaN: true }),
        fc.double({ min: 0, max: 1000, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer({ min: 0, max: 500 }),
        (current, source, fraction, count) => {
          const after = concentrationAfterChanges({ current, source, fraction, count });
          const single = concentrationAfterChange({ current, source, fraction });
          if (current >= source) {
            expect(after).toBeGreaterThanOrEqual(source);
            expect(single).toBeGreaterThanOrEqual(source);
          } else {
            expect(after).toBeLessThanOrEqual(source);
            expect(single).toBeLessThanOrEqual(source);
          }
        },
      ),
      { seed: 42, numRuns: 200 },
    );
  });
});

describe('fractionToReach', () => {
  it('solves the single-change mass balance', () => {
    // f = (c − t)/(c − s): (40 − 20)/(40 − 0) = 0.5; with tap water at 10: 20/30 = 0.6667.
    expect(fractionToReach({ current: 40, target: 20, source: 0 })).toBeCloseTo(0.5, 12);
    expect(fractionToReach({ current: 40, target: 20, source: 10 })).toBeCloseTo(2 / 3, 12);
  });

  it('returns 0 when already at or below target and null when unreachable', () => {
    expect(fractionToReach({ current: 15, target: 20, source: 0 })).toBe(0);
    expect(fractionToReach({ current: 20, target: 20, source: 0 })).toBe(0);
    expect(fractionToReach({ current: 40, target: 20, source: 20 })).toBeNull();
    expect(fractionToReach({ current: 40, target: 20, source: 25 })).toBeNull();
  });
});

describe('planWaterChanges', () => {
  it('plans the fewest equal changes: 40 → 10 mg/L with 0 mg/L water, ≤ 25 % each', () => {
    // With 25 % changes 40 × 0.75^n ≤ 10 needs 0.75^n ≤ 0.25, n ≥ ln 0.25 / ln 0.75 = 4.82 → 5 changes.
    // Equal size: (1 − f)^5 = 0.25 → f = 1 − 0.25^(1/5) = 1 − 0.757858 = 0.242142, i.e. 48.43 L of 200 L.
    const plan = planWaterChanges({
      current: 40,
      target: 10,
      source: 0,
      volumeL: 200,
      maxFractionPerChange: 0.25,
    });
    expect(plan).toHaveLength(5);
    for (const change of plan) {
      expectAbsolute(change.fraction, 0.242142, 1e-6);
      expectAbsolute(change.litres, 48.4283, 1e-4);
    }
    // After the first: 40 × 0.757858 = 30.3143.
    expectAbsolute(plan[0]?.resulting ?? NaN, 30.3143, 1e-4);
    expect(plan[4]?.resulting).toBeLessThanOrEqual(10);
    expectAbsolute(plan[4]?.resulting ?? NaN, 10, 1e-9);
  });

  it('uses one change when one is enough', () => {
    // f = (40 − 30)/(40 − 0) = 0.25 ≤ 0.5 → a single 25 % change of 80 L in a 320 L tank.
    const plan = planWaterChanges({
      current: 40,
      target: 30,
      source: 0,
      volumeL: 320,
      maxFractionPerChange: 0.5,
    });
    expect(plan).toHaveLength(1);
    expectAbsolute(plan[0]?.litres ?? NaN, 80, 1e-9);
  });

  it('returns [] when already at target and throws when unreachable', () => {
    expect(
      planWaterChanges({ current: 8, target: 10, source: 0, volumeL: 100, maxFractionPerChange: 0.2 }),
    ).toEqual([]);
    expect(() =>
      planWaterChanges({ current: 40, target: 10, source: 10, volumeL: 100, maxFractionPerChange: 0.2 }),
    ).toThrow(/unreachable/);
    expect(() =>
      planWaterChanges({ current: 1000, target: 1e-9, source: 0, volumeL: 100, maxFractionPerChange: 0.001 }),
    ).toThrow(/more than 1000 changes/);
  });

  it('never exceeds the per-change limit, ends at or below target, and uses the fewest changes (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        fc.double({ min: 0.001, max: 1, noNaN: true }),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        fc.double({ min: 1, max: 2000, noNaN: true }),
        (source, targetAbove, currentAbove, maxFractionPerChange, volumeL) => {
          const target = source + targetAbove * 50;
          const current = target + currentAbove * 200;
          const plan = planWaterChanges({ current, target, source, volumeL, maxFractionPerChange });
          expect(plan.length).toBeGreaterThan(0);
          for (const change of plan) {
            expect(change.fraction).toBeLessThanOrEqual(maxFractionPerChange);
            expect(change.litres).toBeLessThanOrEqual(maxFractionPerChange * volumeL * (1 + 1e-12));
          }
          expect(plan[plan.length - 1]?.resulting).toBeLessThanOrEqual(target);
          // One change fewer at the maximum size would not have been enough.
          const fewer = concentrationAfterChanges({
            current,
            source,
            fraction: maxFractionPerChange,
            count: plan.length - 1,
          });
          expect(fewer).toBeGreaterThan(target * (1 - 1e-9));
        },
      ),
      { seed: 42, numRuns: 200 },
    );
  });
});

describe('saltForNewWater', () => {
  it('uses the common-practice default of 36.5 g/L for salinity 35', () => {
    // Common practice, no source: 35–38 g of mix per litre for salinity 35; our default is 36.5.
    // 20 L × 35 × (36.5/35) g/L = 730 g.
    expectAbsolute(saltForNewWater({ volumeL: 20, targetSalinity: 35 }), 730, 1e-9);
    // A mix declared at 1.0 g/L per unit salinity: 20 × 35 × 1.0 = 700 g.
    expectAbsolute(
      saltForNewWater({ volumeL: 20, targetSalinity: 35, mixGramsPerLitrePerPsu: 1 }),
      700,
      1e-9,
    );
  });

  it('keeps the default within a physical bound', () => {
    // Reference-Composition seawater at SP = 35 holds SR = 35.16504 g of salts per kg (Millero, Feistel,
    // Wright & McDougall 2008, Deep-Sea Res. I 55:50). At 1.0233431 kg/L (EOS-80 check value at t68 = 25)
    // that is 35.16504 × 1.0233431 = 35.986 g/L of anhydrous salts; a mix carrying some water of
    // hydration needs somewhat more, so the default must lie between 36.0 and 38 g/L.
    const sr = 35.16504 * (seawaterDensity(35, t90FromT68(25)) / 1000);
    expectRelative(sr, 35.986, 1e-4);
    expect(DEFAULT_MIX_GRAMS_PER_LITRE_PER_PSU * 35).toBeGreaterThan(sr);
    expect(DEFAULT_MIX_GRAMS_PER_LITRE_PER_PSU * 35).toBeLessThan(38);
  });
});
