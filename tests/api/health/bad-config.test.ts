import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

describe('server start-up with bad configuration', () => {
  it('when PORT=abc, then it stops with one line naming PORT', () => {
    const run = spawnSync(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
      env: { ...process.env, PORT: 'abc' },
      encoding: 'utf8',
      timeout: 20_000,
    });
    expect(run.status).toBe(1);
    const lines = run.stderr.trim().split('\n');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/PORT/);
  });
});
