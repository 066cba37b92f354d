/**
 * Test-only reference: the straightforward implementation as it was before the engine was made fast,
 * kept unchanged so the oracle tests can prove the fast one gives the same answers. Do not optimise.
 */
import {
  CYCLE_DURATION_WEEKS,
  CYCLE_STAGE_DEFAULTS,
  type CycleProjection,
  type CycleStage,
  type CycleStageOptions,
  type CycleStageResult,
} from '@shared/care/cycle-constants';
import { formatNumber } from '@shared/care/parameters';
import { sortByTakenAt } from './readings';
import { DAY_MS, daysBetween, isoDate, toIso, toMs } from './time';
import type { WaterTestInput } from '@shared/care/types';

interface Resolved {
  cycledAfterDays: number;
  confirmTests: number;
  zeroA: number;
  zeroN: number;
  fall: number;
  nowMs: number | null;
}

interface ZeroRun {
  start: string;
  count: number;
  nitrate: number | undefined;
}

interface State {
  stage: CycleStage;
  since: string | null;
  pending: { stage: CycleStage; since: string; ids: string[] } | null;
  oneOffs: string[];
  cycleStart: string | null;
  startValue: string | null;
  peakA: number;
  peakN: number;
  prevA: number | undefined;
  prevN: number | undefined;
  zeroRun: ZeroRun | null;
  cycledAt: string | null;
  setbackValue: string | null;
}

const PRE_CYCLE: ReadonlySet<CycleStage> = new Set([
  'not-started',
  'ammonia-rising',
  'nitrite-rising',
  'nitrite-falling',
]);

function resolve(o: CycleStageOptions): Resolved {
  return {
    cycledAfterDays: o.cycledAfterDays ?? CYCLE_STAGE_DEFAULTS.cycledAfterDays,
    confirmTests: Math.max(1, o.confirmTests ?? CYCLE_STAGE_DEFAULTS.confirmTests),
    zeroA: o.zeroAt?.ammonia ?? CYCLE_STAGE_DEFAULTS.zeroAt.ammonia,
    zeroN: o.zeroAt?.nitrite ?? CYCLE_STAGE_DEFAULTS.zeroAt.nitrite,
    fall: o.nitriteFallFraction ?? CYCLE_STAGE_DEFAULTS.nitriteFallFraction,
    nowMs: o.now === undefined ? null : toMs(o.now),
  };
}

/** Peaks use the lower of each pair of neighbouring tests, so one wild reading cannot set the peak. */
function robustPeak(peak: number, prev: number | undefined, value: number): number {
  return prev === undefined ? peak : Math.max(peak, Math.min(prev, value));
}

function candidateFor(
  s: State,
  o: Resolved,
  a: number | undefined,
  n: number | undefined,
  cycledNow: boolean,
): CycleStage {
  const detA = a !== undefined && a > o.zeroA;
  const detN = n !== undefined && n > o.zeroN;
  if (s.stage === 'cycled') return detA || detN ? 'setback' : 'cycled';
  if (s.stage === 'setback') return cycledNow ? 'cycled' : 'setback';
  if (s.stage !== 'not-started' && cycledNow) return 'cycled';
  const nitriteSeen = s.stage === 'nitrite-rising' || s.stage === 'nitrite-falling';
  if (detN && n !== undefined) {
    if (s.peakN > 0 && n < s.peakN * (1 - o.fall)) return 'nitrite-falling';
    if (s.stage === 'nitrite-falling' && n < s.peakN) return 'nitrite-falling';
    return 'nitrite-rising';
  }
  if (detA) return nitriteSeen ? 'nitrite-falling' : 'ammonia-rising';
  if (nitriteSeen && n !== undefined) return 'nitrite-falling';
  return s.stage;
}

function updateZeroRun(s: State, o: Resolved, t: WaterTestInput): void {
  const { ammonia: a, nitrite: n, nitrate } = t.values;
  const detected = (a !== undefined && a > o.zeroA) || (n !== undefined && n > o.zeroN);
  if (detected) {
    s.zeroRun = null;
    return;
  }
  if (a !== undefined && n !== undefined) {
    s.zeroRun ??= { start: t.takenAt, count: 0, nitrate: undefined };
    s.zeroRun.count += 1;
  }
  if (s.zeroRun && nitrate !== undefined) s.zeroRun.nitrate = nitrate;
}

function isCycledNow(s: State, o: Resolved, at: string): boolean {
  const run = s.zeroRun;
  return (
    run !== null &&
    run.count >= o.confirmTests &&
    daysBetween(run.start, at) >= o.cycledAfterDays &&
    run.nitrate !== undefined &&
    run.nitrate > 0
  );
}

function step(s: State, o: Resolved, t: WaterTestInput): void {
  const { ammonia: a, nitrite: n } = t.values;
  updateZeroRun(s, o, t);
  if (a === undefined && n === undefined) return;
  if (a !== undefined) {
    s.peakA = robustPeak(s.peakA, s.prevA, a);
    s.prevA = a;
  }
  if (n !== undefined) {
    s.peakN = robustPeak(s.peakN, s.prevN, n);
    s.prevN = n;
  }
  const cycledNow = isCycledNow(s, o, t.takenAt);
  const candidate = candidateFor(s, o, a, n, cycledNow);
  if (candidate === s.stage) {
    if (s.pending) s.oneOffs.push(...s.pending.ids);
    s.pending = null;
    return;
  }
  // Reaching `cycled` needs a whole run of zero tests already, so it needs no further confirmation.
  if (candidate === 'cycled') {
    enter(s, 'cycled', t.takenAt, t);
    return;
  }
  if (s.pending?.stage === candidate) s.pending.ids.push(t.id);
  else {
    if (s.pending) s.oneOffs.push(...s.pending.ids);
    s.pending = { stage: candidate, since: t.takenAt, ids: [t.id] };
  }
  if (s.pending.ids.length >= o.confirmTests) enter(s, candidate, s.pending.since, t);
}

