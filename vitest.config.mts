import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    projects: [
      {
        extends: true,
        test: { name: 'unit', include: ['test/unit/**/*.test.ts', 'test/reference/**/*.test.ts'], environment: 'node' },
      },
      {
        extends: true,
        test: { name: 'api', include: ['test/api/**/*.test.ts'], environment: 'node', testTimeout: 20000 },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['test/e2e/**/*.test.ts'],
          environment: 'node',
          testTimeout: 120000,
          hookTimeout: 240000,
          fileParallelism: false,
          globalSetup: ['test/e2e/global-setup.ts'],
        },
      },
    ],
  },
});
