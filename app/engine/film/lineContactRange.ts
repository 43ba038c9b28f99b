import type { WarningSink } from '../diagnostics';

/**
 * Where the isothermal line-contact film fits stop being interpolations.
 *
 * Dowson–Higginson and Pan–Hamrock fitted their formulas to numerical EHL solutions that
 * cover roughly U ≈ 1e-12…1e-10, W ≈ 2e-5…3e-4 and G ≈ 2500…5000 [memory, approximate].
 * The limits below are that span widened by a decade for U and W and by a factor 2 for G:
 * inside them the fit is trusted, outside them the result is an extrapolation and a
 * warning is raised (the value is still returned).
 */
export const LINE_CONTACT_FIT_LIMITS = {
  uMin: 1e-13,
  uMax: 1e-9,
  wMin: 2e-6,
  wMax: 3e-3,
  gMin: 1250,
  gMax: 10000,
} as const;

/**
 * Add one warning per dimensionless group (speed U, load W, materials G, Hamrock
 * convention) that lies outside {@link LINE_CONTACT_FIT_LIMITS}. Allocates only when it warns.
 * @param model - formula name used in the message, e.g. "Dowson–Higginson"
 */
export function warnOutsideLineContactFit(model: string, U: number, W: number, G: number, warnings: WarningSink | undefined): void {
  if (!warnings) return;
  const L = LINE_CONTACT_FIT_LIMITS;
  if (U < L.uMin || U > L.uMax) {
    warnings.add({
      code: 'film.speed-parameter-range',
      severity: 'warning',
      field: 'U',
      message: `Speed parameter U = ${U.toExponential(2)} is outside ${L.uMin.toExponential(0)}…${L.uMax.toExponential(0)}; the ${model} film is an extrapolation.`,
    });
  }
  if (W < L.wMin || W > L.wMax) {
    warnings.add({
      code: 'film.load-parameter-range',
      severity: 'warning',
      field: 'W',
      message: `Load parameter W = ${W.toExponential(2)} is outside ${L.wMin.toExponential(0)}…${L.wMax.toExponential(0)}; the ${model} film is an extrapolation.`,
    });
  }
  if (G < L.gMin || G > L.gMax) {
    warnings.add({
      code: 'film.materials-parameter-range',
      severity: 'warning',
      field: 'G',
      message: `Materials parameter G = ${G.toFixed(0)} is outside ${L.gMin}…${L.gMax}; the ${model} film is an extrapolation.`,
    });
  }
}
