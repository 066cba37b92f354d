import { formatNumber, parameterInfo, type AnyParameterKey } from '../parameters';
import type { ParameterRange } from '../profiles/types';

type Direction = 'high' | 'low';

const WHY: Partial<Record<AnyParameterKey, Partial<Record<Direction, string>>>> = {
  ammonia: { high: 'toxic waste from food and droppings' },
  nitrite: { high: 'toxic, it stops blood carrying oxygen' },
  nitrate: { high: 'it builds up between water changes and stresses animals at this level' },
  temperature: { high: 'too warm; warm water holds less oxygen', low: 'too cold' },
  salinity: { high: 'too salty, often from evaporation', low: 'not salty enough' },
  pH: { high: 'too high', low: 'too low (too acid)' },
  alkalinity: { high: 'too high', low: 'too low, so pH can swing' },
  calcium: { high: 'too high', low: 'too low for corals and shells to grow' },
  magnesium: { high: 'too high', low: 'too low, which makes calcium hard to hold' },
  phosphate: { high: 'too high; it feeds nuisance algae' },
};

export function whyText(parameter: AnyParameterKey, direction: Direction): string {
  return WHY[parameter]?.[direction] ?? (direction === 'high' ? 'too high' : 'too low');
}

/** "0", "10 mg/L NO3 or less", "24–27 °C". */
export function idealText(parameter: AnyParameterKey, range: ParameterRange): string {
  const [min, max] = range.ideal;
  const unit = parameter === 'pH' ? '' : ` ${parameterInfo(parameter).unit}`;
  if (min === max) return formatNumber(parameter, max);
  if (min === 0) return `${formatNumber(parameter, max)}${unit} or less`;
  return `${formatNumber(parameter, min)}–${formatNumber(parameter, max)}${unit}`;
}

/** Litres as a person would measure them: one decimal under 100 L, whole litres above. */
export function formatLitres(litres: number): string {
  const fixed = litres < 100 ? litres.toFixed(1) : litres.toFixed(0);
  return fixed.replace(/\.0$/, '');
}

export function formatPercent(fraction: number): string {
  return `${Math.round(fraction * 100)}%`;
}

export function mentorStep(severity: 'info' | 'caution' | 'urgent'): string {
  if (severity === 'urgent') return 'Ask your mentor now.';
  if (severity === 'caution') return 'Tell your mentor if it is still the same at the next test.';
  return 'Ask your mentor if anything is unclear.';
}

/** "a", "a and b", "a, b and c". */
export function listOf(words: readonly string[]): string {
  return words.length > 1
    ? `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`
    : (words[0] ?? '');
}

export function capitalised(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