function enter(s: State, stage: CycleStage, since: string, t: WaterTestInput): void {
  if (s.stage === 'not-started' && s.cycleStart === null) {
    s.cycleStart = since;
    s.startValue = describeNitrogen(t);
  }
  if (stage === 'cycled') s.cycledAt = since;
  if (stage === 'setback') s.setbackValue = describeNitrogen(t);
  s.stage = stage;
  s.since = since;
  s.pending = null;
}

function describeNitrogen(t: WaterTestInput): string {
  const parts: string[] = [];
  if (t.values.ammonia !== undefined) parts.push(`ammonia ${formatNumber('ammonia', t.values.ammonia)} mg/L`);
  if (t.values.nitrite !== undefined) parts.push(`nitrite ${formatNumber('nitrite', t.values.nitrite)} mg/L`);
  return parts.join(', ');
}

function project(s: State, o: Resolved, lastMs: number): CycleProjection | undefined {
  if (s.cycleStart === null || !PRE_CYCLE.has(s.stage) || s.stage === 'not-started') return undefined;
  const start = toMs(s.cycleStart);
  const week = 7 * DAY_MS;
  const w = CYCLE_DURATION_WEEKS;
  // The zero run still has to last cycledAfterDays, so nothing can finish before that.
  const runStart = s.zeroRun ? toMs(s.zeroRun.start) : lastMs;
  const floor = Math.max(runStart + o.cycledAfterDays * DAY_MS, o.nowMs ?? lastMs);
  const earliest = Math.max(start + w.rangeMin * week, floor);
  const likely = Math.max(start + ((w.typicalMin + w.typicalMax) / 2) * week, earliest);
  const latest = Math.max(start + w.rangeMax * week, likely);
  return { earliest: toIso(earliest), likely: toIso(likely), latest: toIso(latest) };
}

function evidence(s: State, o: Resolved, tests: readonly WaterTestInput[]): string[] {
  const out: string[] = [];
  const first = tests[0];
  const last = tests[tests.length - 1];
  if (!first || !last) return ['No ammonia or nitrite tests yet.'];
  out.push(`${tests.length} test(s) from ${isoDate(first.takenAt)} to ${isoDate(last.takenAt)}.`);
  if (s.cycleStart === null) {
    out.push('No ammonia or nitrite confirmed yet: the cycle starts once there is an ammonia source.');
  } else {
    out.push(`Cycle started ${isoDate(s.cycleStart)} (${s.startValue}).`);
  }
  if (s.peakA > 0) out.push(`Ammonia peaked near ${formatNumber('ammonia', s.peakA)} mg/L.`);
  if (s.peakN > 0) out.push(`Nitrite peaked near ${formatNumber('nitrite', s.peakN)} mg/L.`);
  const run = s.zeroRun;
  if (run) {
    const days = Math.floor(daysBetween(run.start, last.takenAt));
    out.push(
      `Ammonia and nitrite read 0 on ${run.count} test(s) since ${isoDate(run.start)} (${days} of ${o.cycledAfterDays} days).`,
    );
    if (run.nitrate === undefined) out.push('Test nitrate too: a cycled tank shows nitrate.');
    else out.push(`Latest nitrate ${formatNumber('nitrate', run.nitrate)} mg/L.`);
  }
  if (s.stage === 'cycled' && s.cycledAt) out.push(`Cycled: confirmed ${isoDate(s.cycledAt)}.`);
  if (s.stage === 'setback' && s.since) {
    out.push(`Setback: ${s.setbackValue} came back on ${isoDate(s.since)} after the tank had cycled.`);
  }
  if (s.oneOffs.length > 0)
    out.push(`${s.oneOffs.length} test(s) disagreed with their neighbours and were treated as one-offs.`);
  if (s.pending) out.push(`Latest test suggests ${s.pending.stage}; one more test will confirm.`);
  return out;
}

/**
 * Where a tank is in its nitrogen cycle. Tests are sorted by takenAt, so input order never matters;
 * a stage changes only after `confirmTests` consecutive tests agree.
 */
export function referenceCycleStage(
  history: readonly WaterTestInput[],
  options: CycleStageOptions = {},
): CycleStageResult {
  const o = resolve(options);
  const tests = sortByTakenAt(history).filter(
    (t) => t.values.ammonia !== undefined || t.values.nitrite !== undefined || t.values.nitrate !== undefined,
  );
  const s: State = {
    stage: 'not-started',
    since: tests[0]?.takenAt ?? null,
    pending: null,
    oneOffs: [],
    cycleStart: null,
    startValue: null,
    peakA: 0,
    peakN: 0,
    prevA: undefined,
    prevN: undefined,
    zeroRun: null,
    cycledAt: null,
    setbackValue: null,
  };
  for (const t of tests) step(s, o, t);
  const last = tests[tests.length - 1];
  const result: CycleStageResult = { stage: s.stage, since: s.since, evidence: evidence(s, o, tests) };
  const projection = last ? project(s, o, toMs(last.takenAt)) : undefined;
  if (projection) result.projectedDoneAt = projection;
  return result;
}
