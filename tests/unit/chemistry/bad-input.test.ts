import { describe, it, expect } from 'vitest';
import * as chemistry from '@shared/chemistry';

// Every exported function must reject bad input with a RangeError that names the offending argument,
// never return NaN. Each entry gives a valid call and, per argument, values that must be refused.

type Args = Record<string, unknown>;
interface Case {
  valid: Args;
  call: (args: Args) => unknown;
  bad: Record<string, unknown[]>;
  /** Error text to expect per argument when it is not the argument name itself. */
  mentions?: Record<string, RegExp>;
}

const NON_FINITE = [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, '7', undefined, null];

// Calls go through an untyped door on purpose: they imitate unchecked form input reaching the functions.
function call(name: string, ...args: unknown[]): unknown {
  const fn = (chemistry as Record<string, unknown>)[name];
  if (typeof fn !== 'function') throw new Error(`@shared/chemistry has no function ${name}`);
  return (fn as (...a: unknown[]) => unknown)(...args);
}

const CASES: Record<string, Case> = {
  molarMassOf: {
    valid: { formula: { N: 1, O: 3 } },
    call: (a) => call('molarMassOf', a.formula),
    bad: { formula: [null, 'NO3', { N: Number.NaN }, { N: -1 }, { Xx: 1 }] },
  },
  convert: {
    valid: { value: 1, from: 'mg/L NO3', to: 'mg/L NO3-N' },
    call: (a) => call('convert', a.value, a.from, a.to),
    bad: {
      value: [...NON_FINITE, -1],
      from: ['ppm', 'mg/L NO2', '°C', undefined],
      to: ['mg/l no3', 'L', 'dKH', undefined],
    },
    mentions: { from: /from|cannot convert/, to: /to|cannot convert/ },
  },
  unitFamily: {
    valid: { unit: 'dKH' },
    call: (a) => call('unitFamily', a.unit),
    bad: { unit: ['ppm', '', 42, undefined] },
  },
  t68FromT90: { valid: { t90: 20 }, call: (a) => call('t68FromT90', a.t90), bad: { t90: NON_FINITE } },
  t90FromT68: { valid: { t68: 20 }, call: (a) => call('t90FromT68', a.t68), bad: { t68: NON_FINITE } },
  freshwaterAmmoniumPKa: {
    valid: { tempC: 20 },
    call: (a) => call('freshwaterAmmoniumPKa', a.tempC),
    bad: { tempC: [...NON_FINITE, -1, 51] },
  },
  ionicStrengthFromSalinity: {
    valid: { salinity: 35 },
    call: (a) => call('ionicStrengthFromSalinity', a.salinity),
    bad: { salinity: [...NON_FINITE, -0.1, 46] },
  },
  seawaterAmmoniumPKa: {
    valid: { tempC: 25, salinity: 35 },
    call: (a) => call('seawaterAmmoniumPKa', a.tempC, a.salinity),
    bad: { tempC: [...NON_FINITE, 4, 41], salinity: [...NON_FINITE, -1, 46] },
  },
  unionizedAmmoniaFraction: {
    valid: { tempC: 25, pH: 8.2, salinity: 35 },
    call: (a) => call('unionizedAmmoniaFraction', a),
    bad: {
      tempC: [...NON_FINITE, -1, 60],
      pH: [...NON_FINITE, -0.1, 14.1],
      salinity: [Number.NaN, Number.POSITIVE_INFINITY, null, '35', -1, 46],
    },
  },
  freeAmmonia: {
    valid: { total: 0.5, basis: 'N', tempC: 25, pH: 8.2, salinity: 0 },
    call: (a) => call('freeAmmonia', a),
    bad: {
      total: [...NON_FINITE, -0.1],
      basis: ['NH3-N', 'nh3', undefined],
      tempC: [...NON_FINITE, 55],
      pH: [...NON_FINITE, 15],
      salinity: [Number.NaN, -1, 50],
    },
  },
  seawaterDensity: {
    valid: { salinity: 35, tempC: 25 },
    call: (a) => call('seawaterDensity', a.salinity, a.tempC),
    bad: { salinity: [...NON_FINITE, -1, 42.5], tempC: [...NON_FINITE, -3, 41] },
  },
  pureWaterDensity: {
    valid: { tempC: 20 },
    call: (a) => call('pureWaterDensity', a.tempC),
    bad: { tempC: [...NON_FINITE, -1, 41] },
  },
  practicalSalinity: {
    valid: { conductivityRatio: 1, tempC: 15, pressureDbar: 0 },
    call: (a) => call('practicalSalinity', a),
    bad: {
      conductivityRatio: [...NON_FINITE, 0, -1, 0.01, 3],
      tempC: [...NON_FINITE, -2.5, 36],
      pressureDbar: [Number.NaN, Number.POSITIVE_INFINITY, '0', -1, 10001],
    },
  },
  practicalSalinityFromConductivity: {
    valid: { mScm: 53, tempC: 25 },
    call: (a) => call('practicalSalinityFromConductivity', a),
    bad: { mScm: [...NON_FINITE, 0, -5, 200], tempC: [...NON_FINITE, 40] },
    mentions: { mScm: /mScm|conductivityRatio/ },
  },
  specificGravityFromSalinity: {
    valid: { salinity: 35, sampleTempC: 25, referenceTempC: 25 },
    call: (a) => call('specificGravityFromSalinity', a),
    bad: {
      salinity: [...NON_FINITE, -1, 43],
      sampleTempC: [...NON_FINITE, -5, 45],
      referenceTempC: [...NON_FINITE, -1, 41],
    },
  },
  salinityFromSpecificGravity: {
    valid: { sg: 1.025, sampleTempC: 25, referenceTempC: 25 },
    call: (a) => call('salinityFromSpecificGravity', a),
    bad: {
      sg: [...NON_FINITE, 0, -1, 0.9, 1.1],
      sampleTempC: [...NON_FINITE, 45],
      referenceTempC: [...NON_FINITE, 50],
    },
  },
  concentrationAfterChange: {
    valid: { current: 40, source: 0, fraction: 0.2 },
    call: (a) => call('concentrationAfterChange', a),
    bad: { current: [...NON_FINITE, -1], source: [...NON_FINITE, -1], fraction: [...NON_FINITE, -0.1, 1.1] },
  },
  concentrationAfterChanges: {
    valid: { current: 40, source: 0, fraction: 0.2, count: 3 },
    call: (a) => call('concentrationAfterChanges', a),
    bad: { current: NON_FINITE, fraction: [2], count: [...NON_FINITE, -1, 1.5, 1e9] },
  },
  fractionToReach: {
    valid: { current: 40, target: 20, source: 0 },
    call: (a) => call('fractionToReach', a),
    bad: { current: [...NON_FINITE, -1], target: [...NON_FINITE, -1], source: [...NON_FINITE, -1] },
  },
  planWaterChanges: {
    valid: { current: 40, target: 20, source: 0, volumeL: 100, maxFractionPerChange: 0.25 },
    call: (a) => call('planWaterChanges', a),
    bad: {
      current: [...NON_FINITE, -1],
      target: [...NON_FINITE, -1],
      source: [...NON_FINITE, -1, 20, 30],
      volumeL: [...NON_FINITE, 0, -100],
      maxFractionPerChange: [...NON_FINITE, 0, -0.1, 1.5],
    },
    mentions: { source: /source|unreachable/ },
  },
  saltForNewWater: {
    valid: { volumeL: 20, targetSalinity: 35, mixGramsPerLitrePerPsu: 1.05 },
    call: (a) => call('saltForNewWater', a),
    bad: {
      volumeL: [...NON_FINITE, -1],
      targetSalinity: [...NON_FINITE, -1, 50],
      mixGramsPerLitrePerPsu: [Number.NaN, Number.POSITIVE_INFINITY, '1', 0, 3],
    },
  },
  doseFor: {
    valid: { supplement: 'sodium-bicarbonate', volumeL: 100, rise: 1 },
    call: (a) => call('doseFor', a),
    bad: {
      supplement: ['baking soda', 'Sodium-Bicarbonate', undefined],
      volumeL: [...NON_FINITE, 0, -1],
      rise: [...NON_FINITE, -1],
    },
  },
  maxSafeDailyRise: {
    valid: { supplementOrParameter: 'calcium' },
    call: (a) => call('maxSafeDailyRise', a.supplementOrParameter),
    bad: { supplementOrParameter: ['kalkwasser', 'Calcium', 1, undefined] },
  },
  riseUnitFor: {
    valid: { supplementOrParameter: 'magnesium' },
    call: (a) => call('riseUnitFor', a.supplementOrParameter),
    bad: { supplementOrParameter: ['strontium', null] },
  },
  planDoses: {
    valid: { supplement: 'sodium-carbonate', volumeL: 100, rise: 2, maxDailyRise: 0.5 },
    call: (a) => call('planDoses', a),
    bad: {
      supplement: ['soda', undefined],
      volumeL: [...NON_FINITE, 0, -1],
      rise: [...NON_FINITE, -1, 1e6],
      maxDailyRise: [Number.NaN, Number.POSITIVE_INFINITY, '1', 0, -1],
    },
    mentions: { rise: /rise/ },
  },
  circularSegmentArea: {
    valid: { chord: 100, sagitta: 10 },
    call: (a) => call('circularSegmentArea', a.chord, a.sagitta),
    bad: { chord: [...NON_FINITE, 0, -1, 10], sagitta: [...NON_FINITE, -1, 51] },
    mentions: { chord: /chord|sagitta/ },
  },
  tankVolume: {
    valid: {
      shape: 'rectangle',
      dimensionsCm: { length: 100, width: 40, height: 50 },
      fillHeightCm: 45,
      displacementFraction: 0.1,
    },
    call: (a) => call('tankVolume', a),
    bad: {
      shape: ['hexagon', undefined, 'cylinder'],
      dimensionsCm: [
        null,
        'big',
        { length: 100, width: 40 },
        { length: -1, width: 40, height: 50 },
        { length: 100, width: Number.NaN, height: 50 },
      ],
      fillHeightCm: [Number.NaN, Number.POSITIVE_INFINITY, '45', -1, 51],
      displacementFraction: [Number.NaN, Number.NEGATIVE_INFINITY, '0.1', -0.1, 0.95],
    },
    mentions: { shape: /shape|diameter/, dimensionsCm: /dimensionsCm/ },
  },
};

