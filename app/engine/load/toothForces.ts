import { requirePositive } from '../diagnostics';
import type { Metres, NewtonMetres, Newtons, NewtonsPerMetre, Radians, RadiansPerSecond, Watts } from '../units';

/** Pinion torque from power, T1 = P/ω1. */
export function torqueFromPower(power: Watts, omega1: RadiansPerSecond): NewtonMetres {
  return (power / omega1) as NewtonMetres;
}

export interface ToothForces {
  /** Nominal tangential force at the reference circle, Ft = 2 T1/d1. */
  readonly tangential: Newtons;
  /** Transverse force along the line of action, Fbt = Ft/cos αt. */
  readonly alongLineOfAction: Newtons;
  /** Nominal line load Fbt/b that XΓ and KA multiply. */
  readonly lineLoad: NewtonsPerMetre;
}

/**
 * Nominal tooth forces (ISO 6336-1): Ft = 2 T1/d1 and Fbt = Ft/cos αt. Fbt/b, once multiplied by
 * XΓ and KA, is the normal load per unit length of contact line also for helical gears
 * (the contact-line length b εα/cos βb and the normal force Fbt/cos βb share the cos βb).
 */
export function toothForces(torque1: NewtonMetres, referenceDiameter1: Metres, transversePressureAngle: Radians, faceWidth: Metres): ToothForces {
  requirePositive('loadCases[].pinionTorque_Nm', torque1, 'N·m');
  const ft = (2 * torque1) / referenceDiameter1;
  const fbt = ft / Math.cos(transversePressureAngle);
  return { tangential: ft as Newtons, alongLineOfAction: fbt as Newtons, lineLoad: (fbt / faceWidth) as NewtonsPerMetre };
}
