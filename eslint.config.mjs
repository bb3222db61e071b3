// ESLint for the whole repository (`npm run lint`, a step of `npm test`, zero warnings allowed).
// The boundary rule below is the house's import rule: see "What may import what" in DEVELOPERS.md.
import js from '@eslint/js';
import angular from 'angular-eslint';
import boundaries from 'eslint-plugin-boundaries';
import { defineConfig, globalIgnores } from 'eslint/config';
import tseslint from 'typescript-eslint';

/** The parts of the house, by folder from the repository root (the first pattern that matches wins). */
const elements = [
  { type: 'feature', pattern: 'src/app/features/*', capture: ['feature'] },
  { type: 'core', pattern: 'src/app/core' },
  { type: 'ui', pattern: 'src/app/ui' },
  { type: 'app', pattern: 'src' },
  { type: 'shared', pattern: 'shared' },
  { type: 'server', pattern: 'sync-server' },
  { type: 'specs', pattern: 'spec' },
  { type: 'scripts', pattern: 'scripts' },
].map((element) => ({ ...element, partialMatch: false }));

/** What a feature shows the rest of the app: its one public face and its route table. */
const PUBLIC_FACE = ['index.ts', '*.routes.ts'];
const toParts = (...types) => ({ to: { element: { type: types } } });
const toPublicFaceOfFeature = { to: { element: { type: 'feature', fileInternalPath: PUBLIC_FACE } } };
const from = (type, ...allow) => ({ from: { element: { type } }, allow });

/** Focused and disabled Jasmine specs: a stray `f` or `x` must not turn part of a suite off. */
const focusedOrDisabledSpecs = ['fit', 'fdescribe', 'xit', 'xdescribe'].map((name) => ({
  name,
  message: `\`${name}\` focuses or disables specs; use \`${name.slice(1)}\` (and --filter to run a few).`,
}));

export default defineConfig([
  globalIgnores(['dist/', 'out-tsc/', '.angular/', 'node_modules/', 'test-results/']),
  {
    files: ['**/*.ts'],
    extends: [js.configs.recommended, tseslint.configs.recommended],
    rules: {
      'no-restricted-globals': ['error', ...focusedOrDisabledSpecs],
      // A leading underscore marks a parameter an interface makes us accept but we do not use.
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      // We match control characters on purpose: to refuse NUL and friends that PostgreSQL cannot store.
      'no-control-regex': 'off',
    },
  },
  {
    files: ['src/**/*.ts'],
    extends: [angular.configs.tsRecommended],
    processor: angular.processInlineTemplates,
    rules: {
      '@angular-eslint/component-selector': ['error', { type: 'element', prefix: 'll', style: 'kebab-case' }],
      '@angular-eslint/directive-selector': ['error', { type: 'attribute', prefix: 'll', style: 'camelCase' }],
    },
  },
  {
    files: ['src/**/*.html'],
    extends: [angular.configs.templateRecommended, angular.configs.templateAccessibility],
    rules: {
      // `x != null` is the house idiom for "neither null nor undefined".
      '@angular-eslint/template/eqeqeq': ['error', { allowNullOrUndefined: true }],
    },
  },
  {
    files: ['**/*.{mjs,js}'],
    extends: [js.configs.recommended],
    languageOptions: {
      globals: {
        process: 'readonly',
        console: 'readonly',
        require: 'readonly',
        module: 'writable',
        __dirname: 'readonly',
        URL: 'readonly',
        setTimeout: 'readonly',
        clearTimeout: 'readonly',
        Buffer: 'readonly',
        fetch: 'readonly',
      },
    },
  },
  {
    files: ['**/*.ts'],
    plugins: { boundaries },
    settings: {
      'boundaries/elements': elements,
      'boundaries/include': ['src/**/*.ts', 'shared/**/*.ts', 'sync-server/**/*.ts', 'spec/**/*.ts', 'scripts/**/*.ts'],
      'boundaries/dependency-nodes': ['import', 'dynamic-import', 'export'],
      'import/resolver': { node: { extensions: ['.ts', '.js', '.mjs'] } },
    },
    rules: {
      'boundaries/dependencies': [
        'error',
        {
          default: 'disallow',
          message: '{{from.element.type}} may not import this file of {{to.element.type}} (see "What may import what" in DEVELOPERS.md)',
          policies: [
            { allow: { dependency: { relationship: { to: 'internal' } } } },
            from('shared', toParts('shared')),
            from('core', toParts('core', 'ui', 'shared')),
            from('ui', toParts('ui', 'core', 'shared')),
            from('feature', toParts('core', 'ui', 'shared'), toPublicFaceOfFeature),
            from('app', toParts('core', 'ui', 'shared'), toPublicFaceOfFeature),
            from('server', toParts('server', 'shared')),
            // Specs drive the operator's scripts (the cluster, PgBouncer) as a reader of them would.
            from('specs', toParts('specs', 'server', 'shared', 'scripts')),
            from('scripts', toParts('scripts', 'server', 'shared', 'specs')),
          ],
        },
      ],
    },
  },
]);
