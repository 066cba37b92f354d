import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, DEMO_PEOPLE } from '@server/db/seeds/demo-people';

describe('README', () => {
  const readme = readFileSync('README.md', 'utf8');

  it('when the demo people change, then the README sign-in table changes with them', () => {
    expect(readme).toMatch(/\| role +\| e-mail +\| password +\|/);
    // Prettier pads table cells, so compare cells, not spacing.
    const rows = readme.split('\n').map((line) => line.split('|').map((cell) => cell.trim()));
    for (const p of DEMO_PEOPLE)
      expect(rows.some((cells) => cells.includes(p.email) && cells.includes(DEMO_PASSWORD))).toBe(true);
  });

  it('when someone reads it, then it shows exactly the two set-up commands', () => {
    const block = readme.split('## Two commands')[1]!.split('```')[1]!;
    expect(
      block
        .trim()
        .split('\n')
        .map((l) => l.split('#')[0]!.trim()),
    ).toEqual(['sh', './scripts/start', './scripts/test']);
  });
});
