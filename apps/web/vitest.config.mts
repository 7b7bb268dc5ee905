import { defineConfig, mergeConfig } from 'vitest/config';
import viteConfig from './vite.config.mts';

export default mergeConfig(
  viteConfig,
  defineConfig({
    test: {
      environment: 'jsdom',
      include: ['src/**/*.test.{ts,tsx}'],
      setupFiles: ['./src/test/setup.ts'],
      css: false,
      // The files share one jsdom per worker (the setup file resets the token, storage,
      // notifications and stubs after every test): about a third faster on two cores.
      pool: 'threads',
      isolate: false,
      restoreMocks: true,
      testTimeout: 15000,
    },
  }),
);
