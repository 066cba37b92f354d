import { describe, expect, it } from 'vitest';
import { PARAMETER_KEYS, parameterInfo } from '@shared/care/parameters';
import { UNIT_FAMILIES } from '@shared/chemistry/units';
import { ENTRY_UNITS } from '@shared/readings/entry-units';
import {
  impossibleReading,
  INSTRUMENT_PLAUSIBILITY,
  PLAUSIBILITY,
  unusualReading,
} from '@shared/readings/plausibility';
import { waterTestEntriesSchema } from '@shared/schemas/water-test.schema';

describe('plausibility limits', () => {
  it('when a value sits on either end of the possible range, then it is accepted; just outside, refused', () => {
    for (const key of PARAMETER_KEYS) {
      const unit = parameterInfo(key).unit;
      const [min, max] = PLAUSIBILITY[key].possible;
      expect(impossibleReading(key, min, unit), key).toBeNull();
      expect(impossibleReading(key, max, unit), key).toBeNull();
      expect(impossibleReading(key, max * 1.01 + 0.01, unit), key).toMatch(/is not possible/);
      expect(PLAUSIBILITY[key].usual[0]).toBeGreaterThanOrEqual(min);
      expect(PLAUSIBILITY[key].usual[1]).toBeLessThanOrEqual(max);
    }
  });

  it('when a decimal point slipped, then the message suggests the reading it probably was', () => {
    expect(impossibleReading('pH', 80, 'pH')).toBe('pH 80 is not possible — did you mean 8.0?');
    expect(impossibleReading('pH', 812, 'pH')).toBe('pH 812 is not possible — did you mean 8.12?');
    expect(impossibleReading('salinity', 1025, 'SG')).toBe(
      'Specific gravity 1025 is not possible — did you mean 1.025?',
    );
    expect(impossibleReading('temperature', 255, '°C')).toBe(
      'Temperature 255 °C is not possible — did you mean 25.5?',
    );
    expect(impossibleReading('temperature', -10, '°C')).toBe(
      'Temperature -10 °C is not possible: readings go from -2–45 °C.',
    );
    expect(impossibleReading('salinity', 0.9, 'SG')).toMatch(
      /^Specific gravity 0.9 is not possible: readings go from 0.99–1.04/,
    );
    expect(impossibleReading('temperature', -500, '°F')).toMatch(/is not possible/);
  });

  it('when a value is possible but outside what most tanks read, then it is only unusual', () => {
    expect(unusualReading('nitrate', 250, 'mg/L NO3')).toBe(
      'Nitrate 250 mg/L NO3 is unusual (most tanks read 0–200 mg/L NO3): check the reading.',
    );
    expect(unusualReading('nitrate', 150, 'mg/L NO3')).toBeNull();
    expect(unusualReading('salinity', 1.032, 'SG')).toMatch(/unusual/);
    expect(INSTRUMENT_PLAUSIBILITY.SG.possible).toEqual([0.99, 1.04]);
  });

  it('when the schema sees several typos, then each is named at once', () => {
    const r = waterTestEntriesSchema.safeParse({
      pH: { value: 75 },
      calcium: { value: 42000 },
      nitrite: { value: 1, unit: 'mg/L NO2' },
    });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => i.path.join('.'))).toEqual(['pH.value', 'calcium.value']);
  });

  it('when entry units are listed, then each includes the canonical unit and the nitrogen ones match the chemistry engine', () => {
    for (const key of PARAMETER_KEYS)
      expect(ENTRY_UNITS[key] as readonly string[], key).toContain(parameterInfo(key).unit);
    expect(new Set(ENTRY_UNITS.ammonia)).toEqual(new Set(UNIT_FAMILIES['total-ammonia']));
    expect(new Set(ENTRY_UNITS.nitrite)).toEqual(new Set(UNIT_FAMILIES.nitrite));
    expect(new Set(ENTRY_UNITS.nitrate)).toEqual(new Set(UNIT_FAMILIES.nitrate));
  });
});
