import { describe, expect, it } from 'vitest';
import { niceTicks, seriesOf, yDomain } from '@client/lib/chart-data';
import type { WaterTestView } from '@shared/schemas/tank-views';

const test = (takenAt: string, values: WaterTestView['values']) =>
  ({ id: takenAt, takenAt, values, freeAmmonia: null }) as WaterTestView;

describe('chart data', () => {
  it('when an axis spans an awkward range, then its ticks are round steps that cover it', () => {
    expect(niceTicks([0, 3.36])).toEqual({ domain: [0, 4], ticks: [0, 1, 2, 3, 4] });
    expect(niceTicks([7.95, 8.45])).toEqual({ domain: [7.8, 8.6], ticks: [7.8, 8, 8.2, 8.4, 8.6] });
  });

  it('when a concentration axis gets air below it, then it never goes under zero', () => {
    expect(yDomain([0, 2])[0]).toBe(0);
    expect(yDomain([8.1, 8.1])).toEqual([8.1 - 8.1 * 0.05, 8.1 + 8.1 * 0.05]);
  });

  it("when tests come newest first, then a series is oldest first in the member's units", () => {
    const points = seriesOf(
      [
        test('2025-03-02T10:00:00Z', { temperature: 25 }),
        test('2025-03-01T10:00:00Z', { temperature: 20, pH: 8 }),
      ],
      'temperature',
      { temperatureUnit: 'F', volumeUnit: 'L', salinityDisplay: 'ppt' },
    );
    expect(points.map((p) => p.v)).toEqual([68, 77]);
  });
});
