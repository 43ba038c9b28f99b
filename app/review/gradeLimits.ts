import type { LoadCase } from './schema';

/**
 * The heaviest ISO VG a lubrication method can use at a pitch-line velocity (common practice for
 * enclosed industrial gears; no single standard). Dip (splash): the wheel churns the sump, and
 * churning losses and heat rise with viscosity and speed, so the faster the mesh the lighter the
 * heaviest usable grade. Spray (injection): the oil must pass the pump, filter and nozzles, which
 * heavy grades do poorly, above all when cold. Below each band's speed every heavier grade is usable.
 */
export const DIP_LIMITS: readonly { readonly upTo_mps: number; readonly maxVG: number }[] = [
  { upTo_mps: 2.5, maxVG: 1500 },
  { upTo_mps: 5, maxVG: 1000 },
  { upTo_mps: 10, maxVG: 680 },
  { upTo_mps: 15, maxVG: 460 },
  { upTo_mps: Infinity, maxVG: 320 },
];
export const SPRAY_MAX_VG = 460;

/** Heaviest usable grade for one case, with the reason in words. */
export function usableMaxVG(lubrication: LoadCase['lubrication'], pitchLineVelocity_mps: number): { maxVG: number; reason: string } {
  if (lubrication === 'spray') return { maxVG: SPRAY_MAX_VG, reason: 'spray lubrication passes heavier grades poorly through pump, filter and nozzles (common practice)' };
  const band = DIP_LIMITS.find((b) => pitchLineVelocity_mps <= b.upTo_mps) ?? DIP_LIMITS[DIP_LIMITS.length - 1]!;
  return {
    maxVG: band.maxVG,
    reason: `dip lubrication at ${pitchLineVelocity_mps.toPrecision(3)} m/s pitch-line velocity churns heavier grades in the sump, with losses and heat (common practice)`,
  };
}

/** The most restrictive over the load cases: the heaviest grade every case can use, and why. */
export function usableOverCases(cases: readonly { readonly lubrication: LoadCase['lubrication']; readonly pitchLineVelocity_mps: number; readonly name: string }[]): { maxVG: number; reason: string } {
  let best = { maxVG: Infinity, reason: '' };
  for (const c of cases) {
    const u = usableMaxVG(c.lubrication, c.pitchLineVelocity_mps);
    if (u.maxVG < best.maxVG) best = { maxVG: u.maxVG, reason: `${u.reason}, in “${c.name}”` };
  }
  return best;
}
