// Shared input guards. Every chemistry function runs its arguments through these so that bad input
// (NaN, ±Infinity, strings from a form, out-of-range values) fails loudly with a RangeError that names
// the argument and its valid range, instead of leaking NaN into a result shown to a beginner.

function describe(value: unknown): string {
  if (typeof value === 'number') return String(value);
  if (typeof value === 'string') return `"${value}" (string)`;
  if (value === null) return 'null';
  if (value === undefined) return 'undefined';
  return `a value of type ${typeof value}`;
}

function formatUnit(unit: string | undefined): string {
  return unit ? ` ${unit}` : '';
}

export function requireFinite(name: string, value: unknown, unit?: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(
      `${name} must be a finite number${unit ? ` in ${unit}` : ''}; got ${describe(value)}`,
    );
  }
  return value;
}

/** Inclusive range check; `why` names the formula or rule whose validity sets the range. */
export function requireInRange(
  name: string,
  value: unknown,
  min: number,
  max: number,
  unit?: string,
  why?: string,
): number {
  const range = `between ${min} and ${max}${formatUnit(unit)}${why ? ` (${why})` : ''}`;
  if (typeof value !== 'number' || !Number.isFinite(value) || value < min || value > max) {
    throw new RangeError(`${name} must be a finite number ${range}; got ${describe(value)}`);
  }
  return value;
}

export function requireNonNegative(name: string, value: unknown, unit?: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
    throw new RangeError(`${name} must be a finite number ≥ 0${formatUnit(unit)}; got ${describe(value)}`);
  }
  return value;
}

export function requirePositive(name: string, value: unknown, unit?: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a finite number > 0${formatUnit(unit)}; got ${describe(value)}`);
  }
  return value;
}

/** A value in the half-open interval (0, max]. */
export function requirePositiveUpTo(name: string, value: unknown, max: number, unit?: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0 || value > max) {
    throw new RangeError(
      `${name} must be a finite number greater than 0 and at most ${max}${formatUnit(unit)}; got ${describe(value)}`,
    );
  }
  return value;
}

export function requireInteger(name: string, value: unknown, min: number, max: number): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < min || value > max) {
    throw new RangeError(`${name} must be a whole number between ${min} and ${max}; got ${describe(value)}`);
  }
  return value;
}

export function requireOneOf<T extends string>(name: string, value: unknown, allowed: readonly T[]): T {
  if (typeof value !== 'string' || !(allowed as readonly string[]).includes(value)) {
    throw new RangeError(
      `${name} must be one of ${allowed.map((a) => `'${a}'`).join(', ')}; got ${describe(value)}`,
    );
  }
  return value as T;
}

export function requireObject(name: string, value: unknown): Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new RangeError(`${name} must be an object; got ${describe(value)}`);
  }
  return value as Record<string, unknown>;
}
