/** Plain-JSON path writes for the audit (undo, a change applied alone). Pure. */

type Json = unknown;
export type JsonPath = readonly (string | number)[];

/** A copy of `root` with `value` at `path`; `undefined` removes an object's key. */
export function setIn(root: Json, path: JsonPath, value: Json): Json {
  if (path.length === 0) return value;
  const [head, ...rest] = path as [string | number, ...(string | number)[]];
  const node = root as Record<string | number, Json>;
  const child = setIn(node[head], rest, value);
  if (Array.isArray(node)) return node.map((x, i) => (i === head ? child : x));
  const copy: Record<string, Json> = { ...node };
  if (child === undefined) delete copy[head];
  else copy[head] = child;
  return copy;
}

/** The value at `path`; undefined where the path does not exist. */
export function getIn(root: Json, path: JsonPath): Json {
  let cur = root;
  for (const k of path) cur = cur !== null && typeof cur === 'object' ? (cur as Record<string | number, Json>)[k] : undefined;
  return cur;
}
