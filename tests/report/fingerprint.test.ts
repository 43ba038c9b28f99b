import { describe, expect, it } from 'vitest';
import { canonicalJson } from '../../app/review/canonicalJson';
import { differingParts, fingerprint, fingerprintInputs, fingerprintParts, resultsSummary, sha256Hex } from '../../app/review/fingerprint';
import { signReview } from '../../app/review/signoff';
import { status } from '../../app/review/status';
import { ENGINE_VERSION } from '../../app/engine/version';
import { run } from '../../app/review/run';
import { editableLeaves, editLeaf, loadDemo, parseOrThrow } from './helpers';

const SIGN = { reviewer: 'A. Reviewer', role: 'Lubrication engineer', decision: 'approved-with-conditions' as const, organisation: 'Harrow Creek (invented)', conditions: 'Oil analysis every 500 h', signedAt: '2026-12-01T09:30:00Z' };

describe('canonicalJson', () => {
  it('sorts keys at every depth and writes no whitespace', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { f: 1, e: 2 }], c: 'x' } })).toBe('{"a":{"c":"x","d":[3,{"e":2,"f":1}]},"b":1}');
  });
  it('is the same for objects that differ only in key order', () => {
    expect(canonicalJson({ x: 1, y: [1, 2] })).toBe(canonicalJson({ y: [1, 2], x: 1 }));
  });
  it('leaves out undefined keys as JSON does, and writes numbers as JSON.stringify does', () => {
    expect(canonicalJson({ a: undefined, b: 0.1, c: 1e21, d: -0 })).toBe('{"b":0.1,"c":1e+21,"d":0}');
  });
  it('refuses NaN and Infinity instead of hiding them as null', () => {
    expect(() => canonicalJson({ a: NaN })).toThrow(/\$\.a is NaN/);
    expect(() => canonicalJson([Infinity])).toThrow(/\$\[0\]/);
  });
  it('escapes strings as JSON does (non-ASCII kept as UTF-16 text)', () => {
    expect(canonicalJson({ 'σH': 'θ "q"' })).toBe('{"σH":"θ \\"q\\""}');
  });
});

