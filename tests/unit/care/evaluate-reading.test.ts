import { describe, expect, it, vi } from 'vitest';
import fc from 'fast-check';
import { freeAmmonia, planWaterChanges } from '@shared/chemistry';
import {
  MAX_WATER_CHANGE_FRACTION,
  REEF_PROFILE,
  SEAHORSE_LARGE_PROFILE,
  TROPICAL_FRESHWATER_PROFILE,
  dedupeConcerns,
  evaluateReading,
  severityRank,
  type CareProfile,
  type Concern,
  type EvaluationContext,
  type WaterTestInput,
} from '@shared/care';
import { day, test } from './helpers';

const NOW = day(10);

function seahorseCtx(over: Partial<EvaluationContext> = {}): EvaluationContext {
  return {
    tank: { volumeL: 120, phase: 'established', systemType: 'seahorse' },
    history: [],
    now: NOW,
    ...over,
  };
}

function freshCtx(over: Partial<EvaluationContext> = {}): EvaluationContext {
  return {
    tank: { volumeL: 100, phase: 'established', systemType: 'tropical-freshwater' },
    history: [],
    now: NOW,
    ...over,
  };
}

const byRule = (concerns: readonly Concern[], rule: string) => concerns.find((c) => c.rule === rule);
const healthySeahorse = { temperature: 24, salinity: 33, pH: 8.2 };

describe('evaluateReading: established seahorse tank', () => {
  // Common practice, no source: an established tank reads 0 ammonia and 0 nitrite; anything
  // measurable is at least a caution.
  it('any measurable ammonia or nitrite is at least caution', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('ammonia' as const, 'nitrite' as const),
        fc.double({ min: 0.01, max: 10, noNaN: true }),
        (parameter, value) => {
          const concerns = evaluateReading(
            test('r', 10, { ...healthySeahorse, pH: 7.8, [parameter]: value }),
            SEAHORSE_LARGE_PROFILE,
            seahorseCtx(),
          );
          const c = concerns.find((x) => x.parameter === parameter && x.rule.startsWith('range.'));
          expect(c).toBeDefined();
          expect(severityRank(c!.severity)).toBeGreaterThanOrEqual(severityRank('caution'));
        },
      ),
      { numRuns: 100 },
    );
  });

  it('zero ammonia and nitrite raise nothing', () => {
    const concerns = evaluateReading(
      test('r', 10, { ...healthySeahorse, ammonia: 0, nitrite: 0, nitrate: 5 }),
      SEAHORSE_LARGE_PROFILE,
      seahorseCtx(),
    );
    expect(concerns).toEqual([]);
  });

  // Common practice, no source: nitrite 1.0 mg/L on an established seahorse tank is an emergency.
  it('nitrite 1.0 is urgent and says seahorses need 0', () => {
    const concerns = evaluateReading(
      test('r', 10, { ...healthySeahorse, nitrite: 1.0 }),
      SEAHORSE_LARGE_PROFILE,
      seahorseCtx(),
    );
    const c = byRule(concerns, 'range.nitrite.danger');
    expect(c).toMatchObject({ parameter: 'nitrite', severity: 'urgent', value: 1, unit: 'mg/L NO2' });
    expect(c?.reason).toContain('Nitrite 1 mg/L NO2');
    expect(c?.reason).toContain('seahorses need 0');
    expect(c?.nextSteps).toContain('Ask your mentor now.');
    expect(c?.nextSteps).toContain(
      'Change 30 L (25% of the water) today with new water matched to the tank’s temperature and salinity.',
    );
  });

  it('nitrite 0.05 is caution, not urgent', () => {
    const concerns = evaluateReading(
      test('r', 10, { ...healthySeahorse, nitrite: 0.05 }),
      SEAHORSE_LARGE_PROFILE,
      seahorseCtx(),
    );
    expect(byRule(concerns, 'range.nitrite.caution')?.severity).toBe('caution');
    expect(byRule(concerns, 'range.nitrite.danger')).toBeUndefined();
  });
});

