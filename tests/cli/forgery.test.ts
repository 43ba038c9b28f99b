/**
 * Forged records: each is built with a small PDF editor (tests/report/pdfEdit.ts) the way a
 * forger with any PDF library would, and `flankfilm verify` must answer 3 (mismatch, naming what
 * differs) or 1 (not a readable record) — never 0. Before verify rebuilt the record, every one
 * of the first five below exited 0 ("match"), because only the fingerprint strings were compared.
 */
import { describe, expect, it, beforeAll } from 'vitest';
import { execFileSync, spawnSync } from 'node:child_process';
import { copyFileSync, readFileSync, truncateSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { deflateSync } from 'node:zlib';
import { P12_PASSPHRASE_ENV } from '../../app/cli/outputs';
import { sha256Hex } from '../../app/review/fingerprint';
import { canonicalJson } from '../../app/review/canonicalJson';
import { ENGINE_VERSION } from '../../app/engine/version';
import { CRUSHER, DEMO_DIR, DEMOS, tempDir, toolResult } from '../report/helpers';
import { appendUpdate, PdfEdit } from '../report/pdfEdit';
import { cli } from './cliHarness';

const T = 300_000;
const PASS = 'forgery suite passphrase';
let dir: string;
let crusher: Buffer; // unsigned record of the crusher demo, made as `review --pdf` makes it
let conveyor: Buffer; // the same for the conveyor demo: "another review"
let signed: Buffer; // the crusher record, PKCS#7-signed
let p12Path: string;

function put(name: string, bytes: Buffer): string {
  const p = join(dir, name);
  writeFileSync(p, bytes);
  return p;
}

/** verify must refuse: exit 3 or 1, never 0 (nor 4, "partial"). Returns the result for details. */
async function refused(path: string, expected: 1 | 3): Promise<{ code: number; out: string; err: string }> {
  const r = await cli('verify', path);
  expect(r.code, r.out + r.err).toBe(expected);
  expect(r.out).not.toMatch(/^match:/m);
  return r;
}

/** The page objects in order, from the page tree. */
function pages(e: PdfEdit): number[] {
  const tree = e.find(/\/Type \/Pages\b/)[0]!;
  return [...e.dict(tree).matchAll(/(\d+) 0 R/g)].map((m) => Number(m[1]));
}

function contentOf(e: PdfEdit, page: number): number {
  return Number(/\/Contents (\d+) 0 R/.exec(e.dict(page))![1]);
}

beforeAll(async () => {
  dir = tempDir('flankfilm-forgery-');
  const key = join(dir, 'key.pem');
  const cert = join(dir, 'cert.pem');
  const p12 = join(dir, 'id.p12');
  p12Path = p12;
  execFileSync('openssl', ['req', '-x509', '-newkey', 'rsa:2048', '-nodes', '-keyout', key, '-out', cert, '-days', '2', '-subj', '/CN=Forgery Suite Signer/O=Flankfilm tests'], { stdio: 'ignore' });
  execFileSync('openssl', ['pkcs12', '-export', '-inkey', key, '-in', cert, '-out', p12, '-passout', `pass:${PASS}`, '-keypbe', 'PBE-SHA1-3DES', '-certpbe', 'PBE-SHA1-3DES', '-macalg', 'sha1'], { stdio: 'ignore' });
  const conv = join(DEMO_DIR, DEMOS[1]);
  for (const [src, out, extra] of [
    [CRUSHER, 'crusher.pdf', []],
    [conv, 'conveyor.pdf', []],
    [CRUSHER, 'signed.pdf', ['--p12', p12]],
  ] as const) {
    const saved = process.env[P12_PASSPHRASE_ENV];
    process.env[P12_PASSPHRASE_ENV] = PASS;
    const r = await cli('review', src, '--pdf', join(dir, out), ...extra);
    if (saved === undefined) delete process.env[P12_PASSPHRASE_ENV];
    else process.env[P12_PASSPHRASE_ENV] = saved;
    expect(r.code, r.err).toBe(0);
  }
  crusher = readFileSync(join(dir, 'crusher.pdf'));
  conveyor = readFileSync(join(dir, 'conveyor.pdf'));
  signed = readFileSync(join(dir, 'signed.pdf'));
}, T);

describe('the genuine records verify', () => {
  it('unsigned: exit 0, the pages rebuilt byte for byte', async () => {
    const r = await cli('verify', put('genuine.pdf', crusher));
    expect(r.code, r.out + r.err).toBe(0);
    expect(r.out).toMatch(/^match:/);
    expect(r.out).toContain('rebuilt byte for byte');
    expect(r.out).toContain('signature: none');
  }, T);

  it('signed: exit 0, the signature valid and its signer named; pdfsig agrees', async () => {
    const path = put('genuine-signed.pdf', signed);
    const r = await cli('verify', path);
    expect(r.code, r.out + r.err).toBe(0);
    expect(r.out).toContain('signature: valid, signed by CN=Forgery Suite Signer, O=Flankfilm tests');
    expect(toolResult('pdfsig', [path]).out).toContain('Signature is Valid');
  }, T);

  it('a signed record of a signed-off review whose reviewer and organisation have accents verifies', async () => {
    const src = join(dir, 'accents.flankfilm.json');
    copyFileSync(CRUSHER, src);
    const signedOff = await cli('sign', src, '--reviewer', 'Zoë Ångström-Dvořák (invented)', '--role', 'Lubrication engineer', '--decision', 'approved-with-conditions', '--organisation', 'Façade Œuvre GmbH (invented)', '--signed-at', '2026-12-01T09:30:00Z');
    expect(signedOff.code, signedOff.err).toBe(0);
    const out = join(dir, 'accents.pdf');
    const saved = process.env[P12_PASSPHRASE_ENV];
    process.env[P12_PASSPHRASE_ENV] = PASS;
    const made = await cli('review', src, '--pdf', out, '--p12', p12Path);
    if (saved === undefined) delete process.env[P12_PASSPHRASE_ENV];
    else process.env[P12_PASSPHRASE_ENV] = saved;
    expect(made.code, made.err).toBe(0);
    const r = await cli('verify', out);
    expect(r.code, r.out + r.err).toBe(0);
    expect(r.out).toContain('state: signed');
  }, T);

  it('a Letter record: its paper is read from the page size and the rebuild matches', async () => {
    const out = join(dir, 'letter.pdf');
    expect((await cli('review', CRUSHER, '--pdf', out, '--paper', 'letter')).code).toBe(0);
    const r = await cli('verify', out);
    expect(r.code, r.out + r.err).toBe(0);
  }, T);

  it('the editor itself changes nothing that matters: parse → write of a genuine record still verifies', async () => {
    // Guards the suite: a forgery below fails because of its edit, not because the editor breaks files.
    const again = PdfEdit.parse(crusher).toBuffer();
    expect(again.equals(crusher)).toBe(true);
  });
});

describe('forgeries exit 3, naming what differs', () => {
  it('an edited content stream on page 1 (a visible figure changed)', async () => {
    const e = PdfEdit.parse(crusher);
    const c = contentOf(e, pages(e)[0]!);
    const text = e.stream(c).toString('latin1');
    // pdfkit writes text as glyph ids in hex: swap the first two glyphs of the first long run.
    const m = /<([0-9a-f]{4})([0-9a-f]{4})([0-9a-f]{4,})>/.exec(text)!;
    expect(m[1]).not.toBe(m[2]);
    e.setStream(c, Buffer.from(text.replace(m[0], `<${m[2]}${m[1]}${m[3]}>`), 'latin1'));
    const path = put('edited-page1.pdf', e.toBuffer());
    // The forgery is a valid PDF whose first page reads differently.
    expect(toolResult('pdftotext', ['-f', '1', '-l', '1', path, '-']).out).not.toBe(toolResult('pdftotext', ['-f', '1', '-l', '1', put('orig.pdf', crusher), '-']).out);
    const r = await refused(path, 3);
    expect(r.out).toContain('differs: pages');
    expect(r.out).not.toMatch(/differs: (inputs|attachment)/);
  }, T);

  it('one byte flipped in a compressed page stream', async () => {
    const e = PdfEdit.parse(crusher);
    const c = contentOf(e, pages(e)[2]!);
    const head = Buffer.from(`\n${c} 0 obj\n`, 'latin1');
    const at = crusher.indexOf(head);
    const streamAt = crusher.indexOf('stream\n', at) + 7;
    const forged = Buffer.from(crusher);
    forged[streamAt + 200] = forged[streamAt + 200]! ^ 0x01;
    const r = await refused(put('flipped.pdf', forged), 3);
    expect(r.out).toContain('differs: pages');
  }, T);

  it('pages 2–17 cut out', async () => {
    const e = PdfEdit.parse(crusher);
    const tree = e.find(/\/Type \/Pages\b/)[0]!;
    const first = pages(e)[0]!;
    expect(pages(e).length).toBeGreaterThanOrEqual(17);
    e.setDict(tree, `<<\n/Type /Pages\n/Count 1\n/Kids [${first} 0 R]\n>>`);
    const path = put('cut.pdf', e.toBuffer());
    expect(/^Pages:\s+1$/m.test(toolResult('pdfinfo', [path]).out)).toBe(true);
    const r = await refused(path, 3);
    expect(r.out).toContain('differs: pages');
  }, T);

  it('the embedded review and the Info fingerprints both swapped for another review’s', async () => {
    const e = PdfEdit.parse(crusher);
    const other = PdfEdit.parse(conveyor);
    const file = e.find(/\/Type \/EmbeddedFile\b/)[0]!;
    e.objects.set(file, other.body(other.find(/\/Type \/EmbeddedFile\b/)[0]!));
    const spec = e.find(/\/Type \/Filespec\b/)[0]!;
    e.objects.set(spec, other.body(other.find(/\/Type \/Filespec\b/)[0]!).replace(/\/F \d+ 0 R/, `/F ${file} 0 R`));
    // pdfkit writes each Info value as its own object: put the other record's values into ours.
    const infoRefs = (x: PdfEdit): Map<string, number> => new Map([...x.body(x.ref('Info')).matchAll(/\/(\w+) (\d+) 0 R/g)].map((m) => [m[1]!, Number(m[2])]));
    const ours = infoRefs(e);
    for (const [k, n] of infoRefs(other)) if (ours.has(k)) e.objects.set(ours.get(k)!, other.body(n));
    const names = e.find(/\/EmbeddedFiles/)[0]!;
    e.objects.set(names, other.body(other.find(/\/EmbeddedFiles/)[0]!).replace(/\) \d+ 0 R/, `) ${spec} 0 R`));
    const r = await refused(put('swapped.pdf', e.toBuffer()), 3);
    // The fingerprint agrees with the attached review — that alone is never proof.
    expect(r.out).not.toMatch(/differs: (inputs|results|engine)/);
    expect(r.out).toContain('differs: pages');
  }, T);

  it('a PKCS#7-signed record with one content byte flipped (pdfsig: digest mismatch)', async () => {
    const at = signed.indexOf('Flankfilm record (PDFKit)');
    const forged = Buffer.from(signed);
    forged[at] = 'G'.charCodeAt(0);
    const path = put('signed-flipped.pdf', forged);
    expect(toolResult('pdfsig', [path]).out).toContain('Digest Mismatch');
    const r = await refused(path, 3);
    expect(r.out).toContain('message digest does not match');
    expect(r.out).toContain('differs: document information');
  }, T);

  it('a signed record with a byte flipped inside a page stream', async () => {
    const e = PdfEdit.parse(signed);
    const c = contentOf(e, pages(e)[1]!);
    const at = signed.indexOf('stream\n', signed.indexOf(Buffer.from(`\n${c} 0 obj\n`, 'latin1'))) + 7 + 100;
    const forged = Buffer.from(signed);
    forged[at] = forged[at]! ^ 0x20;
    const r = await refused(put('signed-page.pdf', forged), 3);
    expect(r.out).toContain('differs: pages');
    expect(r.out).toContain('signature: NOT valid');
  }, T);

  it('a signed record whose signature was replaced by another signature of the same signer', async () => {
    // Same key, same review, another signing time: the /Contents of one spliced into the other.
    const e = PdfEdit.parse(signed);
    const sig = e.find(/\/Type \/Sig\b/)[0]!;
    const other = Buffer.from(signed);
    const at = other.indexOf('/Contents <', other.indexOf(Buffer.from(`\n${sig} 0 obj\n`, 'latin1'))) + 11;
    other[at + 100] = other[at + 100] === 0x30 ? 0x31 : 0x30; // a signature byte: the signature no longer verifies
    const r = await refused(put('signature-changed.pdf', other), 3);
    expect(r.out).toMatch(/signature: (the signature does not verify|the signature cannot be read)/);
  }, T);

  it('content appended after the record (an incremental update), unsigned and signed', async () => {
    const e = PdfEdit.parse(crusher);
    const title = Number(/\/Title (\d+) 0 R/.exec(e.body(e.ref('Info')))![1]);
    const update = new Map([[title, '(A different title)']]);
    const r = await refused(put('appended.pdf', appendUpdate(crusher, update)), 3);
    expect(r.out).toContain('differs: appended data');
    const s = PdfEdit.parse(signed);
    const sInfo = s.ref('Info');
    const rs = await refused(put('signed-appended.pdf', appendUpdate(signed, new Map([[sInfo, s.body(sInfo)]]))), 3);
    expect(rs.out).toMatch(/bytes were appended after the signed range/);
  }, T);

  it('an unsigned record with the attachment edited (a hotter sump) and the Info fingerprints made to fit', async () => {
    const e = PdfEdit.parse(crusher);
    const file = e.find(/\/Type \/EmbeddedFile\b/)[0]!;
    const json = JSON.parse(e.stream(file).toString('utf8'));
    json.loadCases[0].oilTemperature_C += 5;
    e.setStream(file, Buffer.from(`${JSON.stringify(json, null, 2)}\n`, 'utf8'));
    const r = await refused(put('attachment-edited.pdf', e.toBuffer()), 3);
    expect(r.out).toContain('differs: inputs');
  }, T);
});

