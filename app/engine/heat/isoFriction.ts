import { requirePositive, type WarningSink } from '../diagnostics';
import type { Metres, MetresPerSecond, NewtonsPerMetre, PascalSeconds } from '../units';

/** Inputs of {@link isoMeanFriction}, all SI. One object may be reused. */
export interface IsoFrictionInputs {
  /** Transverse unit load w_Bt = K_A K_v K_Hβ K_Hα F_bt / b, N/m (> 0). */
  wBt: NewtonsPerMetre;
  /** Sum of tangential velocities at the pitch point vΣC = 2 v_t sin α_wt, m/s (> 0). */
  vSumC: MetresPerSecond;
  /** Normal relative radius of curvature at the pitch point ρ_relC, m (> 0). */
  rhoRelC: Metres;
  /** Dynamic viscosity at the oil (sump or injection) temperature, Pa·s (> 0). */
  etaOil: PascalSeconds;
  /** Mean arithmetic roughness Ra = (Ra1 + Ra2)/2 of the flanks, m (> 0). */
  raAvg: Metres;
  /** Lubricant factor X_L (mineral oil 1.0), dimensionless (> 0). */
  xL: number;
  /** Helical load factor K_Bγ, dimensionless (> 0), default 1 (spur). */
  kBgamma?: number;
}

/** Limits outside which ISO/TS 6336-20 (as DIN 3990-4) is recalled to clamp the inputs [memory, weak]. */
export const ISO_FRICTION_LIMITS = { vSumMax_ms: 50, wBtMin_Nmm: 150 } as const;

/**
 * ISO/TS 6336-20 mean coefficient of friction in the mesh (flash temperature method).
 *
 *   μm = 0.045 · (w_Bt K_Bγ / (vΣC ρ_relC))^0.2 · η_oil^−0.05 · X_R · X_L
 *   X_R = 2.2 · (Ra / ρ_relC)^0.25
 *
 * The formula is dimensional. The SI inputs are converted inside to the units of the
 * standard: w_Bt N/mm (÷1000), vΣC m/s, ρ_relC mm (×1000), η_oil mPa·s (×1000), Ra µm (×1e6).
 *
 * @param p - inputs in SI, see {@link IsoFrictionInputs}
 * @param warnings - optional sink; `heat.friction-speed-range` when vΣC > 50 m/s and
 *   `heat.friction-load-range` when w_Bt K_Bγ < 150 N/mm. The standard is recalled to use
 *   the limit value in those cases [memory, weak]; here the formula value is kept and only warned.
 * @returns μm, dimensionless
 *
 * Non-positive or non-finite inputs throw EngineInputError.
 * Source: ISO/TS 6336-20:2017 (and DIN 3990-4), mean coefficient of friction [memory].
 */
export function isoMeanFriction(p: IsoFrictionInputs, warnings?: WarningSink): number {
  const kBg = p.kBgamma ?? 1;
  requirePositive('wBt', p.wBt, 'N/m');
  requirePositive('vSumC', p.vSumC, 'm/s');
  requirePositive('rhoRelC', p.rhoRelC, 'm');
  requirePositive('etaOil', p.etaOil, 'Pa·s');
  requirePositive('raAvg', p.raAvg, 'm');
  requirePositive('xL', p.xL);
  requirePositive('kBgamma', kBg);
  const wNmm = (p.wBt * kBg) / 1000;
  const rhoMm = p.rhoRelC * 1000;
  const etaMPas = p.etaOil * 1000;
  const raUm = p.raAvg * 1e6;
  if (warnings) {
    if (p.vSumC > ISO_FRICTION_LIMITS.vSumMax_ms) {
      warnings.add({
        code: 'heat.friction-speed-range',
        severity: 'warning',
        field: 'vSumC',
        message: `Sum velocity at the pitch point vΣC = ${p.vSumC.toFixed(1)} m/s is above ${ISO_FRICTION_LIMITS.vSumMax_ms} m/s, beyond the range of the ISO/TS 6336-20 friction formula.`,
      });
    }
    if (wNmm < ISO_FRICTION_LIMITS.wBtMin_Nmm) {
      warnings.add({
        code: 'heat.friction-load-range',
        severity: 'warning',
        field: 'wBt',
        message: `Unit load wBt·KBγ = ${wNmm.toFixed(0)} N/mm is below ${ISO_FRICTION_LIMITS.wBtMin_Nmm} N/mm, beyond the range of the ISO/TS 6336-20 friction formula.`,
      });
    }
  }
  const xR = 2.2 * Math.pow(raUm / rhoMm, 0.25);
  return 0.045 * Math.pow(wNmm / (p.vSumC * rhoMm), 0.2) * Math.pow(etaMPas, -0.05) * xR * p.xL;
}
