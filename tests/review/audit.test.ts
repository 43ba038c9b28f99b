import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { run } from '../../app/review/run';
import { status } from '../../app/review/status';
import { fingerprint } from '../../app/review/fingerprint';
import { signReview, type SignoffDetails } from '../../app/review/signoff';
import { parseReviewValue } from '../../app/review/parse';
import { MAX_SIGNOFF_HISTORY, type Review } from '../../app/review/schema';
import { changesSinceSigning, compareReviews, comparisonJson } from '../../app/review/audit/compare';
import { checkSignedState, inputsOf } from '../../app/review/audit/signedState';
import { diffInputs } from '../../app/review/audit/diff';
import { changeLine } from '../../app/review/audit/words';
import { revisionHistory } from '../../app/review/audit/history';
import { inputLabelOf } from '../../app/review/inputLabels';
import { formatPath } from '../../app/review/parse';
import { loadDemo } from '../report/helpers';

const DETAILS: SignoffDetails = { reviewer: 'Dana Okafor (invented)', role: 'Reliability engineer', decision: 'approved', signedAt: '2026-12-01T09:30:00Z' };

function sign(review: Review, details: SignoffDetails = DETAILS): Review {
  const r = signReview(review, run(review), details);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.review;
}

/** Parse a plain-JSON copy of `review` after `edit` (as a file edited by hand would be). */
function edited(review: Review, edit: (j: any) => void): Review {
  const j = JSON.parse(JSON.stringify(review));
  edit(j);
  const p = parseReviewValue(j);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.review;
}

const signedDemo = () => sign(loadDemo().review);

describe('the signed state', () => {
  it('is kept inside the sign-off, covered by the fingerprint, and a fresh signing reads back as Signed with a confirmed state', () => {
    const s = signedDemo();
    expect(s.signoff?.signedState).toEqual(inputsOf(loadDemo().review));
    expect(status(s, run(s))).toBe('signed');
    const check = checkSignedState(s);
    expect(check.kind).toBe('kept');
    expect(check.kind === 'kept' && check.confirmed).toBe(true);
  });

  it('an untouched signed review has no changes', () => {
    const since = changesSinceSigning(signedDemo());
    expect('comparison' in since && since.comparison.changes).toEqual([]);
    expect('comparison' in since && since.comparison.moved?.verdictChanged).toBe(false);
  });

  it('tampering with the stored signed state changes the status and is reported as altered', () => {
    const s = signedDemo();
    const t = edited(s, (j) => (j.signoff.signedState.oils[0].kv40_mm2s = 150));
    expect(status(t, run(t))).toBe('changed-since-signing');
    expect(checkSignedState(t).kind).toBe('altered');
    // The same for an altered sign-off detail: the signed state no longer reproduces the fingerprint.
    const u = edited(s, (j) => (j.signoff.reviewer = 'Someone else'));
    expect(checkSignedState(u).kind).toBe('altered');
  });

  it('a file signed before the signed state was kept still reads as Signed, and says no audit is possible', () => {
    const review = loadDemo().review;
    const results = run(review);
    const old = { reviewer: 'R', role: 'Role', decision: 'approved' as const, signedAt: '2026-01-01T00:00:00Z', engineVersion: results.flankfilm, fingerprint: '0'.repeat(64) };
    // The former recipe: the sign-off without signedState, fingerprinted over the review with it.
    const withOld: Review = { ...review, signoff: old };
    const signedOld: Review = { ...review, signoff: { ...old, fingerprint: fingerprint(withOld, results) } };
    expect(status(signedOld, run(signedOld))).toBe('signed');
    expect(checkSignedState(signedOld).kind).toBe('not-kept');
  });
});

