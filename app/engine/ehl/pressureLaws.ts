import { EngineInputError } from '../diagnostics';
import type { Pascals, PascalSeconds, PerPascal } from '../units';

/** Which pressure–viscosity law the solver uses. */
export type ViscosityLaw = 'roelands' | 'barus';

/** Roelands' reference pressure p0 = 1.96e8 Pa (so that 1/p0 = 5.1e−9 1/Pa) [memory, standard textbook form]. */
export const ROELANDS_P0 = 1.96e8 as Pascals;
/** Roelands' constant ln(η∞) = −9.67, η∞ = 6.31e−5 Pa·s [memory, standard textbook form]. */
export const ROELANDS_LN_ETA_INF = -9.67;

/** The parameters of one viscosity law, fixed for a solve (no allocation per node). */
export interface ViscosityParameters {
  readonly law: ViscosityLaw;
  /** Barus α, 1/Pa. */
  readonly alpha: number;
  /** Roelands ln η0 + 9.67. */
  readonly lnEtaRatio: number;
  /** Roelands pressure–viscosity index z. */
  readonly z: number;
}

/**
 * Parameters of the pressure–viscosity law at one inlet state.
 *
 * Barus: η/η0 = exp(α p).
 * Roelands (1966): η/η0 = exp{(ln η0 + 9.67)[(1 + p/p0)^z − 1]}, p0 = 1.96e8 Pa. The index z is
 * chosen so that the initial slope d ln η/dp at p = 0 equals the oil's Barus α:
 * z = α p0/(ln η0 + 9.67) (the usual way to carry one α into both laws; Hamrock, Fundamentals of
 * Fluid Film Lubrication, ch. 4 [memory]).
 * @param eta0 - viscosity at the inlet, ambient pressure, Pa·s (> 6.31e−5 for Roelands)
 * @param alpha - Barus pressure–viscosity coefficient, 1/Pa (> 0)
 */
export function viscosityParameters(law: ViscosityLaw, eta0: PascalSeconds, alpha: PerPascal): ViscosityParameters {
  const lnEtaRatio = Math.log(eta0) - ROELANDS_LN_ETA_INF;
  if (law === 'roelands' && !(lnEtaRatio > 0)) {
    throw new EngineInputError('ehl.roelands-viscosity', 'eta0', '> 6.31e-5 Pa·s', `Roelands' law needs η0 above 6.31e-5 Pa·s; η0 = ${eta0} Pa·s. Use the Barus law.`);
  }
  return { law, alpha, lnEtaRatio, z: law === 'roelands' ? (alpha * ROELANDS_P0) / lnEtaRatio : 0 };
}

/** ln(η/η0) at pressure p ≥ 0 (Pa); writes d ln η/dp into out[0]. */
export function lnViscosityRatio(v: ViscosityParameters, p: number, out: Float64Array): number {
  if (v.law === 'barus') {
    out[0] = v.alpha;
    return v.alpha * p;
  }
  const base = 1 + p / ROELANDS_P0;
  const pw = Math.pow(base, v.z);
  out[0] = (v.lnEtaRatio * v.z * pw) / (base * ROELANDS_P0);
  return v.lnEtaRatio * (pw - 1);
}

/**
 * Dowson–Higginson density ratio ρ/ρ0 = 1 + 0.6e−9 p/(1 + 1.7e−9 p), p in Pa (Dowson & Higginson,
 * Elasto-hydrodynamic Lubrication, 1966 [memory, standard textbook form]); writes dρ̄/dp into out[0].
 */
export function densityRatio(p: number, out: Float64Array): number {
  const d = 1 + 1.7e-9 * p;
  out[0] = 0.6e-9 / (d * d);
  return 1 + (0.6e-9 * p) / d;
}
