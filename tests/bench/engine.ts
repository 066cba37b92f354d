/**
 * The engine's figures for `npm run bench` (issue: evaluateReading ≤ 20 µs per call, cycleStage over 365
 * days of tests ≤ 1 ms). Measured with tinybench; the baseline is one plain pass over the same 365 tests
 * reading one value, the floor for anything that looks at a year of history, so the ratio survives a
 * noisy machine. Figures only: nothing here passes or fails a build.
 */
import { Bench } from 'tinybench';
import { cycleStage, evaluateReading, SEAHORSE_LARGE_PROFILE, type EvaluationContext, type WaterTestInput } from '../../shared/care';
import { generateHistory } from '../unit/care/histories';

export interface EngineFigure {
  name: string;
  meanUs: number;
  p99Us: number;
  samples: number;
  /** Goal per call in µs, where the issue sets one. */
  goalUs?: number;
  /** Mean over the same run's baseline. */
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

export async function runEngineBench(time = 700): Promise<EngineFigure[]> {
  const tests365 = year();
  const tests120 = tests365.filter((t) => Date.parse(t.takenAt) > END - 120 * DAY);
  // The test being judged is the newest, with ammonia so free NH3 is worked out from history.
  const latest: WaterTestInput = { id: 'latest', takenAt: new Date(END).toISOString(), values: { ammonia: 0.25, nitrate: 12 } };
  const ctx365 = contextFor([...tests365, latest]);
  const ctx120 = contextFor([...tests120, latest]);
  const goals: Record<string, number> = {};
  const bench = new Bench({ time, warmupTime: 200 });
  let sink = 0;
  bench.add(BASELINE, () => {
    for (const t of tests365) sink += t.values.nitrate ?? 0;
  });
  goals['evaluateReading (seahorse, 120 days of history)'] = 20;
  bench.add('evaluateReading (seahorse, 120 days of history)', () => {
    sink += evaluateReading(latest, SEAHORSE_LARGE_PROFILE, ctx120).length;
  });
  goals['evaluateReading (seahorse, 365 days of history)'] = 20;
  bench.add('evaluateReading (seahorse, 365 days of history)', () => {
    sink += evaluateReading(latest, SEAHORSE_LARGE_PROFILE, ctx365).length;
  });
  goals['cycleStage (365 days of tests)'] = 1000;
  bench.add('cycleStage (365 days of tests)', () => {
    sink += cycleStage(tests365, { now: ctx365.now }).evidence.length;
  });
  await bench.run();
  if (sink === -1) console.log('unreachable');
  const base = bench.tasks.find((t) => t.name === BASELINE)?.result?.mean ?? NaN;
  return bench.tasks.map((task) => {
    const r = task.result;
    if (!r || r.error) throw new Error(`${task.name} failed: ${String(r?.error)}`);
    const figure: EngineFigure = {
      name: task.name,
      meanUs: r.mean * 1000,
      p99Us: r.p99 * 1000,
      samples: r.samples.length,
      ratioToBaseline: r.mean / base,
    };
    const goal = goals[task.name];
    if (goal !== undefined) figure.goalUs = goal;
    return figure;
  });
}

export function printEngineFigures(figures: readonly EngineFigure[]): void {
  console.log(`${'engine'.padEnd(52)} ${'mean µs'.padStart(10)} ${'p99 µs'.padStart(10)} ${'× base'.padStart(8)} ${'goal µs'.padStart(8)}  verdict`);
  for (const f of figures) {
    const verdict = f.goalUs === undefined ? '' : f.meanUs <= f.goalUs ? 'meets goal' : 'MISSES goal';
    console.log(
      `${f.name.padEnd(52)} ${f.meanUs.toFixed(2).padStart(10)} ${f.p99Us.toFixed(2).padStart(10)} ${f.ratioToBaseline.toFixed(1).padStart(8)} ${(f.goalUs?.toString() ?? '').padStart(8)}  ${verdict}`,
    );
  }
}
