// A specification with one value set (or taken out), the rest shared with the
// original: only the objects on the path are copied.

type Step = string | number;

export const pathSteps = (path: string): Step[] => path.split('.').map((s) => (/^\d+$/.test(s) ? Number(s) : s));

/** A copy of root with `value` at the dotted path; null takes the value out (a list item is removed, a key deleted). */
export function withValue<T>(root: T, path: string, value: unknown): T {
  return setAt(root, pathSteps(path), value);
}

function setAt<T>(node: T, steps: readonly Step[], value: unknown): T {
  const [head, ...rest] = steps;
  if (Array.isArray(node)) {
    const copy = [...(node as unknown[])];
    const i = head as number;
    if (rest.length === 0 && value === null) copy.splice(i, 1);
    else copy[i] = rest.length === 0 ? value : setAt(copy[i] ?? {}, rest, value);
    return copy as T;
  }
  const copy = { ...(node as Record<string, unknown>) };
  if (rest.length === 0 && value === null) delete copy[head];
  else copy[head] = rest.length === 0 ? value : setAt(copy[head] ?? (typeof rest[0] === 'number' ? [] : {}), rest, value);
  return copy as T;
}
