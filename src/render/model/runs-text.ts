import type { Run } from './document.ts';

/** Runs as plain text, for outputs without inline marks (a workbook cell). */
export function runsText(runs: readonly Run[]): string {
  return runs.map((r) => (r.kind === 'severity' ? r.severity.toUpperCase() : r.kind === 'source' ? (r.label ?? r.id) : r.text)).join('');
}
