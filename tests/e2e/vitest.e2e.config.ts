import { defineConfig } from 'vitest/config';

// Browser journeys: one server started like `npm start` serves them all; files run one at a time.
export default defineConfig({
  test: {
    include: ['tests/e2e/**/*.e2e.ts'],
    globalSetup: ['tests/e2e/support/start-server.ts'],
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
    pool: 'forks',
  },
});
