import { pathText, type InputIssue, type KeyPath } from '../src/spec/input-issue.ts';
import type { Located } from '../io/read-spec.ts';

/** Input problems as text: key path, line and column, message, code. */
export function formatIssues(file: string, issues: (InputIssue & { at?: Located })[], locate?: (p: KeyPath) => Located | undefined): string {
  const lines = issues.map((i) => {
    const at = i.at ?? (i.path.length ? locate?.(i.path) : undefined);
    const where = [i.path.length ? pathText(i.path) : '', at ? `(line ${at.line}, column ${at.column})` : ''].filter(Boolean).join(' ');
    return `  ${where ? `${where}: ` : ''}${i.message} [${i.code}]`;
  });
  const n = issues.length;
  return `axletree: ${file} cannot be checked: ${n} problem${n === 1 ? '' : 's'}; nothing was written.\n${lines.join('\n')}\n`;
}
