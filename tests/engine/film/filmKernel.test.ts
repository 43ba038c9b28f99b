import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { WarningSink } from '../../../app/engine/diagnostics';
import { dowsonHigginsonMinFilm } from '../../../app/engine/film/dowsonHigginson';
import { isoLocalFilm } from '../../../app/engine/film/isoLocalFilm';
import { panHamrockFilm } from '../../../app/engine/film/panHamrock';
import { murchWilsonThermalFactor } from '../../../app/engine/film/thermalCorrection';
import { specificFilmThickness, specificFilmThicknessGF } from '../../../app/engine/film/specificFilm';
import { analyseCase } from '../../../app/engine/mesh/analyseCase';
import { gearPairGeometry } from '../../../app/engine/geometry/gearPair';
import type { Metres, MetresPerSecond, NewtonsPerMetre, Pascals } from '../../../app/engine/units';
import { parseReviewValue } from '../../../app/review/parse';
import { gearPairInput, materialOf } from '../../../app/review/toEngine';
import { engineDutyOf, enginePolicyOf } from '../../../app/review/engineInputs';
import { oilModelsOf } from '../../../app/review/oils';
import { micrometres } from '../../../app/engine/units';
import { asPairReview, type PairReview } from '../../../app/review/schema';

/** The log-space film loop of mesh/film.ts against the one-formula reference modules of film/. */
describe('film kernel = the reference film functions', () => {
  for (const formula of ['dowson-higginson', 'pan-hamrock'] as const) {
    it(`${formula}: h_min, h_c, φT, λ and λ_GF at every point within 1e-12 relative`, () => {
      const raw = JSON.parse(readFileSync('assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json', 'utf8'));
      raw.policy.filmFormula = formula;
      const p = parseReviewValue(raw);
      if (!p.ok) throw new Error('demo invalid');
      const r = asPairReview(p.review) as PairReview;
      const oil = oilModelsOf(r.oils)[0] as ReturnType<typeof oilModelsOf>[number];
      const ra1 = micrometres(r.gearPair.pinion.roughnessRa_um);
      const ra2 = micrometres(r.gearPair.wheel.roughnessRa_um);
      const a = analyseCase({ geometry: gearPairGeometry(gearPairInput(r.gearPair)), pinion: materialOf(r.gearPair.pinion.material), wheel: materialOf(r.gearPair.wheel.material), roughnessRa1: ra1, roughnessRa2: ra2, duty: engineDutyOf(r, 0), oil, policy: enginePolicyOf(r.policy), caseField: 'loadCases[0]' });
      const m = a.mechanics;
      const film = a.film as NonNullable<typeof a.film>;
      const st = a.oilAtFilmTemperature as NonNullable<typeof a.oilAtFilmTemperature>;
      const eP = (2 * m.contactModulus) as Pascals;
      const sink = new WarningSink();
      const rel = (x: number, y: number) => Math.abs(x / y - 1);
      for (let i = 0; i < m.n; i++) {
        const u = ((m.sumVelocity[i] as number) / 2) as MetresPerSecond;
        const R = m.reducedRadius[i] as Metres;
        const w = m.lineLoad[i] as NewtonsPerMetre;
        const ph = panHamrockFilm(st.dynamicViscosity, st.pressureViscosity, u, R, w, eP, sink);
        const h = formula === 'dowson-higginson' ? dowsonHigginsonMinFilm(st.dynamicViscosity, st.pressureViscosity, u, R, w, eP, sink) : ph.hMin;
        const phi = murchWilsonThermalFactor(st.temperatureViscosity, st.dynamicViscosity, u, undefined, sink);
        expect(rel(film.thermalFactor[i] as number, phi)).toBeLessThan(1e-12);
        expect(rel(film.hMin[i] as number, h * phi)).toBeLessThan(1e-12);
        expect(rel(film.hCentral[i] as number, ph.hCentral * phi)).toBeLessThan(1e-12);
        expect(rel(film.lambda[i] as number, specificFilmThickness((h * phi) as Metres, ra1, ra2))).toBeLessThan(1e-12);
        const hY = isoLocalFilm(st.dynamicViscosity, st.pressureViscosity, m.sumVelocity[i] as MetresPerSecond, R, m.hertzPressure[i] as Pascals, eP, 1, sink);
        expect(rel(film.lambdaGF[i] as number, specificFilmThicknessGF(hY, ra1, ra2))).toBeLessThan(1e-12);
      }
    });
  }
});
