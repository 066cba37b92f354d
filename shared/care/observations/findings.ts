import { capitalised, listOf, mentorStep } from '../evaluation/wording';
import type { Provenance } from '../provenance';
import type { SystemType } from '../system-types';
import { isoDate, toMs } from '../time';
import { severityRank, type Severity } from '../types';
import { PATTERN_RULES, CHECK_RULES, SIGN_RULES, type SignRule } from './severity-rules';
import { currentSigns, type SubjectSigns } from './signs';
import { OBSERVATION_CHECKS, OBSERVATION_SCALE_KEYS, type ObservationInput } from './vocabulary';

export interface ObservationFinding {
  /** Stable id of the rule (the dedupe key): `observation.breathing.fast`, `observation.not-eating`, … */
  rule: string;
  severity: Severity;
  /** Plain words: what was seen, on whom, and why it matters. Never a diagnosis. */
  reason: string;
  nextSteps: string[];
  /** The keeper's words for the animals concerned ("the animals" when not named). */
  animals: string[];
  livestockIds: string[];
  observationIds: string[];
  provenance: Provenance;
}

export interface ObservationContext {
  tank: {
    systemType: SystemType;
    /** Whether animals live in the tank; defaults to true (someone watched them). */
    hasLivestock?: boolean;
  };
  /** ISO timestamp; the engine never reads the clock. */
  now: string;
}

interface Hit {
  rule: string;
  severity: Severity;
  seen: string;
  why?: string;
  provenance: Provenance;
  subject: SubjectSigns;
  observationIds: string[];
}

export const VET_STEP = 'If an animal gets worse, ask a veterinarian who knows aquatic animals.';
export const CHECKLIST_STEP = 'Go through "What to check next" for this tank.';

function fromRule(rule: string, r: SignRule, subject: SubjectSigns, observationIds: string[]): Hit {
  return {
    rule,
    severity: r.severity,
    seen: r.seen,
    ...(r.why ? { why: r.why } : {}),
    provenance: r.provenance,
    subject,
    observationIds,
  };
}

function spanHours(times: readonly string[]): number {
  const ms = times.map(toMs);
  return (Math.max(...ms) - Math.min(...ms)) / 3_600_000;
}

function notEatingHit(s: SubjectSigns, ctx: ObservationContext): Hit | null {
  const run = s.notEating;
  const rule = PATTERN_RULES.notEating;
  if (!run || run.hours < rule.minHours) return null;
  const seahorse = ctx.tank.systemType === 'seahorse' && ctx.tank.hasLivestock !== false;
  const severity: Severity = seahorse || run.hours >= rule.otherUrgentDays * 24 ? 'urgent' : 'caution';
  const days = Math.max(2, Math.round(run.hours / 24) + 1);
  return {
    rule: 'observation.not-eating',
    severity,
    seen: `no food eaten on ${days} days running (since ${isoDate(run.since)})`,
    why: seahorse
      ? 'Seahorses have no true stomach and need food several times a day, so they weaken fast without it.'
      : 'Most animals cope with a few days, but refusing food day after day is a sign to look for the cause.',
    provenance: seahorse ? rule.provenanceSeahorse : rule.provenanceOther,
    subject: s,
    observationIds: run.observationIds,
  };
}

function subjectHits(s: SubjectSigns, ctx: ObservationContext): Hit[] {
  const hits: Hit[] = [];
  const notEating = notEatingHit(s, ctx);
  if (notEating) hits.push(notEating);
  for (const scale of OBSERVATION_SCALE_KEYS) {
    const sign = s.unusual[scale];
    if (!sign) continue;
    // A run of refusals is reported once, as not eating.
    if (scale === 'feedingResponse' && notEating) continue;
    const r = (SIGN_RULES[scale] as Partial<Record<string, SignRule>>)[sign.value];
    if (r) hits.push(fromRule(`observation.${scale}.${sign.value}`, r, s, [sign.observationId]));
  }
  for (const check of OBSERVATION_CHECKS) {
    const seen = s.checks[check];
    if (!seen) continue;
    const hit = fromRule(
      `observation.check.${check}`,
      CHECK_RULES[check],
      s,
      seen.map((x) => x.observationId),
    );
    const rep = PATTERN_RULES.repeatedScratching;
    if (
      check === 'scratching' &&
      seen.length >= rep.minObservations &&
      spanHours(seen.map((x) => x.observedAt)) >= rep.minHours
    ) {
      hits.push({
        ...hit,
        severity: 'caution',
        seen: 'rubbing or scratching again and again',
        provenance: rep.provenance,
      });
    } else hits.push(hit);
  }
  const breathing = s.unusual.breathing;
  const surface = s.checks.stayingAtSurface;
  if (breathing && surface) {
    const r = PATTERN_RULES.surfaceBreathing;
    // Reported as one: breathing not as usual while staying at the surface.
    const parts = new Set([`observation.breathing.${breathing.value}`, 'observation.check.stayingAtSurface']);
    const kept = hits.filter((h) => !parts.has(h.rule));
    kept.push({
      rule: 'observation.surface-breathing',
      severity: r.severity,
      seen: 'breathing hard and staying at the surface',
      why: 'Animals do this when the water does not give them enough oxygen; it can get worse within hours. The water is the first thing to check.',
      provenance: r.provenance,
      subject: s,
      observationIds: [breathing.observationId, ...surface.map((x) => x.observationId)],
    });
    return kept;
  }
  return hits;
}

