/**
 * Solve f(x) = target on [lo, hi] for a continuous, strictly increasing f by bisection. Bisection is
 * slower than Newton but cannot diverge or leave the bracket, which matters more here than speed:
 * ~50 halvings reach double precision. The caller must check that target lies in [f(lo), f(hi)].
 */
export function solveIncreasing(
  f: (x: number) => number,
  target: number,
  lo: number,
  hi: number,
  tolerance = 1e-12,
): number {
  let low = lo;
  let high = hi;
  for (let i = 0; i < 200 && high - low > tolerance; i++) {
    const mid = (low + high) / 2;
    if (f(mid) < target) low = mid;
    else high = mid;
  }
  return (low + high) / 2;
}
