import { describe, expect, it } from 'vitest';
import { EngineInputError, WarningSink } from '../../app/engine/diagnostics';
import { gearPairGeometry } from '../../app/engine/geometry/gearPair';
import { micropittingStageNumber } from '../../app/engine/micropitting/failureStage';
import { MICROPITTING_MATERIAL_FACTOR_WW, pairMaterialFactorWW } from '../../app/engine/micropitting/materialFactor';
import { micropittingSafety } from '../../app/engine/micropitting/micropittingSafety';
import { permissibleSpecificFilm } from '../../app/engine/micropitting/permissibleFilm';
import { C_GF_GEAR, C_GF_OIL_TEMPERATURE, C_GF_PINION_SPEED, C_GF_ROUGHNESS_RA, cGfPinionTorque } from '../../app/engine/micropitting/testGear';
import { kelvinToCelsius, toMicrometres, toMillimetres } from '../../app/engine/units';
import { parseReviewValue } from '../../app/review/parse';
import type { Results } from '../../app/review/results';
import { run } from '../../app/review/run';
import { FZG_STAGE_TORQUE_NM, FZG_TYPE_C } from './fzgTestGears';

/**
 * ISO/TS 6336-22 (formerly ISO/TR 15144-1) micropitting [memory]: λGFP = 1.4 WW λGFT, Sλ = λGF,min/λGFP,
 * λGFT from the FVA 54 step test on the C-GF gear (90 °C, 8.3 m/s), at the ISO 14635-1 load-stage
 * torques [memory]. The oil is an ISO VG 100 mineral oil (KV100 11.1 mm²/s), the class of the FZG
 * reference oils [memory]; it is the same oil in duty and test, as the self-consistency requires.
 */
const cGf = gearPairGeometry(C_GF_GEAR);

describe('the C-GF test gear (FVA 54 micropitting test)', () => {
  it('is the FZG type C geometry of ISO 14635-1 (Höhn et al. 2008, Table 1), b = 14 mm', () => {
    expect(C_GF_GEAR).toEqual(FZG_TYPE_C); // z 16/24, mn 4.5, a 91.5, b 14, x 0.1817/0.1715, da 82.46/118.36 mm [src: Höhn 2008 Table 1]
    expect(toMillimetres(cGf.workingDiameter1)).toBeCloseTo(73.2, 1); // dw1 = 2a/(1 + u) = 183/2.5 = 73.2 mm
  });
  it('runs at 90 °C and about 8.3 m/s (2170 rpm on dw1 = 73.2 mm: π · 0.0732 · 2170/60 = 8.32 m/s), Ra 0.5 µm [memory]', () => {
    expect(kelvinToCelsius(C_GF_OIL_TEMPERATURE)).toBeCloseTo(90, 9); // FVA 54, GT-C/8.3/90 [memory]
    expect((C_GF_PINION_SPEED * cGf.workingDiameter1) / 2).toBeCloseTo(8.3, 1); // FVA 54: 8.3 m/s [memory]
    expect(toMicrometres(C_GF_ROUGHNESS_RA)).toBeCloseTo(0.5, 9); // FVA 54 C-GF, ground, Ra ≈ 0.5 µm [memory]
  });
  it('uses the ISO 14635-1 load-stage torques: stage 5 = 94.1 N·m … stage 10 = 372.6 N·m [memory]; ">10" is computed at stage 10', () => {
    for (let s = 5; s <= 10; s++) expect(cGfPinionTorque(s)).toBe(FZG_STAGE_TORQUE_NM[s - 1]); // ISO 14635-1 table [memory]
    expect(cGfPinionTorque('>10')).toBe(372.6); // ISO 14635-1 stage 10 [memory]
  });
});

