// Lint, including the layering of STYLE.md: arrows only point down
// (renderer → fleet → review → engine; main → report → fleet → review → engine; cli → report → fleet → review → engine).
import tseslint from 'typescript-eslint';

const NODE_BUILTINS = ['node:*', 'fs', 'fs/*', 'path', 'os', 'child_process', 'crypto', 'http', 'https', 'net', 'url', 'util', 'stream', 'worker_threads'];
const layer = (patterns, message) => ({
  'no-restricted-imports': ['error', { patterns: patterns.map((group) => ({ group: [group], message })) }],
});
const up = (...dirs) => dirs.flatMap((d) => [`**/${d}`, `**/${d}/**`]);

export default tseslint.config(
  { ignores: ['node_modules/**', 'dist/**', 'out/**', 'release/**', 'test-output/**', 'coverage/**'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
      'no-restricted-imports': ['error', { paths: [{ name: 'electron', message: 'Only main/ may import electron.' }] }],
    },
  },
  {
    // Tests mutate review files freely to build bad inputs.
    files: ['tests/**/*.ts'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    files: ['app/engine/**/*.ts'],
    rules: layer([...NODE_BUILTINS, 'electron', 'zod', 'react', ...up('review', 'fleet', 'report', 'cli', 'main', 'renderer')], 'app/engine is pure: no I/O, no Node, no UI, no upper layer.'),
  },
  {
    files: ['app/review/**/*.ts'],
    rules: layer([...NODE_BUILTINS, 'electron', 'react', ...up('fleet', 'report', 'cli', 'main', 'renderer')], 'app/review is pure: it may import app/engine and zod only.'),
  },
  {
    files: ['app/bridge/**/*.ts'],
    rules: layer([...NODE_BUILTINS, 'electron', 'react', ...up('report', 'cli', 'main', 'renderer')], 'app/bridge is the pure contract: zod and app/review only.'),
  },
  {
    files: ['app/fleet/**/*.ts'],
    rules: layer([...NODE_BUILTINS, 'electron', 'react', ...up('report', 'cli', 'main', 'renderer', 'files', 'bridge')], 'app/fleet is pure: it may import app/review, app/engine and zod only.'),
  },
  {
    files: ['app/report/**/*.ts'],
    rules: layer(['electron', 'react', ...up('cli', 'main', 'renderer')], 'app/report may import fleet, review and engine, not cli/main/renderer.'),
  },
  {
    files: ['app/cli/**/*.ts'],
    rules: layer(['electron', 'react', ...up('main', 'renderer')], 'app/cli may import report, fleet, review and engine.'),
  },
  {
    files: ['renderer/**/*.{ts,tsx}'],
    rules: layer([...NODE_BUILTINS, 'electron', ...up('report', 'cli', 'main')], 'renderer talks to main only through the bridge; it may import app/engine, app/review, app/fleet and app/bridge.'),
  },
  {
    files: ['main/**/*.ts'],
    rules: { 'no-restricted-imports': ['error', { patterns: [{ group: ['**/renderer/**', '**/cli/**'], message: 'main may import report, review, engine.' }] }] },
  },
);
