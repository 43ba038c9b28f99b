/**
 * What the Map panel shows, computed from the sweep's grids alone (no canvas, no React), so it is
 * tested in Node: iso-lines, the case's own point, cell read-outs, ticks and the sentences.
 */
import type { OperatingMapResult } from '../../../app/review/operatingMaps';
import type { VerdictCode } from '../../../app/review/results';
import type { Oil } from '../../../app/review/schema';
import { contourSegments, type Segment } from '../../../app/engine/sweep/contour';

export interface Cell {
  readonly r: number;
  readonly c: number;
}

export interface CellValues extends Cell {
  readonly temperature_C: number;
  readonly loadPercent: number;
  readonly lambdaMin: number;
  /** null: no temperature rise, the safety is unbounded. */
  readonly scuffingSafety: number | null;
  readonly integralSafety: number | null;
  readonly verdict: VerdictCode;
}

export const rowsOf = (m: OperatingMapResult): number => m.temperatures_C.length;
export const colsOf = (m: OperatingMapResult): number => m.loadPercent.length;

export function cellValues(m: OperatingMapResult, { r, c }: Cell): CellValues {
  return {
    r,
    c,
    temperature_C: m.temperatures_C[r] ?? Number.NaN,
    loadPercent: m.loadPercent[c] ?? Number.NaN,
    lambdaMin: m.lambdaMin[r]?.[c] ?? Number.NaN,
    scuffingSafety: m.scuffingSafety[r]?.[c] ?? null,
    integralSafety: m.integralSafety[r]?.[c] ?? null,
    verdict: m.verdict[r]?.[c] ?? 'beyond-oil',
  };
}

/** Where `value` falls on an evenly spaced axis, as a fractional index (may lie outside 0…n−1). */
export function fractionalIndex(axis: readonly number[], value: number): number {
  const first = axis[0] ?? 0;
  const last = axis[axis.length - 1] ?? first;
  return axis.length < 2 || last === first ? 0 : ((value - first) / (last - first)) * (axis.length - 1);
}

export const clampCell = (m: OperatingMapResult, { r, c }: Cell): Cell => ({
  r: Math.min(rowsOf(m) - 1, Math.max(0, r)),
  c: Math.min(colsOf(m) - 1, Math.max(0, c)),
});

/** The case's own point (its oil temperature, 100 % load): exact position, nearest cell, and whether it lies on the map. */
export function casePoint(m: OperatingMapResult, oilTemperature_C: number): { r: number; c: number; cell: Cell; inside: boolean } {
  const r = fractionalIndex(m.temperatures_C, oilTemperature_C);
  const c = fractionalIndex(m.loadPercent, 100);
  const inside = r >= -0.5 && r <= rowsOf(m) - 0.5 && c >= -0.5 && c <= colsOf(m) - 0.5;
  return { r, c, cell: clampCell(m, { r: Math.round(r), c: Math.round(c) }), inside };
}

/**
 * The SB = SB,min and λ = λ target lines (unbounded SB lies above any level), and λGF,min = λGFP, the
 * micropitting line (ISO/TS 6336-22), where the oil's micropitting failure stage is given.
 */
export function mapContours(m: OperatingMapResult, scuffingSafetyMin: number, lambdaTarget: number): { sb: Segment[]; lambda: Segment[]; micropitting: Segment[] } {
  const lgfp = m.lambdaGFP;
  return {
    sb: contourSegments(rowsOf(m), colsOf(m), (r, c) => m.scuffingSafety[r]?.[c] ?? Number.POSITIVE_INFINITY, scuffingSafetyMin),
    lambda: contourSegments(rowsOf(m), colsOf(m), (r, c) => m.lambdaMin[r]?.[c] ?? Number.NaN, lambdaTarget),
    micropitting: lgfp === null ? [] : contourSegments(rowsOf(m), colsOf(m), (r, c) => m.lambdaGFMin[r]?.[c] ?? Number.NaN, lgfp),
  };
}

export interface GridPoint {
  readonly c: number;
  readonly r: number;
}

/**
 * Marching squares gives the iso-line as loose segments, row by row; joined end to end into
 * polylines, a dash pattern runs along the line instead of restarting at every cell.
 */
export function chainSegments(segments: readonly Segment[]): GridPoint[][] {
  const key = (c: number, r: number) => `${Math.round(c * 1e6)},${Math.round(r * 1e6)}`;
  const at = new Map<string, number[]>();
  segments.forEach((s, i) => {
    for (const k of [key(s.c0, s.r0), key(s.c1, s.r1)]) at.set(k, [...(at.get(k) ?? []), i]);
  });
  const used = new Uint8Array(segments.length);
  const other = (i: number, k: string): GridPoint => {
    const s = segments[i] as Segment;
    return key(s.c0, s.r0) === k ? { c: s.c1, r: s.r1 } : { c: s.c0, r: s.r0 };
  };
  const extend = (line: GridPoint[], end: GridPoint) => {
    for (let p = end; ; ) {
      const k = key(p.c, p.r);
      const next = (at.get(k) ?? []).find((j) => !used[j]);
      if (next === undefined) return;
      used[next] = 1;
      p = other(next, k);
      line.push(p);
    }
  };
  const out: GridPoint[][] = [];
  segments.forEach((s, i) => {
    if (used[i]) return;
    used[i] = 1;
    const forward: GridPoint[] = [{ c: s.c1, r: s.r1 }];
    extend(forward, forward[0] as GridPoint);
    const backward: GridPoint[] = [{ c: s.c0, r: s.r0 }];
    extend(backward, backward[0] as GridPoint);
    out.push([...backward.reverse(), ...forward]);
  });
  return out;
}