describe('ISO/TS 6336-22 formulas [memory]', () => {
  it('λGFP = 1.4 · WW · λGFT: 1.4 · 1 · 0.2 = 0.28; nitrided WW 1.5: 1.4 · 1.5 · 0.2 = 0.42', () => {
    expect(permissibleSpecificFilm(0.2)).toBeCloseTo(0.28, 12);
    expect(permissibleSpecificFilm(0.2, 1.5)).toBeCloseTo(0.42, 12);
  });
  it('Sλ = λGF,min/λGFP: 0.35/0.28 = 1.25', () => {
    expect(micropittingSafety(0.35, 0.28)).toBeCloseTo(1.25, 12);
  });
  it('WW guide values: case-carburized 1.0 [memory, firm]; through-hardened 0.5, induction-hardened 0.65, nitrided 1.5 [memory, weak]; the pair takes the larger', () => {
    expect(MICROPITTING_MATERIAL_FACTOR_WW['case-carburized']).toBe(1); // ISO/TS 6336-22 [memory]
    expect(MICROPITTING_MATERIAL_FACTOR_WW['through-hardened']).toBe(0.5); // ISO/TS 6336-22 [memory, weak]
    expect(MICROPITTING_MATERIAL_FACTOR_WW.nitrided).toBe(1.5); // ISO/TS 6336-22 [memory, weak]
    expect(pairMaterialFactorWW(0.5, 1.5)).toBe(1.5);
    expect(pairMaterialFactorWW(undefined, undefined)).toBe(1);
  });
  it('a failure stage outside 5…10 or ">10" is an error that names the field', () => {
    for (const bad of [4, 11, 7.5, 0, Number.NaN]) {
      expect(() => micropittingStageNumber(bad, 'oils[1].micropittingFailureStage')).toThrow(EngineInputError);
      try {
        micropittingStageNumber(bad, 'oils[1].micropittingFailureStage');
      } catch (e) {
        expect((e as EngineInputError).field).toBe('oils[1].micropittingFailureStage');
        expect((e as Error).message).toMatch(/5 to 10, or ">10"/);
      }
    }
    expect(micropittingStageNumber('>10')).toBe(11);
  });
  it('λGF,min = 0 (no film) is outside the method: Sλ = 0 with a warning, never NaN; a negative or NaN λGF,min is an error', () => {
    const sink = new WarningSink();
    expect(micropittingSafety(0, 0.28, 'loadCases[0]', sink)).toBe(0);
    expect(sink.items.map((w) => w.code)).toEqual(['micropitting.no-film']);
    expect(sink.items[0]?.field).toBe('loadCases[0]');
    expect(() => micropittingSafety(Number.NaN, 0.28)).toThrow(EngineInputError);
    expect(() => micropittingSafety(-0.1, 0.28)).toThrow(EngineInputError);
    expect(() => micropittingSafety(0.3, 0)).toThrow(EngineInputError);
  });
});

const PINION_RPM_8_3 = (8.3 * 60) / (Math.PI * 0.0732); // v = 8.3 m/s exactly on dw1 = 73.2 mm: 2165.6 rpm
function cGfReview(torque: number, oil: Record<string, unknown>, material = 'steel-carburized'): Results {
  const p = parseReviewValue({
    format: 'flankfilm.review',
    version: 1,
    title: 'C-GF test gear (FVA 54) as a duty',
    gearPair: {
      normalModule_mm: 4.5,
      faceWidth_mm: 14,
      centerDistance_mm: 91.5,
      pinion: { teeth: 16, profileShift: 0.1817, tipDiameter_mm: 82.46, roughnessRa_um: 0.5, material },
      wheel: { teeth: 24, profileShift: 0.1715, tipDiameter_mm: 118.36, roughnessRa_um: 0.5, material },
    },
    loadCases: [{ name: `T1 = ${torque} N·m`, pinionSpeed_rpm: PINION_RPM_8_3, pinionTorque_Nm: torque, oilTemperature_C: 90, lubrication: 'dip' }],
    oils: [{ name: 'VG 100 mineral', kv40_mm2s: 100, kv100_mm2s: 11.1, density15_kgm3: 880, baseOil: 'mineral', chemistry: 'extreme-pressure', fzgFailureStage: 12, ...oil }],
  });
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return run(p.review);
}
const mpOf = (r: Results) => r.cases[0]?.micropitting ?? null;