describe('evaluateReading: nitrate water change from planWaterChanges', () => {
  const target = SEAHORSE_LARGE_PROFILE.ranges.nitrate!.target!;

  it('nitrate above the seahorse limit asks for exactly the planned water changes', () => {
    const concerns = evaluateReading(
      test('r', 10, { ...healthySeahorse, nitrate: 25 }),
      SEAHORSE_LARGE_PROFILE,
      seahorseCtx({ sourceWater: { nitrate: 1 } }),
    );
    const c = byRule(concerns, 'range.nitrate.danger');
    expect(c?.severity).toBe('urgent');
    const plan = planWaterChanges({
      current: 25,
      target,
      source: 1,
      volumeL: 120,
      maxFractionPerChange: MAX_WATER_CHANGE_FRACTION,
    });
    expect(plan.length).toBeGreaterThan(1);
    expect(c?.waterChanges).toEqual(plan);
    const litres = plan[0]!.litres.toFixed(1).replace(/\.0$/, '');
    const step = c?.nextSteps.find((s) => s.startsWith('Change '));
    expect(step).toContain(`Change ${litres} L`);
    expect(step).toContain(`${plan.length} times`);
    expect(step).not.toContain('assuming your new water has no nitrate');
  });

  it('a caution-level nitrate gets a single planned change and says the source was assumed clean', () => {
    const concerns = evaluateReading(
      test('r', 10, { ...healthySeahorse, nitrate: 12 }),
      SEAHORSE_LARGE_PROFILE,
      seahorseCtx(),
    );
    const c = byRule(concerns, 'range.nitrate.caution');
    const plan = planWaterChanges({
      current: 12,
      target,
      source: 0,
      volumeL: 120,
      maxFractionPerChange: MAX_WATER_CHANGE_FRACTION,
    });
    expect(c?.waterChanges).toEqual(plan);
    expect(c?.nextSteps[0]).toContain(`Change ${plan[0]!.litres.toFixed(1).replace(/\.0$/, '')} L`);
    expect(c?.nextSteps[0]).toContain('assuming your new water has no nitrate');
  });

  it('source water at or above the target cannot dilute: no plan, asks about purified water', () => {
    const concerns = evaluateReading(
      test('r', 10, { ...healthySeahorse, nitrate: 25 }),
      SEAHORSE_LARGE_PROFILE,
      seahorseCtx({ sourceWater: { nitrate: 8 } }),
    );
    const c = byRule(concerns, 'range.nitrate.danger');
    expect(c?.waterChanges).toEqual([]);
    expect(c?.nextSteps[0]).toContain('purified');
  });
});

