// Lint: TypeScript rules plus the process-layering table of DEVELOPERS.md.
// The layering rules below are not to be relaxed: they keep the solver pure and Electron thin.
// .vue files: vue-eslint-parser with the TypeScript parser for <script lang="ts">, eslint-plugin-vue's
// "essential" rules (errors, not style), and the renderer's layering rule like renderer/**/*.ts.
import tseslint from 'typescript-eslint';
import pluginVue from 'eslint-plugin-vue';
import vueParser from 'vue-eslint-parser';

const nodeBuiltins = ['node:*', 'fs', 'path', 'os', 'child_process', 'worker_threads', 'http', 'crypto', 'url'];

export default tseslint.config(
  { ignores: ['node_modules/**', 'dist/**', 'out/**', 'test-artifacts/**'] },
  ...tseslint.configs.recommended,
  ...pluginVue.configs['flat/essential'],
  {
    files: ['**/*.vue'],
    languageOptions: {
      parser: vueParser,
      parserOptions: { parser: tseslint.parser, extraFileExtensions: ['.vue'], sourceType: 'module' },
      globals: { window: 'readonly', document: 'readonly' },
    },
    rules: {
      // Single-word names (App, TopBar is fine) are our convention for top-level screens.
      'vue/multi-word-component-names': 'off',
    },
  },
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['solver/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [
          { group: [...nodeBuiltins, 'electron', 'vue', 'pinia', 'three', 'mathjs', 'ajv', '../../main/*', '../../renderer/*', '**/main/**', '**/renderer/**'],
            message: 'solver/ imports only solver/: no Node, Electron, DOM or runtime packages.' },
        ],
      }],
    },
  },
  {
    files: ['main/common/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [
          { group: [...nodeBuiltins, 'electron', '**/renderer/**', '../electron/*', '../store/*', '../web/*', '../cli/*'],
            message: 'main/common/ runs anywhere: it may import solver/ and main/common/ only.' },
          { group: ['**/solver/*/**', '!**/solver/index.ts'], message: 'Import the solver through solver/index.ts.' },
        ],
      }],
    },
  },
  {
    files: ['main/**/*.ts'],
    ignores: ['main/electron/**', 'main/common/**'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [
          { group: ['electron', '**/renderer/**'], message: 'Only main/electron/ may import electron; main/ never imports the renderer.' },
          { group: ['**/solver/*/**', '!**/solver/index.ts'], message: 'Import the solver through solver/index.ts.' },
        ],
      }],
    },
  },
  {
    files: ['renderer/**/*.ts', 'renderer/**/*.vue'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [
          { group: [...nodeBuiltins, 'electron', '**/main/electron/**', '**/main/store/**', '**/main/web/**', '**/main/cli/**'],
            message: 'The renderer is a sandboxed page: solver/ (barrel), main/common/, vue, pinia, three only.' },
          { group: ['**/solver/*/**', '!**/solver/index.ts'], message: 'Import the solver through solver/index.ts.' },
        ],
      }],
    },
  },
);
