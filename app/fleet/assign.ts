/**
 * Each served gearbox gets one oil from the chosen set. Preference, in order: its current oil;
 * an oil of the same chemistry and base oil as its current one (no flush of the additive system);
 * an oil that is not EP (EP only where the need asks for it: yellow metals and backstops are
 * kinder to R&O and AW oils); then the first in the candidate list.
 */
import type { FitCell, FleetAssignment, FleetGearbox, FleetOil } from './types';

export function assignOils(gearboxes: readonly FleetGearbox[], oils: readonly FleetOil[], fit: readonly FitCell[], cover: readonly string[], currentOf: (g: FleetGearbox) => FleetOil | null): FleetAssignment[] {
  const meets = new Set(fit.filter((c) => c.meets).map((c) => `${c.gearbox}\u0000${c.oil}`));
  const inCover = oils.filter((o) => cover.includes(o.name));
  const out: FleetAssignment[] = [];
  for (const g of gearboxes) {
    const options = inCover.filter((o) => meets.has(`${g.name}\u0000${o.name}`));
    if (options.length === 0) continue;
    const current = currentOf(g);
    const rank = (o: FleetOil): number[] => [
      g.currentCandidate === o.name ? 0 : 1,
      current && current.chemistry === o.chemistry && current.baseOil === o.baseOil ? 0 : 1,
      o.ep ? 1 : 0,
      oils.indexOf(o),
    ];
    const best = [...options].sort((a, b) => {
      const ra = rank(a);
      const rb = rank(b);
      for (let i = 0; i < ra.length; i++) if (ra[i] !== rb[i]) return (ra[i] as number) - (rb[i] as number);
      return 0;
    })[0] as FleetOil;
    out.push({ gearbox: g.name, oil: best.name, keepsCurrent: g.currentCandidate === best.name });
  }
  return out;
}
