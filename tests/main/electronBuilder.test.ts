import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import Ajv from 'ajv';
import { describe, expect, it } from 'vitest';

// js-yaml comes with electron-builder (no types of its own here).
const require = createRequire(import.meta.url);
const yaml = require('js-yaml') as { load(text: string): unknown };

interface BuilderConfig {
  appId: string;
  productName: string;
  asar: boolean;
  files: string[];
  icon: string;
  fileAssociations: Array<{ ext: string; name: string }>;
  electronFuses: Record<string, boolean>;
  publish: unknown;
  linux: { target: string[] };
  win: { target: string[] };
  mac: { target: string[] };
}

const config = yaml.load(readFileSync('electron-builder.yml', 'utf8')) as BuilderConfig;
const pkg = JSON.parse(readFileSync('package.json', 'utf8')) as { main: string; dependencies: Record<string, string> };

describe('electron-builder.yml', () => {
  it("passes electron-builder's own JSON schema", () => {
    const schema = JSON.parse(readFileSync('node_modules/app-builder-lib/scheme.json', 'utf8')) as object;
    const validate = new Ajv({ allErrors: true, strict: false, allowUnionTypes: true }).compile(schema);
    const ok = validate(config);
    expect(validate.errors ?? [], JSON.stringify(validate.errors, null, 2)).toEqual([]);
    expect(ok).toBe(true);
    expect(validate({ ...config, asar: 'yes' })).toBe(false); // the schema does bite
  });

  it('names the app and packs it as an asar', () => {
    expect(config.appId).toBe('org.flankfilm.app');
    expect(config.productName).toBe('Flankfilm');
    expect(config.asar).toBe(true);
    expect(config.publish).toBeNull(); // offline: nothing is uploaded
  });

  it('ships the built output, the assets and package.json, and no sources', () => {
    expect(config.files).toEqual(expect.arrayContaining(['package.json', 'dist/**/*', 'assets/**/*']));
    expect(pkg.main).toBe('dist/main/main.cjs');
    expect(config.files.some((f) => /^(main|app|renderer|tests)\//.test(f))).toBe(false);
    expect(Object.keys(pkg.dependencies)).not.toContain('electron'); // electron-builder refuses it in dependencies
  });

  it('builds AppImage and deb, nsis and dmg', () => {
    expect(config.linux.target).toEqual(['AppImage', 'deb']);
    expect(config.win.target).toEqual(['nsis']);
    expect(config.mac.target).toEqual(['dmg']);
  });

  it('associates *.flankfilm.json with Flankfilm', () => {
    expect(config.fileAssociations).toEqual([expect.objectContaining({ ext: 'flankfilm.json', name: 'Flankfilm review' })]);
  });

  it('turns off the fuses that would let a user run the app as plain Node', () => {
    expect(config.electronFuses).toMatchObject({ runAsNode: false, enableNodeOptionsEnvironmentVariable: false, enableNodeCliInspectArguments: false, onlyLoadAppFromAsar: true });
  });

  it('has a PNG icon of at least 512 × 512 (macOS needs 512, 1024 preferred)', () => {
    const png = readFileSync(config.icon);
    expect(png.subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a');
    expect(png.subarray(12, 16).toString('ascii')).toBe('IHDR');
    expect(png.readUInt32BE(16)).toBeGreaterThanOrEqual(512);
    expect(png.readUInt32BE(20)).toBe(png.readUInt32BE(16));
  });
});
