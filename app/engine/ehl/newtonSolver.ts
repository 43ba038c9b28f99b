import { deformationKernel } from './kernel';
import { densityRatio, lnViscosityRatio, type ViscosityParameters } from './pressureLaws';
import { luFactor, luSolve } from './denseSolve';

/** The dimensionless problem in Hertz units: X = x/b, P = p/pH, H = hR/b². */
export interface DimensionlessProblem {
  /** λ̄ = 12 η0 ū R²/(b³ pH). */
  readonly lambdaBar: number;
  /** Hertz pressure pH, Pa (the pressure laws need dimensional pressure). */
  readonly hertzPressure: number;
  readonly viscosity: ViscosityParameters;
  readonly nodes: number;
  /** Inlet and outlet ends of the grid, in units of b. */
  readonly xIn: number;
  readonly xOut: number;
  readonly maxIterations: number;
  /** Converged when the largest scaled residual is below this. */
  readonly tolerance: number;
  /** Central film H(0) of the start, e.g. from a film formula. */
  readonly startCentralFilm: number;
  /** Upwind order of the wedge term d(ρ̄H)/dX. */
  readonly wedge: WedgeScheme;
}

/**
 * The wedge term's difference scheme. First order upwind (Venner & Lubrecht's choice) is robust in
 * the Hertz zone, where the equation turns hyperbolic, but its numerical diffusion reads h_c 10–18 %
 * high on a 257-node grid. Second order everywhere is nearer the continuum when the grid resolves
 * the exit, but undershoots badly (h_min down to a third) when it does not. The default, hybrid,
 * is second order in the inlet (x < −b), where the film is built, and first order from the Hertz
 * zone on: our choice, held to Pan–Hamrock and to refinement by the tests.
 */
export type WedgeScheme = 'hybrid' | 'second-order' | 'first-order';

/** x/b upstream of which the hybrid scheme differences the wedge term to second order. */
const HYBRID_EDGE = -1;


/** Arrays of one solve; make once per node count and reuse (nothing is allocated per iteration). */
export interface EhlWorkspace {
  readonly nodes: number;
  readonly x: Float64Array;
  readonly p: Float64Array;
  readonly h: Float64Array;
  readonly kernel: Float64Array;
  readonly rho: Float64Array;
  readonly dRho: Float64Array;
  readonly eps: Float64Array;
  readonly dEpsP: Float64Array;
  readonly dEpsH: Float64Array;
  readonly pTrial: Float64Array;
  readonly rhs: Float64Array;
  readonly matrix: Float64Array;
  readonly scratch: Float64Array;
  /** [root-mean-square, largest] scaled residual of the last evaluation. */
  readonly norms: Float64Array;
  /** The wedge scheme of the solve under way: 0 first order, 1 second order, 2 hybrid. */
  readonly wedgeMode: Uint8Array;
  /** Pivots, row scales and identity-row flags of the last factorised Jacobian (reused near convergence). */
  readonly pivots: Int32Array;
  readonly rowScale: Float64Array;
  readonly identityRow: Uint8Array;
}

export function ehlWorkspace(nodes: number): EhlWorkspace {
  const a = () => new Float64Array(nodes);
  const m = nodes - 1;
  return { nodes, x: a(), p: a(), h: a(), kernel: a(), rho: a(), dRho: a(), eps: a(), dEpsP: a(), dEpsH: a(), pTrial: a(), rhs: new Float64Array(m), matrix: new Float64Array(m * m), scratch: new Float64Array(1), norms: new Float64Array(2), wedgeMode: new Uint8Array(1), pivots: new Int32Array(m), rowScale: new Float64Array(nodes), identityRow: new Uint8Array(nodes) };
}

export interface DimensionlessSolution {
  converged: boolean;
  iterations: number;
  /** Largest scaled residual of the last iterate (Reynolds/complementarity rows and load balance). */
  residual: number;
  /** H0 of the film equation. */
  h0: number;
  /** Why it stopped short, when it did. */
  reason: 'converged' | 'iteration-limit' | 'stalled' | 'non-finite';
}

const H_FLOOR = 1e-9;
/**
 * Below this largest residual a full step keeps the factorised Jacobian for the next iteration (a
 * chord step, O(N²) instead of O(N³)) while the active set stays and the residual falls at least 4×.
 */
const CHORD_FROM = 1e-3;

