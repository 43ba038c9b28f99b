import { EngineInputError } from '../diagnostics';
import type { Metres, NewtonsPerMetre, Pascals } from '../units';

/**
 * Contact modulus E* of two elastic bodies, 1/E* = (1 − ν1²)/E1 + (1 − ν2²)/E2 (Hertz; ISO 6336-2
 * writes ZE = √(E* / π)). Steel on steel (E = 206 GPa, ν = 0.3, ISO 6336-1) gives E* = 113.2 GPa.
 * Hamrock's "effective modulus" E′ is 2E*.
 */
export function contactModulus(e1: Pascals, nu1: number, e2: Pascals, nu2: number): Pascals {
  return (1 / ((1 - nu1 * nu1) / e1 + (1 - nu2 * nu2) / e2)) as Pascals;
}

/** Reduced radius of curvature 1/ρred = 1/ρ1 + 1/ρ2 (convex–convex). */
export function reducedRadius(rho1: Metres, rho2: Metres): Metres {
  return ((rho1 * rho2) / (rho1 + rho2)) as Metres;
}

/**
 * Reduced radius of a conformal (convex–concave) contact, 1/ρred = 1/ρ1 − 1/ρ2, i.e.
 * ρred = ρ1 ρ2/(ρ2 − ρ1): a pinion flank (convex, ρ1) inside a ring flank (concave, ρ2 > ρ1),
 * as on an internal gear pair (Johnson, Contact Mechanics, §4.2, with the concave radius negative).
 * ρ2 ≤ ρ1 is no contact of this kind and throws EngineInputError.
 */
export function conformalReducedRadius(rho1: Metres, rho2: Metres): Metres {
  if (!(rho2 > rho1) || !(rho1 > 0)) {
    throw new EngineInputError('stress.conformal-radii', 'gearPair.wheel', 'ρ2 > ρ1 > 0', `A concave flank of radius ${(rho2 * 1e3).toFixed(3)} mm cannot hold a convex one of radius ${(rho1 * 1e3).toFixed(3)} mm.`);
  }
  return ((rho1 * rho2) / (rho2 - rho1)) as Metres;
}

/**
 * Maximum Hertz pressure of a line contact, p_H = √(w E* / (π ρred)) (Hertz 1881; Johnson,
 * Contact Mechanics, §4.2).
 * @param w - load per unit length of contact line, N/m (> 0)
 * @param rhoRed - reduced radius in the normal plane, m (> 0)
 * @param eStar - contact modulus E*, Pa
 */
export function hertzLinePressure(w: NewtonsPerMetre, rhoRed: Metres, eStar: Pascals): Pascals {
  return Math.sqrt((w * eStar) / (Math.PI * rhoRed)) as Pascals;
}

/** Hertz semi-width of a line contact, bH = √(4 w ρred/(π E*)) (the half-width; the full width is 2 bH). */
export function hertzSemiWidth(w: NewtonsPerMetre, rhoRed: Metres, eStar: Pascals): Metres {
  return Math.sqrt((4 * w * rhoRed) / (Math.PI * eStar)) as Metres;
}
