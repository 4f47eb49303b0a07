// ESLint flat config: @eslint/js recommended and typescript-eslint's type-checked recommended set
// over the sources, tests, benchmarks and scripts. Every rule turned off or relaxed below says why.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';

/** Node's globals that the plain JavaScript files use (TypeScript files get them from @types/node). */
const nodeGlobals = {
  process: 'readonly',
  console: 'readonly',
  Buffer: 'readonly',
  URL: 'readonly',
  fetch: 'readonly',
  setTimeout: 'readonly',
  clearTimeout: 'readonly',
  AbortController: 'readonly',
  TextDecoder: 'readonly',
  TextEncoder: 'readonly',
};

export default tseslint.config(
  {
    // Generated, bundled or test input (fixtures are hostile files on purpose).
    ignores: ['dist/', 'build/', 'coverage/', 'fixtures/', 'node_modules/', '**/*.generated.ts'],
  },
  js.configs.recommended,
  tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      parserOptions: {
        projectService: true,
        tsconfigRootDir: import.meta.dirname,
      },
    },
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    rules: {
      // Off: every control-character class in the tree is deliberate: inputs, paths, git output
      // and report text are checked for or cleaned of control characters before they are used.
      'no-control-regex': 'off',
      // Off: `async` without `await` is how the adapters and their test fakes implement interfaces
      // that return promises (FileSource.read, the REST calls, RunnerOutput.summary) while keeping a
      // throw a rejection; dropping `async` would make those throws synchronous.
      '@typescript-eslint/require-await': 'off',
      // `_`-prefixed parameters and bindings are deliberately unused (interface shapes, skipped
      // tuple slots); `catch {}` without a binding covers the errors that are dropped on purpose.
      '@typescript-eslint/no-unused-vars': [
        'error',
        {
          argsIgnorePattern: '^_',
          varsIgnorePattern: '^_',
          caughtErrorsIgnorePattern: '^_',
          destructuredArrayIgnorePattern: '^_',
        },
      ],
    },
  },
  {
    // Plain JavaScript: the build and CI scripts (type-checked through scripts/tsconfig.json) and
    // the two CommonJS preloads.
    files: ['**/*.mjs', '**/*.cjs', '**/*.js'],
    languageOptions: { globals: nodeGlobals },
  },
  {
    // Off in the tests: they read JSON they just produced (reports, CLI output, package.json,
    // recorded API payloads) and assert on its fields; a wrong shape fails the assertion, so a
    // type for each payload would add casts, not checks. The sources type such input as unknown.
    files: ['test/**'],
    rules: {
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
    },
  },
  {
    // Off in the build and CI scripts: plain JavaScript has no annotations to type the JSON they
    // read (package.json, action.yml, npm's and GitHub's answers), so every read of it is `any`.
    // The type-aware rules that need no annotations (floating and misused promises) stay on.
    files: ['scripts/**'],
    rules: {
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
    },
  },
  {
    files: ['**/*.cjs'],
    languageOptions: { sourceType: 'commonjs', globals: { ...nodeGlobals, require: 'readonly' } },
    // CommonJS preloads (`node --require`) load modules with require by definition.
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    // Files outside every tsconfig: the two preloads and the tool configs at the root. They are a
    // few lines each; the syntax rules still apply, the type-aware ones cannot.
    files: ['**/*.cjs', '*.config.js', '*.config.ts', '*.config.mjs'],
    extends: [tseslint.configs.disableTypeChecked],
  },
);