describe('evaluateReading: free (un-ionized) ammonia', () => {
  // US EPA 1976, Quality Criteria for Water (Red Book): 0.02 mg/L NH3 long-term guidance for
  // freshwater aquatic life (figure from memory; EIFAC 1970, Technical Paper 11, gave a similar ~0.025).
  const LIMIT = 0.02;

  it('free NH3 above the published guidance is urgent even when total ammonia is only a caution', () => {
    const values = { ammonia: 0.4, pH: 8.0, temperature: 27 };
    const expected = freeAmmonia({ total: 0.4, basis: 'NH3', tempC: 27, pH: 8.0 }).nh3;
    expect(expected).toBeGreaterThan(LIMIT);
    const concerns = evaluateReading(test('r', 10, values), TROPICAL_FRESHWATER_PROFILE, freshCtx());
    expect(byRule(concerns, 'range.ammonia.caution')?.severity).toBe('caution');
    const c = byRule(concerns, 'derived.freeAmmonia.danger');
    expect(c).toMatchObject({ parameter: 'freeAmmonia', severity: 'urgent', unit: 'mg/L NH3' });
    expect(c?.value).toBeCloseTo(expected, 12);
    expect(c?.reason).toContain('US EPA 1976');
    expect(c?.reason).toContain('pH 8 and 27 °C from this test');
    expect(concerns[0]?.severity).toBe('urgent');
  });

  it('the same total ammonia at pH 7 stays below the guidance: no free-ammonia concern', () => {
    const expected = freeAmmonia({ total: 0.4, basis: 'NH3', tempC: 27, pH: 7.0 }).nh3;
    expect(expected).toBeLessThan(LIMIT);
    const concerns = evaluateReading(
      test('r', 10, { ammonia: 0.4, pH: 7.0, temperature: 27 }),
      TROPICAL_FRESHWATER_PROFILE,
      freshCtx(),
    );
    expect(concerns.some((c) => c.parameter === 'freeAmmonia')).toBe(false);
  });

  it('uses the tank’s last known pH and temperature when the test lacks them, and says so', () => {
    const history = [
      test('h1', 5, { pH: 8.1, temperature: 26 }),
      test('h2', 8, { pH: 8.0 }),
      test('later', 11, { pH: 6.5 }),
    ];
    const concerns = evaluateReading(
      test('r', 10, { ammonia: 0.5 }),
      TROPICAL_FRESHWATER_PROFILE,
      freshCtx({ history }),
    );
    const c = byRule(concerns, 'derived.freeAmmonia.danger');
    expect(c?.value).toBeCloseTo(freeAmmonia({ total: 0.5, basis: 'NH3', tempC: 26, pH: 8.0 }).nh3, 12);
    expect(c?.reason).toContain(`pH 8 from the test of ${day(8).slice(0, 10)}`);
    expect(c?.reason).toContain(`26 °C from the test of ${day(5).slice(0, 10)}`);
  });

  it('marine salinity never measured is assumed from the profile, and says so', () => {
    const concerns = evaluateReading(
      test('r', 10, { ammonia: 0.5, pH: 8.3, temperature: 26 }),
      REEF_PROFILE,
      { tank: { volumeL: 300, phase: 'established', systemType: 'reef' }, history: [], now: NOW },
    );
    const c = byRule(concerns, 'derived.freeAmmonia.danger');
    expect(c?.value).toBeCloseTo(
      freeAmmonia({ total: 0.5, basis: 'NH3', tempC: 26, pH: 8.3, salinity: 35 }).nh3,
      12,
    );
    expect(c?.reason).toContain('salinity 35 assumed');
  });

  it('without any pH it cannot work out free ammonia and says what to test', () => {
    const concerns = evaluateReading(
      test('r', 10, { ammonia: 0.25, temperature: 25 }),
      TROPICAL_FRESHWATER_PROFILE,
      freshCtx(),
    );
    expect(byRule(concerns, 'derived.freeAmmonia.unknown')).toMatchObject({ severity: 'info' });
    expect(byRule(concerns, 'derived.freeAmmonia.unknown')?.reason).toContain('no pH');
  });
});

describe('evaluateReading: cycling tanks', () => {
  const cycling = (hasLivestock?: boolean): EvaluationContext => ({
    tank: {
      volumeL: 120,
      phase: 'cycling',
      systemType: 'seahorse',
      ...(hasLivestock === undefined ? {} : { hasLivestock }),
    },
    history: [],
    now: NOW,
  });
  const midCycle = test('r', 10, {
    ammonia: 2,
    nitrite: 1,
    nitrate: 10,
    pH: 8.2,
    temperature: 25,
    salinity: 33,
  });

  it('ammonia, nitrite and dangerous free NH3 are info while cycling an empty tank', () => {
    const concerns = evaluateReading(midCycle, SEAHORSE_LARGE_PROFILE, cycling());
    expect(byRule(concerns, 'cycle.ammonia.expected')?.severity).toBe('info');
    expect(byRule(concerns, 'cycle.nitrite.expected')?.severity).toBe('info');
    expect(byRule(concerns, 'cycle.freeAmmonia.expected')?.severity).toBe('info');
    expect(concerns.some((c) => c.severity === 'urgent')).toBe(false);
  });

  it('with animals in a cycling tank, dangerous free NH3 and nitrite are urgent', () => {
    const concerns = evaluateReading(midCycle, SEAHORSE_LARGE_PROFILE, cycling(true));
    expect(byRule(concerns, 'derived.freeAmmonia.danger')?.severity).toBe('urgent');
    expect(byRule(concerns, 'range.nitrite.danger')?.reason).toContain('still cycling with animals');
  });

  it('caps other dangers at caution while no animals are in', () => {
    const hot = test('r', 10, { temperature: 31 });
    expect(
      byRule(evaluateReading(hot, SEAHORSE_LARGE_PROFILE, cycling()), 'range.temperature.danger')?.severity,
    ).toBe('caution');
    expect(
      byRule(evaluateReading(hot, SEAHORSE_LARGE_PROFILE, seahorseCtx()), 'range.temperature.danger')
        ?.severity,
    ).toBe('urgent');
  });
});

