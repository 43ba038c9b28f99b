import { ColumnBlock } from '../columnBlock';
import type { WarningSink } from '../diagnostics';
import { bulkTemperature, LUBRICATION_FACTOR_XS } from '../heat/bulkTemperature';
import { helicalLoadFactor } from '../heat/helicalLoadFactor';
import { isoMeanFriction } from '../heat/isoFriction';
import { materialContactCoefficient } from '../materials';
import type { Kelvin, KelvinDifference, Metres, MetresPerSecond } from '../units';
import { blokFlashAlongPath } from './blokAlongPath';
import type { MeshMechanics } from './mechanics';
import type { CaseInput } from './types';

/** The Float64 columns temperaturesAlongPath takes from its block. */
export const HEAT_COLUMNS = 2;

export interface TemperaturesAlongPath {
  /** Mean coefficient of friction used along the path. */
  readonly friction: number;
  readonly frictionSource: 'ISO/TS 6336-20' | 'policy';
  /** KBγ used in the friction and tip-flash loads. */
  readonly helicalLoadFactor: number;
  /** Blok flash temperature θfl at each point, K (rise). */
  readonly flash: Float64Array;
  /** Contact temperature θB = θM + θfl at each point, K. */
  readonly contact: Float64Array;
  readonly flashMax: KelvinDifference;
  readonly bulkTemperature: Kelvin;
  readonly contactMax: Kelvin;
  readonly contactMaxIndex: number;
}

/**
 * Friction (ISO/TS 6336-20 μm, or the policy's μ), Blok flash temperature at every point,
 * bulk temperature θM = θoil + 0.47 XS Xmp θfl,max and contact temperature θB = θM + θfl.
 * The flash constant 0.80 belongs to the Hertz semi-width bH (see heat/blokFlash.ts).
 */
export function temperaturesAlongPath(input: CaseInput, m: MeshMechanics, sink: WarningSink, block: ColumnBlock = new ColumnBlock(m.n, HEAT_COLUMNS)): TemperaturesAlongPath {
  const oil = input.oil as NonNullable<CaseInput['oil']>;
  const g = input.geometry;
  const tOil = input.duty.oilTemperature;
  const kBg = helicalLoadFactor(g.totalContactRatio);
  let friction: number;
  let frictionSource: TemperaturesAlongPath['frictionSource'];
  if (input.policy.frictionCoefficient !== null) {
    friction = input.policy.frictionCoefficient;
    frictionSource = 'policy';
  } else {
    friction = isoMeanFriction(
      {
        wBt: m.unitLoad,
        vSumC: m.sumVelocity[m.pitchIndex] as MetresPerSecond,
        rhoRelC: m.reducedRadius[m.pitchIndex] as Metres,
        etaOil: oil.model.dynamicViscosity(tOil, `${input.caseField}.oilTemperature_C`),
        raAvg: ((input.roughnessRa1 + input.roughnessRa2) / 2) as Metres,
        xL: oil.model.lubricantFactor,
        kBgamma: kBg,
      },
      sink,
    );
    frictionSource = 'ISO/TS 6336-20';
  }
  const bM1 = materialContactCoefficient(input.pinion);
  const bM2 = materialContactCoefficient(input.wheel);
  const flash = block.float64();
  const flashMax = blokFlashAlongPath(friction, m, bM1, bM2, flash);
  const thetaM = bulkTemperature(tOil, flashMax as KelvinDifference, LUBRICATION_FACTOR_XS[input.duty.lubrication], input.duty.pinionMeshes);
  const contact = block.float64();
  let contactMax = -Infinity;
  let contactMaxIndex = 0;
  for (let i = 0; i < m.n; i++) {
    const t = thetaM + (flash[i] as number);
    contact[i] = t;
    if (t > contactMax) {
      contactMax = t;
      contactMaxIndex = i;
    }
  }
  return {
    friction,
    frictionSource,
    helicalLoadFactor: kBg,
    flash,
    contact,
    flashMax: flashMax as KelvinDifference,
    bulkTemperature: thetaM,
    contactMax: contactMax as Kelvin,
    contactMaxIndex,
  };
}
