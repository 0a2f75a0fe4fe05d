import { defineConfig } from 'vitest/config';

// Browser tests: a production build served by `vite preview`, driven by playwright-core in
// Debian's Chromium. One worker: the machine has two cores and each test owns a browser.
export default defineConfig({
  test: {
    include: ['tests/e2e/**/*.e2e.ts'],
    globalSetup: ['tests/e2e/globalSetup.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 90000,
    hookTimeout: 90000,
  },
});
