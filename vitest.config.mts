import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const root = path.dirname(fileURLToPath(import.meta.url));
const alias = {
  '@': root,
  // The marker package throws outside React's server build; lib code is plain Node here.
  'server-only': path.join(root, 'tests/support/empty-module.ts'),
};

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'unit',
          include: ['tests/lib/**/*.test.ts', 'tests/migrations/**/*.test.ts', 'tests/scripts/**/*.test.ts'],
          environment: 'node',
          setupFiles: ['tests/support/temp-database.ts'],
          testTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'app',
          include: ['tests/api/**/*.test.ts', 'tests/browser/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/support/app-server.ts'],
          testTimeout: 90_000,
          hookTimeout: 120_000,
          // One server, one browser at a time on a 2-core machine.
          fileParallelism: false,
        },
      },
    ],
  },
});
