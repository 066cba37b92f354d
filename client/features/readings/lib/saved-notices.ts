import { TANK_EVENT_KIND_LABELS } from '@shared/constants/tank-labels';
import type { TankEventView, WaterTestSaved } from '@shared/schemas/tank-views';
import type { SavedNotice } from '@client/lib/saved-notice';

/** What the tank page says after a test is saved: how many readings, or that derived values were worked out again. */
export function waterTestNotice(saved: WaterTestSaved, edited: boolean): SavedNotice {
  const warnings = saved.warnings.map((w) => w.message);
  if (edited)
    return { message: 'Changes saved. Derived values such as free ammonia were worked out again.', warnings };
  const count = Object.keys(saved.waterTest.values).length;
  return {
    message: `Test saved: ${count} ${count === 1 ? 'reading' : 'readings'}. ${warnings.length ? 'Have another look at:' : 'It is on the charts.'}`,
    toCharts: true,
    warnings,
  };
}

export const eventNotice = (event: TankEventView): SavedNotice => ({
  message: `${TANK_EVENT_KIND_LABELS[event.kind]} saved. It is on the timeline.`,
  warnings: [],
});
