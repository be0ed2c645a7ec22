// One value of the specification held as plain data, by its key path
// (`['crew', 0, 'mass_kg']`), as the form's fields edit it.
import { setAt, valueAt } from '../core/input/spec-values.ts';
import type { KeyPath } from '../core/spec/input-issue.ts';

export { valueAt as getAt };

/** Sets the value; undefined leaves the key out, so its default holds. */
export function putAt(root: Record<string, unknown>, path: KeyPath, value: unknown): void {
  if (value !== undefined) return setAt(root, path, value);
  const parent = valueAt(root, path.slice(0, -1));
  if (typeof parent === 'object' && parent !== null && !Array.isArray(parent)) delete (parent as Record<string, unknown>)[path[path.length - 1]];
}

/** The id of the control that edits a path: `f-crew.0.mass_kg`. */
export const controlId = (path: KeyPath): string => `f-${path.join('.')}`;
