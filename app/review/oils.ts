import type { EngineOil } from '../engine/mesh/types';
import { cachedOilModel } from '../engine/oil/oilModelCache';
import { centistokes, perGigapascal, type KilogramsPerCubicMetre } from '../engine/units';
import type { OilSummary } from './results';
import type { Oil } from './schema';

export interface ReviewOil extends EngineOil {
  readonly role: Oil['role'];
  readonly source: Oil;
}

/** The review's oils as engine oil models (data-sheet values converted to SI). */
export function oilModelsOf(oils: readonly Oil[]): ReviewOil[] {
  return oils.map((o, i) => {
    const field = `oils[${i}]`;
    const model = cachedOilModel(
      {
        kv40: centistokes(o.kv40_mm2s),
        kv100: centistokes(o.kv100_mm2s),
        density15: o.density15_kgm3 as KilogramsPerCubicMetre,
        baseOil: o.baseOil,
        ...(o.viscosityIndex !== undefined ? { viscosityIndex: o.viscosityIndex } : {}),
        ...(o.pressureViscosity_1perGPa !== undefined ? { pressureViscosity: perGigapascal(o.pressureViscosity_1perGPa) } : {}),
      },
      field,
    );
    return { name: o.name, field, model, baseOil: o.baseOil, chemistry: o.chemistry, fzgFailureStage: o.fzgFailureStage, micropittingFailureStage: o.micropittingFailureStage ?? null, role: o.role, source: o };
  });
}

export function oilSummaries(oils: readonly ReviewOil[]): OilSummary[] {
  return oils.map((o) => ({
    name: o.name,
    role: o.role,
    viscosityIndex: o.model.viscosityIndex.value,
    viscosityIndexSource: o.model.viscosityIndex.source,
    isoVG: o.model.isoVG,
    lubricantFactorXL: o.model.lubricantFactor,
    chemistry: o.chemistry,
    baseOil: o.baseOil,
    fzgFailureStage: o.fzgFailureStage,
    pressureViscositySource: o.model.pressureViscositySource,
    warnings: o.model.warnings,
  }));
}