describe('bad input is refused with a RangeError naming the argument', () => {
  it('covers every exported function', () => {
    const exported = Object.entries(chemistry)
      .filter(([, value]) => typeof value === 'function')
      .map(([name]) => name)
      .sort();
    expect(exported).toEqual(Object.keys(CASES).sort());
  });

  for (const [name, testCase] of Object.entries(CASES)) {
    describe(name, () => {
      it('accepts the valid call', () => {
        expect(() => testCase.call(testCase.valid)).not.toThrow();
      });

      const rows = Object.entries(testCase.bad).flatMap(([arg, values]) =>
        values.map((value) => ({ arg, value })),
      );
      it.each(rows)('rejects $arg = $value', ({ arg, value }) => {
        const args = { ...testCase.valid, [arg]: value };
        let caught: unknown;
        let result: unknown;
        try {
          result = testCase.call(args);
        } catch (error) {
          caught = error;
        }
        expect(caught, `returned ${String(result)} instead of throwing`).toBeInstanceOf(RangeError);
        expect((caught as RangeError).message).toMatch(testCase.mentions?.[arg] ?? new RegExp(arg));
      });
    });
  }

  it('rejects a missing or non-object input for object-style functions', () => {
    for (const fn of [
      chemistry.unionizedAmmoniaFraction,
      chemistry.freeAmmonia,
      chemistry.practicalSalinity,
      chemistry.planWaterChanges,
      chemistry.doseFor,
      chemistry.tankVolume,
    ] as Array<(input: unknown) => unknown>) {
      expect(() => fn(undefined)).toThrow(RangeError);
      expect(() => fn(null)).toThrow(/input must be an object/);
    }
  });
});
