import { MEQ_PER_L_PER_DKH, MOLAR_MASSES } from './atomic-weights';
import { requireNonNegative, requireObject, requireOneOf, requirePositive } from './validate';

export const SUPPLEMENTS = [
  'sodium-bicarbonate',
  'sodium-carbonate',
  'calcium-chloride-dihydrate',
  'magnesium-chloride-hexahydrate',
  'magnesium-sulfate-heptahydrate',
] as const;
export type Supplement = (typeof SUPPLEMENTS)[number];

export const DOSED_PARAMETERS = ['alkalinity', 'calcium', 'magnesium'] as const;
export type DosedParameter = (typeof DOSED_PARAMETERS)[number];

/** Unit of a rise: dKH for alkalinity, mg/L of the element for calcium and magnesium. */
export type RiseUnit = 'dKH' | 'mg/L Ca' | 'mg/L Mg';

interface SupplementSpec {
  parameter: DosedParameter;
  /** Molar mass of the salt as weighed, water of hydration included, g/mol. */
  molarMass: number;
  /**
   * What one mole of salt delivers: equivalents of alkalinity (NaHCO3: HCO3− takes one proton;
   * Na2CO3: CO3²− takes two), or moles of the element (one Ca or Mg per formula unit).
   */
  perMole: number;
}

export const SUPPLEMENT_SPECS: Readonly<Record<Supplement, SupplementSpec>> = {
  'sodium-bicarbonate': { parameter: 'alkalinity', molarMass: MOLAR_MASSES.NaHCO3, perMole: 1 },
  'sodium-carbonate': { parameter: 'alkalinity', molarMass: MOLAR_MASSES.Na2CO3, perMole: 2 },
  'calcium-chloride-dihydrate': { parameter: 'calcium', molarMass: MOLAR_MASSES['CaCl2·2H2O'], perMole: 1 },
  'magnesium-chloride-hexahydrate': {
    parameter: 'magnesium',
    molarMass: MOLAR_MASSES['MgCl2·6H2O'],
    perMole: 1,
  },
  'magnesium-sulfate-heptahydrate': {
    parameter: 'magnesium',
    molarMass: MOLAR_MASSES['MgSO4·7H2O'],
    perMole: 1,
  },
};

export const RISE_UNITS: Readonly<Record<DosedParameter, RiseUnit>> = {
  alkalinity: 'dKH',
  calcium: 'mg/L Ca',
  magnesium: 'mg/L Mg',
};

/**
 * Largest rise per day that is commonly considered safe for livestock. Common practice, no source:
 * keepers' rule of thumb of about 1 dKH, 20 mg/L calcium and 100 mg/L magnesium per day.
 */
export const MAX_SAFE_DAILY_RISE: Readonly<Record<DosedParameter, number>> = {
  alkalinity: 1,
  calcium: 20,
  magnesium: 100,
};

/** Upper limit on the number of days a dose plan may span. */
export const MAX_DOSE_DAYS = 365;

function parameterOf(supplementOrParameter: Supplement | DosedParameter): DosedParameter {
  const key = requireOneOf('supplementOrParameter', supplementOrParameter, [
    ...SUPPLEMENTS,
    ...DOSED_PARAMETERS,
  ]);
  return (DOSED_PARAMETERS as readonly string[]).includes(key)
    ? (key as DosedParameter)
    : SUPPLEMENT_SPECS[key as Supplement].parameter;
}

/** Rise unit for a supplement or parameter ('dKH', 'mg/L Ca' or 'mg/L Mg'). */
export function riseUnitFor(supplementOrParameter: Supplement | DosedParameter): RiseUnit {
  return RISE_UNITS[parameterOf(supplementOrParameter)];
}

/** Largest safe daily rise, in riseUnitFor(supplementOrParameter) per day. Common practice, no source. */
export function maxSafeDailyRise(supplementOrParameter: Supplement | DosedParameter): number {
  return MAX_SAFE_DAILY_RISE[parameterOf(supplementOrParameter)];
}

export interface DoseInput {
  supplement: Supplement;
  /** Water volume, litres. */
  volumeL: number;
  /** Rise wanted, in riseUnitFor(supplement). */
  rise: number;
}

/** Grams of supplement for the rise, by stoichiometry (assumes complete dissolution and mixing). */
export function doseFor(input: DoseInput): number {
  const obj = requireObject('input', input);
  const supplement = requireOneOf('supplement', obj.supplement, SUPPLEMENTS);
  const volumeL = requirePositive('volumeL', obj.volumeL, 'L');
  const spec = SUPPLEMENT_SPECS[supplement];
  const rise = requireNonNegative('rise', obj.rise, RISE_UNITS[spec.parameter]);

  let amountPerLitre: number; // eq/L of alkalinity or mol/L of element
  if (spec.parameter === 'alkalinity') {
    amountPerLitre = (rise * MEQ_PER_L_PER_DKH) / 1000;
  } else {
    const element = spec.parameter === 'calcium' ? MOLAR_MASSES.Ca : MOLAR_MASSES.Mg;
    amountPerLitre = rise / 1000 / element;
  }
  return ((amountPerLitre * volumeL) / spec.perMole) * spec.molarMass;
}

export interface DosePlanInput extends DoseInput {
  /** Override the common-practice daily limit, in riseUnitFor(supplement) per day. */
  maxDailyRise?: number;
}

export interface DoseDay {
  /** 1-based day number. */
  day: number;
  /** Rise delivered that day, in riseUnitFor(supplement). */
  rise: number;
  grams: number;
}

/**
 * Split a rise into the fewest equal daily doses that each stay within the daily limit.
 * Returns [] for a zero rise; throws RangeError if the plan would exceed MAX_DOSE_DAYS.
 */
export function planDoses(input: DosePlanInput): DoseDay[] {
  const obj = requireObject('input', input);
  const supplement = requireOneOf('supplement', obj.supplement, SUPPLEMENTS);
  const volumeL = requirePositive('volumeL', obj.volumeL, 'L');
  const unit = riseUnitFor(supplement);
  const rise = requireNonNegative('rise', obj.rise, unit);
  const limit = requirePositive(
    'maxDailyRise',
    obj.maxDailyRise ?? maxSafeDailyRise(supplement),
    `${unit} per day`,
  );

  if (rise === 0) return [];
  let days = Math.ceil(rise / limit);
  // Guard against rounding such as 3.0000000000000004 days.
  if (days > 1 && rise / (days - 1) <= limit) days -= 1;
  if (days > MAX_DOSE_DAYS) {
    throw new RangeError(
      `a rise of ${rise} ${unit} at ${limit} ${unit} per day needs ${days} days, more than ${MAX_DOSE_DAYS}`,
    );
  }
  const daily = Math.min(rise / days, limit);
  const grams = doseFor({ supplement, volumeL, rise: daily });
  return Array.from({ length: days }, (_, i) => ({ day: i + 1, rise: daily, grams }));
}
