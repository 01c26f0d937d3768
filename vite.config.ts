import { fileURLToPath } from 'node:url';
import vue from '@vitejs/plugin-vue';
import { defineConfig } from 'vitest/config';

const sharedDir = fileURLToPath(new URL('./shared', import.meta.url));
const apiTarget = `http://${process.env.HOST ?? '127.0.0.1'}:${process.env.PORT ?? '3000'}`;

export default defineConfig({
  plugins: [vue()],
  resolve: { alias: { '@shared': sharedDir } },
  server: {
    host: '127.0.0.1',
    port: Number(process.env.VITE_PORT ?? 5173),
    proxy: { '/api': apiTarget },
  },
  build: { outDir: 'dist', emptyOutDir: true, chunkSizeWarningLimit: 1500 },
  test: {
    projects: [
      {
        extends: true,
        test: { name: 'unit', include: ['shared/**/*.test.ts', 'tests/unit/**/*.test.ts'], environment: 'node' },
      },
      {
        extends: true,
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 20000,
          hookTimeout: 30000,
        },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          include: ['tests/browser/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 60000,
          hookTimeout: 60000,
        },
      },
    ],
  },
});
