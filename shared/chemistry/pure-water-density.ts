import { requireInRange } from './validate';

export const PURE_WATER_TEMP_RANGE_C = { min: 0, max: 40 } as const;

/**
 * Density of air-free pure water (VSMOW isotopic composition) at 101.325 kPa, kg/m³, ITS-90 °C:
 * Tanaka, Girard, Davis, Peuto & Bignell 2001, "Recommended table for the density of water between
 * 0 °C and 40 °C based on recent experimental reports", Metrologia 38:301–309, eq. (1):
 * ρ = a5 [1 − (t + a1)² (t + a2) / (a3 (t + a4))]. Valid 0–40 °C.
 */
export function pureWaterDensity(tempC: number): number {
  const t = requireInRange(
    'tempC',
    tempC,
    PURE_WATER_TEMP_RANGE_C.min,
    PURE_WATER_TEMP_RANGE_C.max,
    '°C',
    'Tanaka et al. 2001',
  );
  const a1 = -3.983035; // °C
  const a2 = 301.797; // °C
  const a3 = 522528.9; // °C²
  const a4 = 69.34881; // °C
  const a5 = 999.97495; // kg/m³
  return a5 * (1 - ((t + a1) ** 2 * (t + a2)) / (a3 * (t + a4)));
}
