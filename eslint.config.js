// @ts-check
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import astro from 'eslint-plugin-astro';
import globals from 'globals';

/** Nothing in src/lib imports a page, a component or a script: imports point down (docs/architecture.md). */
const LIB_DOWNWARD = {
  group: ['**/components/**', '**/pages/**', '**/scripts/**'],
  message: 'src/lib sits below pages, components and scripts: move the shared code or type down into src/lib.',
};

/** Pure domain folders (docs/architecture.md; DEVELOPERS.md, "Where things are"); their *.server.ts may read files. */
const PURE_FOLDERS = [
  'src/lib/geometry/**',
  'src/lib/layout/**',
  'src/lib/render/**',
  'src/lib/analysis/**',
  'src/lib/kit/**',
  'src/lib/journal/**',
  'src/lib/reach/**',
  'src/lib/mesh/**',
  'src/lib/tools/**',
  'src/lib/activities/**',
  'src/lib/preview/**',
];

/** Pure domain folders import nothing framework- or server-specific. */
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
      message: 'src/lib pure folders (PURE_FOLDERS) stay pure: no framework, database or node imports.',
    },
    LIB_DOWNWARD,
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
    files: ['src/lib/**'],
    rules: { 'no-restricted-imports': ['error', { patterns: [LIB_DOWNWARD] }] },
  },
  {
    // Queries take the actor and grade band from src/lib/actor.ts and src/lib/grade-bands.ts; auth imports db.
    files: ['src/lib/db/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            LIB_DOWNWARD,
            { group: ['**/auth/**'], message: 'src/lib/db sits below src/lib/auth: share types through src/lib.' },
          ],
        },
      ],
    },
  },
  {
    // A body cap is a named constant (src/lib/http/body-limits.ts or the domain's own), never a bare number.
    files: ['src/pages/**'],
    rules: {
      'no-restricted-syntax': [
        'error',
        {
          selector: "CallExpression[callee.name='readJson'] > Literal.arguments",
          message: 'Cap the body with a constant from src/lib/http/body-limits.ts or the domain module.',
        },
      ],
    },
  },
  {
    files: PURE_FOLDERS,
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
