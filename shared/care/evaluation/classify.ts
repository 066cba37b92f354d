import type { Band, ParameterRange } from '../profiles/types';

export type RangeVerdict = { level: 'ok' } | { level: 'caution' | 'danger'; direction: 'high' | 'low' };

function side(value: number, band: Band): 'high' | 'low' | null {
  if (value > band[1]) return 'high';
  if (value < band[0]) return 'low';
  return null;
}

/** Ideal → ok; outside ideal → caution; outside caution or past an explicit danger threshold → danger. */
export function classify(value: number, range: ParameterRange): RangeVerdict {
  const outer = side(value, range.caution);
  if (outer) return { level: 'danger', direction: outer };
  if (range.danger?.above !== undefined && value > range.danger.above)
    return { level: 'danger', direction: 'high' };
  if (range.danger?.below !== undefined && value < range.danger.below)
    return { level: 'danger', direction: 'low' };
  const inner = side(value, range.ideal);
  return inner ? { level: 'caution', direction: inner } : { level: 'ok' };
}
