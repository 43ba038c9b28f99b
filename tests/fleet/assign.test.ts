import { describe, expect, it } from 'vitest';
import { assignOils } from '../../app/fleet/assign';
import type { FitCell, FleetGearbox, FleetOil } from '../../app/fleet/types';

const oil = (name: string, chemistry: FleetOil['chemistry'], baseOil: FleetOil['baseOil'] = 'mineral'): FleetOil => ({ name, chemistry, baseOil, isoVG: 320, fzgFailureStage: 12, ep: chemistry === 'extreme-pressure' });
const box = (name: string, currentCandidate: string | null): FleetGearbox => ({ name, title: name, id: null, source: name, currentOil: currentCandidate, currentCandidate, components: [] });
const cell = (gearbox: string, o: string, meets: boolean): FitCell => ({ gearbox, oil: o, meets, shortfalls: meets ? [] : ['film'], governingCase: 'c', code: 'aw-suffices', dutyShareMet: meets ? 1 : 0, worstRatio: 1, summary: '' });

describe('assignment of oils from the chosen set', () => {
  const oils = [oil('EP mineral', 'extreme-pressure'), oil('AW mineral', 'anti-wear'), oil('AW PAO', 'anti-wear', 'pao')];
  const byName = new Map(oils.map((o) => [o.name, o]));
  const currentOf = (g: FleetGearbox) => (g.currentCandidate ? (byName.get(g.currentCandidate) ?? null) : null);
  const cover = oils.map((o) => o.name);

  it('keeps the current oil where it is in the set and serves the gearbox', () => {
    const a = assignOils([box('B', 'AW PAO')], oils, [cell('B', 'EP mineral', true), cell('B', 'AW mineral', true), cell('B', 'AW PAO', true)], cover, currentOf);
    expect(a).toEqual([{ gearbox: 'B', oil: 'AW PAO', keepsCurrent: true }]);
  });

  it('otherwise prefers the same chemistry and base oil, then an oil that is not EP', () => {
    const gone = [cell('B', 'EP mineral', true), cell('B', 'AW mineral', true), cell('B', 'AW PAO', false)];
    expect(assignOils([box('B', 'AW PAO')], oils, gone, cover, currentOf)[0]?.oil).toBe('AW mineral'); // not EP
    const sameBase = assignOils([box('C', 'EP mineral')], oils, [cell('C', 'EP mineral', false), cell('C', 'AW mineral', true), cell('C', 'AW PAO', true)], cover, currentOf);
    expect(sameBase[0]?.oil).toBe('AW mineral'); // first of the two non-EP oils in the list
    const noCurrent = assignOils([box('D', null)], oils, [cell('D', 'EP mineral', true), cell('D', 'AW PAO', true)], cover, currentOf);
    expect(noCurrent[0]).toEqual({ gearbox: 'D', oil: 'AW PAO', keepsCurrent: false });
  });

  it('never assigns an oil outside the set, nor one that falls short', () => {
    const a = assignOils([box('E', 'AW mineral')], oils, [cell('E', 'EP mineral', true), cell('E', 'AW mineral', true)], ['EP mineral'], currentOf);
    expect(a).toEqual([{ gearbox: 'E', oil: 'EP mineral', keepsCurrent: false }]);
    expect(assignOils([box('F', null)], oils, [cell('F', 'EP mineral', false)], cover, currentOf)).toEqual([]);
  });
});