describe('evaluateReading: trends (thresholds common practice, no source)', () => {
  const ctxWith = (history: WaterTestInput[]) => seahorseCtx({ history });

  it('nitrate rising more than 5 mg/L a week is a caution', () => {
    // +1 mg/L a day on a straight line: 7 mg/L a week.
    const history = [
      test('a', 0, { nitrate: 2 }),
      test('b', 2, { nitrate: 4 }),
      test('c', 4, { nitrate: 6 }),
    ];
    const concerns = evaluateReading(test('r', 6, { nitrate: 8 }), SEAHORSE_LARGE_PROFILE, ctxWith(history));
    expect(byRule(concerns, 'trend.nitrate.rising')).toMatchObject({
      severity: 'caution',
      unit: 'mg/L NO3 per week',
    });
    expect(byRule(concerns, 'trend.nitrate.rising')?.value).toBeCloseTo(7, 10);
  });

  it('a slow nitrate rise, or any rise while cycling, is not flagged', () => {
    const slow = [test('a', 0, { nitrate: 2 }), test('b', 3, { nitrate: 2.5 }), test('c', 6, { nitrate: 3 })];
    expect(
      byRule(
        evaluateReading(test('r', 7, { nitrate: 3 }), SEAHORSE_LARGE_PROFILE, ctxWith(slow)),
        'trend.nitrate.rising',
      ),
    ).toBeUndefined();
    const fast = [test('a', 0, { nitrate: 2 }), test('b', 3, { nitrate: 4 }), test('c', 6, { nitrate: 6 })];
    const ctx = { ...ctxWith(fast), tank: { ...ctxWith(fast).tank, phase: 'cycling' as const } };
    expect(
      byRule(
        evaluateReading(test('r', 7, { nitrate: 8 }), SEAHORSE_LARGE_PROFILE, ctx),
        'trend.nitrate.rising',
      ),
    ).toBeUndefined();
  });

  it('salinity drifting more than 1 PSU in a week is a caution, with top-up advice when rising', () => {
    const history = [test('a', 4, { salinity: 32.5 }), test('b', 7, { salinity: 33.2 })];
    const c = byRule(
      evaluateReading(test('r', 10, { salinity: 33.8 }), SEAHORSE_LARGE_PROFILE, ctxWith(history)),
      'trend.salinity.drift',
    );
    expect(c?.severity).toBe('caution');
    expect(c?.value).toBeCloseTo(1.3, 10);
    expect(c?.nextSteps[0]).toContain('fresh (purified) water');
    // Outside the 7-day window the old 32.5 does not count.
    const old = [test('a', 2, { salinity: 32.5 }), test('b', 7, { salinity: 33.2 })];
    expect(
      byRule(
        evaluateReading(test('r', 10, { salinity: 33.8 }), SEAHORSE_LARGE_PROFILE, ctxWith(old)),
        'trend.salinity.drift',
      ),
    ).toBeUndefined();
  });

  it('pH falling more than 0.2 a week is a caution', () => {
    const history = [test('a', 0, { pH: 8.3 }), test('b', 4, { pH: 8.15 }), test('c', 7, { pH: 8.05 })];
    const c = byRule(
      evaluateReading(test('r', 10, { pH: 7.95 }), SEAHORSE_LARGE_PROFILE, ctxWith(history)),
      'trend.ph.falling',
    );
    expect(c?.severity).toBe('caution');
    const steady = [test('a', 0, { pH: 8.2 }), test('b', 4, { pH: 8.15 }), test('c', 7, { pH: 8.2 })];
    expect(
      byRule(
        evaluateReading(test('r', 10, { pH: 8.15 }), SEAHORSE_LARGE_PROFILE, ctxWith(steady)),
        'trend.ph.falling',
      ),
    ).toBeUndefined();
  });

  it('a temperature swing over 2 °C within 24 h is a caution; the same change over 30 h is not', () => {
    const swing = evaluateReading(
      test('r', 10.5, { temperature: 24.8 }),
      SEAHORSE_LARGE_PROFILE,
      ctxWith([test('a', 10, { temperature: 22.5 })]),
    );
    expect(byRule(swing, 'trend.temperature.swing')?.value).toBeCloseTo(2.3, 10);
    const slow = evaluateReading(
      test('r', 11.25, { temperature: 24.8 }),
      SEAHORSE_LARGE_PROFILE,
      ctxWith([test('a', 10, { temperature: 22.5 })]),
    );
    expect(byRule(slow, 'trend.temperature.swing')).toBeUndefined();
  });
});

