/**
 * The summary CSV: one row per load case × oil with the key figures, each limit beside its figure
 * and pass or fail, for a spreadsheet or a management summary. Same conventions as csv.ts (header
 * with units, RFC 4180 quoting, CRLF, UTF-8 BOM). Figures are rounded to 4 significant digits
 * (safety factors and λ to 3 decimals): the methods carry no more than that. Pure.
 */
import type { CaseResult, LimitCheck, Results } from '../review/results';
import { OIL_FIT_WORDS, VERDICT_WORDS } from '../review/vocabulary';
import { unitsFor, type Quantity, type UnitSystem } from './units';

type Cell = number | string | null;
interface Column {
  readonly name: string;
  readonly quantity: Quantity | null;
  /** Rounding: significant digits, or fixed decimals for ratios. */
  readonly round: { sig: number } | { dp: number };
  readonly get: (c: CaseResult) => Cell;
}

const check = (c: CaseResult, q: LimitCheck['quantity']): LimitCheck | undefined => c.verdict?.checks.find((k) => k.quantity === q);
const passWord = (k: LimitCheck | undefined): string => (k === undefined || k.pass === null ? '' : k.pass ? 'pass' : 'fail');
const stage = (s: number | '>12' | null | undefined): string => (s === null || s === undefined ? '' : s === '>12' ? 'above 12' : String(s));
const SIG4 = { sig: 4 } as const;
const DP3 = { dp: 3 } as const;

const COLUMNS: readonly Column[] = [
  { name: 'pinion speed n1', quantity: 'speed', round: SIG4, get: (c) => c.pinionSpeed_rpm },
  { name: 'pinion torque T1', quantity: 'torque', round: SIG4, get: (c) => c.pinionTorque_Nm },
  { name: 'application factor KA', quantity: 'none', round: DP3, get: (c) => c.applicationFactor },
  { name: 'oil temperature', quantity: 'temperature', round: SIG4, get: (c) => c.oilTemperature_C },
  { name: 'max Hertz stress σH', quantity: 'stress', round: SIG4, get: (c) => c.maxHertzStress_MPa },
  { name: 'bulk temperature θM', quantity: 'temperature', round: SIG4, get: (c) => c.bulkTemperature_C },
  { name: 'max flash temperature θfl', quantity: 'temperatureRise', round: SIG4, get: (c) => c.maxFlashTemperature_K },
  { name: 'max contact temperature θB', quantity: 'temperature', round: SIG4, get: (c) => c.maxContactTemperature_C },
  { name: 'scuffing temperature θS', quantity: 'temperature', round: SIG4, get: (c) => c.scuffingTemperature_C },
  { name: 'SB', quantity: 'none', round: DP3, get: (c) => check(c, 'scuffingSafety')?.value ?? null },
  { name: 'SB limit', quantity: 'none', round: DP3, get: (c) => check(c, 'scuffingSafety')?.limit ?? null },
  { name: 'SB pass', quantity: null, round: SIG4, get: (c) => passWord(check(c, 'scuffingSafety')) },
  { name: 'SintS', quantity: 'none', round: DP3, get: (c) => check(c, 'integralSafety')?.value ?? null },
  { name: 'SintS limit', quantity: 'none', round: DP3, get: (c) => check(c, 'integralSafety')?.limit ?? null },
  { name: 'SintS pass', quantity: null, round: SIG4, get: (c) => passWord(check(c, 'integralSafety')) },
  { name: 'λmin', quantity: 'none', round: DP3, get: (c) => c.lambdaMin },
  { name: 'λ target', quantity: 'none', round: DP3, get: (c) => check(c, 'lambdaMin')?.limit ?? null },
  { name: 'λmin pass', quantity: null, round: SIG4, get: (c) => passWord(check(c, 'lambdaMin')) },
  { name: 'FZG stage needed', quantity: null, round: SIG4, get: (c) => stage(c.verdict?.neededFzgStage) },
  { name: 'finding', quantity: null, round: SIG4, get: (c) => (c.verdict ? `${VERDICT_WORDS[c.verdict.code]}${c.verdict.oilFit ? `; the oil ${OIL_FIT_WORDS[c.verdict.oilFit]}` : ''}` : 'no oil: no verdict') },
  { name: 'all limits pass', quantity: null, round: SIG4, get: (c) => (c.verdict ? (c.verdict.checks.every((k) => k.pass !== false) ? 'pass' : 'fail') : '') },
];

function quote(s: string): string {
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** A rounded plain decimal (no exponent): 4 significant digits (123456 → 123500, 0.0123456 → 0.01235), or fixed decimals. */
export function roundedCell(x: number, round: Column['round']): string {
  if (!Number.isFinite(x)) return '';
  const r = 'dp' in round ? Number(x.toFixed(round.dp)) : Number(x.toPrecision(round.sig));
  const s = String(r);
  return /e/i.test(s) ? r.toFixed(20).replace(/\.?0+$/, '') : s;
}

export function summaryCsv(results: Results, system: UnitSystem = 'si'): string {
  const u = unitsFor(system);
  const oilOf = new Map(results.oils.map((o) => [o.name, o]));
  const header = ['load case', 'oil', 'role', 'FZG stage of the oil', ...COLUMNS.map((c) => (c.quantity && c.quantity !== 'none' ? `${c.name} (${u.unit(c.quantity)})` : c.name))];
  const lines = [header.map(quote).join(',')];
  for (const c of results.cases) {
    const oil = c.oil === null ? undefined : oilOf.get(c.oil);
    const cells = [c.loadCase, c.oil ?? '', oil?.role ?? '', stage(oil?.fzgFailureStage)];
    for (const col of COLUMNS) {
      const v = col.get(c);
      if (v === null) cells.push('');
      else if (typeof v === 'string') cells.push(v);
      else cells.push(roundedCell(col.quantity ? u.value(v, col.quantity) : v, col.round));
    }
    lines.push(cells.map(quote).join(','));
  }
  return `\uFEFF${lines.join('\r\n')}\r\n`;
}