describe('sha256Hex', () => {
  it('matches the FIPS 180-2 test vectors', () => {
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad'); // FIPS 180-2, Appendix B.1
    expect(sha256Hex('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe('248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1'); // FIPS 180-2, Appendix B.2
  });
});

describe('fingerprint', () => {
  const { review, results } = loadDemo();
  const parts = fingerprintParts(review, results);

  it('is 64 hex digits, with three part hashes, and the engine hash is of the engine version', () => {
    for (const h of [parts.combined, parts.inputs, parts.results, parts.engine]) expect(h).toMatch(/^[0-9a-f]{64}$/);
    expect(parts.engine).toBe(sha256Hex(JSON.stringify(ENGINE_VERSION)));
    expect(parts.engineVersion).toBe(ENGINE_VERSION);
  });

  it('is deterministic: the same review read twice, and recomputed, gives the same fingerprint', () => {
    const again = parseOrThrow(JSON.stringify(review));
    expect(fingerprint(again, run(again))).toBe(parts.combined);
  });

  it('covers the defaults: a file with every default written out has the same fingerprint as one without', () => {
    const explicit = parseOrThrow(JSON.stringify(review, null, 2));
    expect(fingerprintParts(explicit, results).inputs).toBe(parts.inputs);
  });

  it('a different engine version changes the engine part and the fingerprint, not the others', () => {
    const other = fingerprintParts(review, results, '9.9.9');
    expect(differingParts(parts, other)).toEqual(['engine']);
    expect(other.combined).not.toBe(parts.combined);
  });

  it('a changed result changes the results part only', () => {
    const c0 = results.cases[0]!;
    const changed = { ...results, cases: [{ ...c0, scuffingSafety: (c0.scuffingSafety ?? 1) * 1.01 }, ...results.cases.slice(1)] };
    const other = fingerprintParts(review, changed);
    expect(differingParts(parts, other)).toEqual(['results']);
  });

  it('rounds the summary to 6 significant digits, so last-bit noise does not change it', () => {
    const c0 = results.cases[0]!;
    const noisy = { ...results, cases: [{ ...c0, maxHertzStress_MPa: c0.maxHertzStress_MPa * (1 + 1e-13) }, ...results.cases.slice(1)] };
    expect(fingerprintParts(review, noisy).results).toBe(parts.results);
    expect((resultsSummary(results).cases as unknown[]).length).toBe(results.cases.length);
  });

  it('changes when any single editable leaf of a signed demo review changes (every leaf)', () => {
    const signed = signReview(review, results, SIGN);
    if (!signed.ok) throw new Error('sign failed');
    const base = fingerprintParts(signed.review, results);
    const leaves = editableLeaves(signed.review);
    expect(leaves.length).toBeGreaterThan(60); // the demo has gear, 3 cases, 2 oils, policy and sign-off
    for (const path of leaves) {
      const edited = editLeaf(signed.review, path);
      expect(edited, `no valid edit for ${path.join('.')}`).not.toBeNull();
      const p = fingerprintParts(edited!, results);
      expect(p.inputs, path.join('.')).not.toBe(base.inputs);
      expect(p.combined, path.join('.')).not.toBe(base.combined);
    }
  });

  it('leaves out signoff.fingerprint and signoff.signedAt, and only those', () => {
    const signed = signReview(review, results, SIGN);
    if (!signed.ok) throw new Error('sign failed');
    const hashed = fingerprintInputs(signed.review) as { signoff: Record<string, unknown> };
    expect(Object.keys(hashed.signoff).sort()).toEqual(['conditions', 'decision', 'engineVersion', 'organisation', 'reviewer', 'role', 'signedState']);
  });
});

describe('status and signReview', () => {
  const { review, results } = loadDemo();

  it('a review without sign-off is a draft', () => {
    expect(status(review, results)).toBe('draft');
  });

  it('a freshly signed review is signed, and carries the engine version and fingerprint', () => {
    const s = signReview(review, results, SIGN);
    expect(s.ok).toBe(true);
    if (!s.ok) return;
    expect(s.signoff.engineVersion).toBe(ENGINE_VERSION);
    expect(s.signoff.fingerprint).toBe(fingerprint(s.review, results));
    expect(status(s.review, results)).toBe('signed');
  });

  it('editing an input, or the decision, after signing gives changed-since-signing', () => {
    const s = signReview(review, results, SIGN);
    if (!s.ok) throw new Error('sign failed');
    const hotter = { ...s.review, loadCases: s.review.loadCases.map((c, i) => (i === 0 ? { ...c, oilTemperature_C: c.oilTemperature_C + 1 } : c)) };
    expect(status(hotter, run(hotter))).toBe('changed-since-signing');
    const flipped = { ...s.review, signoff: { ...s.signoff, decision: 'approved' as const } };
    expect(status(flipped, results)).toBe('changed-since-signing');
  });

  it('signing again at another time, with the same decision, gives the same fingerprint', () => {
    const a = signReview(review, results, SIGN);
    const b = signReview(review, results, { ...SIGN, signedAt: '2027-03-04T05:06:07+01:00' });
    if (!a.ok || !b.ok) throw new Error('sign failed');
    expect(b.signoff.fingerprint).toBe(a.signoff.fingerprint);
  });

  it('refuses an empty reviewer and a malformed time, naming the field', () => {
    const r1 = signReview(review, results, { ...SIGN, reviewer: '' });
    expect(r1.ok).toBe(false);
    if (!r1.ok) expect(r1.issues[0]?.path).toBe('signoff.reviewer');
    const r2 = signReview(review, results, { ...SIGN, signedAt: 'yesterday' });
    expect(r2.ok).toBe(false);
    if (!r2.ok) expect(r2.issues[0]?.path).toBe('signoff.signedAt');
  });
});
