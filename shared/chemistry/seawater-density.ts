import { t68FromT90 } from './temperature-scale';
import { requireInRange } from './validate';

export const EOS80_SALINITY_RANGE = { min: 0, max: 42 } as const;
export const EOS80_TEMP_RANGE_C = { min: -2, max: 40 } as const;

/**
 * Density of seawater at one standard atmosphere (gauge pressure 0), kg/m³: the one-atmosphere
 * International Equation of State of Seawater, EOS-80 (Millero & Poisson 1981, "International one-
 * atmosphere equation of state of seawater", Deep-Sea Res. 28A:625–629; UNESCO 1981 Technical Papers
 * in Marine Science 36; algorithm and check values in Fofonoff & Millard 1983, UNESCO Technical Papers
 * in Marine Science 44). `tempC` is ITS-90 and is converted to the IPTS-68 scale the fit uses.
 * Valid for practical salinity 0–42 and −2–40 °C; the fit's standard error is 0.0036 kg/m³.
 */
export function seawaterDensity(salinity: number, tempC: number): number {
  const s = requireInRange(
    'salinity',
    salinity,
    EOS80_SALINITY_RANGE.min,
    EOS80_SALINITY_RANGE.max,
    '(practical salinity)',
    'EOS-80',
  );
  const t90 = requireInRange('tempC', tempC, EOS80_TEMP_RANGE_C.min, EOS80_TEMP_RANGE_C.max, '°C', 'EOS-80');
  const t = t68FromT90(t90);

  // Standard Mean Ocean Water (Bigg 1967), the pure-water end member of EOS-80.
  const smow =
    999.842594 +
    t * (6.793952e-2 + t * (-9.09529e-3 + t * (1.001685e-4 + t * (-1.120083e-6 + t * 6.536332e-9))));
  const a = 8.24493e-1 + t * (-4.0899e-3 + t * (7.6438e-5 + t * (-8.2467e-7 + t * 5.3875e-9)));
  const b = -5.72466e-3 + t * (1.0227e-4 + t * -1.6546e-6);
  const c = 4.8314e-4;
  return smow + a * s + b * s * Math.sqrt(s) + c * s * s;
}
