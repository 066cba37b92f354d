import { MOLAR_MASSES } from './atomic-weights';
import { ZERO_CELSIUS_IN_KELVIN } from './units';
import { requireInRange, requireNonNegative, requireObject, requireOneOf } from './validate';

/** How a test kit reports total ammonia: as mg/L NH3, as mg/L NH4+, or as mg/L of nitrogen (TAN-N). */
export const AMMONIA_BASES = ['NH3', 'NH4', 'N'] as const;
export type AmmoniaBasis = (typeof AMMONIA_BASES)[number];

// Emerson et al. 1975 fitted their pKa over 0–50 °C.
export const FRESHWATER_TEMP_RANGE_C = { min: 0, max: 50 } as const;
// Khoo, Culberson & Bates 1977 measured the salt effect at 5–40 °C in synthetic seawater up to S ≈ 45.
export const SEAWATER_TEMP_RANGE_C = { min: 5, max: 40 } as const;
export const AMMONIA_SALINITY_RANGE = { min: 0, max: 45 } as const;

/**
 * pKa of NH4+ in pure water: Emerson, Russo, Lund & Thurston 1975, "Aqueous ammonia equilibrium
 * calculations: effect of pH and temperature", J. Fish. Res. Board Can. 32:2379–2383:
 * pKa = 0.09018 + 2729.92 / T, T in kelvin.
 */
export function freshwaterAmmoniumPKa(tempC: number): number {
  const t = requireInRange(
    'tempC',
    tempC,
    FRESHWATER_TEMP_RANGE_C.min,
    FRESHWATER_TEMP_RANGE_C.max,
    '°C',
    'Emerson et al. 1975',
  );
  return 0.09018 + 2729.92 / (t + ZERO_CELSIUS_IN_KELVIN);
}

/**
 * Molal ionic strength of seawater of practical salinity S, as used by Bower & Bidwell 1978:
 * I = 19.9273 S / (1000 − 1.005109 S)  (gives I = 0.701 mol/kg at S = 34).
 */
export function ionicStrengthFromSalinity(salinity: number): number {
  const s = requireInRange(
    'salinity',
    salinity,
    AMMONIA_SALINITY_RANGE.min,
    AMMONIA_SALINITY_RANGE.max,
    '(practical salinity)',
  );
  return (19.9273 * s) / (1000 - 1.005109 * s);
}

/**
 * Stoichiometric pKa of NH4+ in sea or brackish water: Khoo, Culberson & Bates 1977, "Thermodynamics
 * of the dissociation of ammonium ion in seawater from 5 to 40 °C", J. Solution Chem. 6:281, as used by
 * Bower & Bidwell 1978, "Ionization of ammonia in seawater: effects of temperature, pH, and salinity",
 * J. Fish. Res. Board Can. 35:1012–1016:  pKa = pKa(pure water) + (0.1552 − 0.0003142 t) I,
 * with t in °C and I from ionicStrengthFromSalinity. pH is on the NBS (glass electrode) scale.
 */
export function seawaterAmmoniumPKa(tempC: number, salinity: number): number {
  const t = requireInRange(
    'tempC',
    tempC,
    SEAWATER_TEMP_RANGE_C.min,
    SEAWATER_TEMP_RANGE_C.max,
    '°C',
    'Khoo et al. 1977 salt correction',
  );
  const ionicStrength = ionicStrengthFromSalinity(salinity);
  return freshwaterAmmoniumPKa(t) + (0.1552 - 0.0003142 * t) * ionicStrength;
}

export interface UnionizedAmmoniaInput {
  tempC: number;
  pH: number;
  /** Practical salinity; 0 (the default) selects the fresh-water formula. */
  salinity?: number;
}

/** Fraction (0–1) of total ammonia present as un-ionized NH3. */
export function unionizedAmmoniaFraction(input: UnionizedAmmoniaInput): number {
  const { tempC, pH, salinity = 0 } = requireObject('input', input) as Partial<UnionizedAmmoniaInput>;
  const ph = requireInRange('pH', pH, 0, 14);
  const s = requireInRange(
    'salinity',
    salinity,
    AMMONIA_SALINITY_RANGE.min,
    AMMONIA_SALINITY_RANGE.max,
    '(practical salinity)',
  );
  const pKa = s === 0 ? freshwaterAmmoniumPKa(tempC as number) : seawaterAmmoniumPKa(tempC as number, s);
  return 1 / (1 + 10 ** (pKa - ph));
}

export interface FreeAmmoniaInput extends UnionizedAmmoniaInput {
  /** Total ammonia reading (NH3 + NH4+), in mg/L as `basis`. */
  total: number;
  basis: AmmoniaBasis;
}

export interface FreeAmmonia {
  /** Un-ionized ammonia, mg/L as NH3. */
  nh3: number;
  /** Un-ionized ammonia, mg/L as N. */
  nh3N: number;
}

const NITROGEN_FRACTION: Record<AmmoniaBasis, number> = {
  NH3: MOLAR_MASSES.N / MOLAR_MASSES.NH3,
  NH4: MOLAR_MASSES.N / MOLAR_MASSES.NH4,
  N: 1,
};

/** Un-ionized (toxic) ammonia from a total-ammonia test-kit reading. */
export function freeAmmonia(input: FreeAmmoniaInput): FreeAmmonia {
  const {
    total,
    basis,
    tempC,
    pH,
    salinity = 0,
  } = requireObject('input', input) as Partial<FreeAmmoniaInput>;
  const reading = requireNonNegative('total', total, 'mg/L');
  const kitBasis = requireOneOf('basis', basis, AMMONIA_BASES);
  const fraction = unionizedAmmoniaFraction({ tempC: tempC as number, pH: pH as number, salinity });
  const nh3N = reading * NITROGEN_FRACTION[kitBasis] * fraction;
  return { nh3: (nh3N * MOLAR_MASSES.NH3) / MOLAR_MASSES.N, nh3N };
}
