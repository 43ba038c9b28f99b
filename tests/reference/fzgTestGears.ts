import { degreesToRadians, millimetres } from '../../app/engine/units';
import type { GearPairInput } from '../../app/engine/geometry/types';

/**
 * The FZG test gears of ISO 14635-1, as tabulated by Höhn et al. (2008), Table 1:
 * z1/z2 = 16/24, m = 4.5 mm, a = 91.5 mm, αn = 20°, spur.
 */
export const FZG_TYPE_A: GearPairInput = {
  normalModule: millimetres(4.5), // ISO 14635-1 / Höhn 2008 Table 1
  normalPressureAngle: degreesToRadians(20),
  helixAngle: degreesToRadians(0),
  faceWidth: millimetres(20), // type A: b = 20 mm
  centerDistance: millimetres(91.5),
  pinion: { teeth: 16, profileShift: 0.8532, tipDiameter: millimetres(88.77) },
  wheel: { teeth: 24, profileShift: -0.5, tipDiameter: millimetres(112.5) },
};

export const FZG_TYPE_C: GearPairInput = {
  normalModule: millimetres(4.5),
  normalPressureAngle: degreesToRadians(20),
  helixAngle: degreesToRadians(0),
  faceWidth: millimetres(14), // type C: b = 14 mm
  centerDistance: millimetres(91.5),
  pinion: { teeth: 16, profileShift: 0.1817, tipDiameter: millimetres(82.46) },
  wheel: { teeth: 24, profileShift: 0.1715, tipDiameter: millimetres(118.36) },
};

/** FZG A/8.3/90: motor 1450 rpm, pinion about 2170 rpm (ISO 14635-1). */
export const FZG_PINION_SPEED_RPM = 2170;

/** Pinion torque per load stage 1–12, N·m (ISO 14635-1 load-stage table [memory]). */
export const FZG_STAGE_TORQUE_NM = [3.3, 13.7, 35.3, 60.8, 94.1, 135.3, 183.4, 239.3, 302.0, 372.6, 450.1, 534.5] as const;

/** Hertz stress at the pitch point per load stage 1–12, N/mm², type A gear (ISO 14635-1 load-stage table [memory]). */
export const FZG_STAGE_PITCH_HERTZ_MPA = [146, 295, 474, 621, 773, 927, 1080, 1232, 1386, 1538, 1691, 1841] as const;
