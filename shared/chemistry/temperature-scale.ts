import { requireFinite } from './validate';

// Thermometers today report ITS-90. The seawater formulas of the 1980s (EOS-80, PSS-78) were fitted on
// the older IPTS-68 scale, so they must be fed T68. Over 0–40 °C the linear relation T68 = 1.00024·T90
// is accurate to a few mK (Saunders 1990, "The International Temperature Scale of 1990, ITS-90",
// WOCE Newsletter 10:10), and it is the conversion TEOS-10's gsw uses inside SP_from_C.
export const T68_PER_T90 = 1.00024;

export function t68FromT90(t90: number): number {
  return requireFinite('t90', t90, '°C') * T68_PER_T90;
}

export function t90FromT68(t68: number): number {
  return requireFinite('t68', t68, '°C') / T68_PER_T90;
}
