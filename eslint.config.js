// One flat config for the whole repo. Type-aware rules are left out to keep `npm test` quick;
// `tsc` in the typecheck step covers types.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', '.tmp/**', 'test-output/**', 'coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx}'],
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': 'off',
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    languageOptions: { globals: globals.browser },
    rules: { ...reactHooks.configs.recommended.rules },
  },
  {
    // three.js objects (camera, controls, meshes) are mutable by design: react-three-fiber's
    // own guidance is to mutate them in effects and frame callbacks, never through React state.
    files: ['src/features/editor/scene/**/*.{ts,tsx}'],
    rules: { 'react-hooks/immutability': 'off' },
  },
  {
    files: ['server/**/*.ts', 'scripts/**/*.ts', 'tests/**/*.{ts,tsx}', 'shared/cli/**/*.ts', '*.config.{js,ts}'],
    languageOptions: { globals: globals.node },
  },
  {
    // shared/ is pure computation: no DOM, no Node.
    files: ['shared/**/*.ts'],
    ignores: ['shared/cli/**'],
    rules: {
      'no-restricted-globals': ['error', 'window', 'document', 'process', 'Buffer', 'require'],
      'no-restricted-imports': ['error', { patterns: ['node:*', 'fs', 'path', 'react', 'three', 'typeorm', 'express'] }],
    },
  },
);