function severalAnimalsHit(hits: readonly Hit[], subjects: readonly SubjectSigns[]): Hit | null {
  const rule = PATTERN_RULES.severalAnimals;
  const worrying = hits.filter((h) => severityRank(h.severity) >= severityRank('caution'));
  const animals = new Set(worrying.map((h) => h.subject.key));
  const group = worrying.some((h) => h.subject.affected === 'some' || h.subject.affected === 'all');
  if (animals.size < rule.minAnimals && !group) return null;
  const first = subjects.find((s) => animals.has(s.key));
  if (!first) return null;
  return {
    rule: 'observation.several-animals',
    severity: rule.severity,
    seen:
      group && animals.size < rule.minAnimals
        ? 'signs on several animals of the group at once'
        : 'signs on several animals at once',
    why: 'When several animals show signs together, look at the water and at what could spread between them first.',
    provenance: rule.provenance,
    subject: first,
    observationIds: [...new Set(worrying.flatMap((h) => h.observationIds))],
  };
}

function toFinding(rule: string, hits: readonly Hit[], all: readonly Hit[]): ObservationFinding {
  const severity = hits.reduce<Severity>(
    (worst, h) => (severityRank(h.severity) > severityRank(worst) ? h.severity : worst),
    'info',
  );
  const top = hits.find((h) => h.severity === severity) ?? (hits[0] as Hit);
  const subjects =
    rule === 'observation.several-animals' ? all.map((h) => h.subject) : hits.map((h) => h.subject);
  const animals = [...new Set(subjects.map((s) => s.label))];
  const livestockIds = [...new Set(subjects.flatMap((s) => (s.livestockId ? [s.livestockId] : [])))];
  const seen = [...new Set(hits.map((h) => h.seen))].join('; ');
  const steps = [CHECKLIST_STEP, mentorStep(severity)];
  if (severity === 'urgent') steps.push(VET_STEP);
  return {
    rule,
    severity,
    reason: `${capitalised(listOf(animals))}: ${seen}.${top.why ? ` ${top.why}` : ''}`,
    nextSteps: steps,
    animals,
    livestockIds,
    observationIds: [...new Set(hits.flatMap((h) => h.observationIds))],
    provenance: top.provenance,
  };
}

/**
 * Which of the recent observations should worry the keeper and their mentor, and how much: one finding per
 * rule, most severe first. Signs count from each animal's latest observation of them (see `currentSigns`).
 */
export function observationFindings(
  observations: readonly ObservationInput[],
  context: ObservationContext,
): ObservationFinding[] {
  const subjects = currentSigns(observations, context.now);
  const hits = subjects.flatMap((s) => subjectHits(s, context));
  const several = severalAnimalsHit(hits, subjects);
  const byRule = new Map<string, Hit[]>();
  for (const h of several ? [...hits, several] : hits) byRule.set(h.rule, [...(byRule.get(h.rule) ?? []), h]);
  const worrying = hits.filter((h) => severityRank(h.severity) >= severityRank('caution'));
  return [...byRule]
    .map(([rule, list]) => toFinding(rule, list, worrying))
    .sort((a, b) => severityRank(b.severity) - severityRank(a.severity));
}

/** The worst severity among the findings, or null when nothing observed is a worry. */
export function observationSeverity(
  observations: readonly ObservationInput[],
  context: ObservationContext,
): Severity | null {
  return observationFindings(observations, context)[0]?.severity ?? null;
}
