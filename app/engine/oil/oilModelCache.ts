import { makeOilModel, type OilData, type OilModel } from './oilModel';

/** How many oil models the cache keeps (the most recently used). A review holds at most 10 oils and the grade finder a dozen grades per oil. */
export const OIL_MODEL_CACHE_SIZE = 256;

const cache = new Map<string, OilModel>();

/**
 * makeOilModel, kept for the same data sheet and field: a recompute after an edit that leaves an
 * oil alone reuses its model (the Walther fit, the VI by ASTM D2270, α) and, with it, what is kept
 * per model (the micropitting test gear's λGF). A model is immutable once made, so sharing it
 * cannot change a result. An oil the model rejects is not kept: it throws again on the next call.
 */
export function cachedOilModel(data: OilData, field: string): OilModel {
  const key = `${field}|${data.kv40}|${data.kv100}|${data.density15}|${data.baseOil}|${data.viscosityIndex ?? ''}|${data.pressureViscosity ?? ''}`;
  const known = cache.get(key);
  if (known) {
    cache.delete(key); // most recently used last
    cache.set(key, known);
    return known;
  }
  const model = makeOilModel(data, field);
  Object.freeze(model.warnings);
  cache.set(key, model);
  if (cache.size > OIL_MODEL_CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  return model;
}
