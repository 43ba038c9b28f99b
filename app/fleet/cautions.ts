/**
 * The cautions of a consolidation: every one is listed; `applies` and the gearboxes say where this
 * fleet's assignment makes it bite. The last always applies.
 */
import type { FleetAssignment, FleetCaution, FleetGearbox, FleetOil } from './types';

const YELLOW = ['bronze-bushing', 'brass-cage', 'yellow-metal'];
const FRICTION = ['backstop', 'clutch'];

export function fleetCautions(gearboxes: readonly FleetGearbox[], oils: readonly FleetOil[], assignment: readonly FleetAssignment[], currentOf: (g: FleetGearbox) => FleetOil | null): FleetCaution[] {
  const oil = new Map(oils.map((o) => [o.name, o]));
  const byName = new Map(gearboxes.map((g) => [g.name, g]));
  const changing: Array<{ g: FleetGearbox; to: FleetOil; from: FleetOil | null }> = [];
  for (const a of assignment) {
    const g = byName.get(a.gearbox);
    const to = oil.get(a.oil);
    if (!g || !to || a.keepsCurrent) continue;
    changing.push({ g, to, from: currentOf(g) });
  }
  const names = (xs: Array<{ g: FleetGearbox }>) => xs.map((x) => x.g.name);
  const flush = changing.filter((x) => x.from === null || x.from.chemistry !== x.to.chemistry || x.from.baseOil !== x.to.baseOil);
  const pag = changing.filter((x) => x.to.baseOil.startsWith('pag') || (x.from?.baseOil.startsWith('pag') ?? false));
  const yellow = assignment.filter((a) => oil.get(a.oil)?.ep && byName.get(a.gearbox)?.components.some((c) => YELLOW.includes(c))).map((a) => a.gearbox);
  const friction = changing.filter((x) => x.g.components.some((c) => FRICTION.includes(c)));
  return [
    {
      id: 'mixing',
      applies: changing.length > 0,
      gearboxes: names(changing),
      text: `Mixing oils: a gearbox that changes oil must not be topped up with its old oil, and the plant's store, labels and top-up cans must follow the new assignment.${pag.length ? ' PAG oils do not mix with mineral or PAO oils at all and can attack some seals and paints.' : ''} Check every pairing with the oil suppliers.`,
    },
    {
      id: 'flushing',
      applies: flush.length > 0,
      gearboxes: names(flush),
      text: 'Flushing: where the chemistry or base oil changes (or the oil in service is not known), drain hot, flush with the new oil and check the seals; mixed additive systems can form deposits or lose their effect.',
    },
    {
      id: 'yellow-metals',
      applies: yellow.length > 0,
      gearboxes: yellow,
      text: 'Yellow metals: bronze or brass parts (bushings, cages, worm wheels) can be attacked by active-sulphur EP additives, more so when hot. Ask the supplier for a copper-corrosion result (ASTM D130) at the sump temperature, or choose an EP oil declared safe for yellow metals.',
    },
    {
      id: 'backstops',
      applies: friction.length > 0,
      gearboxes: names(friction),
      text: 'Backstops and clutches: sprag or ratchet holdbacks and wet clutches depend on friction; EP and friction-modified oils can make them slip. Confirm with their maker that the new oil is approved for them.',
    },
    {
      id: 'defer',
      applies: true,
      gearboxes: [],
      text: "This consolidation is an engineering aid, not an approval: follow each gearbox maker's lubricant list and instructions, local codes and regulations, and the judgement of a licensed engineer; confirm every oil with its supplier's current data sheet.",
    },
  ];
}
