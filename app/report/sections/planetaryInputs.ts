import type { Planetary } from '../../review/schema';
import type { RecordContext } from '../context';
import { formatNumber } from '../units';
import { materialName, materialRow, shift, tip } from './inputHelpers';

const HELD_WORDS: Record<Planetary['held'], string> = { ring: 'ring (the sun drives the carrier)', carrier: 'carrier (the sun drives the ring)', sun: 'sun (the carrier drives the ring)' };

/** Inputs of a planetary stage: the members, the stage and the materials. */
export function drawPlanetaryInputs(ctx: RecordContext, p: Planetary): void {
  const { layout: L, results, units: u } = ctx;
  const meshes = results.meshes ?? [];
  const sp = meshes.find((m) => m.mesh === 'sun-planet')?.gear;
  const pr = meshes.find((m) => m.mesh === 'planet-ring')?.gear;
  const used = {
    sun: { x: sp?.profileShift.pinion, da: sp?.tipDiameter_mm.pinion },
    planet: { x: sp?.profileShift.wheel, da: sp?.tipDiameter_mm.wheel },
    ring: { x: pr?.profileShift.wheel, da: pr?.tipDiameter_mm.wheel },
  };
  const members = ['sun', 'planet', 'ring'] as const;
  L.heading('Planetary stage', 2);
  L.table(
    [
      { header: 'Quantity', width: 0.4 },
      { header: 'Sun', width: 0.2, align: 'right' },
      { header: 'Planet', width: 0.2, align: 'right' },
      { header: 'Ring', width: 0.2, align: 'right' },
    ],
    [
      ['Number of teeth z', ...members.map((m) => String(p[m].teeth))],
      ['Profile shift coefficient x (input → used)', ...members.map((m) => shift(p[m].profileShift, used[m].x ?? 0))],
      ['Tip diameter da, ring: inner (input → used)', ...members.map((m) => tip(u, p[m].tipDiameter_mm, used[m].da ?? 0))],
      ['Flank roughness Ra', ...members.map((m) => u.fmt(p[m].roughnessRa_um, 'roughness'))],
      ['Material', ...members.map((m) => materialName(p[m].material))],
    ],
    { zebra: true, fontSize: 8 },
  );
  const st = results.planetary;
  const rows: Array<[string, string]> = [
    ['Normal module mn', u.fmt(p.normalModule_mm, 'length')],
    ['Normal pressure angle αn', u.fmt(p.normalPressureAngle_deg, 'angle')],
    ['Helix angle β', u.fmt(p.helixAngle_deg, 'angle')],
    ['Face width b', u.fmt(p.faceWidth_mm, 'length')],
    ['Planets', String(p.planets)],
    ['Mesh load factor Kγ', formatNumber(p.meshLoadFactorKgamma, 3)],
    ['Held member', HELD_WORDS[p.held]],
    ['Ratio, driving over driven', st ? `${formatNumber(st.ratio, 5)} (${st.driving} to ${st.driven})` : '—'],
    ['Centre distance a (carrier)', st ? u.fmt(st.centerDistance_mm, 'length', 6) : '—'],
    ['Gap between planet tips', st?.planetTipGap_mm != null ? u.fmt(st.planetTipGap_mm, 'length') : 'one planet'],
    ['Xmp sun–planet / planet–ring', st ? `${formatNumber(st.multipleMeshFactor['sun-planet'], 3)} / ${formatNumber(st.multipleMeshFactor['planet-ring'], 3)}` : '—'],
    ['Contact ratio εα sun–planet / planet–ring', sp && pr ? `${formatNumber(sp.transverseContactRatio, 4)} / ${formatNumber(pr.transverseContactRatio, 4)}` : '—'],
    ['Components in the oil', p.components.length ? p.components.join(', ') : 'none declared'],
    ['Kv / KHβ / KHα (inputs)', `${formatNumber(p.dynamicFactorKv, 3)} / ${formatNumber(p.faceLoadFactorKHbeta, 3)} / ${formatNumber(p.transverseLoadFactorKHalpha, 3)}`],
  ];
  L.keyValues(rows, { pairs: 2, labelShare: 0.56, size: 7.5, header: ['Stage', 'Value'], valueAlign: 'right' });
  for (const c of st?.checks ?? []) L.para(`${c.severity}: ${c.message}`, { size: 8 });

  if (st) {
    L.heading('Speeds and torques in the carrier frame', 2);
    L.table(
      [
        { header: 'Load case', width: 0.24 },
        { header: 'n carrier', width: 0.13, align: 'right' },
        { header: 'n sun − n C', width: 0.13, align: 'right' },
        { header: 'n planet − n C', width: 0.14, align: 'right' },
        { header: 'T sun', width: 0.12, align: 'right' },
        { header: 'T sun mesh', width: 0.12, align: 'right' },
        { header: 'T planet on ring', width: 0.12, align: 'right' },
      ],
      st.loadCases.map((k) => [
        k.loadCase,
        u.fmt(k.carrierSpeed_rpm, 'speed'),
        u.fmt(k.sunRelativeSpeed_rpm, 'speed'),
        u.fmt(k.planetRelativeSpeed_rpm, 'speed'),
        u.fmt(k.sunTorque_Nm, 'torque'),
        u.fmt(k.meshTorque_Nm['sun-planet'], 'torque'),
        u.fmt(k.meshTorque_Nm['planet-ring'], 'torque'),
      ]),
      { zebra: true, fontSize: 7.5 },
    );
  }

  L.heading('Materials', 2);
  L.table(
    [
      { header: 'Member', width: 0.26 },
      { header: 'E', width: 0.11, align: 'right' },
      { header: 'ν', width: 0.07, align: 'right' },
      { header: 'k', width: 0.16, align: 'right' },
      { header: 'ρ', width: 0.13, align: 'right' },
      { header: 'c', width: 0.19, align: 'right' },
      { header: 'XW', width: 0.08, align: 'right' },
    ],
    members.map((m) => materialRow(u, m, p[m].material)),
    { zebra: true, fontSize: 8 },
  );
}
