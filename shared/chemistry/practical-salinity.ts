import { t68FromT90 } from './temperature-scale';
import { requireInRange, requireObject, requirePositive } from './validate';

export const PSS78_SALINITY_RANGE = { min: 2, max: 42 } as const;
export const PSS78_TEMP_RANGE_C = { min: -2, max: 35 } as const;
export const PSS78_PRESSURE_RANGE_DBAR = { min: 0, max: 10000 } as const;
/** Conductivity of standard seawater, S = 35 at 15 °C (IPTS-68) and 0 dbar, mS/cm (Culkin & Smith 1980). */
export const C3515_MS_PER_CM = 42.914;

const A = [0.008, -0.1692, 25.3851, 14.0941, -7.0261, 2.7081] as const;
const B = [0.0005, -0.0056, -0.0066, -0.0375, 0.0636, -0.0144] as const;
const K = 0.0162;

function polynomialInSqrt(coefficients: readonly number[], x: number): number {
  const root = Math.sqrt(x);
  let sum = 0;
  for (let i = coefficients.length - 1; i >= 0; i--) sum = sum * root + (coefficients[i] ?? 0);
  return sum;
}

export interface PracticalSalinityInput {
  /** R = C(S, t, p) / C(35, 15 °C IPTS-68, 0). */
  conductivityRatio: number;
  /** In-situ temperature, ITS-90 °C. */
  tempC: number;
  /** Sea pressure (gauge), dbar. */
  pressureDbar?: number;
}

/**
 * Practical Salinity Scale 1978 with its pressure term (Lewis & Perkin 1981; UNESCO 1981 Technical
 * Papers in Marine Science 37; algorithm and check values in Fofonoff & Millard 1983, UNESCO Technical
 * Papers in Marine Science 44, eqs. 1–4). Temperatures are ITS-90 and are converted to IPTS-68.
 * Throws RangeError when the result falls outside the scale's validity, 2–42.
 */
export function practicalSalinity(input: PracticalSalinityInput): number {
  const {
    conductivityRatio,
    tempC,
    pressureDbar = 0,
  } = requireObject('input', input) as Partial<PracticalSalinityInput>;
  const r = requirePositive('conductivityRatio', conductivityRatio);
  const t90 = requireInRange('tempC', tempC, PSS78_TEMP_RANGE_C.min, PSS78_TEMP_RANGE_C.max, '°C', 'PSS-78');
  const p = requireInRange(
    'pressureDbar',
    pressureDbar,
    PSS78_PRESSURE_RANGE_DBAR.min,
    PSS78_PRESSURE_RANGE_DBAR.max,
    'dbar',
    'PSS-78',
  );
  const t = t68FromT90(t90);

  // rt = C(35, t, 0) / C(35, 15, 0)
  const rt = 0.6766097 + t * (2.00564e-2 + t * (1.104259e-4 + t * (-6.9698e-7 + t * 1.0031e-9)));
  // Rp = C(S, t, p) / C(S, t, 0)
  const rp =
    1 +
    (p * (2.07e-5 + p * (-6.37e-10 + p * 3.989e-15))) /
      (1 + t * (3.426e-2 + t * 4.464e-4) + (4.215e-1 + t * -3.107e-3) * r);
  const bigRt = r / (rp * rt);
  const dt = t - 15;
  const salinity = polynomialInSqrt(A, bigRt) + (dt / (1 + K * dt)) * polynomialInSqrt(B, bigRt);

  if (!(salinity >= PSS78_SALINITY_RANGE.min && salinity <= PSS78_SALINITY_RANGE.max)) {
    throw new RangeError(
      `conductivityRatio ${r} at ${t90} °C and ${p} dbar gives practical salinity ${salinity.toFixed(4)}, ` +
        `outside the PSS-78 validity of ${PSS78_SALINITY_RANGE.min}–${PSS78_SALINITY_RANGE.max}`,
    );
  }
  return salinity;
}

export interface ConductivityInput {
  /** Conductivity measured at the sample temperature (not temperature-compensated), mS/cm. */
  mScm: number;
  /** Sample temperature, ITS-90 °C. */
  tempC: number;
}

/** Practical salinity from a conductivity meter reading at surface pressure. */
export function practicalSalinityFromConductivity(input: ConductivityInput): number {
  const { mScm, tempC } = requireObject('input', input) as Partial<ConductivityInput>;
  const c = requirePositive('mScm', mScm, 'mS/cm');
  return practicalSalinity({
    conductivityRatio: c / C3515_MS_PER_CM,
    tempC: tempC as number,
    pressureDbar: 0,
  });
}
