// @ts-check
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import astro from 'eslint-plugin-astro';
import globals from 'globals';

/** Pure domain folders import nothing framework- or server-specific (DEVELOPERS.md, "Where things are"). */
const PURE_RESTRICTIONS = {
  patterns: [
    {
      group: [
        'astro',
        'astro:*',
        'react',
        'react-dom',
        'knex',
        'pg',
        'node:*',
        '**/db/**',
        '**/auth/**',
        '**/mail/**',
        '**/storage/**',
      ],
      message: 'src/lib geometry, layout, render, analysis and kit stay pure: no framework, database or node imports.',
    },
  ],
};

export default tseslint.config(
  { ignores: ['dist*/', '.data/', '.astro/', 'node_modules/', 'assets/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  ...astro.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: [
      'src/lib/geometry/**',
      'src/lib/layout/**',
      'src/lib/render/**',
      'src/lib/analysis/**',
      'src/lib/kit/**',
      'src/lib/journal/**',
      'src/lib/reach/**',
      'src/lib/mesh/**',
    ],
    ignores: ['**/*.server.ts'],
    rules: { 'no-restricted-imports': ['error', PURE_RESTRICTIONS] },
  },
  {
    // Islands (.tsx/.ts) run in the browser; .astro components render on the server and may read adapters.
    files: ['src/components/**/*.tsx', 'src/components/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['**/lib/db/**', '**/lib/auth/*.server', '**/lib/mail/**', '**/lib/storage/**', 'knex', 'pg'],
              message: 'Islands talk to the API, never to the database or server adapters.',
            },
          ],
        },
      ],
    },
  },
);
