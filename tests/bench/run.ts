/**
 * `npm run bench`: how fast the pure engine runs on this machine. Figures only, no pass/fail:
 * performance goals are tracked here, not in timed unit tests.
 */
import { performance } from 'node:perf_hooks';
import { rankTanks, type TankState } from '@shared/care';
import { salinityFromSpecificGravity, unionizedAmmoniaFraction } from '@shared/chemistry';
import { printEngineFigures, runEngineBench } from './engine';
import { DAY_MS } from '@shared/care/time';

const NOW = Date.parse('2026-12-01T12:00:00Z');

function bench(name: string, runs: number, fn: () => unknown): void {
  for (let i = 0; i < Math.min(200, runs); i++) fn();
  const start = performance.now();
  for (let i = 0; i < runs; i++) fn();
  const ms = performance.now() - start;
  console.log(
    `${name.padEnd(52)} ${(ms / runs).toFixed(4).padStart(10)} ms/op  ${Math.round((runs / ms) * 1000)
      .toString()
      .padStart(10)} op/s`,
  );
}

const states: TankState[] = Array.from({ length: 1500 }, (_, i) => ({
  tankId: `tank-${i}`,
  createdAt: new Date(NOW - (i % 90) * DAY_MS).toISOString(),
  lastTestAt: i % 7 ? new Date(NOW - (i % 20) * DAY_MS).toISOString() : null,
  openConcerns: Array.from({ length: i % 4 }, (_, j) => ({
    severity: (['info', 'caution', 'urgent'] as const)[(i + j) % 3]!,
    raisedAt: new Date(NOW - j * DAY_MS).toISOString(),
  })),
  risingTrends: i % 3,
  unansweredQuestions: i % 5 === 0 ? 1 : 0,
  phase: i % 4 ? 'established' : 'cycling',
}));

console.log(`node ${process.version}, ${new Date().toISOString()}`);
bench('unionizedAmmoniaFraction (seawater)', 200_000, () =>
  unionizedAmmoniaFraction({ tempC: 24, pH: 8.1, salinity: 33 }),
);
bench('salinityFromSpecificGravity (solver)', 50_000, () =>
  salinityFromSpecificGravity({ sg: 1.0245, sampleTempC: 25, referenceTempC: 25 }),
);
bench('rankTanks (1,500 tank states)', 200, () => rankTanks(states, new Date(NOW).toISOString()));

printEngineFigures(await runEngineBench());
