import type { Caution, VerdictCode, VerdictFacts } from './types';

/** The life-halving rule of thumb holds above about this sump temperature (common practice). */
const OXIDATION_RULE_FROM_C = 60;
/** A sump at or above this is hot enough for the oxidation caution to apply (common practice). */
const HOT_SUMP_C = 80;

const has = (f: VerdictFacts, ...ids: string[]) => ids.some((id) => f.components.includes(id));

/**
 * The cautions that go with every verdict. Each is always listed (standing); it is marked
 * `triggered` when this review's inputs make it apply. The last one always applies.
 */
/** Short titles for the list of standing cautions that do not apply to a review. */
export const CAUTION_TITLES: Readonly<Record<string, string>> = {
  'yellow-metals': 'Yellow metals and active-sulphur EP additives',
  'friction-sensitive': 'Backstops and wet clutches',
  oxidation: 'Oxidation in a hot sump',
  'pag-mixing': 'PAG oils: mixing, seals and paints',
  flushing: 'Changing chemistry or base oil: drain and flush',
  'food-contact': 'Food-contact duty',
  defer: 'An engineering aid, not an approval',
};

export function cautionsFor(f: VerdictFacts, code: VerdictCode): Caution[] {
  const epInPlay = f.chemistry === 'extreme-pressure' || code !== 'aw-suffices';
  const list: Array<[string, boolean, string]> = [
    [
      'yellow-metals',
      has(f, 'bronze-bushing', 'brass-cage', 'yellow-metal') && epInPlay,
      'Yellow metals: bronze or brass parts (bushings, cages, worm wheels) can be attacked by active-sulphur EP additives, more so when hot. Ask the oil supplier for a copper-corrosion result (ASTM D130) at the sump temperature, or choose an EP oil declared safe for yellow metals.',
    ],
    [
      'friction-sensitive',
      has(f, 'backstop', 'clutch'),
      'Backstops, sprag or ratchet holdbacks and wet clutches depend on friction: EP and friction-modified oils can make them slip. Confirm with the maker of the backstop or clutch that the oil is approved for it.',
    ],
    f.oilTemperature_C >= HOT_SUMP_C
      ? [
          'oxidation',
          true,
          `Oxidation: above a sump temperature of about ${OXIDATION_RULE_FROM_C} °C an oil's life roughly halves for every 10 °C rise (common practice); at ${f.oilTemperature_C.toFixed(0)} °C shorten the oil-analysis interval or improve cooling.`,
        ]
      : [
          'oxidation',
          false,
          `Oxidation: above a sump temperature of about ${OXIDATION_RULE_FROM_C} °C an oil's life roughly halves for every 10 °C rise (common practice); a hot sump calls for shorter oil-analysis intervals.`,
        ],
    [
      'pag-mixing',
      f.baseOil.startsWith('pag') || f.otherOils.some((o) => o.baseOil.startsWith('pag')),
      'PAG oils do not mix with mineral or PAO oils and can attack some seals and interior paints: drain and flush completely, and check seal and paint compatibility with the oil supplier.',
    ],
    [
      'flushing',
      f.otherOils.some((o) => o.chemistry !== f.chemistry || o.baseOil !== f.baseOil),
      'Changing chemistry or base oil: drain hot, flush with the new oil, and check the seals; mixed additive systems can form deposits or lose their effect.',
    ],
    [
      'food-contact',
      has(f, 'food-contact'),
      'Food-contact duty: use only an oil registered for incidental food contact (for example NSF H1) and follow the plant\'s hygiene rules.',
    ],
    [
      'defer',
      true,
      'This review is an engineering aid, not an approval: follow the gearbox maker\'s lubricant list and instructions, local codes and regulations, and the judgement of a licensed engineer. Gear failures can injure people and damage plant.',
    ],
  ];
  return list.map(([id, triggered, text]) => ({ id, text, kind: triggered ? 'triggered' : 'standing' }));
}
