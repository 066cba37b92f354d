import { PARAMETER_KEYS, type ParameterKey } from '@shared/care/parameters';
import type { WaterTestView } from '@shared/schemas/tank-views';

export interface LatestValue {
  value: number;
  takenAt: string;
}

/** The newest value of each parameter among the tests given (any order). */
export function latestValues(tests: readonly WaterTestView[]): Partial<Record<ParameterKey, LatestValue>> {
  const out: Partial<Record<ParameterKey, LatestValue>> = {};
  const newestFirst = [...tests].sort((a, b) => Date.parse(b.takenAt) - Date.parse(a.takenAt));
  for (const t of newestFirst) {
    for (const key of PARAMETER_KEYS) {
      const v = t.values[key];
      if (v !== undefined && !out[key]) out[key] = { value: v, takenAt: t.takenAt };
    }
  }
  return out;
}
