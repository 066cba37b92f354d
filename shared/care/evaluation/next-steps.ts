import { parameterInfo, type ParameterKey } from '../parameters';
import type { Severity } from '../types';
import { dilutionWaterChange, nitrateWaterChange, type PlannedWaterChange } from './water-change';
import { mentorStep } from './wording';

export interface StepContext {
  volumeL: number;
  saltwater: boolean;
  sourceNitrate: number | undefined;
  /** What nitrate should be brought down to. */
  nitrateTarget: number;
}

export interface Steps {
  steps: string[];
  waterChanges?: PlannedWaterChange[];
}

/** What a beginner should do about one parameter out of range. */
export function stepsFor(
  parameter: ParameterKey,
  value: number,
  direction: 'high' | 'low',
  severity: Severity,
  ctx: StepContext,
): Steps {
  const label = parameterInfo(parameter).label.toLowerCase();
  const mentor = mentorStep(severity);
  if ((parameter === 'ammonia' || parameter === 'nitrite') && direction === 'high') {
    return {
      steps: [
        ...dilutionWaterChange(ctx.volumeL, ctx.saltwater).steps,
        'Feed less until it reads 0 again: uneaten food makes more.',
        'Check nothing has died or is rotting in the tank, and that the filter is running.',
        `Test ${parameter} again tomorrow.`,
        mentor,
      ],
    };
  }
  if (parameter === 'nitrate' && direction === 'high') {
    const advice = nitrateWaterChange({
      current: value,
      target: ctx.nitrateTarget,
      sourceNitrate: ctx.sourceNitrate,
      volumeL: ctx.volumeL,
      saltwater: ctx.saltwater,
    });
    return {
      steps: [
        ...advice.steps,
        'Stop feeding heavily: uneaten food becomes nitrate.',
        'Test nitrate again after the water changes.',
        mentor,
      ],
      waterChanges: advice.plan,
    };
  }
  if (parameter === 'temperature') {
    return {
      steps: [
        direction === 'high'
          ? 'Check the heater is not stuck on; keep the tank out of the sun and let the room cool.'
          : 'Check the heater is plugged in, switched on and set right.',
        'Change the temperature slowly, over hours, not all at once.',
        `Check your thermometer, then test ${label} again tomorrow.`,
        mentor,
      ],
    };
  }
  if (parameter === 'salinity') {
    return {
      steps: [
        direction === 'high'
          ? 'Top up with fresh (purified) water, not salt water: evaporation leaves the salt behind.'
          : 'Mix new salt water a little stronger for the next water changes.',
        'Correct salinity slowly, over several days.',
        'Check your salinity tester is calibrated.',
        mentor,
      ],
    };
  }
  if (parameter === 'pH' && direction === 'low') {
    return {
      steps: [
        'Test alkalinity (dKH).',
        'Make sure the water is well aired (surface moving).',
        `Test ${label} again tomorrow.`,
        mentor,
      ],
    };
  }
  return {
    steps: [
      `Test ${label} again to rule out a misread.`,
      'Ask your mentor before adding anything to correct it.',
    ],
  };
}