/**
 * Steady isothermal EHL line contact by a damped Newton–Raphson method on the fully coupled system
 * (pressures and H0 together, the dense elastic Jacobian solved directly), after Houpert & Hamrock,
 * "Fast approach for calculating film thicknesses and pressures in elastohydrodynamically
 * lubricated contacts at high loads", ASME J. Tribology 108 (1986) 411–420 [memory]. The
 * discretisation is the one of Venner & Lubrecht, Multilevel Methods in Lubrication (2000) [memory]:
 *
 *   d/dX(ε dP/dX) − d(ρ̄H)/dX = 0,  ε = ρ̄H³/(η̄λ̄)      (Reynolds; central Poiseuille, upwind wedge)
 *   H = H0 + X²/2 − (1/π)∫ ln|X − X′| P dX′              (half-space deformation, kernel.ts)
 *   ∫ P dX = π/2                                          (load balance)
 *
 * Cavitation (the Reynolds condition P = dP/dX = 0 at the outlet) is the complementarity P ≥ 0,
 * −R ≥ 0, P·R = 0, solved as min(P, −R/|∂R/∂P|) = 0 by a semismooth Newton (active-set) step.
 * Near convergence a full step keeps the factorised Jacobian (chord steps) while the active set
 * stays and the residual falls at least fourfold, which saves a dense factorisation or two.
 * The start is the Hertz ellipse with H(0) = `startCentralFilm`. A backtracking line search on the
 * root-mean-square residual keeps the iterate from diverging; P is kept ≥ 0 and never becomes NaN: a
 * non-finite trial step is rejected and the solve stops with the last finite iterate.
 */
export function solveDimensionless(q: DimensionlessProblem, w: EhlWorkspace): DimensionlessSolution {
  const n = q.nodes;
  const dx = (q.xOut - q.xIn) / (n - 1);
  const { x, p, pTrial } = w;
  w.wedgeMode[0] = q.wedge === 'second-order' ? 1 : q.wedge === 'hybrid' ? 2 : 0;
  for (let i = 0; i < n; i++) {
    const xi = q.xIn + i * dx;
    x[i] = xi;
    p[i] = Math.abs(xi) < 1 ? Math.sqrt(1 - xi * xi) : 0;
  }
  p[0] = 0;
  p[n - 1] = 0;
  deformationKernel(n, dx, w.kernel);
  // Scale the start to carry the load exactly and place H(0) where the formula says.
  let sum = 0;
  for (let i = 0; i < n; i++) sum += p[i] as number;
  const scale = Math.PI / 2 / (sum * dx);
  for (let i = 0; i < n; i++) p[i] = (p[i] as number) * scale;
  const iZero = Math.round(-q.xIn / dx);
  let h0 = q.startCentralFilm - elastic(w, p, iZero, n) - ((x[iZero] as number) ** 2) / 2;

  let merit = evaluate(q, w, p, h0, dx);
  // Non-monotone acceptance (Grippo, Lampariello & Lucidi, SIAM J. Numer. Anal. 23 (1986) 707–716):
  // a step is measured against the worst of the last few merits, so a full Newton step that crosses
  // a kink of the complementarity function is not cut to a crawl.
  const recent = [merit, merit, merit, merit];
  let iterations = 0;
  let reason: DimensionlessSolution['reason'] = 'iteration-limit';
  let chordOk = false;
  while (iterations < q.maxIterations) {
    const before = w.norms[1] as number;
    if (before < q.tolerance) {
      reason = 'converged';
      break;
    }
    iterations++;
    const reuse = chordOk && before < CHORD_FROM && assemble(q, w, p, dx, false);
    if (!reuse) {
      assemble(q, w, p, dx, true);
      if (!luFactor(w.matrix, w.pivots, n - 1)) {
        reason = 'stalled';
        break;
      }
    }
    if (!luSolve(w.matrix, w.pivots, w.rhs, n - 1)) {
      reason = 'stalled';
      break;
    }
    let step = 1;
    let accepted = false;
    for (let tries = 0; tries < 12; tries++) {
      for (let i = 1; i < n - 1; i++) {
        const v = (p[i] as number) + step * (w.rhs[i - 1] as number);
        pTrial[i] = v > 0 ? v : 0;
      }
      pTrial[0] = 0;
      pTrial[n - 1] = 0;
      const h0Trial = h0 + step * (w.rhs[n - 2] as number);
      const m = evaluate(q, w, pTrial, h0Trial, dx);
      const reference = Math.max(recent[0] as number, recent[1] as number, recent[2] as number, recent[3] as number);
      if (Number.isFinite(m) && (m < reference * (1 - 1e-4 * step) || tries === 11)) {
        p.set(pTrial);
        h0 = h0Trial;
        merit = m;
        recent[iterations % 4] = m;
        accepted = true;
        chordOk = tries === 0 && (w.norms[1] as number) < before / 4;
        break;
      }
      step /= 2;
    }
    if (!accepted) {
      reason = 'non-finite';
      merit = evaluate(q, w, p, h0, dx);
      break;
    }
  }
  evaluate(q, w, p, h0, dx);
  const residual = w.norms[1] as number;
  if (residual < q.tolerance) reason = 'converged';
  else if (reason === 'converged') reason = 'stalled';
  return { converged: reason === 'converged', iterations, residual, h0, reason };
}

