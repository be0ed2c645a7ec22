// The linter npm test runs: type-aware checks (promises that are never
// awaited, values typed `any` flowing on), import circles, and the layers.
import tseslint from 'typescript-eslint';
import importX from 'eslint-plugin-import-x';

const NODE_BUILTINS = ['node:*', 'fs', 'fs/*', 'path', 'os', 'child_process', 'worker_threads', 'url', 'util', 'http', 'https', 'net', 'crypto', 'stream', 'module', 'process'];

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'coverage/**', 'axletree-out/**', '**/generated/**', 'src/core/spec/spec.types.ts', '.scratch/**', 'web/dist/**', 'vitest.config.ts'] },
  ...tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: { parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname } },
    plugins: { 'import-x': importX },
    settings: {
      'import-x/extensions': ['.ts', '.js'],
      'import-x/parsers': { '@typescript-eslint/parser': ['.ts'] },
      'import-x/resolver': { node: { extensions: ['.ts', '.js'] } },
    },
    rules: {
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            { target: './src/core', from: ['./src/render', './src/node', './cli', './src/web'], message: 'the core imports no higher layer' },
            { target: './src/render', from: ['./src/node', './cli', './src/web'], message: 'the renderers import no file access and no command' },
            { target: './src/node', from: ['./cli', './src/web'], message: 'the edge imports no command and no page' },
            { target: './cli', from: ['./src/web'], message: 'the commands import no page' },
            { target: './src/web', from: ['./src/node', './cli'], message: 'the page runs in a browser: no file access, no command' },
          ],
        },
      ],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['src/core/**/*.ts', 'src/render/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: NODE_BUILTINS, message: 'core and render are pure: no node built-ins' }] }],
      'no-restricted-globals': ['error', { name: 'process', message: 'only cli/main.ts touches the process' }, { name: 'Buffer', message: 'the browser has no Buffer: use Uint8Array' }],
      'no-restricted-properties': [
        'error',
        { object: 'Date', property: 'now', message: 'the core reads no clock' },
        { object: 'Math', property: 'random', message: 'the core draws no random numbers' },
        { object: 'performance', property: 'now', message: 'the core reads no clock' },
      ],
    },
  },
  {
    files: ['src/web/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: NODE_BUILTINS, message: 'the page runs in a browser: no node built-ins' }] }],
      'no-restricted-globals': ['error', { name: 'process', message: 'the page runs in a browser' }, { name: 'Buffer', message: 'the browser has no Buffer: use Uint8Array' }],
    },
  },
  {
    files: ['tests/**/*.ts', 'scripts/**/*.ts', 'bench/**/*.ts'],
    rules: {
      // Tests and scripts read parsed files and fixtures loosely typed on purpose.
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
      '@typescript-eslint/no-explicit-any': 'off',
      '@typescript-eslint/no-non-null-assertion': 'off',
    },
  },
  { files: ['**/*.js', '**/*.mjs'], ...tseslint.configs.disableTypeChecked },
);
