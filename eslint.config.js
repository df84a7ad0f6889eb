// ESLint flat config. `npm run lint` runs it with --max-warnings 0, and `npm test` runs lint first.
// The layer rules (see DEVELOPERS.md, "Layers") are the `import-x/no-restricted-paths` zones below;
// tests/lint/boundaries.test.ts proves that each zone makes the linter fail.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import { importX } from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** Packages the pure domain may never import: UI, 3D, state, server and database frameworks. */
const FRAMEWORKS = [
  'react',
  'react-dom',
  'react-dom/*',
  'react-router',
  'react-hook-form',
  '@react-three/*',
  'three',
  'three/*',
  'zustand',
  'zustand/*',
  'zundo',
  '@tanstack/*',
  'express',
  'express-*',
  'sequelize',
  'umzug',
  'passport',
  'passport-*',
];

const root = dirname(fileURLToPath(import.meta.url));

/** Every folder in src/features is a feature; a new one is covered without editing this file. */
const FEATURES = readdirSync(join(root, 'src/features'), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

/** One zone per feature: no other feature may import it. */
const featureIsolation = FEATURES.map((feature) => ({
  target: `./src/features/!(${feature})/**/*`,
  from: `./src/features/${feature}`,
  message: 'Features do not import each other; move what several features share into src/lib or src/components.',
}));

export const boundaryZones = [
  {
    target: './src/domain',
    from: ['./src', './server', './tests', './e2e', './bench'],
    except: ['./domain'],
    message: 'src/domain imports nothing outside itself.',
  },
  {
    target: './server',
    from: ['./src'],
    except: ['./domain'],
    message: 'server/ imports only src/domain.',
  },
  {
    target: ['./src/components', './src/lib'],
    from: ['./src/features', './src/app'],
    message: 'src/components and src/lib import no feature.',
  },
  {
    target: './src/features',
    from: ['./src/app'],
    message: 'Features do not import the app shell.',
  },
  {
    // Folder-level direction inside the domain: the catalogue describes parts and knows no design.
    target: './src/domain/catalogue',
    from: ['./src/domain/design', './src/domain/checks', './src/domain/outputs', './src/domain/analysis', './src/domain/assembly', './src/domain/contracts'],
    message: 'The catalogue is below the design: it imports units, geometry and section properties only.',
  },
  {
    // Folder-level direction inside the server: the database layer knows no route module.
    target: './server/db',
    from: ['./server/modules', './server/app.ts', './server/domainBridge.ts'],
    message: 'server/db is below server/modules; composition (like the seed) lives in server/setup.',
  },
  ...featureIsolation,
];

export default tseslint.config(
  {
    ignores: [
      'node_modules/**',
      'dist/**',
      'coverage/**',
      'data/**',
      'test-results/**',
      'playwright-report/**',
      'e2e/.output/**',
      '.tmp/**',
      'bench/results/**',
      'public/**',
      'dev-dist/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx,js,mjs}'],
    plugins: { 'import-x': importX, 'react-hooks': reactHooks },
    languageOptions: {
      ecmaVersion: 2023,
      sourceType: 'module',
      globals: { ...globals.browser, ...globals.node },
    },
    settings: {
      'import-x/extensions': ['.ts', '.tsx', '.js', '.mjs'],
      'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx'] },
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: './tsconfig.json' })],
    },
    rules: {
      'import-x/no-restricted-paths': ['error', { basePath: root, zones: boundaryZones }],
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-self-import': 'error',
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_', ignoreRestSiblings: true },
      ],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
    },
  },
  {
    // Tests read untyped JSON answers; `any` there is a reading aid, not a contract.
    files: ['tests/**/*.{ts,tsx}', 'e2e/**/*.ts', 'bench/**/*.ts'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    // React runs only in the client; the domain and server have no hooks (a domain `use…` name is not one).
    files: ['src/app/**/*.{ts,tsx}', 'src/features/**/*.{ts,tsx}', 'src/components/**/*.{ts,tsx}', 'src/lib/**/*.{ts,tsx}', 'tests/client/**/*.{ts,tsx}'],
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  {
    files: ['src/domain/**/*.ts'],
    ignores: ['src/domain/cli.ts', 'src/domain/**/write*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: FRAMEWORKS, message: 'src/domain is pure TypeScript: no UI, 3D, state, server or database framework.' },
            { group: ['node:*', 'fs', 'path', 'url', 'os', 'child_process'], message: 'src/domain runs in the browser too: no Node built-ins outside its command-line scripts.' },
          ],
        },
      ],
    },
  },
  {
    files: ['server/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['react', 'react-dom', 'react-dom/*', '@react-three/*', 'three', 'zustand', '@tanstack/*'], message: 'server/ imports no client framework.' },
          ],
        },
      ],
    },
  },
);
