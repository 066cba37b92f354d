import { compareTests } from '../readings';
import { DAY_MS, toMs } from '../time';
import {
  ATE_VALUES,
  DID_NOT_EAT_VALUES,
  OBSERVATION_CHECKS,
  OBSERVATION_SCALE_KEYS,
  USUAL_VALUES,
  type ObservationAffected,
  type ObservationCheck,
  type ObservationInput,
  type ObservationScale,
  type ObservationValue,
} from './vocabulary';

/**
 * How far back the signs are read. Common practice, no source: a sign seen in the last three days and not
 * seen to go away is still worth acting on; older than that, watch again and log what you see now. A
 * refusal to eat is followed back two weeks, so a long run is measured from its start.
 */
export const SIGN_WINDOWS = {
  signDays: 3,
  feedingLookbackDays: 14,
  provenance: 'common practice, no source',
} as const;

export interface SeenAt {
  observationId: string;
  observedAt: string;
}

export interface SeenSign<V extends string = string> extends SeenAt {
  value: V;
}

export interface NotEatingRun {
  /** The first refusal of the run (no meal seen since). */
  since: string;
  /** The latest refusal. */
  latest: string;
  hours: number;
  observationIds: string[];
}

/** One animal (or group) and what it shows now. */
export interface SubjectSigns {
  /** livestockId, else the keeper's words for the animals in lower case, else "" for the tank as a whole. */
  key: string;
  /** Words for the reason: the keeper's own ("Yellow seahorse"), else "the animals". */
  label: string;
  livestockId?: string;
  /** From the latest observation that said. */
  affected?: ObservationAffected;
  /** The latest value of each scale recorded in the window, when it is not the usual one. */
  unusual: { [S in ObservationScale]?: SeenSign<ObservationValue<S>> };
  /** Checks ticked in the window and not recorded as gone (`false`) by a later observation. */
  checks: Partial<Record<ObservationCheck, SeenAt[]>>;
  notEating: NotEatingRun | null;
  /** Every observation of this subject in the window, oldest first. */
  observationIds: string[];
}

function subjectKey(o: ObservationInput): string {
  return o.livestockId ?? o.animal?.trim().toLowerCase() ?? '';
}

interface Timed {
  o: ObservationInput;
  ms: number;
}

function notEatingRun(list: readonly Timed[], fromMs: number): NotEatingRun | null {
  let run: Timed[] = [];
  for (const t of list) {
    if (t.ms < fromMs || t.o.feedingResponse === undefined) continue;
    if ((ATE_VALUES as readonly string[]).includes(t.o.feedingResponse)) run = [];
    else if ((DID_NOT_EAT_VALUES as readonly string[]).includes(t.o.feedingResponse)) run.push(t);
  }
  const first = run[0];
  const last = run[run.length - 1];
  if (!first || !last) return null;
  return {
    since: first.o.observedAt,
    latest: last.o.observedAt,
    hours: (last.ms - first.ms) / 3_600_000,
    observationIds: run.map((t) => t.o.id),
  };
}

function signsOf(
  key: string,
  list: readonly Timed[],
  windowFromMs: number,
  feedingFromMs: number,
): SubjectSigns {
  const inWindow = list.filter((t) => t.ms >= windowFromMs);
  const latest = inWindow[inWindow.length - 1]?.o;
  const named = [...inWindow]
    .reverse()
    .find((t) => t.o.animal?.trim())
    ?.o.animal?.trim();
  const s: SubjectSigns = {
    key,
    label: named ?? 'the animals',
    unusual: {},
    checks: {},
    notEating: null,
    observationIds: inWindow.map((t) => t.o.id),
  };
  if (latest?.livestockId) s.livestockId = latest.livestockId;
  const affected = [...inWindow].reverse().find((t) => t.o.affected)?.o.affected;
  if (affected) s.affected = affected;
  for (const scale of OBSERVATION_SCALE_KEYS) {
    const last = [...inWindow].reverse().find((t) => t.o[scale] !== undefined);
    const value = last?.o[scale];
    if (last && value !== undefined && !(USUAL_VALUES[scale] as readonly string[]).includes(value)) {
      (s.unusual as Record<string, SeenSign>)[scale] = {
        value,
        observationId: last.o.id,
        observedAt: last.o.observedAt,
      };
    }
  }
  for (const check of OBSERVATION_CHECKS) {
    let seen: SeenAt[] = [];
    for (const t of inWindow) {
      const ticked = t.o.checks?.[check];
      if (ticked === true) seen.push({ observationId: t.o.id, observedAt: t.o.observedAt });
      else if (ticked === false) seen = [];
    }
    if (seen.length > 0) s.checks[check] = seen;
  }
  s.notEating = notEatingRun(list, feedingFromMs);
  // A refusal older than the window, with nothing since, is not news any more.
  if (s.notEating && toMs(s.notEating.latest) < windowFromMs) s.notEating = null;
  return s;
}

/**
 * What each animal (or group) shows now, from the observations up to `now`: the latest value of every
 * scale, the checks still standing and any run of meals refused. Input order never matters.
 */
export function currentSigns(observations: readonly ObservationInput[], now: string): SubjectSigns[] {
  const nowMs = toMs(now);
  const windowFromMs = nowMs - SIGN_WINDOWS.signDays * DAY_MS;
  const feedingFromMs = nowMs - SIGN_WINDOWS.feedingLookbackDays * DAY_MS;
  const bySubject = new Map<string, Timed[]>();
  const timed = observations
    .map((o) => ({ o, ms: toMs(o.observedAt) }))
    .filter((t) => t.ms <= nowMs && t.ms >= feedingFromMs)
    .sort((a, b) => compareTests(a.ms, a.o.id, b.ms, b.o.id));
  for (const t of timed) {
    const key = subjectKey(t.o);
    bySubject.set(key, [...(bySubject.get(key) ?? []), t]);
  }
  return [...bySubject]
    .map(([key, list]) => signsOf(key, list, windowFromMs, feedingFromMs))
    .filter((s) => s.observationIds.length > 0 || s.notEating !== null)
    .sort((a, b) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0));
}
