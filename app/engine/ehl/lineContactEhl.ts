import { requireInRange, type WarningSink } from '../diagnostics';
import { lineContactGroups } from '../film/lineContactGroups';
import { panHamrockFilm } from '../film/panHamrock';
import type { Metres, MetresPerSecond, NewtonsPerMetre, Pascals, PascalSeconds, PerPascal } from '../units';
import { ehlWorkspace, solveDimensionless, type DimensionlessSolution, type EhlWorkspace, type WedgeScheme } from './newtonSolver';
import { viscosityParameters, type ViscosityLaw } from './pressureLaws';

/** One contact point, SI (the inputs of the film formulas, plus the laws). */
export interface LineContactEhlInput {
  /** Viscosity at the inlet temperature and ambient pressure, Pa·s. */
  readonly eta0: PascalSeconds;
  /** Barus pressure–viscosity coefficient, 1/Pa (also sets the Roelands index). */
  readonly alpha: PerPascal;
  /** Mean entrainment velocity ū = (v1 + v2)/2, m/s (> 0). */
  readonly uMean: MetresPerSecond;
  /** Reduced radius of curvature R, m. */
  readonly radius: Metres;
  /** Normal load per unit contact length w, N/m. */
  readonly loadPerLength: NewtonsPerMetre;
  /** Hamrock's effective modulus E′ = 2E*, Pa. */
  readonly eReduced: Pascals;
}

export interface LineContactEhlOptions {
  /** Grid nodes N, 65…1025; default {@link EHL_DEFAULT_NODES}. */
  readonly nodes?: number;
  /** Pressure–viscosity law; default Roelands. */
  readonly viscosityLaw?: ViscosityLaw;
  /**
   * Inlet end of the grid, x/b (−12…−2.5). Default: −4.5, or further upstream for a thick film,
   * so that the undeformed gap at the inlet end, X²/2, is at least 40 times the central film H_c
   * of the start (a fully flooded inlet; our choice, checked by the inlet-length test).
   */
  readonly inlet?: number;
  /** Outlet end of the grid, x/b (1.2…3); default 1.5. */
  readonly outlet?: number;
  readonly maxIterations?: number;
  /** Difference scheme of the wedge term; default hybrid (see newtonSolver.ts). */
  readonly wedge?: WedgeScheme;
  /** Reuse the arrays of an earlier solve with the same node count. */
  readonly workspace?: EhlWorkspace;
}

export const EHL_DEFAULT_NODES = 257;
export const EHL_NODE_LIMITS = { min: 65, max: 1025 } as const;
const TOLERANCE = 1e-8;
const FLOODED_GAP_RATIO = 40;

export interface LineContactEhlResult {
  readonly converged: boolean;
  readonly iterations: number;
  /** Largest scaled residual of the last iterate (dimensionless, relative to pH and the load). */
  readonly residual: number;
  readonly stopReason: DimensionlessSolution['reason'] | 'negative-film';
  /** Whether the grid resolves the exit constriction (spacing ≤ 1.2 H_c, see EHL_RESOLUTION_LIMIT). */
  readonly gridResolved: boolean;
  /** Nodes that would resolve it, when the central film is positive. */
  readonly suggestedNodes: number | null;
  readonly nodes: number;
  readonly viscosityLaw: ViscosityLaw;
  /** Minimum film, at the exit constriction, m. */
  readonly hMin: Metres;
  /** Film at the centre of the Hertz contact, x = 0, m. */
  readonly hCentral: Metres;
  readonly pMax: Pascals;
  /** x/b of the pressure maximum and of the film minimum. */
  readonly xAtPMax: number;
  readonly xAtHMin: number;
  /** The pressure spike: the local maximum nearest the outlet, when there is one inside the contact. */
  readonly spike: { readonly xOverB: number; readonly p: Pascals } | null;
  readonly hertzPressure: Pascals;
  readonly hertzSemiWidth: Metres;
  /** Hamrock's groups U, W, G of the point. */
  readonly groups: { readonly U: number; readonly W: number; readonly G: number };
  /** Pan–Hamrock (1989) films at the same point, m (the formula the solver is held to). */
  readonly formula: { readonly hMin: Metres; readonly hCentral: Metres };
  /** x/b, p (Pa) and h (m) at every node. */
  readonly xOverB: Float64Array;
  readonly pressure: Float64Array;
  readonly film: Float64Array;
}

