/**
 * The engine's figures for `npm run bench` (issue: evaluateReading ≤ 20 µs per call, cycleStage over 365
 * days of tests ≤ 1 ms). Measured with tinybench; the baseline is one plain pass over the same 365 tests
 * reading one value, the floor for anything that looks at a year of history, so the ratio survives a
 * noisy machine. Figures only: nothing here passes or fails a build.
 */
import { Bench } from 'tinybench';
import {
  cycleStage,
  evaluateReading,
  indexTests,
  SEAHORSE_LARGE_PROFILE,
  type EvaluationContext,
  type WaterTestInput,
} from '@shared/care';
import { generateHistory } from '../unit/care/histories';

export interface EngineFigure {
  name: string;
  /** The headline figure: the median is what a noisy shared machine disturbs least. */
  medianUs: number;
  meanUs: number;
  p99Us: number;
  samples: number;
  /** Goal per call in µs, where the issue sets one. */
  goalUs?: number;
  /** Median over the same run's baseline median. */
  ratioToBaseline: number;
}

const DAY = 86_400_000;
const END = Date.parse('2026-12-01T12:00:00Z');
const BASELINE = 'baseline: one pass over 365 tests';

function year(): WaterTestInput[] {
  return generateHistory(14, { days: 365, endMs: END, cycle: true });
}

function contextFor(history: readonly WaterTestInput[]): EvaluationContext {
  return {
    tank: { volumeL: 200, phase: 'established', systemType: 'seahorse', hasLivestock: true },
    history,
    sourceWater: { nitrate: 0 },
    now: new Date(END).toISOString(),
  };
}

function median(samples: readonly number[]): number {
  const sorted = [...samples].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2
    ? (sorted[mid] as number)
    : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
}

export async function runEngineBench(time = 700): Promise<EngineFigure[]> {
  const tests365 = year();
  const tests120 = tests365.filter((t) => Date.parse(t.takenAt) > END - 120 * DAY);
  // The test being judged is the newest, with ammonia so free NH3 is worked out from history.
  const latest: WaterTestInput = {
    id: 'latest',
    takenAt: new Date(END).toISOString(),
    values: { ammonia: 0.25, nitrate: 12 },
  };
  const ctx365 = contextFor([...tests365, latest]);
  const ctx120 = contextFor([...tests120, latest]);
  const goals: Record<string, number> = {};
  const bench = new Bench({ time, warmupTime: 200 });
  let sink = 0;
  bench.add(BASELINE, () => {
    for (const t of tests365) sink += t.values.nitrate ?? 0;
  });
  const timeline365 = indexTests(ctx365.history);
  const indexed365 = { ...ctx365, history: timeline365 };
  const add = (name: string, goalUs: number | undefined, fn: () => number) => {
    if (goalUs !== undefined) goals[name] = goalUs;
    bench.add(name, () => {
      sink += fn();
    });
  };
  // What a caller pays when it passes a plain array: the history is indexed inside each call.
  add(
    'evaluateReading, 120 days of tests as an array',
    20,
    () => evaluateReading(latest, SEAHORSE_LARGE_PROFILE, ctx120).length,
  );
  add(
    'evaluateReading, 365 days of tests as an array',
    20,
    () => evaluateReading(latest, SEAHORSE_LARGE_PROFILE, ctx365).length,
  );
  // Indexed once per tank (indexTests), then shared by every engine call on that history.
  add('indexTests (365 days of tests, once per tank)', undefined, () => indexTests(ctx365.history).length);
  add(
    'evaluateReading, 365 days already indexed',
    20,
    () => evaluateReading(latest, SEAHORSE_LARGE_PROFILE, indexed365).length,
  );
  add(
    'cycleStage, 365 days of tests as an array',
    1000,
    () => cycleStage(tests365, { now: ctx365.now }).evidence.length,
  );
  add(
    'cycleStage, 365 days already indexed',
    1000,
    () => cycleStage(timeline365, { now: ctx365.now }).evidence.length,
  );
  await bench.run();
  if (sink === -1) console.log('unreachable');
  const baseTask = bench.tasks.find((t) => t.name === BASELINE)?.result;
  const base = baseTask ? median(baseTask.samples) : NaN;
  return bench.tasks.map((task) => {
    const r = task.result;
    if (!r || r.error) throw new Error(`${task.name} failed: ${String(r?.error)}`);
    const figure: EngineFigure = {
      name: task.name,
      medianUs: median(r.samples) * 1000,
      meanUs: r.mean * 1000,
      p99Us: r.p99 * 1000,
      samples: r.samples.length,
      ratioToBaseline: median(r.samples) / base,
    };
    const goal = goals[task.name];
    if (goal !== undefined) figure.goalUs = goal;
    return figure;
  });
}

export function printEngineFigures(figures: readonly EngineFigure[]): void {
  const cols = ['median µs', 'mean µs', 'p99 µs', '× base', 'goal µs'];
  console.log(
    `${'engine (median judged against the goal)'.padEnd(52)} ${cols.map((c) => c.padStart(10)).join(' ')}  verdict`,
  );
  for (const f of figures) {
    const verdict = f.goalUs === undefined ? '' : f.medianUs <= f.goalUs ? 'meets goal' : 'MISSES goal';
    const cells = [
      f.medianUs.toFixed(2),
      f.meanUs.toFixed(2),
      f.p99Us.toFixed(2),
      f.ratioToBaseline.toFixed(1),
      f.goalUs?.toString() ?? '',
    ];
    console.log(`${f.name.padEnd(52)} ${cells.map((c) => c.padStart(10)).join(' ')}  ${verdict}`);
  }
}
