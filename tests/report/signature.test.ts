/**
 * PKCS#7 signature of the record, checked with poppler's pdfsig (which exits 0 even on a bad
 * signature, so the test reads its text). The identity is a throw-away self-signed certificate
 * made here with openssl.
 */
import { describe, expect, it, beforeAll, afterAll } from 'vitest';
import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { P12_PASSPHRASE_ENV, writeOutputs } from '../../app/cli/outputs';
import { cli } from '../cli/cliHarness';
import { loadDemo, tempDir, toolResult } from './helpers';

const T = 180_000;
const PASS = 'correct horse battery staple';
let dir: string;
let p12: string;
let saved: string | undefined;

function capture(): { io: { out: (s: string) => void; err: (s: string) => void }; text: () => string } {
  let buf = '';
  return { io: { out: (s) => (buf += s), err: (s) => (buf += s) }, text: () => buf };
}

beforeAll(() => {
  dir = tempDir('flankfilm-sign-');
  const key = join(dir, 'key.pem');
  const cert = join(dir, 'cert.pem');
  p12 = join(dir, 'reviewer.p12');
  execFileSync('openssl', ['req', '-x509', '-newkey', 'rsa:2048', '-nodes', '-keyout', key, '-out', cert, '-days', '2', '-subj', '/CN=Flankfilm Test Reviewer'], { stdio: 'ignore' });
  // node-forge reads the PKCS#12 PBE-SHA1-3DES forms, not OpenSSL 3's AES default.
  execFileSync('openssl', ['pkcs12', '-export', '-inkey', key, '-in', cert, '-out', p12, '-passout', `pass:${PASS}`, '-keypbe', 'PBE-SHA1-3DES', '-certpbe', 'PBE-SHA1-3DES', '-macalg', 'sha1'], { stdio: 'ignore' });
  saved = process.env[P12_PASSPHRASE_ENV];
}, T);

afterAll(() => {
  if (saved === undefined) delete process.env[P12_PASSPHRASE_ENV];
  else process.env[P12_PASSPHRASE_ENV] = saved;
});

describe('signed record (@signpdf, PKCS#7 detached)', () => {
  let signed: string;
  beforeAll(async () => {
    const { review, results } = loadDemo();
    signed = join(dir, 'signed.pdf');
    process.env[P12_PASSPHRASE_ENV] = PASS;
    const c = capture();
    const code = await writeOutputs(review, results, { pdf: signed, p12, paper: 'a4' }, c.io);
    expect(code, c.text()).toBe(0);
  }, T);

  it('pdfsig reports "Signature is Valid" and no syntax error', () => {
    const r = toolResult('pdfsig', [signed]);
    expect(r.out).toContain('Signature Validation: Signature is Valid.');
    expect(r.out).toContain('Signer Certificate Common Name: Flankfilm Test Reviewer');
    expect(r.out).toContain('Total document signed');
    expect(r.out).not.toMatch(/Syntax Error/);
  });

  it('after one byte of the signed content changes, pdfsig reports a digest mismatch', () => {
    const bytes = readFileSync(signed);
    const at = bytes.indexOf('Flankfilm record (PDFKit)');
    expect(at).toBeGreaterThan(0);
    const tampered = Buffer.from(bytes);
    tampered[at] = 'G'.charCodeAt(0);
    const path = join(dir, 'tampered.pdf');
    writeFileSync(path, tampered);
    const r = toolResult('pdfsig', [path]);
    expect(r.out).toContain('Digest Mismatch');
    expect(r.out).not.toContain('Signature is Valid');
  });

  it('a signed record still verifies against its attached review', async () => {
    const r = await cli('verify', signed);
    expect(r.code, r.out + r.err).toBe(0);
    expect(r.out).toMatch(/^match:/);
  });

  it('a wrong passphrase exits 1 and writes no file', async () => {
    const { review, results } = loadDemo();
    process.env[P12_PASSPHRASE_ENV] = 'wrong';
    const out = join(dir, 'never.pdf');
    const c = capture();
    expect(await writeOutputs(review, results, { pdf: out, p12, paper: 'a4' }, c.io)).toBe(1);
    expect(c.text()).toMatch(/passphrase/);
    expect(existsSync(out)).toBe(false);
    process.env[P12_PASSPHRASE_ENV] = PASS;
  }, T);

  it('--p12 without --pdf is a usage error; a missing identity file exits 1', async () => {
    const { review, results } = loadDemo();
    const c = capture();
    expect(await writeOutputs(review, results, { p12, paper: 'a4' }, c.io)).toBe(2);
    expect(await writeOutputs(review, results, { pdf: join(dir, 'x.pdf'), p12: join(dir, 'missing.p12'), paper: 'a4' }, c.io)).toBe(1);
    expect(c.text()).toMatch(/missing\.p12: cannot read the signing identity \(ENOENT\)/);
  }, T);
});
