import { defineConfig } from 'vitest/config';

/** Browser journeys: the built app served by the built backend, driven in Debian's chromium. */
export default defineConfig({
  test: {
    root: import.meta.dirname,
    include: ['**/*.e2e.ts'],
    environment: 'node',
    globalSetup: ['./support/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 60_000,
  },
});