describe('changes since signing', () => {
  it('two changed inputs are listed exactly, with before and after, and whether the verdict moved', () => {
    const s = signedDemo();
    const e = edited(s, (j) => {
      j.oils[0].kv40_mm2s = 240;
      j.loadCases[1].oilTemperature_C = 75;
    });
    const since = changesSinceSigning(e);
    if (!('comparison' in since)) throw new Error(since.check.kind);
    const c = since.comparison.changes;
    expect(c.map((x) => [x.path, x.before, x.after])).toEqual([
      ['loadCases[1].oilTemperature_C', 68, 75],
      ['oils[0].kv40_mm2s', 220, 240],
    ]);
    expect(c.map((x) => x.panel)).toEqual(['Duty', 'Oils']);
    expect(changeLine(c[0]!)).toBe('Hard-rock peak: Oil temperature θoil: 68 °C → 75 °C');
    // Independently: did any verdict word change between the two computations?
    const was = run(s);
    const now = run(e);
    const expected = was.verdicts.some((v, i) => v.code !== now.verdicts[i]?.code) || was.cases.some((x, i) => x.verdict?.code !== now.cases[i]?.verdict?.code);
    expect(since.comparison.moved?.verdictChanged).toBe(expected);
    // λmin of the edited oil at the edited case moved (a warmer sump thins the film).
    expect(since.comparison.moved?.moves.some((m) => m.quantity === 'lambdaMin' && m.loadCase === 'Hard-rock peak')).toBe(true);
  });

  it('inserting a load case in the middle is one added case', () => {
    const s = signedDemo();
    const e = edited(s, (j) => j.loadCases.splice(1, 0, { ...j.loadCases[0], name: 'Overload trip (invented)' }));
    const c = compareReviews(s, e).changes;
    expect(c.map((x) => [x.kind, x.path])).toEqual([['added', 'loadCases[1]']]);
    expect(changeLine(c[0]!)).toBe('Load case “Overload trip (invented)” added');
  });

  it('removing, renaming and reordering load cases are one change each', () => {
    const s = signedDemo();
    expect(compareReviews(s, edited(s, (j) => j.loadCases.splice(0, 1))).changes.map((x) => [x.kind, x.path])).toEqual([['removed', 'loadCases[0]']]);
    expect(compareReviews(s, edited(s, (j) => (j.loadCases[2].name = 'Winter start'))).changes.map((x) => [x.kind, x.path, x.after])).toEqual([['changed', 'loadCases[2].name', 'Winter start']]);
    const r = compareReviews(s, edited(s, (j) => j.loadCases.reverse())).changes;
    expect(r.map((x) => x.kind)).toEqual(['reordered']);
  });

  it('a choice shows its words, a custom material as such', () => {
    const s = signedDemo();
    const c = compareReviews(s, edited(s, (j) => {
      j.oils[1].chemistry = 'anti-wear';
      j.gearPair.wheel.material = { youngsModulus_GPa: 206, poissonRatio: 0.3, thermalConductivity_WmK: 50, density_kgm3: 7800, specificHeat_JkgK: 470, structuralFactorXW: 1 };
    })).changes;
    expect(c.map((x) => changeLine(x))).toEqual(['Wheel: Material: Steel, case carburized → Custom material', 'ISO VG 320 EP mineral: Additive chemistry: EP, extreme pressure (DIN 51517-3 CLP) → AW, anti-wear (as DIN 51524-2 HLP)']);
  });
});

