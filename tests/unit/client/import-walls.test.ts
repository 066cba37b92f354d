// @vitest-environment node
import { readFileSync } from 'node:fs';
import { ESLint } from 'eslint';
import { beforeAll, describe, expect, it } from 'vitest';

/** The lint rules that keep the client's features apart, run on code that breaks them (nothing is written to disk). */
describe('client import walls', () => {
  let eslint: ESLint;
  beforeAll(() => {
    eslint = new ESLint({ cwd: process.cwd() });
  });

  const rulesHit = async (filePath: string, code: string) => {
    const [result] = await eslint.lintText(code, { filePath });
    return result!.messages.map((m) => m.ruleId);
  };

  it(
    'when a feature imports another feature, by alias or by relative path, then lint fails',
    { timeout: 60_000 },
    async () => {
      const code =
        "import { useTank } from '@client/features/tanks/api/tanks';\nimport { useSession } from '../auth/components/session-provider';\nexport const used = [useTank, useSession];\n";
      expect(await rulesHit('client/features/readings/probe.ts', code)).toEqual([
        'import-x/no-restricted-paths',
        'import-x/no-restricted-paths',
      ]);
    },
  );

  it(
    'when client/lib imports a feature or the app, then lint fails; a feature importing lib and components passes',
    { timeout: 60_000 },
    async () => {
      expect(
        await rulesHit(
          'client/lib/probe.ts',
          "import { useTank } from '@client/features/tanks/api/tanks';\nexport const used = useTank;\n",
        ),
      ).toContain('import-x/no-restricted-paths');
      expect(
        await rulesHit(
          'client/lib/probe.ts',
          "import { Component } from '@client/app/routes/home';\nexport const used = Component;\n",
        ),
      ).toContain('import-x/no-restricted-paths');
      const allowed =
        "import { Button } from '@client/components/ui/button';\nimport { api } from '@client/lib/api-client';\nexport const used = [Button, api];\n";
      expect(await rulesHit('client/features/readings/probe.ts', allowed)).toEqual([]);
    },
  );

  it(
    'when imports inside the client go round in a circle, then lint fails',
    { timeout: 60_000 },
    async () => {
      // tank-form/volume-fields.tsx imports lib/tank-draft.ts: the draft importing the fields back closes a cycle.
      const draft = 'client/features/tanks/lib/tank-draft.ts';
      const closed = `${readFileSync(draft, 'utf8')}\nimport { VolumeFields } from '../components/tank-form/volume-fields';\nexport const used = VolumeFields;\n`;
      expect(await rulesHit(draft, closed)).toContain('import-x/no-cycle');
      // A cycle through a shared module and a feature is refused twice: lib may not import the feature at all.
      const keys = 'client/lib/tank-keys.ts';
      const throughFeature = `${readFileSync(keys, 'utf8')}\nimport { useTank } from '@client/features/tanks/api/tanks';\nexport const used = useTank;\n`;
      expect(await rulesHit(keys, throughFeature)).toEqual(
        expect.arrayContaining(['import-x/no-cycle', 'import-x/no-restricted-paths']),
      );
      expect(await rulesHit(draft, readFileSync(draft, 'utf8'))).toEqual([]);
    },
  );
});