export function verdictCounts(m: OperatingMapResult): Record<VerdictCode, number> {
  const out: Record<VerdictCode, number> = { 'aw-suffices': 0, 'ep-warranted': 0, 'beyond-oil': 0 };
  for (const row of m.verdict) for (const v of row) out[v] += 1;
  return out;
}

/** The map's size, verdict counts and a few cells (the corners and the case's cell), for its element and tests. */
export function mapSummary(m: OperatingMapResult, caseCell: Cell) {
  const R = rowsOf(m) - 1;
  const C = colsOf(m) - 1;
  const picks: Cell[] = [{ r: 0, c: 0 }, { r: 0, c: C }, { r: R, c: 0 }, { r: R, c: C }, caseCell];
  return { rows: R + 1, cols: C + 1, counts: verdictCounts(m), cells: picks.map((p) => cellValues(m, p)) };
}

const holds = (sb: number | null, min: number) => sb === null || sb >= min;

/** The highest load (%) up to which SB ≥ SB,min holds along a row from the lightest load; null if not even there. */
export function scuffingHoldsUpTo(m: OperatingMapResult, r: number, scuffingSafetyMin: number): number | null {
  const row = m.scuffingSafety[r] ?? [];
  let last: number | null = null;
  for (let c = 0; c < row.length; c++) {
    if (!holds(row[c] ?? null, scuffingSafetyMin)) break;
    last = m.loadPercent[c] ?? null;
  }
  return last;
}

/** How a sentence names an oil: by its role where that is unique, else by its name. */
export function oilPhrases(oils: readonly Pick<Oil, 'name' | 'role'>[]): string[] {
  const count = (role: string) => oils.filter((o) => o.role === role).length;
  return oils.map((o) => (o.role === 'in-service' && count('in-service') === 1 ? 'the oil in service' : o.role === 'proposed' && count('proposed') === 1 ? 'the proposed oil' : `“${o.name}”`));
}

export interface Phrasing {
  /** A temperature in °C as shown, with its unit. */
  readonly temperature: (celsius: number) => string;
  readonly number: (x: number) => string;
  /** A policy level (SB,min), as short as it is exact. */
  readonly level: (x: number) => string;
}

/**
 * Plain sentences read off the grids of one load case (one map per oil, same axes): per oil, how
 * far SB ≥ SB,min holds at the row of the case's temperature; and, for each pair of oils, the
 * cell nearest the case's point where one holds SB ≥ SB,min and the other does not.
 */
export function mapSentences(maps: readonly OperatingMapResult[], names: readonly string[], scuffingSafetyMin: number, caseTemperature_C: number, say: Phrasing): string[] {
  const first = maps[0];
  if (!first) return [];
  const point = casePoint(first, caseTemperature_C);
  const row = point.cell.r;
  const min = say.level(scuffingSafetyMin);
  const upTo = maps.map((m, i) => {
    const l = scuffingHoldsUpTo(m, row, scuffingSafetyMin);
    const last = m.loadPercent[colsOf(m) - 1] ?? 0;
    return l === null ? `not even at ${say.number(m.loadPercent[0] ?? 0)} % load with ${names[i]}` : l >= last ? `over the whole load range with ${names[i]}` : `up to ${say.number(l)} % load with ${names[i]}`;
  });
  const out = [`At ${say.temperature(first.temperatures_C[row] ?? caseTemperature_C)} (the row nearest this case’s oil temperature), SB ≥ ${min} holds ${upTo.join(', and ')}.`];
  for (let a = 0; a < maps.length; a++) {
    for (let b = 0; b < maps.length; b++) {
      const ma = maps[a];
      const mb = maps[b];
      if (a === b || !ma || !mb) continue;
      let best: Cell | null = null;
      let bestD = Number.POSITIVE_INFINITY;
      for (let r = 0; r < rowsOf(ma); r++) {
        for (let c = 0; c < colsOf(ma); c++) {
          if (!holds(ma.scuffingSafety[r]?.[c] ?? null, scuffingSafetyMin) || holds(mb.scuffingSafety[r]?.[c] ?? null, scuffingSafetyMin)) continue;
          const d = (r - point.r) ** 2 + (c - point.c) ** 2;
          if (d < bestD) [best, bestD] = [{ r, c }, d];
        }
      }
      if (!best) continue;
      const v = cellValues(mb, best);
      out.push(`At ${say.temperature(v.temperature_C)} and ${say.number(v.loadPercent)} % load, ${names[a]} still holds SB ≥ ${min}; ${names[b]} does not (SB ${say.number(v.scuffingSafety ?? 0)}).`);
    }
  }
  return out;
}

/** A policy level as typed: 1.5, not 1.50. */
export const levelText = (x: number): string => String(Number(x.toPrecision(4)));

/** About `count` round tick values from min to max (1, 2 or 5 × 10ⁿ apart). */
export function niceTicks(min: number, max: number, count = 6): number[] {
  if (!(max > min)) return [min];
  const raw = (max - min) / Math.max(1, count);
  const p = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((k) => k * p).find((s) => s >= raw) ?? 10 * p;
  const out: number[] = [];
  for (let v = Math.ceil(min / step - 1e-9) * step; v <= max + 1e-9 * step; v += step) out.push(Math.abs(v) < 1e-12 ? 0 : v);
  return out;
}
