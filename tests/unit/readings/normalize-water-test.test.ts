import { describe, expect, it } from 'vitest';
import { REEF_PROFILE } from '@shared/care/profiles';
import { freeAmmonia } from '@shared/chemistry/ammonia';
import { practicalSalinityFromConductivity } from '@shared/chemistry/practical-salinity';
import { REFERENCE_TEMP_60F_C, salinityFromSpecificGravity } from '@shared/chemistry/specific-gravity';
import { convert } from '@shared/chemistry/units';
import { normalizeWaterTest, type NormalizeContext } from '@shared/readings/normalize-water-test';
import { salinityAsSpecificGravity } from '@shared/readings/salinity';
import { createWaterTestSchema, type CreateWaterTestInput } from '@shared/schemas/water-test.schema';

const NOW = '2025-06-01T12:00:00.000Z';
const reef: NormalizeContext = { systemType: 'reef', now: NOW };
const run = (
  entries: CreateWaterTestInput['entries'],
  ctx: NormalizeContext = reef,
  takenAt = '2025-06-01T10:00:00.000Z',
) => normalizeWaterTest(createWaterTestSchema.parse({ takenAt, entries }), ctx);

describe('normalizeWaterTest', () => {
  it('when SG 1.0245 at 25 °C on a 25 °C refractometer, then salinity matches the chemistry engine and reads back as SG 1.0245 (±0.00005)', () => {
    const n = run({
      salinity: { value: 1.0245, unit: 'SG', method: 'refractometer', referenceTempC: 25, sampleTempC: 25 },
    });
    expect(n.errors).toEqual([]);
    expect(n.values.salinity).toBe(
      salinityFromSpecificGravity({ sg: 1.0245, sampleTempC: 25, referenceTempC: 25 }),
    );
    expect(Math.abs(salinityAsSpecificGravity(n.values.salinity!, 25) - 1.0245)).toBeLessThanOrEqual(0.00005);
  });

  it('when a refractometer gives no sample temperature, then the sample counts as at the reference (its compensation); a hydrometer uses the water temperature', () => {
    const refr = run({
      temperature: { value: 28, unit: '°C' },
      salinity: { value: 1.025, unit: 'SG', method: 'refractometer' },
    });
    expect(refr.derived.salinity).toMatchObject({
      sampleTempC: 25,
      sampleTempSource: 'reference',
      referenceTempC: 25,
      referenceTempSource: 'assumed',
    });
    const hydro = run({
      temperature: { value: 80.6, unit: '°F' },
      salinity: { value: 1.023, unit: 'SG', method: 'hydrometer', referenceTempC: 15.56 },
    });
    expect(hydro.derived.salinity).toMatchObject({
      sampleTempSource: 'this-test',
      referenceTempC: REFERENCE_TEMP_60F_C,
    });
    expect(hydro.values.salinity).toBeCloseTo(
      salinityFromSpecificGravity({ sg: 1.023, sampleTempC: 27, referenceTempC: REFERENCE_TEMP_60F_C }),
      9,
    );
    const blind = run({ salinity: { value: 1.023, unit: 'SG', method: 'hydrometer' } });
    expect(blind.warnings).toEqual([
      { path: 'entries.salinity.sampleTempC', message: expect.stringMatching(/hydrometer was read as if/) },
    ]);
  });

  it('when conductivity is entered, then it is taken as compensated to 25 °C unless a sample temperature is given', () => {
    expect(run({ salinity: { value: 53, unit: 'mS/cm' } }).values.salinity).toBe(
      practicalSalinityFromConductivity({ mScm: 53, tempC: 25 }),
    );
    expect(run({ salinity: { value: 50, unit: 'mS/cm', sampleTempC: 22 } }).values.salinity).toBe(
      practicalSalinityFromConductivity({ mScm: 50, tempC: 22 }),
    );
    expect(run({ salinity: { value: 1, unit: 'mS/cm' } }).errors).toEqual([
      { path: 'entries.salinity.value', message: expect.stringMatching(/outside the salinity scale/) },
    ]);
  });

  it('when units other than the canonical ones are used, then values convert and the entries keep what was typed with a default method', () => {
    const n = run({
      temperature: { value: 77, unit: '°F' },
      ammonia: { value: 1, unit: 'mg/L NH4-N' },
      nitrite: { value: 0.3, unit: 'mg/L NO2-N' },
      alkalinity: { value: 143, unit: 'mg/L CaCO3' },
      calcium: { value: 410 },
    });
    expect(n.values.temperature).toBeCloseTo(25, 12);
    expect(n.values.ammonia).toBe(convert(1, 'mg/L NH4-N', 'mg/L NH3'));
    expect(n.values.nitrite).toBe(convert(0.3, 'mg/L NO2-N', 'mg/L NO2'));
    expect(n.values.alkalinity).toBe(convert(143, 'mg/L CaCO3', 'dKH'));
    expect(n.values.calcium).toBe(410);
    expect(n.entries.calcium).toEqual({ value: 410, unit: 'mg/L Ca', method: 'liquid-kit' });
    expect(n.entries.temperature).toEqual({ value: 77, unit: '°F', method: 'digital-meter' });
  });

  it('when ammonia comes with its own pH and temperature, then free ammonia uses them; missing ones fall back to the last known, then to the profile', () => {
    const own = run({
      ammonia: { value: 0.5, unit: 'mg/L NH3' },
      pH: { value: 8.2 },
      temperature: { value: 25, unit: '°C' },
      salinity: { value: 34, unit: 'ppt' },
    });
    expect(own.freeAmmonia).toBe(
      freeAmmonia({ total: 0.5, basis: 'NH3', tempC: 25, pH: 8.2, salinity: 34 }).nh3,
    );
    expect(own.derived.freeAmmonia).toMatchObject({
      inputs: {
        pH: { source: 'this-test' },
        temperature: { source: 'this-test' },
        salinity: { source: 'this-test' },
      },
    });

    const lastKnown = {
      pH: { value: 8.0, takenAt: '2025-05-30T09:00:00.000Z', testId: 'earlier-test' },
      temperature: { value: 26, takenAt: '2025-05-29T09:00:00.000Z', testId: 'older-test' },
    };
    const leaning = run({ ammonia: { value: 0.5, unit: 'mg/L NH3' } }, { ...reef, lastKnown });
    const middle = (REEF_PROFILE.ranges.salinity!.ideal[0] + REEF_PROFILE.ranges.salinity!.ideal[1]) / 2;
    expect(leaning.freeAmmonia).toBe(
      freeAmmonia({ total: 0.5, basis: 'NH3', tempC: 26, pH: 8.0, salinity: middle }).nh3,
    );
    expect(leaning.derived.freeAmmonia).toMatchObject({
      inputs: {
        pH: { source: 'last-known', testId: 'earlier-test', takenAt: '2025-05-30T09:00:00.000Z' },
        temperature: { source: 'last-known', testId: 'older-test' },
        salinity: { source: 'assumed', value: middle },
      },
    });

    const fresh = run(
      {
        ammonia: { value: 0.5, unit: 'mg/L NH3' },
        pH: { value: 7.5 },
        temperature: { value: 24, unit: '°C' },
      },
      { systemType: 'tropical-freshwater', now: NOW },
    );
    expect(fresh.derived.freeAmmonia).toMatchObject({
      inputs: { salinity: { value: 0, source: 'assumed', detail: 'fresh water' } },
    });

    const unknown = run({ ammonia: { value: 0.5, unit: 'mg/L NH3' } });
    expect(unknown.freeAmmonia).toBeNull();
    expect(unknown.derived.freeAmmonia).toEqual({
      value: null,
      reason: 'no pH and temperature has been recorded for this tank',
    });
    expect(run({ pH: { value: 8 } }).derived.freeAmmonia).toBeUndefined();
  });

  it('when a value is unusual but possible, then it is a warning; when the time is in the future, then an error', () => {
    expect(run({ temperature: { value: 8, unit: '°C' } }).warnings).toEqual([
      {
        path: 'entries.temperature.value',
        message: 'Temperature 8 °C is unusual (most tanks read 10–35 °C): check the reading.',
      },
    ]);
    expect(run({ pH: { value: 8 } }, reef, '2025-06-01T12:04:00.000Z').errors).toEqual([]);
    expect(run({ pH: { value: 8 } }, reef, '2025-06-01T12:30:00.000Z').errors).toEqual([
      { path: 'takenAt', message: expect.stringMatching(/future/) },
    ]);
  });

  it('when SG is beyond what sea water can read at that temperature, then an error names the salinity field', () => {
    const n = run({ salinity: { value: 1.035, unit: 'SG', method: 'refractometer' } });
    expect(n.errors).toEqual([
      {
        path: 'entries.salinity.value',
        message: expect.stringMatching(/^Specific gravity 1.035 with water at 25 °C is outside/),
      },
    ]);
    expect(n.values.salinity).toBeUndefined();
  });
});
