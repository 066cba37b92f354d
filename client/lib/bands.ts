import type { AnyParameterKey } from '@shared/care/parameters';
import { classify, type RangeVerdict } from '@shared/care/evaluation/classify';
import type { Band, CareProfile } from '@shared/care/profiles';
import { displayUnit, formatDisplayNumber, type ReadingPrefs } from './display-units';

/** "7.9–8.4", "0 mg/L NH3", "1.0235–1.0265 SG" in the member's units. */
export function bandText(key: AnyParameterKey, band: Band, prefs: ReadingPrefs): string {
  const [lo, hi] = band.map((v) => formatDisplayNumber(key, v, prefs));
  const unit = displayUnit(key, prefs);
  return `${lo === hi ? lo : `${lo}–${hi}`}${unit ? ` ${unit}` : ''}`;
}

export interface Verdict {
  level: RangeVerdict['level'];
  direction?: 'high' | 'low';
  /** Plain words: what it means against this tank's profile. */
  text: string;
}

/** How a canonical value sits against the tank's profile, in words; undefined when the profile sets no range. */
export function verdictFor(
  key: AnyParameterKey,
  canonical: number,
  profile: CareProfile | undefined,
  prefs: ReadingPrefs,
): Verdict | undefined {
  const range = profile?.ranges[key];
  if (!range) return undefined;
  const v = classify(canonical, range);
  const ideal = bandText(key, range.ideal, prefs);
  if (v.level === 'ok') return { level: 'ok', text: `In the ideal range for this tank (${ideal}).` };
  const word = v.direction === 'high' ? 'high' : 'low';
  if (v.level === 'caution')
    return { level: 'caution', direction: v.direction, text: `A little ${word}: the ideal is ${ideal}.` };
  return {
    level: 'danger',
    direction: v.direction,
    text: `Too ${word} for this tank: outside the safe range ${bandText(key, range.caution, prefs)}. Ideal is ${ideal}.`,
  };
}
