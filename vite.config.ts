import { fileURLToPath, URL } from 'node:url';
import { defineConfig } from 'vitest/config';
import vue from '@vitejs/plugin-vue';
import AutoImport from 'unplugin-auto-import/vite';
import Components from 'unplugin-vue-components/vite';
import { ElementPlusResolver } from 'unplugin-vue-components/resolvers';

const alias = {
  '@': fileURLToPath(new URL('./src', import.meta.url)),
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
};
const apiPort = process.env.PORT ?? '5180';

export default defineConfig({
  plugins: [
    vue(),
    // Element Plus on demand: only the components a view uses reach the bundle.
    AutoImport({ resolvers: [ElementPlusResolver()], dts: false }),
    Components({ resolvers: [ElementPlusResolver({ importStyle: 'css' })], dts: false }),
  ],
  resolve: { alias },
  build: { outDir: 'dist/client', emptyOutDir: true, chunkSizeWarningLimit: 700 },
  server: {
    host: '127.0.0.1',
    port: 5179,
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
  test: {
    projects: [
      {
        extends: true,
        test: { name: 'unit', environment: 'node', include: ['tests/unit/**/*.test.ts'] },
      },
      {
        extends: true,
        test: {
          name: 'api',
          environment: 'node',
          include: ['tests/api/**/*.test.ts', 'tests/smoke/**/*.test.ts'],
          globalSetup: ['tests/setup/global-setup.ts'],
          testTimeout: 30_000,
          hookTimeout: 120_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'client',
          environment: 'happy-dom',
          // Component tests render Element Plus; under a full parallel run a few take seconds.
          testTimeout: 20_000,
          include: ['tests/client/**/*.test.ts'],
          setupFiles: ['tests/setup/client-setup.ts'],
          // Element Plus' on-demand style entries import .css files: let Vite (not Node) load them in tests.
          server: { deps: { inline: [/element-plus\/es\/components\/[^/]+\/style\//] } },
        },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          environment: 'node',
          include: ['tests/browser/**/*.test.ts'],
          globalSetup: ['tests/setup/global-setup.ts'],
          testTimeout: 120_000,
          hookTimeout: 300_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
