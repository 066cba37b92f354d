import { describe, expect, it } from 'vitest';
import {
  SEAHORSE_LARGE_PROFILE,
  stockingReadiness,
  type StockingReadinessInput,
  type WaterTestInput,
} from '@shared/care';
import { day, test } from './helpers';

const NOW = day(50);
// In the seahorse profile's ideal band (common practice, no source): 22–25 °C, salinity 31–35,
// pH 8.0–8.4, ammonia and nitrite 0, nitrate 10 or less.
const GOOD = { temperature: 23.5, salinity: 33, pH: 8.2, ammonia: 0, nitrite: 0, nitrate: 5 };

function week(values: (d: number) => WaterTestInput['values']): WaterTestInput[] {
  return Array.from({ length: 8 }, (_, i) => test(`w${i}`, 43 + i, values(43 + i)));
}

const allMet: StockingReadinessInput = {
  stage: 'cycled',
  recentTests: week(() => GOOD),
  profile: SEAHORSE_LARGE_PROFILE,
  checklist: { equipmentRunning: true, quarantinePlan: true, foodReady: true },
  signOff: { mentorId: 'mentor-1', signedAt: day(49) },
  now: NOW,
};

const unmet = (input: StockingReadinessInput) =>
  stockingReadiness(input)
    .items.filter((i) => !i.met)
    .map((i) => i.key);

describe('stockingReadiness', () => {
  it('is ready when everything is met', () => {
    const result = stockingReadiness(allMet);
    expect(result.ready).toBe(true);
    expect(result.items.map((i) => [i.key, i.met])).toEqual([
      ['cycled', true],
      ['parameters-in-band', true],
      ['equipment', true],
      ['quarantine', true],
      ['food', true],
      ['mentor-sign-off', true],
    ]);
  });

  it('is not ready mid-cycle, with nitrate high, no food and no sign-off, and says why', () => {
    const input: StockingReadinessInput = {
      ...allMet,
      stage: 'nitrite-falling',
      recentTests: week((d) => ({ ...GOOD, nitrate: d === 48 ? 15 : 5 })),
      checklist: { equipmentRunning: true, quarantinePlan: true, foodReady: false },
      signOff: null,
    };
    const result = stockingReadiness(input);
    expect(result.ready).toBe(false);
    expect(unmet(input)).toEqual(['cycled', 'parameters-in-band', 'food', 'mentor-sign-off']);
    const item = (key: string) => result.items.find((i) => i.key === key);
    expect(item('cycled')?.detail).toContain('nitrite-falling');
    expect(item('parameters-in-band')?.detail).toContain(`Nitrate 15 mg/L NO3 on ${day(48).slice(0, 10)}`);
    // Seahorses eat frozen or live foods and need feeding several times a day (common practice, no source).
    expect(item('food')?.detail).toContain('frozen or live foods');
    expect(item('food')?.detail).toContain('several times a day');
  });

  it('needs tests covering the whole window', () => {
    const short = allMet.recentTests.filter((t) => t.takenAt >= day(47));
    expect(unmet({ ...allMet, recentTests: short })).toEqual(['parameters-in-band']);
    expect(stockingReadiness({ ...allMet, recentTests: short }).items[1]?.detail).toContain(
      'tests only cover 3 of the last 7 days',
    );
    expect(unmet({ ...allMet, recentTests: [] })).toEqual(['parameters-in-band']);
  });

  it('needs every weekly parameter tested in the window', () => {
    const noSalinity = week(() => ({ ...GOOD, salinity: undefined }));
    const result = stockingReadiness({ ...allMet, recentTests: noSalinity });
    expect(result.ready).toBe(false);
    expect(result.items[1]?.detail).toContain('no salinity test');
  });

  it('honours a longer daysInBand', () => {
    expect(unmet({ ...allMet, daysInBand: 14 })).toEqual(['parameters-in-band']);
  });

  it('a sign-off dated after now does not count; each checklist item is its own line', () => {
    expect(unmet({ ...allMet, signOff: { mentorId: 'm', signedAt: day(51) } })).toEqual(['mentor-sign-off']);
    expect(
      unmet({ ...allMet, checklist: { equipmentRunning: false, quarantinePlan: false, foodReady: true } }),
    ).toEqual(['equipment', 'quarantine']);
  });
});
