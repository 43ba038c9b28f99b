import type { PathSeries, Results } from '../../app/review/results';

/**
 * The buffers of every case's path columns (and every mesh's, for a planetary stage), each once:
 * the worker hands them to the page instead of having them copied. Columns of one load case share
 * the mechanics' arrays, hence the set. Only arrays made for these results are listed; nothing the
 * engine keeps between recomputes lives in a path, so moving them detaches nothing it needs.
 */
export function pathBuffers(results: Results): ArrayBuffer[] {
  const out = new Set<ArrayBuffer>();
  const add = (p: PathSeries) => {
    for (const v of Object.values(p)) if (ArrayBuffer.isView(v)) out.add(v.buffer as ArrayBuffer);
    for (const group of [p.film, p.heat]) if (group) for (const v of Object.values(group)) if (ArrayBuffer.isView(v)) out.add(v.buffer as ArrayBuffer);
  };
  for (const c of results.cases) add(c.path);
  for (const m of results.meshes ?? []) for (const c of m.cases) add(c.path);
  return [...out];
}
