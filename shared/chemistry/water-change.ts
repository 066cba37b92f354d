import {
  requireInRange,
  requireInteger,
  requireNonNegative,
  requireObject,
  requirePositive,
  requirePositiveUpTo,
} from './validate';

// Mass balance for a water change, assuming the new water mixes completely with what stays and the
// tank is refilled to the same volume: after replacing a fraction f of the water,
//   c' = c·(1 − f) + s·f = s + (c − s)(1 − f)
// and after n identical changes c_n = s + (c − s)(1 − f)^n. Concentrations can be in any unit
// (mg/L nitrate, phosphate, salinity …) as long as current, source and target share it.

/** Upper limit on the number of changes a plan may contain. */
export const MAX_PLANNED_CHANGES = 1000;
/** Upper limit on the number of changes simulated in one call. */
export const MAX_CHANGE_COUNT = 100000;

export interface ChangeInput {
  /** Concentration in the tank now. */
  current: number;
  /** Concentration in the replacement water. */
  source: number;
  /** Fraction of the tank volume replaced, 0–1. */
  fraction: number;
}

// Written as s + (c − s)(1 − f) rather than c + (s − c)f so that, in floating point too, the result
// never crosses the source concentration: the second term always has the sign of (c − s).
function mix(current: number, source: number, keep: number): number {
  return source + (current - source) * keep;
}

function checkChange(input: unknown): ChangeInput {
  const { current, source, fraction } = requireObject('input', input);
  return {
    current: requireNonNegative('current', current),
    source: requireNonNegative('source', source),
    fraction: requireInRange('fraction', fraction, 0, 1),
  };
}

export function concentrationAfterChange(input: ChangeInput): number {
  const { current, source, fraction } = checkChange(input);
  return mix(current, source, 1 - fraction);
}

export interface ChangesInput extends ChangeInput {
  /** Number of identical changes, each replacing `fraction` of the water. */
  count: number;
}

export function concentrationAfterChanges(input: ChangesInput): number {
  const { current, source, fraction } = checkChange(input);
  const count = requireInteger('count', input.count, 0, MAX_CHANGE_COUNT);
  return mix(current, source, (1 - fraction) ** count);
}

export interface FractionToReachInput {
  current: number;
  target: number;
  source: number;
}

/**
 * The single-change fraction that brings `current` down to `target`: f = (c − t)/(c − s).
 * Returns 0 when already at or below target, and null when the target is unreachable because the
 * source water is not below it (no amount of that water can dilute below its own concentration).
 */
export function fractionToReach(input: FractionToReachInput): number | null {
  const obj = requireObject('input', input);
  const current = requireNonNegative('current', obj.current);
  const target = requireNonNegative('target', obj.target);
  const source = requireNonNegative('source', obj.source);
  if (current <= target) return 0;
  if (source >= target) return null;
  return (current - target) / (current - source);
}

export interface PlanWaterChangesInput {
  current: number;
  target: number;
  source: number;
  /** Tank water volume, litres. */
  volumeL: number;
  /** Largest fraction of the water to replace in one change, in (0, 1]. */
  maxFractionPerChange: number;
}

export interface PlannedChange {
  litres: number;
  fraction: number;
  /** Concentration after this change. */
  resulting: number;
}

function simulate(current: number, source: number, fraction: number, count: number): number {
  let c = current;
  for (let i = 0; i < count; i++) c = mix(c, source, 1 - fraction);
  return c;
}

/**
 * Plan the fewest changes that take `current` to `target` or below, all of the SAME size (equal
 * changes are easier to carry out and gentler than a big one followed by a small one), none larger
 * than maxFractionPerChange. Returns [] when already at or below target. Throws RangeError when the
 * target is unreachable (source ≥ target) or would need more than MAX_PLANNED_CHANGES changes; call
 * fractionToReach first to detect the unreachable case without an exception.
 */
