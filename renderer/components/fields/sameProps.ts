/**
 * Props equality for the memoised inputs: shallow, except that arrays (a path, a list of options)
 * compare by their elements, since the panels build them afresh on every render, and callbacks
 * are taken as equal. That holds because every callback a panel gives an input depends only on
 * the input's other props (its path, its option) and the sheet's dispatch, which never changes:
 * with the other props equal, the callback the input holds does the same as the new one.
 */
export function sameFieldProps<P extends object>(a: P, b: P): boolean {
  const ka = Object.keys(a) as (keyof P)[];
  if (ka.length !== Object.keys(b).length) return false;
  return ka.every((k) => Object.prototype.hasOwnProperty.call(b, k) && sameValue(a[k], b[k]));
}

function sameValue(a: unknown, b: unknown): boolean {
  if (Object.is(a, b)) return true;
  if (typeof a === 'function' && typeof b === 'function') return true;
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((x, i) => sameValue(x, b[i]));
  return false;
}
