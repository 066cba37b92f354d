import { defineConfig, mergeConfig } from 'vitest/config';
import viteConfig from './vite.config.ts';

export default mergeConfig(
  viteConfig,
  defineConfig({
    test: {
      reporters: ['default'],
      projects: [
        {
          extends: true,
          test: {
            name: 'unit',
            environment: 'jsdom',
            include: ['tests/unit/**/*.test.{ts,tsx}'],
            setupFiles: ['tests/helpers/unit-setup.ts'],
          },
        },
        {
          extends: true,
          test: {
            name: 'api',
            environment: 'node',
            include: ['tests/api/**/*.test.ts'],
            globalSetup: ['tests/helpers/api-global-setup.ts'],
            fileParallelism: false,
            testTimeout: 20_000,
            hookTimeout: 30_000,
          },
        },
        {
          extends: true,
          test: {
            name: 'e2e',
            environment: 'node',
            include: ['tests/e2e/**/*.test.ts'],
            globalSetup: ['tests/helpers/e2e-global-setup.ts'],
            fileParallelism: false,
            testTimeout: 60_000,
            hookTimeout: 60_000,
          },
        },
      ],
    },
  }),
);