function elastic(w: EhlWorkspace, p: Float64Array, i: number, n: number): number {
  const k = w.kernel;
  let s = 0;
  for (let j = 1; j < n - 1; j++) s += (k[i > j ? i - j : j - i] as number) * (p[j] as number);
  return s;
}

/**
 * Film, density and flow factor at every node for pressures `p` and offset `h0`; returns the
 * root-mean-square scaled residual (complementarity rows and load balance), the line search's merit,
 * and writes it and the largest into `w.norms`. Leaves the node state in the workspace.
 */
function evaluate(q: DimensionlessProblem, w: EhlWorkspace, p: Float64Array, h0: number, dx: number): number {
  const n = q.nodes;
  const { x, h, rho, dRho, eps, dEpsP, dEpsH, scratch } = w;
  const pH = q.hertzPressure;
  let load = 0;
  for (let i = 0; i < n; i++) {
    const xi = x[i] as number;
    const hi = h0 + (xi * xi) / 2 + elastic(w, p, i, n);
    h[i] = hi;
    const pi = (p[i] as number) * pH;
    load += p[i] as number;
    const r = densityRatio(pi, scratch);
    const dr = (scratch[0] as number) * pH;
    const lnEta = lnViscosityRatio(q.viscosity, pi, scratch);
    const dLnEta = (scratch[0] as number) * pH;
    rho[i] = r;
    dRho[i] = dr;
    const hc = hi > H_FLOOR ? hi : H_FLOOR;
    const e = (r * hc * hc * hc * Math.exp(-lnEta)) / q.lambdaBar;
    eps[i] = e;
    dEpsP[i] = e * (dr / r - dLnEta);
    dEpsH[i] = hi > H_FLOOR ? (3 * e) / hi : 0;
  }
  const loadError = (load * dx - Math.PI / 2) / (Math.PI / 2);
  let worst = Math.abs(loadError);
  let squares = loadError * loadError;
  for (let i = 1; i < n - 1; i++) {
    const c = rowCoefficients(w, p, i, dx);
    const phi = Math.min(p[i] as number, -c.residual / Math.abs(c.diagonal));
    const a = Math.abs(phi);
    squares += phi * phi;
    if (!(a <= worst)) worst = Number.isNaN(a) ? Infinity : a;
  }
  const rms = Math.sqrt(squares / (n - 1));
  w.norms[0] = Number.isFinite(rms) ? rms : Infinity;
  w.norms[1] = worst;
  return w.norms[0] as number;
}

/** Coefficients of Reynolds row i, written into one reused object. */
const ROW = { residual: 0, diagonal: 0, dPmm: 0, dPm: 0, dP0: 0, dPp: 0, dHmm: 0, dHm: 0, dH0: 0, dHp: 0 };

