import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import globals from 'globals';
import { layersRule } from './eslint.layers.js';

export default tseslint.config(
  { ignores: ['dist', 'dist-cli', '.dist-cli-*', 'node_modules', 'test-results', 'playwright-report'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/consistent-type-imports': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { railwise: { rules: { layers: layersRule } } },
    rules: { 'railwise/layers': 'error' },
  },
  {
    // The core is pure: no React, no DOM, no UI state, no filesystem.
    files: ['src/core/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['react', 'react-dom', 'konva', 'react-konva', 'zustand', 'zustand/*'],
              message: 'src/core stays free of UI libraries.',
            },
            {
              group: ['node:*', 'fs', 'path', 'child_process'],
              message: 'src/core runs in the browser too: no Node modules.',
            },
          ],
        },
      ],
    },
  },
);
