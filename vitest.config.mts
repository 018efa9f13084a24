import { defineConfig } from 'vitest/config';
import path from 'node:path';

export default defineConfig({
  resolve: { alias: { '@': path.resolve(import.meta.dirname) } },
  test: {
    environment: 'node',
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    fileParallelism: false, // one real PostgreSQL test database shared by the server tests
    testTimeout: 30_000,
    hookTimeout: 60_000,
    env: { NODE_ENV: 'test', AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true', LOG_LEVEL: 'silent' },
  },
});