describe('self-consistency: the method reproduces its own test on the C-GF gear (ISO/TS 6336-22 [memory])', () => {
  for (let s = 5; s <= 10; s++) {
    it(`an oil of failure stage ${s}, at stage ${s}'s torque (${FZG_STAGE_TORQUE_NM[s - 1]} N·m), 90 °C, 8.3 m/s: Sλ = 1/1.4 = 0.714 within ±3 %`, () => {
      const mp = mpOf(cGfReview(FZG_STAGE_TORQUE_NM[s - 1] as number, { micropittingFailureStage: s }));
      expect(mp?.safety).not.toBeNull();
      expect(Math.abs((mp?.safety ?? 0) * 1.4 - 1), `Sλ = ${mp?.safety}`).toBeLessThan(0.03); // 1/1.4: λGF,min = λGFT at the failure stage
      expect(mp?.finding).toBe('short'); // 0.714 < Sλ,min = 1
    });
  }
  for (let s = 6; s <= 10; s++) {
    it(`the same stage-${s} oil at the lighter stage ${s - 1}: Sλ is higher`, () => {
      const at = mpOf(cGfReview(FZG_STAGE_TORQUE_NM[s - 1] as number, { micropittingFailureStage: s }))?.safety ?? 0;
      const lighter = mpOf(cGfReview(FZG_STAGE_TORQUE_NM[s - 2] as number, { micropittingFailureStage: s }))?.safety ?? 0;
      expect(lighter).toBeGreaterThan(at);
    });
  }
  it('λGFT falls with the stage (more load, a hotter mesh): stages 5 … 10', () => {
    const by = mpOf(cGfReview(183.4, {}))?.lambdaGFTByStage.map((x) => x.lambdaGFT) ?? [];
    expect(by).toHaveLength(6);
    for (let i = 1; i < by.length; i++) expect(by[i] as number).toBeLessThan(by[i - 1] as number);
  });
  it('the stage needed is the smallest with Sλ ≥ Sλ,min: at the stage below it Sλ < 1, at it Sλ ≥ 1', () => {
    const r = cGfReview(FZG_STAGE_TORQUE_NM[5] as number, {});
    const mp = mpOf(r);
    const need = mp?.requiredFailureStage;
    expect(typeof need).toBe('number');
    const at = (s: number) => (mp?.lambdaGFMin ?? 0) / (1.4 * (mp?.lambdaGFTByStage.find((x) => x.stage === s)?.lambdaGFT ?? 1));
    expect(at(need as number)).toBeGreaterThanOrEqual(1);
    if ((need as number) > 5) expect(at((need as number) - 1)).toBeLessThan(1);
    expect(r.need?.micropittingStage).toBe(need);
  });
  it('nitrided flanks (WW 1.5 [memory, weak]) lower Sλ by 1.5 against carburized ones', () => {
    const c = mpOf(cGfReview(239.3, { micropittingFailureStage: 9 }))?.safety ?? 0;
    const n = mpOf(cGfReview(239.3, { micropittingFailureStage: 9 }, 'steel-nitrided'))?.safety ?? 0;
    expect(c / n).toBeCloseTo(1.5, 9);
  });
});

describe('the micropitting finding in the verdict', () => {
  it('unknown without a failure stage: Sλ null, the screen kept, the stage needed stated', () => {
    const r = cGfReview(239.3, {});
    const c = r.cases[0];
    expect(c?.verdict?.micropitting).toBe('unknown');
    expect(c?.micropitting?.safety).toBeNull();
    expect(c?.micropittingAdvisory).toMatch(/< 1: micropitting is possible/);
    expect(c?.verdict?.reasons.find((x) => x.rule === 'micropitting.safety')?.text).toMatch(/not given/);
  });
  it('short is a shortfall of the oil, never a reason for EP: the verdict code is the same as with a micropitting stage that meets', () => {
    const short = cGfReview(135.3, { micropittingFailureStage: 5 });
    const meets = cGfReview(135.3, { micropittingFailureStage: '>10' });
    expect(short.cases[0]?.verdict?.micropitting).toBe('short');
    expect(short.cases[0]?.verdict?.shortfalls).toContain('micropitting');
    expect(meets.cases[0]?.verdict?.micropitting).toBe('meets');
    expect(short.cases[0]?.verdict?.code).toBe(meets.cases[0]?.verdict?.code);
    const text = short.cases[0]?.verdict?.reasons.find((x) => x.rule === 'micropitting.safety')?.text ?? '';
    expect(text).toMatch(/some EP additive systems lower it/); // common practice
    expect(text).toMatch(/higher micropitting class/);
  });
  it('a failure stage outside 5…10 or ">10" is refused by the schema, naming the field', () => {
    for (const bad of [4, 11, 8.5, '10', '>12']) {
      const p = parseReviewValue({
        format: 'flankfilm.review',
        version: 1,
        title: 't',
        gearPair: { normalModule_mm: 4.5, faceWidth_mm: 14, pinion: { teeth: 16, roughnessRa_um: 0.5, material: 'steel-carburized' }, wheel: { teeth: 24, roughnessRa_um: 0.5, material: 'steel-carburized' } },
        loadCases: [{ name: 'c', pinionSpeed_rpm: 1000, pinionTorque_Nm: 100, oilTemperature_C: 60, lubrication: 'dip' }],
        oils: [{ name: 'o', kv40_mm2s: 100, kv100_mm2s: 11.1, density15_kgm3: 880, baseOil: 'mineral', chemistry: 'anti-wear', fzgFailureStage: 10, micropittingFailureStage: bad }],
      });
      expect(p.ok).toBe(false);
      if (!p.ok) expect(JSON.stringify(p.issues)).toMatch(/oils\[0\]\.micropittingFailureStage|oils.*0.*micropittingFailureStage/);
    }
  });
});