describe('an input the editor empties with another edit is listed with that edit', () => {
  // The editor drops a viscosity index the user did not type when KV40 or KV100 changes, so that
  // ASTM D2270 computes it from the new pair (renderer/state/reviewState.ts): one edit, two keys.
  const viscosityEdit = (j: any) => {
    j.loadCases[1].oilTemperature_C = 75;
    j.oils[0].kv40_mm2s = 240;
    delete j.oils[0].viscosityIndex;
  };

  it('a new KV40 that leaves the VI to ASTM D2270 is one change, which names the VI', () => {
    const s = signedDemo();
    const since = changesSinceSigning(edited(s, viscosityEdit));
    if (!('comparison' in since)) throw new Error(since.check.kind);
    const c = since.comparison.changes;
    expect(c.map((x) => [x.path, x.before, x.after])).toEqual([
      ['loadCases[1].oilTemperature_C', 68, 75],
      ['oils[0].kv40_mm2s', 220, 240],
    ]);
    expect(c[1]!.along?.map((x) => [x.path, x.before, x.after])).toEqual([['oils[0].viscosityIndex', 97, undefined]]);
    expect(changeLine(c[1]!)).toBe('ISO VG 220 R&O mineral: Viscosity at 40 °C: 220 mm²/s → 240 mm²/s, with Viscosity index VI: 97 → computed by ASTM D2270');
    // Nothing the fingerprint sees goes unnamed: the --json list gives the VI's path too.
    expect((comparisonJson(since.comparison).changes as any[])[1].along).toEqual([{ path: 'oils[0].viscosityIndex', label: 'ISO VG 220 R&O mineral: Viscosity index VI', before: 97, after: null }]);
  });

  it('undoing that change puts back the KV40 and the VI, and the two undos return the review to Signed', async () => {
    const { setIn } = await import('../../renderer/state/paths');
    const { undoEdit } = await import('../../app/review/audit/undo');
    const s = signedDemo();
    const signedState = s.signoff!.signedState!;
    let draft: any = JSON.parse(JSON.stringify(edited(s, viscosityEdit)));
    for (const expected of [2, 1]) {
      const p = parseReviewValue(draft);
      if (!p.ok) throw new Error(JSON.stringify(p.issues));
      const changes = diffInputs(signedState, inputsOf(p.review));
      expect(changes).toHaveLength(expected);
      const u = undoEdit(draft, signedState, changes[changes.length - 1]!);
      draft = setIn(draft, u.path, u.value);
    }
    expect(draft.oils[0]).toMatchObject({ kv40_mm2s: 220, viscosityIndex: 97 });
    const back = parseReviewValue(draft);
    expect(back.ok && status(back.review, run(back.review))).toBe('signed');
  });

  it('on its own the change moves the KV40 and the VI together', async () => {
    const { applyAlone } = await import('../../app/review/audit/attribute');
    const s = signedDemo();
    const e = edited(s, viscosityEdit);
    const change = diffInputs(inputsOf(s), inputsOf(e))[1]!;
    const alone = applyAlone(inputsOf(s), inputsOf(e), change) as any;
    expect(alone.oils[0].kv40_mm2s).toBe(240);
    expect('viscosityIndex' in alone.oils[0]).toBe(false);
    expect(alone.loadCases[1].oilTemperature_C).toBe(68);
  });

  it('a VI emptied alone, a VI typed anew and a KV40 with its VI kept are each listed as they are', () => {
    const s = signedDemo();
    const cleared = compareReviews(s, edited(s, (j) => delete j.oils[0].viscosityIndex)).changes;
    expect(cleared.map((x) => [x.path, x.along])).toEqual([['oils[0].viscosityIndex', undefined]]);
    expect(changeLine(cleared[0]!)).toBe('ISO VG 220 R&O mineral: Viscosity index VI: 97 → computed by ASTM D2270');
    const typed = compareReviews(s, edited(s, (j) => ((j.oils[0].kv40_mm2s = 240), (j.oils[0].viscosityIndex = 90)))).changes;
    expect(typed.map((x) => [x.path, x.after, x.along])).toEqual([
      ['oils[0].kv40_mm2s', 240, undefined],
      ['oils[0].viscosityIndex', 90, undefined],
    ]);
    // another oil's VI is not this oil's consequence
    const other = compareReviews(s, edited(s, (j) => ((j.oils[0].kv40_mm2s = 240), delete j.oils[1].viscosityIndex))).changes;
    expect(other.map((x) => x.path)).toEqual(['oils[0].kv40_mm2s', 'oils[1].viscosityIndex']);
    expect(other[0]!.along).toBeUndefined();
  });
});