function rowCoefficients(w: EhlWorkspace, p: Float64Array, i: number, dx: number): typeof ROW {
  const { h, rho, dRho, eps, dEpsP, dEpsH, kernel } = w;
  const dx2 = dx * dx;
  const pm = p[i - 1] as number, p0 = p[i] as number, pp = p[i + 1] as number;
  const em = ((eps[i - 1] as number) + (eps[i] as number)) / 2;
  const ep = ((eps[i] as number) + (eps[i + 1] as number)) / 2;
  const gp = pp - p0, gm = p0 - pm;
  const rh0 = (rho[i] as number) * (h[i] as number);
  const rhm = (rho[i - 1] as number) * (h[i - 1] as number);
  // Wedge term by upwind differences: second order (3, −4, 1)/2 or first order (1, −1); first order
  // next to the inlet boundary.
  const mode = w.wedgeMode[0] as number;
  const second = i > 1 && (mode === 1 || (mode === 2 && (w.x[i] as number) < HYBRID_EDGE));
  const c0 = second ? 1.5 : 1, c1 = second ? -2 : -1, c2 = second ? 0.5 : 0;
  const rhmm = second ? (rho[i - 2] as number) * (h[i - 2] as number) : 0;
  ROW.residual = (ep * gp - em * gm) / dx2 - (c0 * rh0 + c1 * rhm + c2 * rhmm) / dx;
  ROW.dPp = ep / dx2 + ((dEpsP[i + 1] as number) / 2) * gp / dx2;
  ROW.dP0 = -(ep + em) / dx2 + ((dEpsP[i] as number) / 2) * (gp - gm) / dx2 - (c0 * (dRho[i] as number) * (h[i] as number)) / dx;
  ROW.dPm = em / dx2 - ((dEpsP[i - 1] as number) / 2) * gm / dx2 - (c1 * (dRho[i - 1] as number) * (h[i - 1] as number)) / dx;
  ROW.dPmm = second ? -(c2 * (dRho[i - 2] as number) * (h[i - 2] as number)) / dx : 0;
  ROW.dHp = ((dEpsH[i + 1] as number) / 2) * gp / dx2;
  ROW.dH0 = ((dEpsH[i] as number) / 2) * (gp - gm) / dx2 - (c0 * (rho[i] as number)) / dx;
  ROW.dHm = -((dEpsH[i - 1] as number) / 2) * gm / dx2 - (c1 * (rho[i - 1] as number)) / dx;
  ROW.dHmm = second ? -(c2 * (rho[i - 2] as number)) / dx : 0;
  const k0 = kernel[0] as number, k1 = kernel[1] as number;
  ROW.diagonal = ROW.dP0 + ROW.dHmm * (kernel[2] as number) + ROW.dHm * k1 + ROW.dH0 * k0 + ROW.dHp * k1;
  return ROW;
}

/**
 * The semismooth Newton system for the state left by the last evaluate(). With `withMatrix` it fills
 * the matrix, the right-hand side, the row scales and the active set; without, only the right-hand
 * side, scaled as the factorised matrix was, and it returns false if the active set has changed
 * (the factors no longer belong to this system).
 */
function assemble(q: DimensionlessProblem, w: EhlWorkspace, p: Float64Array, dx: number, withMatrix: boolean): boolean {
  const n = q.nodes;
  const m = n - 1;
  const { matrix, rhs, kernel, rowScale, identityRow } = w;
  if (withMatrix) matrix.fill(0);
  let load = 0;
  for (let i = 0; i < n; i++) load += p[i] as number;
  for (let i = 1; i < n - 1; i++) {
    const r = i - 1;
    const row = r * m;
    const c = rowCoefficients(w, p, i, dx);
    const s = withMatrix ? 1 / Math.abs(c.diagonal) : (rowScale[i] as number);
    const pi = p[i] as number;
    const identity = pi < -c.residual / Math.abs(c.diagonal);
    if (!withMatrix) {
      if ((identityRow[i] === 1) !== identity) return false;
      rhs[r] = identity ? -pi : -c.residual * s;
      continue;
    }
    rowScale[i] = s;
    identityRow[i] = identity ? 1 : 0;
    if (identity) {
      matrix[row + r] = 1;
      rhs[r] = -pi;
      continue;
    }
    rhs[r] = -c.residual * s;
    const amm = c.dHmm * s, am = c.dHm * s, a0 = c.dH0 * s, ap = c.dHp * s;
    for (let j = 1; j < n - 1; j++) {
      const kmm = i > 1 ? (kernel[Math.abs(i - 2 - j)] as number) : 0;
      const km = kernel[Math.abs(i - 1 - j)] as number;
      const k0 = kernel[Math.abs(i - j)] as number;
      const kp = kernel[Math.abs(i + 1 - j)] as number;
      matrix[row + j - 1] = amm * kmm + am * km + a0 * k0 + ap * kp;
    }
    if (i > 2) matrix[row + r - 2] = (matrix[row + r - 2] as number) + c.dPmm * s;
    if (i > 1) matrix[row + r - 1] = (matrix[row + r - 1] as number) + c.dPm * s;
    matrix[row + r] = (matrix[row + r] as number) + c.dP0 * s;
    if (i < n - 2) matrix[row + r + 1] = (matrix[row + r + 1] as number) + c.dPp * s;
    matrix[row + m - 1] = amm + am + a0 + ap;
  }
  rhs[m - 1] = -(load * dx - Math.PI / 2);
  if (!withMatrix) return true;
  const last = (m - 1) * m;
  for (let j = 0; j < m - 1; j++) matrix[last + j] = dx;
  return true;
}
