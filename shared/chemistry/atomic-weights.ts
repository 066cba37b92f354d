import { requireNonNegative, requireObject, requireOneOf } from './validate';

// Single source of truth for atomic weights and the molar masses built from them.
// Values: IUPAC/CIAAW abridged standard atomic weights (conventional values for elements whose
// standard atomic weight is an interval), Prohaska et al. 2022, "Standard atomic weights of the
// elements 2021 (IUPAC Technical Report)", Pure Appl. Chem. 94:573–600. Every unit conversion and dose
// in this package derives from this table, so changing a weight here changes them all consistently.

export const ATOMIC_WEIGHTS = {
  H: 1.008,
  C: 12.011,
  N: 14.007,
  O: 15.999,
  Na: 22.99,
  Mg: 24.305,
  S: 32.06,
  Cl: 35.45,
  Ca: 40.078,
} as const;

export type Element = keyof typeof ATOMIC_WEIGHTS;
export const ELEMENTS = Object.keys(ATOMIC_WEIGHTS) as Element[];

/** Molar mass in g/mol of a formula given as element counts, e.g. { N: 1, O: 3 } for nitrate. */
export function molarMassOf(formula: Partial<Record<Element, number>>): number {
  let total = 0;
  for (const [key, count] of Object.entries(requireObject('formula', formula))) {
    const element = requireOneOf('formula element', key, ELEMENTS);
    total += ATOMIC_WEIGHTS[element] * requireNonNegative(`formula.${element}`, count, 'atoms');
  }
  return total;
}

const WATER = molarMassOf({ H: 2, O: 1 });

/** Molar masses in g/mol. Ions are listed by their formula without charge (electron mass is negligible). */
export const MOLAR_MASSES = {
  N: ATOMIC_WEIGHTS.N,
  Ca: ATOMIC_WEIGHTS.Ca,
  Mg: ATOMIC_WEIGHTS.Mg,
  H2O: WATER,
  NH3: molarMassOf({ N: 1, H: 3 }),
  NH4: molarMassOf({ N: 1, H: 4 }),
  NO2: molarMassOf({ N: 1, O: 2 }),
  NO3: molarMassOf({ N: 1, O: 3 }),
  CaO: molarMassOf({ Ca: 1, O: 1 }),
  CaCO3: molarMassOf({ Ca: 1, C: 1, O: 3 }),
  NaHCO3: molarMassOf({ Na: 1, H: 1, C: 1, O: 3 }),
  Na2CO3: molarMassOf({ Na: 2, C: 1, O: 3 }),
  'CaCl2·2H2O': molarMassOf({ Ca: 1, Cl: 2 }) + 2 * WATER,
  'MgCl2·6H2O': molarMassOf({ Mg: 1, Cl: 2 }) + 6 * WATER,
  'MgSO4·7H2O': molarMassOf({ Mg: 1, S: 1, O: 4 }) + 7 * WATER,
} as const;

export type Species = keyof typeof MOLAR_MASSES;

// The German degree of carbonate hardness is defined as 10 mg/L of CaO equivalent. CaO neutralises
// two protons, so 1 dKH = 2 × 10 / M(CaO) meq/L ≈ 0.3566 meq/L, i.e. 10 × M(CaCO3)/M(CaO) ≈ 17.848 mg/L
// as CaCO3 (1 meq is half a millimole of CaCO3).
export const MEQ_PER_L_PER_DKH = (2 * 10) / MOLAR_MASSES.CaO;
export const MG_PER_L_CACO3_PER_MEQ = MOLAR_MASSES.CaCO3 / 2;
export const MG_PER_L_CACO3_PER_DKH = MEQ_PER_L_PER_DKH * MG_PER_L_CACO3_PER_MEQ;
