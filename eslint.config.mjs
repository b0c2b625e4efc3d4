// Lint rules that keep the layers apart (see docs/architecture.md):
//   shared/      pure code: imports nothing of app/, components/, lib/ or server/
//   lib/         client logic: no app/ screens, no components/, no server/
//   components/  no app/ routes, no server/
//   server/      no client code: no app/, components/ or lib/
// and no import cycles anywhere. No type-aware rules, so a full run stays quick.
import tseslint from 'typescript-eslint';
import importPlugin from 'eslint-plugin-import';

const layer = (target, from, message) => ({ target, from, message });

export const layeringZones = [
  layer('./shared', './app', 'shared/ is pure: it must not import app screens'),
  layer('./shared', './components', 'shared/ is pure: it must not import components'),
  layer('./shared', './lib', 'shared/ is pure: it must not import client logic from lib/'),
  layer('./shared', './server', 'shared/ is pure: it must not import the server'),
  layer('./lib', './app', 'lib/ must not import app screens'),
  layer('./lib', './components', 'lib/ must not import components'),
  layer('./lib', './server', 'lib/ runs in the client: it must not import the server'),
  layer('./components', './app', 'components/ must not import app routes'),
  layer('./components', './server', 'components/ run in the client: they must not import the server'),
  layer('./server', './app', 'server/ must not import client code (app/)'),
  layer('./server', './components', 'server/ must not import client code (components/)'),
  layer('./server', './lib', 'server/ must not import client code (lib/)'),
];

export default tseslint.config(
  {
    ignores: [
      'node_modules/**',
      'dist/**',
      '.expo/**',
      'web-build/**',
      'coverage/**',
      'test-results/**',
      'playwright-report/**',
      'tests/lint/fixtures/**',
    ],
  },
  {
    files: ['**/*.{ts,tsx}'],
    languageOptions: { parser: tseslint.parser, ecmaVersion: 'latest', sourceType: 'module' },
    plugins: { import: importPlugin },
    settings: {
      'import/resolver': { typescript: { project: './tsconfig.json' }, node: true },
      'import/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx'] },
      'import/extensions': ['.ts', '.tsx', '.js', '.mjs'],
      'import/external-module-folders': ['node_modules'],
      // Never parse installed packages (some ship Flow syntax); the rules are about our own files.
      'import/ignore': ['node_modules'],
    },
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    rules: {
      'import/no-cycle': ['error', { ignoreExternal: true }],
      'import/no-restricted-paths': ['error', { zones: layeringZones }],
      'import/no-self-import': 'error',
      'import/no-duplicates': 'error',
    },
  },
);
