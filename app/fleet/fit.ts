/**
 * One gearbox with one candidate oil: the review run with that oil alone, under the gearbox's own
 * policy, and whether the oil's overall verdict meets the gearbox's need.
 */
import { EngineInputError } from '../engine/diagnostics';
import { run } from '../review/run';
import type { OverallVerdict, Results } from '../review/results';
import type { Oil, Review } from '../review/schema';
import type { FitCell, FleetShortfall } from './types';

/**
 * What the oil falls short on for the gearbox, from its overall verdict. The single place where
 * the fleet decides "meets the need": chemistry, FZG stage by the policy's methods and the film
 * target come from the verdict's shortfalls (`oilFit`). Micropitting plugs in here: once the
 * verdict carries a micropitting shortfall it flows through unchanged; if it is reported apart
 * (a micropitting need in `results`), add its comparison below and nowhere else.
 */
export function needShortfalls(v: OverallVerdict, _results: Results): FleetShortfall[] {
  const out: FleetShortfall[] = [...v.shortfalls];
  if (v.code === 'beyond-oil') out.push('beyond-oil');
  else if (v.oilFit !== 'meets' && out.length === 0) out.push('not-computed');
  return out;
}

/** The least ratio of a figure to its limit over the worst checks (null: no figure defined). */
function worstRatio(v: OverallVerdict): number | null {
  let r: number | null = null;
  for (const k of v.checks) if (k.value !== null && k.limit > 0) r = r === null ? k.value / k.limit : Math.min(r, k.value / k.limit);
  return r;
}

/** The review of `gearbox` with the candidates as its oils (no sign-off: this is a what-if). */
export function withOils(gearbox: Review, oils: readonly Oil[]): Review {
  return { ...gearbox, oils: [...oils], signoff: undefined };
}

function notComputed(gearboxName: string, oil: string, why: string): FitCell {
  return { gearbox: gearboxName, oil, meets: false, shortfalls: ['not-computed'], governingCase: null, code: null, dutyShareMet: 0, worstRatio: null, summary: `Not computed: ${why}` };
}

function cellOf(gearboxName: string, oil: string, results: Results): FitCell {
  const v = results.verdicts.find((x) => x.oil === oil);
  if (!v) return notComputed(gearboxName, oil, 'no load case gave a verdict with this oil.');
  const shortfalls = needShortfalls(v, results);
  const meets = v.oilFit === 'meets' && shortfalls.length === 0;
  return { gearbox: gearboxName, oil, meets, shortfalls, governingCase: v.governingLoadCase, code: v.code, dutyShareMet: v.dutyShareMet, worstRatio: worstRatio(v), summary: v.summary };
}

function tryRun(review: Review): Results | EngineInputError {
  try {
    return run(review);
  } catch (e) {
    if (e instanceof EngineInputError) return e;
    throw e;
  }
}

/**
 * One gearbox against every candidate. An oil's verdict depends on that oil alone (the others
 * change only the cautions, which the fleet states apart), so the review runs once with all the
 * candidates; tests/fleet/fit.test.ts holds that to running each oil alone. If the engine refuses
 * the whole row, each oil runs alone so the refusal is pinned to the oil (or the gearbox) at fault.
 */
export function fitRow(gearboxName: string, gearbox: Review, oils: readonly Oil[]): FitCell[] {
  if (oils.length === 0) return [];
  const all = tryRun(withOils(gearbox, oils));
  if (!(all instanceof EngineInputError)) return oils.map((o) => cellOf(gearboxName, o.name, all));
  return oils.map((o) => {
    const one = tryRun(withOils(gearbox, [o]));
    return one instanceof EngineInputError ? notComputed(gearboxName, o.name, `${one.field}: ${one.message}`) : cellOf(gearboxName, o.name, one);
  });
}

/**
 * Of the cells of one gearbox that fall short, the closest: not beyond oil chemistry first, then
 * the fewest shortfalls, the most duty met, and the best worst ratio; ties to the first listed.
 */
export function closestCell(cells: readonly FitCell[]): FitCell | null {
  let best: FitCell | null = null;
  const key = (c: FitCell): [number, number, number, number] => [
    c.shortfalls.includes('not-computed') ? 2 : c.code === 'beyond-oil' ? 1 : 0,
    c.shortfalls.length,
    -c.dutyShareMet,
    -(c.worstRatio ?? -Infinity),
  ];
  for (const c of cells) {
    if (best === null) {
      best = c;
      continue;
    }
    const a = key(c);
    const b = key(best);
    for (let i = 0; i < a.length; i++) {
      if ((a[i] as number) < (b[i] as number)) {
        best = c;
        break;
      }
      if ((a[i] as number) > (b[i] as number)) break;
    }
  }
  return best;
}