/**
 * Numerical film and pressure of a steady, isothermal, fully flooded EHL line contact at one
 * point: the Reynolds equation with the half-space deformation integral, Roelands (or Barus)
 * viscosity, Dowson–Higginson density, load balance and the Reynolds cavitation condition, solved
 * by a Newton–Raphson scheme from a Hertzian start (newtonSolver.ts: Houpert & Hamrock 1986,
 * discretisation after Venner & Lubrecht 2000 [memory]).
 *
 * Hertz units: b = 4RpH/E′, pH = √(wE′/(2πR)), λ̄ = 12 η0 ū R²/(b³ pH).
 * A cross-check and a picture at a chosen point, not a replacement for the path formulas.
 *
 * Out of range: a node count outside 65…1025 or a grid end outside its limits throws
 * EngineInputError naming the option; ū ≤ 0 or a non-positive input throws (there is no film to
 * solve for). Groups outside the fitted range of the formulas add a warning (the comparison is then
 * an extrapolation of the formula, not of the solver). The result is never NaN: a solve that does
 * not converge says so (`converged: false`, its stop reason and last residual).
 */
export function lineContactEhl(input: LineContactEhlInput, options: LineContactEhlOptions = {}, warnings?: WarningSink): LineContactEhlResult {
  const nodes = requireInRange('nodes', options.nodes ?? EHL_DEFAULT_NODES, EHL_NODE_LIMITS.min, EHL_NODE_LIMITS.max);
  if (!Number.isInteger(nodes)) requireInRange('nodes (a whole number)', Number.NaN, EHL_NODE_LIMITS.min, EHL_NODE_LIMITS.max);
  const xOut = requireInRange('outlet', options.outlet ?? 1.5, 1.2, 3, 'x/b');
  requireInRange('uMean', input.uMean, 1e-6, 1e3, 'm/s');
  const g = lineContactGroups('Pan–Hamrock', input.eta0, input.alpha, input.uMean, input.radius, input.loadPerLength, input.eReduced, warnings);
  if (!g) throw new Error('unreachable: uMean checked above');
  const groups = { U: g.U, W: g.W, G: g.G };
  const formula = panHamrockFilm(input.eta0, input.alpha, input.uMean, input.radius, input.loadPerLength, input.eReduced);
  const R = input.radius;
  const pH = Math.sqrt((input.loadPerLength * input.eReduced) / (2 * Math.PI * R));
  const b = (4 * R * pH) / input.eReduced;
  const toH = R / (b * b);
  const autoInlet = -Math.min(12, Math.max(4.5, Math.sqrt(2 * FLOODED_GAP_RATIO * formula.hCentral * toH)));
  const xIn = requireInRange('inlet', options.inlet ?? autoInlet, -12, -2.5, 'x/b');
  const law = options.viscosityLaw ?? 'roelands';
  const work = options.workspace && options.workspace.nodes === nodes ? options.workspace : ehlWorkspace(nodes);
  const sol = solveDimensionless(
    {
      lambdaBar: (12 * input.eta0 * input.uMean * R * R) / (b * b * b * pH),
      hertzPressure: pH,
      viscosity: viscosityParameters(law, input.eta0, input.alpha),
      nodes,
      xIn,
      xOut,
      maxIterations: options.maxIterations ?? 60,
      tolerance: TOLERANCE,
      startCentralFilm: formula.hCentral * toH,
      wedge: options.wedge ?? 'hybrid',
    },
    work,
  );
  const r0 = dimensional(sol, work, nodes, law, pH, b, toH, groups, formula);
  return checkResolution(r0, (xOut - xIn) / (nodes - 1), toH, warnings);
}

/**
 * The grid spacing against the central film in Hertz units, Δ/H_c. Up to 1.2 the exit constriction
 * is resolved (N → 2N moves h_min by < 3 % in the tests); above it h_min reads low and a warning
 * says how many nodes would resolve it. A negative film is no solution at all: the solve is then
 * reported as not converged.
 */
