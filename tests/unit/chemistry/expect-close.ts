import { expect } from 'vitest';

/** Assert |actual − expected| ≤ relative · |expected|, with a readable failure message. */
export function expectRelative(actual: number, expected: number, relative: number, label = ''): void {
  const error = Math.abs(actual - expected) / Math.abs(expected);
  expect(
    error,
    `${label} expected ${expected}, got ${actual} (relative error ${error.toExponential(2)} > ${relative})`,
  ).toBeLessThanOrEqual(relative);
}

/** Assert |actual − expected| ≤ absolute. */
export function expectAbsolute(actual: number, expected: number, absolute: number, label = ''): void {
  const error = Math.abs(actual - expected);
  expect(error, `${label} expected ${expected} ± ${absolute}, got ${actual}`).toBeLessThanOrEqual(absolute);
}
