import { parseArgs } from 'node:util';
import { EngineInputError } from '../../engine/diagnostics';
import { EHL_DEFAULT_NODES, EHL_NODE_LIMITS } from '../../engine/ehl/lineContactEhl';
import { ehlAtPoint, type EhlPointResult } from '../../review/ehlAtPoint';
import { EhlPointError, type EhlPointSpec } from '../../review/ehlPoint';
import { EXIT, UsageError, type CliIo } from '../io';
import { loadReviewFile } from '../reviewFile';

const POINTS = ['A', 'B', 'C', 'D', 'E', 'lambda-min'] as const;

/** `--at A|B|C|D|E|lambda-min|POSITION_mm` → a point; anything else is a usage error. */
export function parsePoint(text: string): EhlPointSpec {
  const named = POINTS.find((p) => p === text || p.toLowerCase() === text.toLowerCase());
  if (named) return named;
  const mm = /^[+]?\d+(\.\d+)?$/.test(text.trim()) ? Number(text) : Number.NaN;
  if (!Number.isFinite(mm)) throw new UsageError(`--at is A, B, C, D, E, lambda-min or a position in mm from T1 (got "${text}")`);
  return { position_mm: mm };
}

function parseNodes(text: string | undefined): number {
  if (text === undefined) return EHL_DEFAULT_NODES;
  const n = /^\d+$/.test(text) ? Number(text) : Number.NaN;
  if (!Number.isInteger(n) || n < EHL_NODE_LIMITS.min || n > EHL_NODE_LIMITS.max) {
    throw new UsageError(`--nodes is a whole number from ${EHL_NODE_LIMITS.min} to ${EHL_NODE_LIMITS.max} (got "${text}")`);
  }
  return n;
}

/**
 * `flankfilm ehl REVIEW --case NAME [--oil NAME] --at POINT [--nodes N] [--law roelands|barus] [--json]`:
 * the numerical film and pressure at one point. A point outside A–E, an unknown case or oil, or a
 * node count out of range is a usage error (exit 2).
 */
export async function ehlCommand(args: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    options: {
      case: { type: 'string' },
      oil: { type: 'string' },
      at: { type: 'string' },
      nodes: { type: 'string' },
      law: { type: 'string', default: 'roelands' },
      json: { type: 'boolean', default: false },
    },
  });
  if (positionals.length !== 1) throw new UsageError('give exactly one REVIEW file');
  if (values.case === undefined) throw new UsageError('--case NAME is needed (the load case, by name)');
  if (values.at === undefined) throw new UsageError('--at is needed: A, B, C, D, E, lambda-min or a position in mm');
  if (values.law !== 'roelands' && values.law !== 'barus') throw new UsageError('--law is roelands or barus');
  const at = parsePoint(values.at);
  const nodes = parseNodes(values.nodes);
  const file = positionals[0] as string;
  const loaded = await loadReviewFile(file);
  if (!loaded.ok) {
    io.err(`${loaded.message}\n`);
    return EXIT.invalid;
  }
  let r: EhlPointResult;
  try {
    r = ehlAtPoint(loaded.review, { caseName: values.case, ...(values.oil !== undefined ? { oilName: values.oil } : {}), at }, { nodes, viscosityLaw: values.law }, () => performance.now());
  } catch (e) {
    if (e instanceof EhlPointError) throw new UsageError(e.message);
    if (e instanceof EngineInputError) {
      io.err(`${file}: ${e.message}\n`);
      return EXIT.invalid;
    }
    throw e;
  }
  io.out(values.json ? `${JSON.stringify(r, null, 2)}\n` : ehlSummary(r));
  return EXIT.ok;
}

const f = (x: number, d = 3) => x.toFixed(d);

/** What a person reads: words and labels, no field names. */
export function ehlSummary(r: EhlPointResult): string {
  const lines = [
    `Numerical film — ${r.loadCase}, ${r.oil}`,
    `Point: ${r.point}; oil at the bulk temperature ${f(r.filmTemperature_C, 1)} °C; isothermal solution, ${r.viscosityLaw === 'roelands' ? 'Roelands' : 'Barus'} viscosity, Dowson–Higginson density.`,
    r.converged
      ? `Converged in ${r.iterations} iterations on ${r.nodes} nodes (residual ${r.residual.toExponential(1)}, ${f(r.ms, 0)} ms).`
      : `Did NOT converge after ${r.iterations} iterations on ${r.nodes} nodes (last residual ${r.residual.toExponential(1)}): the figures below are provisional.`,
    `Minimum film        ${f(r.hMin_um)} µm   (${r.formulaName}: ${f(r.formulaHMin_um)} µm)`,
    `Central film        ${f(r.hCentral_um)} µm   (Pan–Hamrock: ${f(r.formulaHCentral_um)} µm)`,
    `Peak pressure       ${f(r.pMax_MPa, 0)} MPa   (Hertz: ${f(r.hertzP0_MPa, 0)} MPa)`,
    r.spike ? `Pressure spike      ${f(r.spike.p_MPa, 0)} MPa at ${f(r.spike.x_over_b, 2)} Hertz half-widths from the centre` : 'Pressure spike      none resolved on this grid',
    `Composite roughness ${f(r.compositeRoughness_um)} µm; anti-wear tribofilm ${f(r.tribofilm_um.min, 2)}–${f(r.tribofilm_um.max, 2)} µm (common practice)`,
  ];
  if (r.thermalFactor < 1) lines.push(`The review's formula film includes the inlet shear-heating factor ${f(r.thermalFactor)}; the numerical film does not.`);
  lines.push(r.inWords);
  for (const w of r.warnings) lines.push(`Note: ${w.message}`);
  lines.push('A cross-check at one point, not a replacement for the path calculation; defer to the gearbox maker\'s lubricant list and licensed engineering judgement.');
  return `${lines.join('\n')}\n`;
}
