import { fractionToReach, planWaterChanges } from '@shared/chemistry';
import { formatNumber } from '../parameters';
import { formatLitres, formatPercent } from './wording';

/**
 * Largest single water change the engine suggests, as a fraction of the tank. Common practice,
 * no source: bigger changes shift temperature and salinity too fast for delicate animals.
 */
export const MAX_WATER_CHANGE_FRACTION = 0.25;

export interface PlannedWaterChange {
  litres: number;
  fraction: number;
  resulting: number;
}

export interface WaterChangeAdvice {
  steps: string[];
  plan: PlannedWaterChange[];
}

function matchNote(saltwater: boolean): string {
  return saltwater
    ? 'matched to the tank’s temperature and salinity'
    : 'dechlorinated and at the tank’s temperature';
}

/** Nitrate (or any diluted substance) down to `target` with the chemistry engine's plan. */
export function nitrateWaterChange(args: {
  current: number;
  target: number;
  sourceNitrate: number | undefined;
  volumeL: number;
  saltwater: boolean;
}): WaterChangeAdvice {
  const source = args.sourceNitrate ?? 0;
  const assumed =
    args.sourceNitrate === undefined ? ' (assuming your new water has no nitrate: test it to be sure)' : '';
  if (fractionToReach({ current: args.current, target: args.target, source }) === null) {
    return {
      plan: [],
      steps: [
        `Your new water has ${formatNumber('nitrate', source)} mg/L nitrate, not below the ${formatNumber('nitrate', args.target)} mg/L aim, so water changes with it cannot bring nitrate down. Ask your mentor about purified (RO/DI) water.`,
      ],
    };
  }
  const plan = planWaterChanges({
    current: args.current,
    target: args.target,
    source,
    volumeL: args.volumeL,
    maxFractionPerChange: MAX_WATER_CHANGE_FRACTION,
  });
  const first = plan[0];
  const last = plan[plan.length - 1];
  if (!first || !last) return { plan: [], steps: [] };
  const size = `${formatLitres(first.litres)} L (${formatPercent(first.fraction)} of the water)`;
  const times = plan.length === 1 ? '' : ` ${plan.length} times, a day or two apart,`;
  return {
    plan,
    steps: [
      `Change ${size}${times} with new water ${matchNote(args.saltwater)}, to bring nitrate to about ${formatNumber('nitrate', last.resulting)} mg/L${assumed}.`,
    ],
  };
}

/** Ammonia and nitrite cannot be planned down to zero by dilution; suggest one gentle change now. */
export function dilutionWaterChange(volumeL: number, saltwater: boolean): WaterChangeAdvice {
  const litres = volumeL * MAX_WATER_CHANGE_FRACTION;
  return {
    plan: [],
    steps: [
      `Change ${formatLitres(litres)} L (${formatPercent(MAX_WATER_CHANGE_FRACTION)} of the water) today with new water ${matchNote(saltwater)}.`,
    ],
  };
}
