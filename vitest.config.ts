import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    globalSetup: ['tests/setup/build-cli.global-setup.ts'],
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
