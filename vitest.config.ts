import { fileURLToPath, URL } from 'node:url';
import vue from '@vitejs/plugin-vue';
import { defineConfig } from 'vitest/config';

const alias = {
  '@': fileURLToPath(new URL('./src', import.meta.url)),
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
};

export default defineConfig({
  test: {
    projects: [
      { resolve: { alias }, test: { name: 'unit', environment: 'node', include: ['tests/unit/**/*.test.ts', 'tests/reference/**/*.test.ts'] } },
      { resolve: { alias }, test: { name: 'api', environment: 'node', include: ['tests/api/**/*.test.ts'], testTimeout: 20_000, hookTimeout: 30_000 } },
      { plugins: [vue()], resolve: { alias }, test: { name: 'components', environment: 'happy-dom', include: ['tests/components/**/*.test.ts'] } },
      {
        resolve: { alias },
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/e2e/global-setup.ts'],
          testTimeout: 60_000,
          hookTimeout: 90_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
