// Typecheck every layer with its own tsconfig, so a wrong import (a DOM or Node API in the
// pure engine, say) fails here. The list is the layering of STYLE.md, lowest first.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const layers = ['app/engine', 'app/review', 'app/fleet', 'app/bridge', 'app/files', 'app/report', 'app/cli', 'main', 'renderer', 'tests'];
let failed = false;
for (const layer of layers) {
  const config = `${layer}/tsconfig.json`;
  if (!existsSync(config)) continue;
  const r = spawnSync(process.execPath, ['node_modules/typescript/bin/tsc', '-p', config], { stdio: 'inherit' });
  if (r.status !== 0) {
    console.error(`typecheck: ${layer} failed`);
    failed = true;
  }
}
if (failed) process.exit(1);
console.log(`typecheck: ${layers.filter((l) => existsSync(`${l}/tsconfig.json`)).length} layers clean`);
