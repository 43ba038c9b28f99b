/**
 * One CSV of every point along the path of every case (load case × oil), for a spreadsheet:
 * a header row of names with units, RFC 4180 quoting, CRLF line ends, a UTF-8 byte-order mark
 * (so spreadsheet programs read σ, θ and µ correctly), '.' as the decimal sign, and an empty
 * cell where the engine gives no value (no oil, so no film). Pure.
 */
import type { CaseResult, PointResult, Results } from '../review/results';
import { unitsFor, type Quantity, type UnitSystem } from './units';
import { textCell } from '../review/csvCell';
import { pathPoints } from '../review/pathSeries';

interface CsvColumn {
  name: string;
  quantity: Quantity | null;
  get: (p: PointResult) => number | string | null;
}

const COLUMNS: readonly CsvColumn[] = [
  { name: 'position from T1', quantity: 'length', get: (p) => p.position_mm },
  { name: 'path fraction A→E', quantity: 'none', get: (p) => p.pathFraction },
  { name: 'load share XΓ', quantity: 'none', get: (p) => p.loadShare },
  { name: 'Hertz stress σH', quantity: 'stress', get: (p) => p.hertzStress_MPa },
  { name: 'pinion flank velocity v1', quantity: 'velocity', get: (p) => p.pinionFlankVelocity_mps },
  { name: 'wheel flank velocity v2', quantity: 'velocity', get: (p) => p.wheelFlankVelocity_mps },
  { name: 'sliding velocity vg', quantity: 'velocity', get: (p) => p.slidingVelocity_mps },
  { name: 'sum velocity vΣ', quantity: 'velocity', get: (p) => p.sumVelocity_mps },
  { name: 'slide-to-roll ratio', quantity: 'none', get: (p) => p.slideToRoll },
  { name: 'specific sliding ζ1 (pinion)', quantity: 'none', get: (p) => p.specificSlidingPinion },
  { name: 'specific sliding ζ2 (wheel)', quantity: 'none', get: (p) => p.specificSlidingWheel },
  { name: 'film thickness hmin', quantity: 'film', get: (p) => p.filmThicknessMin_um },
  { name: 'film thickness hc', quantity: 'film', get: (p) => p.filmThicknessCentral_um },
  { name: 'specific film λ', quantity: 'none', get: (p) => p.lambda },
  { name: 'specific film λGF', quantity: 'none', get: (p) => p.lambdaGF },
  { name: 'regime', quantity: null, get: (p) => p.regime },
  { name: 'flash temperature θfl', quantity: 'temperatureRise', get: (p) => p.flashTemperature_K },
  { name: 'contact temperature θB', quantity: 'temperature', get: (p) => p.contactTemperature_C },
];

/** Per case × oil, repeated on each of its rows: micropitting by ISO/TS 6336-22 (empty where not known). */
const CASE_COLUMNS: ReadonlyArray<{ name: string; get: (c: CaseResult) => number | string | null }> = [
  { name: 'λGF,min in the area at risk (–)', get: (c) => c.micropitting?.lambdaGFMin ?? null },
  { name: 'λGFT of the C-GF test (–)', get: (c) => c.micropitting?.lambdaGFT ?? null },
  { name: 'λGFP permissible (–)', get: (c) => c.micropitting?.lambdaGFP ?? null },
  { name: 'micropitting safety Sλ (–)', get: (c) => c.micropitting?.safety ?? null },
  { name: 'micropitting failure stage needed', get: (c) => (c.micropitting ? String(c.micropitting.requiredFailureStage) : null) },
];

function quote(s: string): string {
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Plain decimal with up to 10 significant digits, no exponent a spreadsheet could misread. */
function csvNumber(x: number): string {
  if (!Number.isFinite(x)) return '';
  const s = Number(x.toPrecision(10)).toString();
  if (!/e/i.test(s)) return s;
  const fixed = x.toFixed(Math.min(20, Math.max(0, 10 - Math.floor(Math.log10(Math.abs(x))) - 1)));
  return fixed.includes('.') ? fixed.replace(/\.?0+$/, '') : fixed;
}

/** A planetary stage's CSV starts each row with its mesh (sun-planet, planet-ring); a pair's has no mesh column. */
export function resultsToCsv(results: Results, system: UnitSystem = 'si'): string {
  const u = unitsFor(system);
  const meshes = results.meshes ?? null;
  const header = [...(meshes ? ['mesh'] : []), 'load case', 'oil', 'point', ...COLUMNS.map((c) => (c.quantity ? `${c.name} (${u.unit(c.quantity) || '–'})` : c.name)), ...CASE_COLUMNS.map((c) => c.name)];
  const lines = [header.map(quote).join(',')];
  const blocks = meshes ? meshes.map((m) => ({ lead: [m.mesh], cases: m.cases })) : [{ lead: [] as string[], cases: results.cases }];
  for (const { lead, cases } of blocks) for (const c of cases) {
    pathPoints(c.path).forEach((p, i) => {
      const cells = [...lead, textCell(c.loadCase), textCell(c.oil ?? ''), String(i)];
      for (const col of COLUMNS) {
        const v = col.get(p);
        if (v === null) cells.push('');
        else if (typeof v === 'string') cells.push(textCell(v));
        else cells.push(csvNumber(col.quantity ? u.value(v, col.quantity) : v));
      }
      for (const col of CASE_COLUMNS) {
        const v = col.get(c);
        cells.push(v === null ? '' : typeof v === 'string' ? v : csvNumber(v));
      }
      lines.push(cells.map(quote).join(','));
    });
  }
  return `\uFEFF${lines.join('\r\n')}\r\n`;
}