export function planWaterChanges(input: PlanWaterChangesInput): PlannedChange[] {
  const obj = requireObject('input', input);
  const current = requireNonNegative('current', obj.current);
  const target = requireNonNegative('target', obj.target);
  const source = requireNonNegative('source', obj.source);
  const volumeL = requirePositive('volumeL', obj.volumeL, 'L');
  const maxFraction = requirePositiveUpTo('maxFractionPerChange', obj.maxFractionPerChange, 1);

  if (current <= target) return [];
  if (source >= target) {
    throw new RangeError(
      `target ${target} is unreachable: the source water (${source}) is not below it, so water changes ` +
        `can only approach ${source}`,
    );
  }

  // Fewest changes: start from the closed form ln(r)/ln(1 − fmax), then correct it against the same
  // step-by-step simulation the plan reports, so floating-point rounding cannot break the guarantee.
  const ratio = (target - source) / (current - source);
  let count = maxFraction === 1 ? 1 : Math.max(1, Math.ceil(Math.log(ratio) / Math.log(1 - maxFraction)));
  if (!Number.isFinite(count) || count > MAX_PLANNED_CHANGES) count = MAX_PLANNED_CHANGES + 1;
  while (count <= MAX_PLANNED_CHANGES && simulate(current, source, maxFraction, count) > target) count++;
  while (count > 1 && simulate(current, source, maxFraction, count - 1) <= target) count--;
  if (count > MAX_PLANNED_CHANGES) {
    throw new RangeError(
      `reaching target ${target} from ${current} with source ${source} needs more than ${MAX_PLANNED_CHANGES} ` +
        `changes of at most ${maxFraction}; raise maxFractionPerChange`,
    );
  }

  // Equal changes: (1 − f)^n = r. Nudge f upward if rounding left the end point a hair above target;
  // f = maxFraction is known to work, so this terminates.
  let fraction = Math.min(maxFraction, 1 - ratio ** (1 / count));
  while (fraction < maxFraction && simulate(current, source, fraction, count) > target) {
    fraction = Math.min(maxFraction, fraction + Math.max(fraction * 1e-12, 1e-15));
  }

  const plan: PlannedChange[] = [];
  let c = current;
  for (let i = 0; i < count; i++) {
    c = mix(c, source, 1 - fraction);
    plan.push({ litres: fraction * volumeL, fraction, resulting: c });
  }
  return plan;
}

/**
 * Default strength of a salt mix, grams per litre per unit of practical salinity: 36.5 g/L for
 * salinity 35. Common practice, no source — brands differ (roughly 35–38 g/L for salinity 35,
 * depending on their water of hydration), so pass the mix's own figure when it is known.
 */
export const DEFAULT_MIX_GRAMS_PER_LITRE_PER_PSU = 36.5 / 35;
export const MIX_STRENGTH_RANGE = { min: 0.5, max: 1.5 } as const;

export interface SaltForNewWaterInput {
  /** Volume of new water to make, litres. */
  volumeL: number;
  /** Practical salinity wanted. */
  targetSalinity: number;
  mixGramsPerLitrePerPsu?: number;
}

/** Grams of salt mix for `volumeL` of new water at `targetSalinity` (linear in salinity). */
export function saltForNewWater(input: SaltForNewWaterInput): number {
  const obj = requireObject('input', input);
  const volumeL = requireNonNegative('volumeL', obj.volumeL, 'L');
  const salinity = requireInRange('targetSalinity', obj.targetSalinity, 0, 42, '(practical salinity)');
  const strength = requireInRange(
    'mixGramsPerLitrePerPsu',
    obj.mixGramsPerLitrePerPsu ?? DEFAULT_MIX_GRAMS_PER_LITRE_PER_PSU,
    MIX_STRENGTH_RANGE.min,
    MIX_STRENGTH_RANGE.max,
    'g/L per unit salinity',
  );
  return volumeL * salinity * strength;
}
