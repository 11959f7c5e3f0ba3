// ESLint flat config: typescript-eslint recommended, the Office add-in rules, and the
// layering of DESIGN.md §2 (taskpane → functions → core; the core touches no host).
import js from '@eslint/js';
import globals from 'globals';
import tseslint from 'typescript-eslint';
import officeAddins from 'eslint-plugin-office-addins';

// The plugin's own "recommended" preset also registers its private copy of the
// typescript-eslint plugin and prettier formatting; take only its office-addins/* rules
// so they sit beside the project's typescript-eslint without a plugin clash.
const officeAddinsRules = Object.fromEntries(
  officeAddins.configs.recommended
    .flatMap((config) => Object.entries(config.rules ?? {}))
    .filter(([rule]) => rule.startsWith('office-addins/')),
);

const hostGlobals = ['Office', 'Excel', 'CustomFunctions', 'OfficeExtension'].map((name) => ({
  name,
  message: 'Host code lives in src/functions/excel and src/taskpane/ports; pass what you need in instead.',
}));

const domGlobals = ['window', 'document', 'navigator', 'localStorage', 'sessionStorage', 'location', 'fetch'].map((name) => ({
  name,
  message: 'src/core is pure: no DOM or browser globals.',
}));

const layer = (message, ...names) => ({
  group: names.flatMap((n) => [`**/${n}`, `**/${n}/**`]),
  message,
});

export default tseslint.config(
  { ignores: ['dist/**', 'build-bench/**', 'build-tsc/**', 'coverage/**', 'test-artifacts/**', 'node_modules/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    plugins: { 'office-addins': officeAddins },
    rules: {
      ...officeAddinsRules,
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['src/**/*.ts'],
    languageOptions: { globals: { ...globals.browser } },
  },
  {
    files: ['scripts/**/*.{ts,mjs,js}', 'test/**/*.ts', 'bench/**/*.ts', '*.config.{js,cjs,mjs,ts,mts}'],
    languageOptions: { globals: { ...globals.node } },
  },
  {
    files: ['webpack.config.js'],
    languageOptions: { sourceType: 'commonjs' },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    // The host contract passes `any[][]` cells; the function layer and the preview's engine
    // adapter are where they are read.
    files: ['src/functions/**/*.ts', 'src/preview/**/*.ts', 'test/**/*.ts'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    files: ['src/core/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [
            { name: '@microsoft/office-js', message: 'src/core must not import Office.' },
            { name: 'hyperformula', message: 'src/core must not import the preview engine.' },
          ],
          patterns: [
            layer('src/core must not import the function, pane or preview layers (imports point taskpane → functions → core).', 'functions', 'taskpane', 'preview'),
            { group: ['office-js', 'office-js/**', '@microsoft/**', '@types/office-js'], message: 'src/core must not import Office.' },
            { group: ['**/*.css', '**/*.html', '**/*.css?*'], message: 'src/core must not import DOM assets.' },
          ],
        },
      ],
      'no-restricted-globals': ['error', ...hostGlobals, ...domGlobals],
    },
  },
  {
    files: ['src/functions/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [{ name: 'hyperformula', message: 'The preview engine stays in src/preview.' }],
          patterns: [layer('src/functions must not import the pane or the preview (imports point taskpane → functions → core).', 'taskpane', 'preview')],
        },
      ],
    },
  },
  {
    files: ['src/taskpane/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [{ name: 'hyperformula', message: 'The preview engine must not reach the task pane bundle.' }],
          patterns: [layer('src/taskpane must not import the preview.', 'preview')],
        },
      ],
    },
  },
  {
    // The pane and its pure helpers run in the preview too: no Office globals there.
    files: ['src/taskpane/pane.ts', 'src/taskpane/reference.ts', 'src/taskpane/port.ts'],
    rules: { 'no-restricted-globals': ['error', ...hostGlobals] },
  },
);