/** Every leaf (number, string, boolean) of the inputs, with its path. */
function leaves(v: unknown, path: (string | number)[] = []): Array<{ path: (string | number)[]; value: string | number | boolean }> {
  if (Array.isArray(v)) return path.join() === 'gearPair,components' ? [] : v.flatMap((x, i) => leaves(x, [...path, i]));
  if (v && typeof v === 'object') return Object.entries(v).flatMap(([k, x]) => leaves(x, [...path, k]));
  return [{ path, value: v as string | number | boolean }];
}

const setAt = (root: any, path: (string | number)[], value: unknown) => {
  let o = root;
  for (const k of path.slice(0, -1)) o = o[k];
  o[path[path.length - 1] as string | number] = value;
};

describe('property: a single-field edit is listed as exactly that field', () => {
  const s = signedDemo();
  const fields = leaves(inputsOf(s));

  it('every input field of the demo has a label on screen', () => {
    expect(fields.length).toBeGreaterThan(40);
    expect(fields.filter((f) => !inputLabelOf(f.path)).map((f) => formatPath(f.path))).toEqual([]);
  });

  it('random single-field edits (seeded)', () => {
    let checked = 0;
    fc.assert(
      fc.property(fc.nat({ max: fields.length - 1 }), fc.double({ min: -0.2, max: 0.2, noNaN: true }), fc.nat({ max: 100 }), (k, rel, pick) => {
        const f = fields[k]!;
        const words = inputLabelOf(f.path)?.words;
        let next: string | number | boolean;
        if (typeof f.value === 'boolean') next = !f.value;
        else if (words && Object.keys(words).length > 1 && typeof f.value === 'string') {
          const others = Object.keys(words).filter((w) => w !== f.value);
          next = others[pick % others.length] as string;
        } else if (typeof f.value === 'string') next = `${f.value} (rev. ${pick})`;
        else if (Number.isInteger(f.value) && Math.abs(f.value) >= 1) next = f.value + (rel >= 0 ? 1 : -1);
        else next = Number((f.value * (1 + rel)).toPrecision(6));
        fc.pre(next !== f.value);
        const j = JSON.parse(JSON.stringify(s));
        setAt(j, f.path, next);
        const p = parseReviewValue(j);
        fc.pre(p.ok); // an edit the file would refuse cannot be signed or compared
        if (!p.ok) return;
        const since = changesSinceSigning(p.review);
        if (!('comparison' in since)) throw new Error(`no audit: ${since.check.kind}`);
        const c = since.comparison.changes;
        expect(c.map((x) => x.path)).toEqual([formatPath(f.path)]);
        expect([c[0]!.before, c[0]!.after]).toEqual([f.value, next]);
        expect(status(p.review, run(p.review))).toBe('changed-since-signing');
        checked++;
      }),
      { seed: 160016, numRuns: 120 },
    );
    expect(checked).toBeGreaterThan(60);
  }, 120_000);

  it('diff is empty exactly when the canonical inputs are equal (and undoing every change restores Signed)', () => {
    const a = inputsOf(s);
    expect(diffInputs(a, JSON.parse(JSON.stringify(a)))).toEqual([]);
  });
});

