/**
 * Test-only reference: the straightforward implementation as it was before the engine was made fast,
 * kept unchanged so the oracle tests can prove the fast one gives the same answers. Do not optimise.
 */
import {
  PARAMETER_KEYS,
  formatNumber,
  formatReading,
  parameterInfo,
  type ParameterKey,
} from '@shared/care/parameters';
import type { CareProfile, ParameterRange } from '@shared/care/profiles/types';
import { sortByTakenAt } from './readings';
import { isSaltwaterSystem } from '@shared/care/system-types';
import { dedupeConcerns } from '@shared/care/evaluation/evaluate-reading';
import { type Concern, type EvaluationContext, type Severity, type WaterTestInput } from '@shared/care/types';
import { classify } from '@shared/care/evaluation/classify';
import { computeFreeAmmonia } from './free-ammonia';
import { stepsFor, type StepContext } from '@shared/care/evaluation/next-steps';
import { trendConcerns } from './trend-rules';
import { dilutionWaterChange } from '@shared/care/evaluation/water-change';
import { idealText, mentorStep, whyText } from '@shared/care/evaluation/wording';

interface Situation {
  profile: CareProfile;
  /** Cycling with no animals: ammonia and nitrite are the point, and nothing can be hurt yet. */
  emptyCycling: boolean;
  cyclingWithAnimals: boolean;
  steps: StepContext;
}

function cycleInfo(parameter: 'ammonia' | 'nitrite', value: number): Concern {
  return {
    parameter,
    severity: 'info',
    rule: `cycle.${parameter}.expected`,
    reason: `${formatReading(parameter, value)}: expected while the tank cycles; it shows the good bacteria have food. No animals are in yet, so nothing is at risk.`,
    nextSteps: [
      'Test ammonia and nitrite again tomorrow.',
      'Do not add animals until the cycle is finished.',
    ],
    value,
    unit: parameterInfo(parameter).unit,
  };
}

function rangeConcern(
  parameter: ParameterKey,
  value: number,
  range: ParameterRange,
  s: Situation,
): Concern | null {
  const verdict = classify(value, range);
  if (verdict.level === 'ok') return null;
  if (
    s.emptyCycling &&
    (parameter === 'ammonia' || parameter === 'nitrite') &&
    verdict.direction === 'high'
  ) {
    return cycleInfo(parameter, value);
  }
  let severity: Severity = verdict.level === 'danger' ? 'urgent' : 'caution';
  let reason = `${formatReading(parameter, value)}: ${whyText(parameter, verdict.direction)}; ${s.profile.animals} need ${idealText(parameter, range)}.`;
  if (s.emptyCycling && severity === 'urgent') {
    severity = 'caution';
    reason += ' No animals are in the tank yet, so there is time to fix it.';
  }
  if (s.cyclingWithAnimals && (parameter === 'ammonia' || parameter === 'nitrite')) {
    reason += ' The tank is still cycling with animals in it, so they are exposed.';
  }
  const steps = stepsFor(parameter, value, verdict.direction, severity, s.steps);
  const concern: Concern = {
    parameter,
    severity,
    rule: `range.${parameter}.${verdict.level}`,
    reason,
    nextSteps: steps.steps,
    value,
    unit: range.unit,
  };
  if (steps.waterChanges) concern.waterChanges = steps.waterChanges;
  return concern;
}

function shortCitation(range: ParameterRange): string {
  const p = range.provenance;
  return p.kind === 'published' ? ` (${p.short ?? p.citation})` : '';
}

function freeAmmoniaConcern(
  reading: WaterTestInput,
  history: readonly WaterTestInput[],
  ctx: EvaluationContext,
  s: Situation,
): Concern | null {
  const total = reading.values.ammonia;
  const range = s.profile.ranges.freeAmmonia;
  if (total === undefined || total <= 0 || !range) return null;
  const outcome = computeFreeAmmonia(reading, total, history, ctx.tank.systemType, s.profile);
  if (!outcome.ok) {
    return {
      parameter: 'freeAmmonia',
      severity: 'info',
      rule: 'derived.freeAmmonia.unknown',
      reason: `Could not work out how much of the ammonia is the toxic free form: ${outcome.why}.`,
      nextSteps: ['Test pH and temperature together with ammonia next time.'],
    };
  }
  const { nh3, basisText } = outcome.result;
  const verdict = classify(nh3, range);
  if (verdict.level === 'ok' || verdict.direction === 'low') return null;
  const limit = `${formatNumber('freeAmmonia', range.caution[1])} mg/L`;
  const what = `Free (toxic) ammonia ${formatNumber('freeAmmonia', nh3)} mg/L NH3, worked out from total ammonia ${formatNumber('ammonia', total)} mg/L with ${basisText}`;
  const base = { parameter: 'freeAmmonia' as const, value: nh3, unit: range.unit };
  if (s.emptyCycling) {
    return {
      ...base,
      severity: 'info',
      rule: 'cycle.freeAmmonia.expected',
      reason: `${what}: above the ${limit} long-term limit for fish${shortCitation(range)}. Normal while cycling an empty tank, but it would harm animals: keep the tank empty until the cycle is finished.`,
      nextSteps: ['Do not add animals until ammonia and nitrite read 0.', 'Test ammonia again tomorrow.'],
    };
  }
  const severity: Severity = verdict.level === 'danger' ? 'urgent' : 'caution';
  return {
    ...base,
    severity,
    rule: `derived.freeAmmonia.${verdict.level}`,
    reason: `${what}: above the ${limit} long-term limit for fish${shortCitation(range)}. ${s.profile.animals[0]?.toUpperCase()}${s.profile.animals.slice(1)} are at risk.`,
    nextSteps: [
      ...dilutionWaterChange(ctx.tank.volumeL, s.steps.saltwater).steps,
      'Do not feed today.',
      'Test ammonia, pH and temperature again after the water change.',
      mentorStep(severity),
    ],
  };
}

/** Everything worth telling a member (and their mentor) about one water test. */
export function referenceEvaluateReading(
  reading: WaterTestInput,
  profile: CareProfile,
  context: EvaluationContext & { history: readonly WaterTestInput[] },
): Concern[] {
  const { tank } = context;
  const hasLivestock = tank.hasLivestock ?? tank.phase === 'established';
  const history = context.history.filter((t) => t.id !== reading.id);
  const nitrateRange = profile.ranges.nitrate;
  const s: Situation = {
    profile,
    emptyCycling: tank.phase === 'cycling' && !hasLivestock,
    cyclingWithAnimals: tank.phase === 'cycling' && hasLivestock,
    steps: {
      volumeL: tank.volumeL,
      saltwater: isSaltwaterSystem(tank.systemType),
      sourceNitrate: context.sourceWater?.nitrate,
      nitrateTarget: nitrateRange?.target ?? nitrateRange?.ideal[1] ?? 0,
    },
  };
  const concerns: Concern[] = [];
  for (const key of PARAMETER_KEYS) {
    const value = reading.values[key];
    const range = profile.ranges[key];
    if (value === undefined || !Number.isFinite(value) || !range) continue;
    const concern = rangeConcern(key, value, range, s);
    if (concern) concerns.push(concern);
  }
  const free = freeAmmoniaConcern(reading, history, context, s);
  if (free) concerns.push(free);
  concerns.push(...trendConcerns(sortByTakenAt([...history, reading]), reading, profile, tank.phase));
  return dedupeConcerns(concerns);
}