describe('another engine version: its own word and exit code, never "match"', () => {
  /** The record with its Info engine version set to 0.0.9 (and the engine hash made to fit). */
  function olderEngine(bytes: Buffer): Buffer {
    expect(ENGINE_VERSION.length).toBe('0.0.9'.length);
    const out = Buffer.from(bytes);
    const e = PdfEdit.parse(bytes);
    const n = Number(/\/FlankfilmEngineVersion (\d+) 0 R/.exec(e.body(e.ref('Info')))![1]);
    const infoV = out.indexOf(`\n${n} 0 obj\n(${ENGINE_VERSION})`);
    expect(infoV).toBeGreaterThan(0);
    out.write('0.0.9', infoV + `\n${n} 0 obj\n(`.length, 'latin1');
    const h = sha256Hex(canonicalJson(ENGINE_VERSION));
    const hAt = out.indexOf(h);
    out.write(sha256Hex(canonicalJson('0.0.9')), hAt, 'latin1');
    return out;
  }

  it('exit 4 "partial": the pages are said not to be checked', async () => {
    const r = await cli('verify', put('older.pdf', olderEngine(crusher)));
    expect(r.code, r.out + r.err).toBe(4);
    expect(r.out).toMatch(/^partial:/);
    expect(r.out).toContain('NOT checked: the pages');
    expect(r.out).not.toMatch(/^match/m);
  }, T);

  it('control characters in the record\'s text never reach the terminal', async () => {
    const out = Buffer.from(crusher);
    const e = PdfEdit.parse(crusher);
    const n = Number(/\/FlankfilmEngineVersion (\d+) 0 R/.exec(e.body(e.ref('Info')))![1]);
    const at = out.indexOf(`\n${n} 0 obj\n(${ENGINE_VERSION})`) + `\n${n} 0 obj\n(`.length;
    out.write('\u001b[2J\u0007', at, 'latin1'); // same length: the offsets stay valid
    const r = await cli('verify', put('escape.pdf', out));
    expect([3, 4]).toContain(r.code);
    expect(r.out + r.err).not.toMatch(/[\u0007\u001b]/);
  }, T);

  it('still exit 3 when the attachment does not fit the fingerprint', async () => {
    const e = PdfEdit.parse(olderEngine(crusher));
    const file = e.find(/\/Type \/EmbeddedFile\b/)[0]!;
    const json = JSON.parse(e.stream(file).toString('utf8'));
    json.gearPair.faceWidth_mm += 1;
    e.setStream(file, Buffer.from(JSON.stringify(json, null, 2), 'utf8'));
    const r = await refused(put('older-edited.pdf', e.toBuffer()), 3);
    expect(r.out).toContain('differs: inputs');
  }, T);
});