export const EHL_RESOLUTION_LIMIT = 1.2;

function checkResolution(r: Omit<LineContactEhlResult, 'gridResolved' | 'suggestedNodes'>, dx: number, toH: number, warnings: WarningSink | undefined): LineContactEhlResult {
  const hc = r.hCentral * toH;
  const ratio = hc > 0 ? dx / hc : Infinity;
  const resolved = ratio <= EHL_RESOLUTION_LIMIT;
  const span = (r.xOverB[r.nodes - 1] as number) - (r.xOverB[0] as number);
  const suggested = hc > 0 ? Math.ceil(span / (EHL_RESOLUTION_LIMIT * hc)) + 1 : null;
  if (!resolved) {
    warnings?.add({
      code: 'ehl.grid-coarse',
      severity: 'warning',
      field: 'nodes',
      message: `The exit constriction is narrower than ${r.nodes} nodes resolve (grid spacing ${ratio.toFixed(1)} times the central film, limit ${EHL_RESOLUTION_LIMIT}): the numerical minimum film reads low${suggested !== null ? `; about ${suggested} nodes would resolve it` : ''}.`,
    });
  }
  if (r.hMin <= 0) {
    warnings?.add({ code: 'ehl.negative-film', severity: 'warning', field: 'nodes', message: 'The solution has a negative film at the exit: it is not a solution; use more nodes.' });
    return { ...r, converged: false, stopReason: 'negative-film', gridResolved: resolved, suggestedNodes: suggested };
  }
  return { ...r, gridResolved: resolved, suggestedNodes: suggested };
}

function dimensional(
  sol: DimensionlessSolution,
  w: EhlWorkspace,
  n: number,
  law: ViscosityLaw,
  pH: number,
  b: number,
  toH: number,
  groups: LineContactEhlResult['groups'],
  formula: { hMin: Metres; hCentral: Metres },
): Omit<LineContactEhlResult, 'gridResolved' | 'suggestedNodes'> {
  const xOverB = Float64Array.from(w.x);
  const pressure = new Float64Array(n);
  const film = new Float64Array(n);
  let iP = 0, iH = 0, iC = 0;
  for (let i = 0; i < n; i++) {
    pressure[i] = (w.p[i] as number) * pH;
    film[i] = (w.h[i] as number) / toH;
    if ((pressure[i] as number) > (pressure[iP] as number)) iP = i;
    if ((film[i] as number) < (film[iH] as number)) iH = i;
    if (Math.abs(w.x[i] as number) < Math.abs(w.x[iC] as number)) iC = i;
  }
  // Central film at x = 0 exactly, by linear interpolation between the two nearest nodes.
  const j = (w.x[iC] as number) > 0 && iC > 0 ? iC - 1 : iC;
  const x0 = w.x[j] as number, x1 = w.x[j + 1] as number;
  const t = x1 !== x0 ? -x0 / (x1 - x0) : 0;
  const hCentral = (film[j] as number) * (1 - t) + (film[j + 1] as number) * t;
  let spike: LineContactEhlResult['spike'] = null;
  for (let i = n - 2; i > 0; i--) {
    const pi = pressure[i] as number;
    if (pi > 0 && pi >= (pressure[i - 1] as number) && pi > (pressure[i + 1] as number) && (w.x[i] as number) > 0) {
      spike = { xOverB: w.x[i] as number, p: pi as Pascals };
      break;
    }
  }
  return {
    converged: sol.converged,
    iterations: sol.iterations,
    residual: sol.residual,
    stopReason: sol.reason,
    nodes: n,
    viscosityLaw: law,
    hMin: (film[iH] as number) as Metres,
    hCentral: hCentral as Metres,
    pMax: (pressure[iP] as number) as Pascals,
    xAtPMax: w.x[iP] as number,
    xAtHMin: w.x[iH] as number,
    spike,
    hertzPressure: pH as Pascals,
    hertzSemiWidth: b as Metres,
    groups,
    formula: { hMin: formula.hMin, hCentral: formula.hCentral },
    xOverB,
    pressure,
    film,
  };
}
