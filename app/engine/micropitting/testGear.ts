import { FZG_A_PINION_TORQUE } from '../heat/integralTemperature';
import type { GearPairInput } from '../geometry/types';
import { celsiusToKelvin, degreesToRadians, micrometres, millimetres, rpmToRadiansPerSecond, type NewtonMetres } from '../units';
import { micropittingStageNumber, type MicropittingFailureStage } from './failureStage';

/**
 * The C-GF test gear of the FVA 54 micropitting test: the FZG type C geometry of ISO 14635-1
 * (z 16/24, mn 4.5 mm, a 91.5 mm, b 14 mm, x 0.1817/0.1715, da 82.46/118.36 mm; Höhn et al. 2008,
 * Table 1, as tests/reference/fzgTestGears.ts holds it), ground flanks, case-carburized steel.
 */
export const C_GF_GEAR: GearPairInput = {
  normalModule: millimetres(4.5),
  normalPressureAngle: degreesToRadians(20),
  helixAngle: degreesToRadians(0),
  faceWidth: millimetres(14),
  centerDistance: millimetres(91.5),
  pinion: { teeth: 16, profileShift: 0.1817, tipDiameter: millimetres(82.46) },
  wheel: { teeth: 24, profileShift: 0.1715, tipDiameter: millimetres(118.36) },
};

/** Flank roughness of the C-GF gear, Ra ≈ 0.5 µm on pinion and wheel (FVA 54 [memory]). */
export const C_GF_ROUGHNESS_RA = micrometres(0.5);

/** The test's pinion speed: about 2170 rpm, v ≈ 8.3 m/s on dw1 = 73.2 mm (ISO 14635-1 rig [memory]). */
export const C_GF_PINION_SPEED = rpmToRadiansPerSecond(2170);

/** The test's oil temperature, 90 °C (FVA 54, GT-C/8.3/90 [memory]). */
export const C_GF_OIL_TEMPERATURE = celsiusToKelvin(90);

/** How the test gearbox is lubricated: dip (the FZG rig's sump, heated to the test temperature) [memory, weak]. */
export const C_GF_LUBRICATION = 'dip' as const;

/**
 * The pinion torque of a micropitting load stage: the FZG load-stage torques of ISO 14635-1 are used
 * on the C-GF gear too [memory]; stage 5 = 94.1 N·m … stage 10 = 372.6 N·m. A stage '>10' is computed at stage 10.
 */
export function cGfPinionTorque(stage: MicropittingFailureStage): NewtonMetres {
  const s = Math.min(micropittingStageNumber(stage), 10);
  return FZG_A_PINION_TORQUE[s - 1] as NewtonMetres;
}
