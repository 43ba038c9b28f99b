/** `gearPair.pinion.teeth`, `loadCases[1].oilTemperature_C`; `(file)` for the whole file. */
export function formatPath(path: ReadonlyArray<PropertyKey>): string {
  let out = '';
  for (const p of path) {
    if (typeof p === 'number') out += `[${p}]`;
    else out += out ? `.${String(p)}` : String(p);
  }
  return out || '(file)';
}
