import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

// Two projects: pure/shared and server code run in Node; client code runs in jsdom.
export default defineConfig({
  plugins: [react()],
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'node',
          environment: 'node',
          include: [
            'shared/**/*.test.ts',
            'server/**/*.test.ts',
            'scripts/**/*.test.ts',
            'tests/architecture/**/*.test.ts',
          ],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          // Real server process + Debian chromium; see tests/e2e/global-setup.ts.
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.e2e.test.ts'],
          globalSetup: ['tests/e2e/global-setup.ts'],
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'dom',
          environment: 'jsdom',
          include: ['src/**/*.test.{ts,tsx}'],
          setupFiles: ['src/test/setup.ts'],
        },
      },
    ],
  },
});