describe('evaluateReading: one concern per cause, deterministic', () => {
  it('never returns two concerns with the same rule, and puts the most severe first', () => {
    const reading = test('r', 10, {
      ammonia: 1,
      nitrite: 0.5,
      nitrate: 40,
      pH: 7.6,
      temperature: 29,
      salinity: 38,
      alkalinity: 4,
    });
    const history = [reading, test('a', 9.8, { temperature: 25 })];
    const concerns = evaluateReading(reading, SEAHORSE_LARGE_PROFILE, seahorseCtx({ history }));
    const rules = concerns.map((c) => c.rule);
    expect(new Set(rules).size).toBe(rules.length);
    const ranks = concerns.map((c) => severityRank(c.severity));
    expect([...ranks].sort((a, b) => b - a)).toEqual(ranks);
    expect(rules).toEqual(
      expect.arrayContaining(['range.ammonia.danger', 'range.salinity.danger', 'trend.temperature.swing']),
    );
  });

  it('dedupeConcerns keeps the most severe of a rule', () => {
    const c = (severity: Concern['severity']): Concern => ({
      parameter: 'nitrate',
      severity,
      reason: severity,
      rule: 'x',
      nextSteps: [],
    });
    expect(dedupeConcerns([c('info'), c('urgent'), c('caution')])).toEqual([c('urgent')]);
  });

  it('honours an explicit danger threshold inside the caution band', () => {
    const profile: CareProfile = {
      ...REEF_PROFILE,
      ranges: { phosphate: { ...REEF_PROFILE.ranges.phosphate!, caution: [0, 1], danger: { above: 0.5 } } },
    };
    const ctx: EvaluationContext = {
      tank: { volumeL: 100, phase: 'established', systemType: 'reef' },
      history: [],
      now: NOW,
    };
    expect(
      byRule(evaluateReading(test('r', 10, { phosphate: 0.6 }), profile, ctx), 'range.phosphate.danger')
        ?.severity,
    ).toBe('urgent');
    expect(
      byRule(evaluateReading(test('r', 10, { phosphate: 0.4 }), profile, ctx), 'range.phosphate.caution')
        ?.severity,
    ).toBe('caution');
  });

  it('gives the same answer whatever the wall clock says', () => {
    const reading = test('r', 10, { ammonia: 0.5, nitrite: 0.2, nitrate: 30, pH: 8.1, temperature: 24 });
    vi.useFakeTimers();
    try {
      vi.setSystemTime(new Date('2001-01-01T00:00:00Z'));
      const a = evaluateReading(reading, SEAHORSE_LARGE_PROFILE, seahorseCtx());
      vi.setSystemTime(new Date('2040-06-01T00:00:00Z'));
      const b = evaluateReading(reading, SEAHORSE_LARGE_PROFILE, seahorseCtx());
      expect(b).toEqual(a);
    } finally {
      vi.useRealTimers();
    }
  });
});
