// Reading and placing values at key paths of a raw specification.

export function valueAt(root: unknown, path: readonly (string | number)[]): unknown {
  let node = root;
  for (const step of path) {
    if (typeof node !== 'object' || node === null) return undefined;
    node = (node as Record<string | number, unknown>)[step];
  }
  return node;
}

/** Set a value, making the objects and arrays on the way; a number step makes an array. */
export function setAt(root: Record<string, unknown>, path: readonly (string | number)[], value: unknown): void {
  let node: Record<string | number, unknown> = root;
  path.forEach((step, i) => {
    if (i === path.length - 1) {
      node[step] = value;
      return;
    }
    node[step] ??= typeof path[i + 1] === 'number' ? [] : {};
    node = node[step] as Record<string | number, unknown>;
  });
}

/** A default or value as a planner would type it in one cell. */
export function cellText(value: unknown): string {
  if (Array.isArray(value)) return value.map(cellText).join('; ');
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  return typeof value === 'object' && value !== null ? JSON.stringify(value) : String(value);
}

/** A blank specification: only the keys that allow one value (the version), filled. */
export function blankSpec(sections: readonly { path: string[]; fields: readonly { path: string[]; required: boolean; enum?: readonly unknown[] }[] }[]): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const s of sections) {
    for (const f of s.fields) if (f.required && f.enum?.length === 1 && s.path.length === 0) setAt(out, f.path, f.enum[0]);
  }
  return out;
}
