// `npm start`: launch the desktop app on the built output. Where the Electron binary is not
// installed (as on our build machines), say so plainly and name the headless commands instead.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';

const require = createRequire(import.meta.url);
const headless = `
The headless commands work without it:
  npm run -s flankfilm -- review assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json
  npm run -s flankfilm -- review assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json --pdf record.pdf
  npm test`;

function electronBinary() {
  let pkgDir;
  try {
    pkgDir = dirname(require.resolve('electron/package.json'));
  } catch {
    return null;
  }
  const pathFile = join(pkgDir, 'path.txt');
  if (!existsSync(pathFile)) return null;
  const bin = join(pkgDir, 'dist', readFileSync(pathFile, 'utf8').trim());
  return existsSync(bin) ? bin : null;
}

let bin = electronBinary();
let why = '';
if (!bin && process.env.ELECTRON_SKIP_BINARY_DOWNLOAD !== '1') {
  // Electron fetches its binary on first use; try once, with its output captured (no stack traces).
  console.error('flankfilm: fetching the Electron binary (first start only)…');
  try {
    const installer = join(dirname(require.resolve('electron/package.json')), 'install.js');
    const r = spawnSync(process.execPath, [installer], { encoding: 'utf8', timeout: 10 * 60_000 });
    if (r.status !== 0) why = (`${r.stderr}\n${r.stdout}`.split('\n').find((l) => /error|failed/i.test(l)) ?? '').trim();
  } catch (e) {
    why = String(e?.message ?? e);
  }
  bin = electronBinary();
}
if (!bin) {
  console.error(`flankfilm: the Electron binary is not installed on this machine, so the desktop app cannot open here.${why ? `\n(The download failed: ${why.slice(0, 200)})` : ''}
On a machine with internet access, run \`npm ci\` (without ELECTRON_SKIP_BINARY_DOWNLOAD) and then \`npm start\`.${headless}`);
  process.exit(1);
}
const demo = join(process.cwd(), 'assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json');
const child = spawn(bin, ['.', '--open', demo, ...process.argv.slice(2)], { stdio: 'inherit' });
child.on('exit', (code) => process.exit(code ?? 0));
