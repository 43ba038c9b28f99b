import { EngineInputError } from '../diagnostics';
import type { RadiansPerSecond } from '../units';
import type { HeldMember, StageSpeeds } from './types';

/**
 * Speeds of a simple planetary stage by the Willis equation, (nS − nC)/(nR − nC) = −zR/zS, and
 * for the planet (nP − nC)/(nS − nC) = −zS/zP (R. Willis, Principles of Mechanism, 1841 [memory]; METHODS.md):
 *   ring held:    nC = nS zS/(zS + zR),     ratio nS/nC = 1 + zR/zS (sun drives the carrier);
 *   carrier held: nR = −nS zS/zR,           ratio nS/nR = −zR/zS   (sun drives the ring);
 *   sun held:     nR = nC (1 + zS/zR),      ratio nC/nR = zR/(zS + zR) (carrier drives the ring).
 * In the carrier frame: sun nS − nC, planet (nP − nC) = −(nS − nC) zS/zP, ring −(nS − nC) zS/zR.
 * @param inputSpeed - the sun's speed, or the carrier's when the sun is held, rad/s (> 0)
 */
export function stageSpeeds(zS: number, zP: number, zR: number, held: HeldMember, inputSpeed: RadiansPerSecond): StageSpeeds {
  if (!(inputSpeed > 0) || !Number.isFinite(inputSpeed)) {
    const field = held === 'sun' ? 'loadCases[].carrierSpeed_rpm' : 'loadCases[].sunSpeed_rpm';
    throw new EngineInputError('input.not-positive', field, '> 0 rad/s', `The input speed must be greater than 0.`);
  }
  let sun: number;
  let carrier: number;
  let ring: number;
  if (held === 'ring') {
    sun = inputSpeed;
    ring = 0;
    carrier = (sun * zS) / (zS + zR);
  } else if (held === 'carrier') {
    sun = inputSpeed;
    carrier = 0;
    ring = (-sun * zS) / zR;
  } else {
    sun = 0;
    carrier = inputSpeed;
    ring = carrier * (1 + zS / zR);
  }
  const sunRelative = sun - carrier;
  const planetRelative = (-sunRelative * zS) / zP;
  const ringRelative = (-sunRelative * zS) / zR;
  const ratio = held === 'ring' ? sun / carrier : held === 'carrier' ? sun / ring : carrier / ring;
  return {
    sun: sun as RadiansPerSecond,
    planet: (carrier + planetRelative) as RadiansPerSecond,
    ring: ring as RadiansPerSecond,
    carrier: carrier as RadiansPerSecond,
    sunRelative: sunRelative as RadiansPerSecond,
    planetRelative: planetRelative as RadiansPerSecond,
    ringRelative: ringRelative as RadiansPerSecond,
    ratio,
    driving: held === 'sun' ? 'carrier' : 'sun',
    driven: held === 'ring' ? 'carrier' : 'ring',
  };
}
