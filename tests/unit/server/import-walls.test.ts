// @vitest-environment node
import { readFileSync } from 'node:fs';
import { ESLint } from 'eslint';
import { beforeAll, describe, expect, it } from 'vitest';

/** The lint rules that keep the server's modules apart, run on code that breaks them (nothing is written to disk). */
describe('server import walls', () => {
  let eslint: ESLint;
  beforeAll(() => {
    eslint = new ESLint({ cwd: process.cwd() });
  });

  const rulesHit = async (filePath: string, code: string) => {
    const [result] = await eslint.lintText(code, { filePath });
    return result!.messages.map((m) => m.ruleId);
  };
  const withImport = (filePath: string, line: string) => `${readFileSync(filePath, 'utf8')}\n${line}\n`;

  it(
    'when a module reaches into another module’s files, by relative path or alias, then lint fails; through its index.ts it passes',
    { timeout: 60_000 },
    async () => {
      const file = 'server/modules/questions/question.queries.ts';
      const deep = withImport(
        file,
        "import { tankForCare } from '../tanks/tank.queries';\nimport { presentPhoto } from '@server/modules/photos/photo.presenter';\nexport const used = [tankForCare, presentPhoto];",
      );
      expect(await rulesHit(file, deep)).toEqual([
        'import-x/no-restricted-paths',
        'import-x/no-restricted-paths',
      ]);
      const face = withImport(
        file,
        "import { tankForCare } from '../tanks';\nexport const used = tankForCare;",
      );
      expect(await rulesHit(file, face)).toEqual([]);
    },
  );

  it(
    'when the rest of the server reaches into a module’s files, then lint fails',
    { timeout: 60_000 },
    async () => {
      const code =
        "import { reevaluateTank } from './modules/concerns/reevaluate-tank';\nexport const used = reevaluateTank;\n";
      expect(await rulesHit('server/probe.ts', code)).toContain('import-x/no-restricted-paths');
    },
  );

  it('when two server modules import each other, then lint fails', { timeout: 60_000 }, async () => {
    // tanks imports care (a tank follows a care profile): care importing tanks back closes a circle.
    const file = 'server/modules/care/care-profile.service.ts';
    const closed = withImport(file, "import { loadTank } from '../tanks';\nexport const used = loadTank;");
    expect(await rulesHit(file, closed)).toContain('import-x/no-cycle');
    // A type-only import has no effect at run time and is no cycle.
    const typeOnly = withImport(file, "import type { Tank } from '../tanks';\nexport type Used = Tank;");
    expect(await rulesHit(file, typeOnly)).toEqual([]);
  });

  it('when shared/ imports from the server or the client, then lint fails', { timeout: 60_000 }, async () => {
    const code =
      "import { errors } from '@server/lib/app-error';\nimport { api } from '../../client/lib/api-client';\nexport const used = [errors, api];\n";
    expect(await rulesHit('shared/care/probe.ts', code)).toEqual([
      'import-x/no-restricted-paths',
      'import-x/no-restricted-paths',
    ]);
  });
});
