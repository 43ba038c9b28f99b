import { formatPath } from '../../app/review/parse';

/** A path into the review, as zod reports it: keys and array indexes. */
export type FieldPath = readonly (string | number)[];

/** The dotted form used by parse issues and engine errors, e.g. `loadCases[1].oilTemperature_C`. */
export const pathKey = (path: FieldPath): string => formatPath(path);

/** Read a value at `path`; undefined where the path does not exist. */
export function getIn(root: unknown, path: FieldPath): unknown {
  let cur: unknown = root;
  for (const key of path) {
    if (cur === null || typeof cur !== 'object') return undefined;
    cur = (cur as Record<string | number, unknown>)[key];
  }
  return cur;
}

/**
 * A copy of `root` with `value` at `path`; the objects along the path are copied, the rest is
 * shared. `undefined` removes the key (an optional field left empty).
 */
export function setIn<T>(root: T, path: FieldPath, value: unknown): T {
  if (path.length === 0) return value as T;
  const [head, ...rest] = path as [string | number, ...(string | number)[]];
  const node = (root ?? (typeof head === 'number' ? [] : {})) as Record<string | number, unknown> | unknown[];
  const child = setIn((node as Record<string | number, unknown>)[head], rest, value);
  if (Array.isArray(node)) {
    const copy = node.slice();
    copy[head as number] = child;
    return copy as T;
  }
  const copy: Record<string | number, unknown> = { ...node };
  if (child === undefined) delete copy[head];
  else copy[head] = child;
  return copy as T;
}
