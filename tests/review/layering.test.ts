import { describe, expect, it } from 'vitest';
import { ESLint } from 'eslint';

/** The layering of STYLE.md is enforced by lint: a wrong import fails, a right one passes. */
const eslint = new ESLint({ cwd: process.cwd() });
async function errorsFor(file: string, code: string): Promise<string[]> {
  const [r] = await eslint.lintText(code, { filePath: file });
  return (r?.messages ?? []).filter((m) => m.ruleId === 'no-restricted-imports').map((m) => m.message);
}

describe('layer boundaries (eslint no-restricted-imports)', () => {
  const cases: Array<[string, string, boolean]> = [
    ['app/engine/x.ts', "import { readFileSync } from 'node:fs';", false],
    ['app/engine/x.ts', "import { z } from 'zod';", false],
    ['app/engine/x.ts', "import { run } from '../review/run';", false],
    ['app/engine/x.ts', "import { involute } from './geometry/involute';", true],
    ['app/review/x.ts', "import { renderRecord } from '../report/record';", false],
    ['app/review/x.ts', "import { gearPairGeometry } from '../engine/geometry/gearPair';", true],
    ['renderer/x.ts', "import { app } from 'electron';", false],
    ['renderer/x.ts', "import { writeFile } from 'node:fs/promises';", false],
    ['renderer/x.ts', "import { renderRecord } from '../app/report/record';", false],
    ['renderer/x.ts', "import { run } from '../app/review/run';", true],
    ['app/report/x.ts', "import { BrowserWindow } from 'electron';", false],
    ['app/review/x.ts', "import { runFleet } from '../fleet/fleet';", false],
    ['app/engine/x.ts', "import { runFleet } from '../fleet/fleet';", false],
    ['app/fleet/x.ts', "import { run } from '../review/run';", true],
    ['app/fleet/x.ts', "import { readFile } from 'node:fs/promises';", false],
    ['app/fleet/x.ts', "import { renderRecord } from '../report/record';", false],
    ['app/fleet/x.ts', "import { cli } from '../cli/runCli';", false],
    ['app/report/x.ts', "import { runFleet } from '../fleet/fleet';", true],
    ['app/cli/x.ts', "import { runFleet } from '../fleet/fleet';", true],
    ['main/x.ts', "import { app } from 'electron';", true],
  ];
  for (const [file, code, allowed] of cases) {
    it(`${file}: ${code} is ${allowed ? 'allowed' : 'refused'}`, async () => {
      const errors = await errorsFor(file, `${code}\nexport {};\n`);
      expect(errors.length === 0, errors.join('; ')).toBe(allowed);
    });
  }
});
