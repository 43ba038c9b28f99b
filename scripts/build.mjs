// `npm run build`: bundle the Electron main process and preload, the CLI, and the renderer into
// dist/. Builds only; launches nothing.
//   dist/main/main.cjs     Electron main (node, cjs); electron and runtime dependencies stay external
//   dist/main/recordWorker.cjs  the record export's worker thread (main/recordWorker.ts)
//   dist/main/preload.cjs  the sandboxed preload: one self-contained file (a sandboxed preload can
//                          require only 'electron'), so only electron is external
//   dist/cli/flankfilm.cjs the `flankfilm` command, with a node shebang
//   dist/renderer/         vite build --config renderer/vite.config.ts, when that config exists
import { spawnSync } from 'node:child_process';
import { chmodSync, existsSync, readFileSync, rmSync } from 'node:fs';
import { build } from 'esbuild';

const pkg = JSON.parse(readFileSync('package.json', 'utf8'));

/** A dependency with no CommonJS entry would need require(esm); it is bundled instead (it has no files to find at run time). */
function esmOnly(name) {
  const p = JSON.parse(readFileSync(`node_modules/${name}/package.json`, 'utf8'));
  const entry = p.exports && typeof p.exports === 'object' && '.' in p.exports ? p.exports['.'] : p.exports;
  return p.type === 'module' && !(entry && typeof entry === 'object' && 'require' in entry);
}
const external = Object.keys(pkg.dependencies ?? {})
  .filter((d) => !esmOnly(d))
  .flatMap((d) => [d, `${d}/*`]);

// app/report finds assets/fonts from import.meta.url; give the bundles a real one.
const importMetaUrl = {
  banner: { js: 'const __flankfilmImportMetaUrl = require("node:url").pathToFileURL(__filename).href;' },
  define: { 'import.meta.url': '__flankfilmImportMetaUrl' },
};
const common = { bundle: true, platform: 'node', format: 'cjs', sourcemap: 'linked', logLevel: 'warning', legalComments: 'none' };

rmSync('dist/main', { recursive: true, force: true });
rmSync('dist/cli', { recursive: true, force: true });

await build({ ...common, ...importMetaUrl, entryPoints: ['main/main.ts'], outfile: 'dist/main/main.cjs', target: 'node22', external: ['electron', ...external] });
await build({ ...common, ...importMetaUrl, entryPoints: ['main/recordWorker.ts'], outfile: 'dist/main/recordWorker.cjs', target: 'node22', external: ['electron', ...external] });
await build({ ...common, entryPoints: ['main/preload.ts'], outfile: 'dist/main/preload.cjs', target: 'chrome130', external: ['electron'], minify: true });
// The entry's own `#!/usr/bin/env node` line is kept by esbuild; the banner goes after it.
await build({ ...common, ...importMetaUrl, entryPoints: ['app/cli/main.ts'], outfile: 'dist/cli/flankfilm.cjs', target: 'node20', external });
const cli = readFileSync('dist/cli/flankfilm.cjs', 'utf8');
if (!cli.startsWith('#!/usr/bin/env node\n')) throw new Error('build: dist/cli/flankfilm.cjs lacks its node shebang');
chmodSync('dist/cli/flankfilm.cjs', 0o755);
console.log('build: dist/main/main.cjs, dist/main/preload.cjs, dist/cli/flankfilm.cjs');

if (existsSync('renderer/vite.config.ts')) {
  const r = spawnSync('npx', ['vite', 'build', '--config', 'renderer/vite.config.ts'], { stdio: 'inherit', shell: process.platform === 'win32' });
  if (r.status !== 0) {
    console.error('build: the renderer build failed');
    process.exit(r.status ?? 1);
  }
} else {
  console.log('build: renderer/vite.config.ts does not exist yet; the renderer was not built');
}