describe('revision history', () => {
  it('sign, change, sign again: the second sign-off keeps the first with its signed state; one line a signing', () => {
    const first = signedDemo();
    const e = edited(first, (j) => (j.loadCases[0].oilTemperature_C = 62));
    const second = sign(e, { ...DETAILS, reviewer: 'Lee Marsh (invented)', decision: 'approved-with-conditions', conditions: 'Oil analysis every 500 h', signedAt: '2026-12-02T10:00:00Z' });
    expect(second.signoff?.history?.map((h) => h.reviewer)).toEqual(['Dana Okafor (invented)']);
    expect(status(second, run(second))).toBe('signed');
    const lines = revisionHistory(second.signoff!);
    expect(lines.map((l) => [l.reviewer, l.decision, l.changes?.map((c) => c.path) ?? null])).toEqual([
      ['Dana Okafor (invented)', 'approved', null],
      ['Lee Marsh (invented)', 'approved-with-conditions', ['loadCases[0].oilTemperature_C']],
    ]);
  });

  it('signing the same inputs with the same details again keeps the fingerprint and adds no history', () => {
    const first = signedDemo();
    const again = sign(first, { ...DETAILS, signedAt: '2026-12-03T08:00:00Z' });
    expect(again.signoff?.fingerprint).toBe(first.signoff?.fingerprint);
    expect(again.signoff?.history).toBeUndefined();
  });

  it(`is bounded: after ${MAX_SIGNOFF_HISTORY + 3} signings the file keeps the last ${MAX_SIGNOFF_HISTORY} earlier ones`, () => {
    let r = loadDemo().review;
    for (let i = 0; i < MAX_SIGNOFF_HISTORY + 3; i++) {
      r = sign(edited(r, (j) => (j.revision = i)), { ...DETAILS, signedAt: `2026-12-01T09:${String(10 + i).padStart(2, '0')}:00Z` });
    }
    expect(r.signoff?.history).toHaveLength(MAX_SIGNOFF_HISTORY);
    expect(r.signoff?.history?.[0]?.signedState?.revision).toBe(2); // 12 earlier signings (revisions 0–11), the oldest two dropped
    expect(status(r, run(r))).toBe('signed');
  }, 60_000);
});

describe('undo this change', () => {
  it('undoing every change, one at a time, returns the review to Signed', async () => {
    const { setIn } = await import('../../renderer/state/paths');
    const { undoEdit } = await import('../../app/review/audit/undo');
    const s = signedDemo();
    let draft: any = JSON.parse(JSON.stringify(edited(s, (j) => {
      j.oils[0].kv40_mm2s = 240;
      delete j.oils[0].viscosityIndex;
      j.loadCases.splice(1, 0, { ...j.loadCases[0], name: 'Overload trip (invented)' });
      j.loadCases.reverse();
      j.oils.splice(1, 1);
      j.gearPair.components = ['backstop', 'clutch'];
      j.policy.temperatureRange_C = [25, 70];
    })));
    const signedState = s.signoff!.signedState!;
    const kinds = new Set<string>();
    for (let step = 0; step < 20; step++) {
      const p = parseReviewValue(draft);
      if (!p.ok) throw new Error(JSON.stringify(p.issues));
      const changes = diffInputs(signedState, inputsOf(p.review));
      if (changes.length === 0) break;
      changes.forEach((c) => kinds.add(c.kind));
      const u = undoEdit(draft, signedState, changes[changes.length - 1]!);
      draft = setIn(draft, u.path, u.value);
    }
    expect([...kinds].sort()).toEqual(['added', 'changed', 'removed', 'reordered']);
    const back = parseReviewValue(draft);
    expect(back.ok && status(back.review, run(back.review))).toBe('signed');
  });
});

describe('the results that move with each change alone', () => {
  it('each change applied alone to the signed inputs is exactly that change; a single change moves what all move', async () => {
    const { applyAlone } = await import('../../app/review/audit/attribute');
    const s = signedDemo();
    const e = edited(s, (j) => {
      j.oils[0].kv40_mm2s = 240;
      j.loadCases.splice(1, 0, { ...j.loadCases[0], name: 'Overload trip (invented)' });
      j.loadCases[3].oilTemperature_C = 35; // "Cold start", now the fourth
      j.oils.reverse();
    });
    const c = compareReviews(s, e);
    expect(c.changes.map((x) => x.kind).sort()).toEqual(['added', 'changed', 'changed', 'reordered']);
    for (const change of c.changes) {
      const p = parseReviewValue({ format: 'flankfilm.review', version: 1, ...(applyAlone(inputsOf(s), inputsOf(e), change) as object) });
      expect(p.ok).toBe(true);
      if (!p.ok) continue;
      const alone = diffInputs(inputsOf(s), inputsOf(p.review));
      expect(alone.map((x) => [x.kind, x.label]), change.label).toEqual([[change.kind, change.label]]);
    }
    const one = compareReviews(s, edited(s, (j) => (j.loadCases[1].oilTemperature_C = 75)));
    expect(one.perChange?.[0]).toEqual({ moves: one.moved?.moves });
  });
});
