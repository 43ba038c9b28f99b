/**
 * Gearboxes for the fleet tests, built from the invented demo reviews by scaling their duty and
 * smoothing their flanks. Which oil each one needs is not asserted from memory: each test states
 * the premise it relies on (the gearbox's own need from run()) before it checks the fleet logic.
 */
import { readFileSync } from 'node:fs';
import { parseReviewValue } from '../../app/review/parse';
import type { Oil, Review } from '../../app/review/schema';

const CONVEYOR = 'assets/demo/harrow-creek-conveyor-spur-pair.flankfilm.json';
const CRUSHER = 'assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json';

export interface Variant {
  title: string;
  base: 'conveyor' | 'crusher';
  /** Flank roughness Ra of both gears, µm. */
  ra: number;
  /** Torque (or power) factor on every load case. */
  load: number;
  /** Speed factor on every load case (power scales with it). */
  speed: number;
  inService?: Oil;
  components?: string[];
}

export function gearbox(v: Variant): Record<string, any> {
  const raw = JSON.parse(readFileSync(v.base === 'conveyor' ? CONVEYOR : CRUSHER, 'utf8'));
  raw.title = v.title;
  raw.id = v.title.replace(/\W+/g, '-');
  raw.gearPair.pinion.roughnessRa_um = v.ra;
  raw.gearPair.wheel.roughnessRa_um = v.ra;
  if (v.components) raw.gearPair.components = v.components;
  for (const lc of raw.loadCases) {
    if (lc.pinionTorque_Nm) lc.pinionTorque_Nm *= v.load;
    else lc.power_kW *= v.load * v.speed;
    lc.pinionSpeed_rpm *= v.speed;
  }
  raw.oils = v.inService ? [{ ...v.inService, role: 'in-service' }] : [];
  return raw;
}

export function parsed(raw: unknown): Review {
  const p = parseReviewValue(raw);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.review;
}

/** Three mineral VG 680 oils, one per chemistry class; data-sheet values invented for the test (KV100 39.2 mm²/s gives VI ≈ 95). */
export function vg680(name: string, chemistry: Oil['chemistry'], fzg: Oil['fzgFailureStage']): Oil {
  return { name, role: 'candidate', kv40_mm2s: 680, kv100_mm2s: 39.2, density15_kgm3: 900, baseOil: 'mineral', chemistry, fzgFailureStage: fzg };
}
export const RO = vg680('R&O VG 680', 'r-and-o', 7);
export const AW = vg680('AW VG 680', 'anti-wear', 10);
export const EP = vg680('EP VG 680', 'extreme-pressure', '>12');

/** The hand-built fleet: one gearbox needs EP, two do not, one is beyond any oil. */
export const HAND_FLEET: Variant[] = [
  { title: 'G1 conveyor, heavy and fast (needs EP)', base: 'conveyor', ra: 0.1, load: 5, speed: 3, inService: EP },
  { title: 'G2 conveyor, light', base: 'conveyor', ra: 0.1, load: 1, speed: 3, inService: RO },
  { title: 'G3 crusher, light', base: 'crusher', ra: 0.1, load: 0.3, speed: 1, inService: AW },
  { title: 'G4 crusher, overloaded', base: 'crusher', ra: 0.2, load: 5, speed: 1 },
];
