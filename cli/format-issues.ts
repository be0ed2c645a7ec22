import { pathText, type InputIssue } from '../src/core/spec/input-issue.ts';
import type { Located, Locator } from '../src/core/input/read-spec-result.ts';
import { MESSAGES } from '../src/core/diagnostics/messages.ts';
import { echo, escapeControls } from '../src/core/diagnostics/echo.ts';

/** Problems listed in full; a file with more (a sheet of stray rows) gets a count of the rest. */
const MAX_LISTED = 50;

/** Input problems as text: key path, line and column, message, code; at most MAX_LISTED of them. */
export function formatIssues(file: string, issues: (InputIssue & { at?: Located })[], locate?: Locator): string {
  const lines = issues.slice(0, MAX_LISTED).map((i) => {
    const at = i.at ?? (i.path.length ? placeOf(i, locate) : undefined);
    const where = at?.cell !== undefined ? echo(at.cell) : at ? `line ${at.line}, column ${at.column}` : '';
    // A key path can hold a key the input made up: each key is echoed like a value.
    const path = i.path.map((k) => (typeof k === 'string' ? echo(k) : k));
    const label = [i.path.length ? pathText(path) : '', where ? `(${where})` : ''].filter(Boolean).join(' ');
    return `  ${label ? `${label}: ` : ''}${i.message} [${i.code}]`;
  });
  const n = issues.length;
  if (n > MAX_LISTED) lines.push(`  ... and ${n - MAX_LISTED} more; correct these first.`);
  return `axletree: ${escapeControls(file)} cannot be checked: ${n} problem${n === 1 ? '' : 's'}; nothing was written.\n${lines.join('\n')}\n`;
}

// A missing key is shown at the mapping that lacks it, an unknown key at
// itself; every other problem at its value.
function placeOf(i: InputIssue, locate?: Locator): Located | undefined {
  if (!locate) return undefined;
  // A workbook has a cell for every key, filled or not: point at the key's own cell.
  const own = locate(i.path);
  if (own?.cell) return own;
  if (i.code === MESSAGES.required.code) return i.path.length > 1 ? locate(i.path.slice(0, -1), true) : locate([]);
  if (i.code === MESSAGES.unknownKey.code) return locate(i.path, true);
  return locate(i.path);
}