describe('not a readable record: exit 1 at once', () => {
  it('/dev/zero and a FIFO fail at once instead of hanging', async () => {
    const t0 = Date.now();
    const z = await refused('/dev/zero', 1);
    expect(z.err).toContain('not a regular file');
    const fifo = join(dir, 'pipe.pdf');
    const mk = spawnSync('mkfifo', [fifo]);
    expect(mk.status).toBe(0);
    const f = await refused(fifo, 1);
    expect(f.err).toContain('not a regular file (a pipe)');
    expect(Date.now() - t0).toBeLessThan(5000);
  }, 20_000);

  it('a file over the size limit is refused before it is read (a sparse 40 MB file)', async () => {
    const big = join(dir, 'big.pdf');
    copyFileSync(join(dir, 'crusher.pdf'), big);
    truncateSync(big, 40_000_000);
    const r = await refused(big, 1);
    expect(r.err).toMatch(/the limit is 32\.0 MB/);
  }, 20_000);

  it('a self-referencing attachment name tree', async () => {
    const e = PdfEdit.parse(crusher);
    const names = e.find(/\/EmbeddedFiles/)[0]!;
    e.setDict(names, '<<\n/EmbeddedFiles 200 0 R\n>>');
    e.objects.set(200, '<<\n/Kids [201 0 R]\n>>');
    e.objects.set(201, '<<\n/Kids [200 0 R]\n>>');
    const t0 = Date.now();
    const r = await refused(put('loop.pdf', e.toBuffer()), 1);
    expect(r.err).toContain('refers to itself');
    expect(Date.now() - t0).toBeLessThan(5000);
  }, 20_000);

  it('an attachment that inflates past the review size limit', async () => {
    const e = PdfEdit.parse(crusher);
    const file = e.find(/\/Type \/EmbeddedFile\b/)[0]!;
    const bomb = deflateSync(Buffer.alloc(50_000_000, 0x20)); // ≈ 50 kB that inflate to 50 MB
    e.setStream(file, bomb, { compress: false });
    const t0 = Date.now();
    const r = await refused(put('bomb.pdf', e.toBuffer()), 1);
    expect(r.err).toContain('inflates past 1 MB');
    expect(Date.now() - t0).toBeLessThan(5000);
  }, 20_000);
});
