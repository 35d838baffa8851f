// @ts-check
import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const serverOnly = [
  {
    group: ['@/db', '@/db/*', '@/server', '@/server/*', '**/db/*', '**/server/*'],
    message: 'Client code talks to the server over HTTP only (stores/queries).',
  },
];
const sharedForbidden = [
  {
    group: ['react', 'react-*', 'react-native', 'react-native-*', 'expo', 'expo-*', '@expo/*'],
    message: 'shared/ runs on both sides: no React or React Native.',
  },
  {
    group: ['drizzle-orm', 'drizzle-orm/*', 'better-sqlite3', 'better-auth', 'better-auth/*', 'express'],
    message: 'shared/ has no database or server code.',
  },
  { group: ['node:*'], message: 'shared/ runs in the browser too: no Node built-ins.' },
  {
    group: [
      '@/db/*',
      '@/server/*',
      '@/app/*',
      '@/components/*',
      '@/stores/*',
      '**/db/*',
      '**/server/*',
      '**/components/*',
      '**/stores/*',
    ],
    message: 'shared/ imports nothing from the rest of the project.',
  },
];
const dbForbidden = [
  {
    group: ['@/server', '@/server/*', '**/server', '**/server/*'],
    message:
      'db/ never imports server/: take what it needs as a parameter (command-line entry points live in scripts/).',
  },
  {
    group: ['@/app/*', '@/components/*', '@/stores/*', '**/components/*', '**/stores/*'],
    message: 'db/ holds no client code.',
  },
];
const envOnlyThroughServerEnv = {
  selector: "MemberExpression[object.name='process'][property.name='env']",
  message: 'Read configuration through server/env.ts.',
};
const nodeBuiltins = [
  'fs',
  'path',
  'os',
  'crypto',
  'child_process',
  'http',
  'https',
  'url',
  'util',
  'stream',
  'events',
  'zlib',
  'net',
  'tls',
  'worker_threads',
];

export default tseslint.config(
  {
    ignores: [
      'node_modules/',
      'dist/',
      'build/',
      '.expo/',
      'data/',
      'test-results/',
      'drizzle/',
      'public/',
      'expo-env.d.ts',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      '@typescript-eslint/consistent-type-definitions': ['error', 'type'],
      '@typescript-eslint/no-non-null-assertion': 'error',
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-require-imports': 'off',
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['../../*'], message: 'Use the @/ alias instead of ../../ chains.' }] },
      ],
    },
  },
  {
    files: ['app/**/*.{ts,tsx}', 'components/**/*.{ts,tsx}', 'stores/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'no-restricted-imports': [
        'error',
        { patterns: [...serverOnly, { group: ['../../*'], message: 'Use the @/ alias.' }] },
      ],
    },
  },
  {
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: nodeBuiltins.map((name) => ({ name, message: 'shared/ runs in the browser too: no Node built-ins.' })),
          patterns: sharedForbidden,
        },
      ],
      'no-restricted-globals': ['error', { name: 'process', message: 'shared/ is pure: pass values in.' }],
    },
  },
  {
    files: ['server/**/*.ts', 'db/**/*.ts'],
    rules: { 'no-restricted-syntax': ['error', envOnlyThroughServerEnv] },
  },
  {
    files: ['db/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [...dbForbidden, { group: ['../../*'], message: 'Use the @/ alias instead of ../../ chains.' }] },
      ],
      // import() and require() slip past no-restricted-imports.
      'no-restricted-syntax': [
        'error',
        envOnlyThroughServerEnv,
        { selector: 'ImportExpression[source.value=/(^|\\/)server(\\/|$)/]', message: dbForbidden[0].message },
        {
          selector: "CallExpression[callee.name='require'][arguments.0.value=/(^|\\/)server(\\/|$)/]",
          message: dbForbidden[0].message,
        },
      ],
    },
  },
  {
    files: ['server/env.ts'],
    rules: { 'no-restricted-syntax': 'off' },
  },
);
