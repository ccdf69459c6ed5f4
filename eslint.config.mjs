// @ts-check
import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import importPlugin from 'eslint-plugin-import';
import reactHooks from 'eslint-plugin-react-hooks';
import reactRefresh from 'eslint-plugin-react-refresh';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const features = (dir) =>
  readdirSync(new URL(dir, import.meta.url), { withFileTypes: true })
    .filter((d) => d.isDirectory())
    .map((d) => d.name);

// Dependency direction (conventions.md): shared code -> features -> app; no feature imports another.
const frontendZones = [
  ...features('./frontend/src/features').map((name) => ({
    target: `./frontend/src/features/${name}`,
    from: './frontend/src/features',
    except: [`./${name}`],
    message: 'A feature never imports another feature; compose them in app/routes.',
  })),
  {
    target: './frontend/src/features',
    from: './frontend/src/app',
    message: 'Features do not import from app/.',
  },
  {
    target: ['./frontend/src/components', './frontend/src/lib'],
    from: ['./frontend/src/features', './frontend/src/app'],
    message: 'Shared code does not import features or app/.',
  },
  {
    // Test helpers mirror the app's providers (theme), but know no feature.
    target: './frontend/src/testing',
    from: './frontend/src/features',
    message: 'Test helpers do not import features.',
  },
  {
    target: './frontend',
    from: './backend',
    // The browser journeys start the built server with the backend's own process helper.
    except: ['./test/support/server-process.ts'],
    message: 'The frontend never imports the backend.',
  },
  {
    target: './backend/src/common',
    from: './backend/src',
    except: ['./common'],
    message: 'common/ never imports a feature.',
  },
  {
    target: './shared-types',
    from: ['./backend', './frontend'],
    message: 'shared-types depends on nothing.',
  },
];

export default tseslint.config(
  {
    ignores: [
      '**/dist/**',
      '**/node_modules/**',
      '**/coverage/**',
      'data/**',
      'frontend/e2e/screenshots/**',
      'backend/src/migrations/Migration*.ts',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
    },
    plugins: { import: importPlugin },
    settings: {
      'import/resolver': {
        typescript: {
          noWarnOnMultipleProjects: true,
          project: [
            'backend/tsconfig.json',
            'frontend/tsconfig.json',
            'frontend/e2e/tsconfig.json',
            'shared-types/tsconfig.json',
          ],
        },
        node: true,
      },
    },
    rules: {
      eqeqeq: ['error', 'always'],
      'import/no-cycle': 'error',
      'import/no-restricted-paths': ['error', { zones: frontendZones }],
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', ignoreRestSiblings: true },
      ],
    },
  },
  {
    files: ['backend/**/*.ts'],
    languageOptions: { globals: globals.node },
    rules: {
      // Nest resolves constructor parameters from their emitted types: they must stay value imports.
      '@typescript-eslint/consistent-type-imports': 'off',
    },
  },
  {
    // One place names the database driver; everything else works on any SQL driver (issue 17).
    files: ['backend/**/*.ts'],
    ignores: ['backend/src/mikro-orm.config.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@mikro-orm/sqlite', '@mikro-orm/postgresql'],
              message:
                'Import MikroORM from @mikro-orm/knex (any SQL driver); only mikro-orm.config.ts names the driver.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['backend/src/analysis/engine/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@nestjs/*', '@mikro-orm/*'],
              message: 'The engine is pure: no Nest, no ORM.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['frontend/src/**/*.{ts,tsx}'],
    languageOptions: { globals: globals.browser },
    plugins: { 'react-hooks': reactHooks, 'react-refresh': reactRefresh },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'react-refresh/only-export-components': ['warn', { allowConstantExport: true }],
    },
  },
  {
    files: ['frontend/e2e/**/*.ts', 'frontend/vite.config.ts'],
    languageOptions: { globals: globals.node },
  },
  {
    files: ['**/*.{js,mjs,cjs}'],
    ...tseslint.configs.disableTypeChecked,
    languageOptions: {
      ...tseslint.configs.disableTypeChecked.languageOptions,
      globals: globals.node,
    },
  },
  {
    files: ['**/*.spec.ts', '**/*.e2e-spec.ts', '**/*.test.{ts,tsx}', 'backend/test/**/*.ts'],
    rules: {
      // supertest bodies are `any` by type; tests assert on them with expect().
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
      '@typescript-eslint/unbound-method': 'off',
    },
  },
  prettier,
);
