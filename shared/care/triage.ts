import { DAY_MS, toMs } from './time';
import type { Severity, TankPhase } from './types';

export interface TankState {
  tankId: string;
  createdAt: string;
  lastTestAt: string | null;
  openConcerns: readonly { severity: Severity; raisedAt: string }[];
  /** Trend concerns (rules `trend.*`) open on the tank. */
  risingTrends: number;
  unansweredQuestions: number;
  phase: TankPhase;
}

export interface TriagePart {
  label: string;
  points: number;
}

export interface TriageResult {
  score: number;
  parts: TriagePart[];
}

export interface RankedTank extends TriageResult {
  tankId: string;
}

/**
 * Weights, all common practice, no source: a product choice, documented in README.md.
 * They are set so that one open urgent concern, however old, always outranks a tank without one:
 * an urgent concern is worth at least 1000 × 0.5 = 500, and every other part together at most
 * 300 + 20 + 40 + 45 + 60 + 30 = 495.
 */
export const TRIAGE_WEIGHTS = {
  concern: { urgent: 1000, caution: 100, info: 5 },
  /** Total caps per severity (urgent is uncapped). */
  concernCap: { caution: 300, info: 20 },
  /** A concern's weight halves every halfLifeDays, but never drops below `floor` of its weight. */
  decay: { halfLifeDays: 7, floor: 0.5 },
  stale: { afterDays: 7, perDay: 4, cap: 40 },
  risingTrend: { each: 15, cap: 45 },
  unansweredQuestion: { each: 20, cap: 60 },
  newTank: { withinDays: 42, max: 30 },
} as const;

function round1(n: number): number {
  return Math.round(n * 10) / 10;
}

function ageDays(iso: string, nowMs: number): number {
  return Math.max(0, (nowMs - toMs(iso)) / DAY_MS);
}

export function concernDecay(age: number): number {
  const { halfLifeDays, floor } = TRIAGE_WEIGHTS.decay;
  return Math.max(floor, 0.5 ** (age / halfLifeDays));
}

function concernParts(state: TankState, nowMs: number): TriagePart[] {
  const parts: TriagePart[] = [];
  for (const severity of ['urgent', 'caution', 'info'] as const) {
    const list = state.openConcerns.filter((c) => c.severity === severity);
    if (list.length === 0) continue;
    let points = list.reduce(
      (sum, c) => sum + TRIAGE_WEIGHTS.concern[severity] * concernDecay(ageDays(c.raisedAt, nowMs)),
      0,
    );
    if (severity !== 'urgent') points = Math.min(points, TRIAGE_WEIGHTS.concernCap[severity]);
    parts.push({ label: `${list.length} open ${severity} concern(s)`, points: round1(points) });
  }
  return parts;
}

/** How much a mentor should look at this tank now. Deterministic: depends only on the state and `now`. */
export function triageScore(state: TankState, now: string): TriageResult {
  const nowMs = toMs(now);
  const w = TRIAGE_WEIGHTS;
  const parts = concernParts(state, nowMs);

  const sinceTest = ageDays(state.lastTestAt ?? state.createdAt, nowMs);
  if (sinceTest > w.stale.afterDays) {
    const points = Math.min(w.stale.cap, (sinceTest - w.stale.afterDays) * w.stale.perDay);
    const label = state.lastTestAt
      ? `No test for ${Math.floor(sinceTest)} days`
      : `Never tested in ${Math.floor(sinceTest)} days`;
    parts.push({ label, points: round1(points) });
  }
  if (state.risingTrends > 0) {
    parts.push({
      label: `${state.risingTrends} worsening trend(s)`,
      points: Math.min(w.risingTrend.cap, state.risingTrends * w.risingTrend.each),
    });
  }
  if (state.unansweredQuestions > 0) {
    parts.push({
      label: `${state.unansweredQuestions} unanswered question(s)`,
      points: Math.min(w.unansweredQuestion.cap, state.unansweredQuestions * w.unansweredQuestion.each),
    });
  }
  const age = ageDays(state.createdAt, nowMs);
  if (age < w.newTank.withinDays) {
    parts.push({
      label: `New tank (day ${Math.floor(age) + 1}${state.phase === 'cycling' ? ', cycling' : ''})`,
      points: round1(w.newTank.max * (1 - age / w.newTank.withinDays)),
    });
  }
  const score = round1(parts.reduce((sum, p) => sum + p.points, 0));
  return { score, parts };
}

/**
 * Highest score first. Ties: the tank whose last test is oldest first (never tested counts as oldest),
 * then tank id, so the order is stable whatever order the states arrive in.
 */
export function rankTanks(states: readonly TankState[], now: string): RankedTank[] {
  const lastMs = (s: TankState) => (s.lastTestAt === null ? -Infinity : toMs(s.lastTestAt));
  return states
    .map((state) => ({ state, result: triageScore(state, now) }))
    .sort(
      (a, b) =>
        b.result.score - a.result.score ||
        lastMs(a.state) - lastMs(b.state) ||
        (a.state.tankId < b.state.tankId ? -1 : a.state.tankId > b.state.tankId ? 1 : 0),
    )
    .map(({ state, result }) => ({ tankId: state.tankId, ...result }));
}
