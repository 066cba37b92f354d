import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import js from '@eslint/js';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const root = fileURLToPath(new URL('.', import.meta.url));

/**
 * The client's walls: client/app composes features; a feature imports client/components and client/lib but never
 * another feature; components and lib import no feature and no app code; lib holds no UI; nothing in the client
 * reaches into the server. Imports inside client/ may not go round in a circle. Paths resolve through tsconfig, so
 * the @client and @shared aliases count like relative paths.
 */
const features = readdirSync(new URL('client/features', import.meta.url), { withFileTypes: true })
  .filter((d) => d.isDirectory())
  .map((d) => d.name);
const clientWalls = [
  {
    files: ['client/**/*.{ts,tsx}'],
    plugins: { 'import-x': importX },
    settings: {
      // Without these the plugin cannot read .ts/.tsx modules, and no-cycle passes without looking.
      'import-x/extensions': ['.ts', '.tsx', '.js'],
      'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx'] },
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: `${root}tsconfig.json` })],
    },
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        {
          basePath: root,
          zones: [
            ...features.map((feature) => ({
              target: `./client/features/${feature}`,
              from: './client/features',
              except: [`./${feature}`],
              message: `Features don't import each other: move what ${feature} needs to client/lib or client/components, or compose the two in client/app/routes.`,
            })),
            {
              target: ['./client/features', './client/components', './client/lib'],
              from: './client/app',
              message: 'Only client/app imports the app layer.',
            },
            {
              target: ['./client/components', './client/lib'],
              from: './client/features',
              message: 'client/components and client/lib serve every feature and import none.',
            },
            {
              target: './client/lib',
              from: './client/components',
              message: 'client/lib holds no UI: components import lib, not the other way round.',
            },
            {
              target: './client',
              from: './server',
              message:
                'The client talks to the server over HTTP and sockets only; shared code lives in shared/.',
            },
          ],
        },
      ],
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
    },
  },
];

/**
 * The server's walls: a module under server/modules is used only through its index.ts, by other modules and by the
 * rest of the server alike (inside a module, files import each other directly); imports on the server may not go round
 * in a circle; shared/ imports nothing from client/ or server/. Type-only imports are no dependency at run time, so
 * no-cycle lets them pass (the deps object's type names every module).
 */
const modules = readdirSync(new URL('server/modules', import.meta.url), { withFileTypes: true })
  .filter((d) => d.isDirectory())
  .map((d) => d.name);
const onlyThroughIndex = (except) => [...except, ...modules.map((m) => `./${m}/index.ts`)];
const importSettings = {
  'import-x/extensions': ['.ts', '.tsx', '.js'],
  'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx'] },
  'import-x/resolver-next': [createTypeScriptImportResolver({ project: `${root}tsconfig.json` })],
};
const serverWalls = [
  {
    files: ['server/**/*.ts'],
    plugins: { 'import-x': importX },
    settings: importSettings,
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        {
          basePath: root,
          zones: [
            ...modules.map((module) => ({
              target: `./server/modules/${module}`,
              from: './server/modules',
              except: onlyThroughIndex([`./${module}`]),
              message: `Server modules use each other only through their index.ts: import from '../<module>', and export what ${module} needs there.`,
            })),
            {
              target: [
                './server/*.ts',
                './server/config',
                './server/db',
                './server/lib',
                './server/mail',
                './server/middleware',
                './server/realtime',
                './server/types',
              ],
              from: './server/modules',
              except: onlyThroughIndex([]),
              message: 'Outside server/modules, a module is used only through its index.ts.',
            },
            {
              target: './server',
              from: './client',
              message: 'The server never imports the client; shared code lives in shared/.',
            },
          ],
        },
      ],
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
    },
  },
  {
    files: ['shared/**/*.ts'],
    plugins: { 'import-x': importX },
    settings: importSettings,
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        {
          basePath: root,
          zones: [
            {
              target: './shared',
              from: ['./client', './server'],
              message: 'shared/ is used by client and server: it imports nothing from client/ or server/.',
            },
          ],
        },
      ],
    },
  },
];

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', 'tests/e2e/artifacts/**', 'coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-unsafe-function-type': 'off',
      'no-console': 'off',
    },
  },
  {
    files: ['client/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: { ...reactHooks.configs.recommended.rules },
  },
  ...clientWalls,
  ...serverWalls,
);
