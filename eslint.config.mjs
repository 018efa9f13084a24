// Lint: TypeScript rules plus the import-direction rules of ARCHITECTURE.md section 1.
// A layer imports only the layers listed above it; the client never imports server/ or db/.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';

const deepRelative = { group: ['../../*'], message: 'Import across folders with the @/ alias.' };
// Any '@/...' import outside the allowed folders is an error (allowed given as '@/lib/units/*').
const only = (allowed, why) => ({
  regex: `^@/(?!(${allowed.map((a) => a.replace(/^@\//, '').replace(/\/\*$/, '/')).join('|')}))`,
  message: why,
});
const layer = (files, allowed, why, extra = [], ignores = []) => ({
  files,
  ignores,
  rules: {
    'no-restricted-imports': ['error', { patterns: [only(allowed, why), deepRelative, ...extra] }],
  },
});
const noNode = {
  group: ['node:*', 'fs', 'path', 'react', 'react-native', 'express', 'pg', 'drizzle-orm', 'drizzle-orm/*'],
  message: 'lib/ is pure: no Node APIs, no React, no I/O.',
};

export default tseslint.config(
  {
    ignores: ['node_modules/**', 'dist/**', '.expo/**', '.tmp/**', '.pg/**', 'drizzle/**', 'coverage/**', 'expo-env.d.ts'],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx,mts,mjs,js}'],
    languageOptions: { globals: { console: 'readonly', process: 'readonly', __dirname: 'readonly', setTimeout: 'readonly', clearTimeout: 'readonly', URL: 'readonly' } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_' }],
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-require-imports': 'off',
      'no-undef': 'off',
    },
  },
  {
    files: ['**/*.tsx', 'canvas/**/*.ts', 'components/**/*.ts'],
    plugins: { 'react-hooks': reactHooks },
    rules: { 'react-hooks/rules-of-hooks': 'error', 'react-hooks/exhaustive-deps': 'warn' },
  },
  layer(['lib/units/**'], ['@/lib/units/*'], 'lib/units imports nothing.', [noNode]),
  layer(['lib/engine/**'], ['@/lib/units/*', '@/lib/engine/*'], 'lib/engine imports only lib/units.', [noNode]),
  layer(['lib/schema/**'], ['@/lib/units/*', '@/lib/engine/*', '@/lib/schema/*'], 'lib/schema imports only lib/units and lib/engine.', [noNode]),
  layer(['lib/api/**'], ['@/lib/units/*', '@/lib/schema/*', '@/lib/api/*'], 'lib/api imports only lib/schema and lib/units.'),
  layer(['components/ui/**'], ['@/lib/*', '@/components/ui/*', '@/assets/*'], 'components/ui imports only lib/ and other ui primitives.'),
  layer(['canvas/**'], ['@/lib/*', '@/components/ui/*', '@/canvas/*'], 'canvas/ imports only lib/ and components/ui.'),
  layer(['components/**'], ['@/lib/*', '@/components/*', '@/canvas/*', '@/assets/*'], 'components/ never import server/, db/ or app/.', [], ['components/ui/**']),
  layer(['app/**'], ['@/lib/*', '@/components/*', '@/canvas/*', '@/assets/*'], 'app/ holds routes only: render screens from components/.'),
  layer(['server/**'], ['@/lib/*', '@/db/*', '@/server/*', '@/assets/*'], 'server/ never imports client code.'),
  layer(['db/**'], ['@/lib/*', '@/db/*', '@/assets/*'], 'db/ is imported by server/ and scripts/, and imports only lib/.'),
);
