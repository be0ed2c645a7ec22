import type { Severity } from '../../core/findings/finding.ts';
import type { Run } from '../model/document.ts';
import { anchorId, escapeHtml } from './html-escape.ts';

/** Prefix of the ids the Sources table gives its rows, so a finding's source ids link to them. */
export const SOURCE_ANCHOR = 'source';

/** A severity as a badge that keeps its word, coloured by the style sheet. */
export function badgeHtml(s: Severity): string {
  return `<strong class="badge badge-${s}">${s.toUpperCase()}</strong>`;
}

function runHtml(r: Run): string {
  switch (r.kind) {
    case 'text':
      return escapeHtml(r.text);
    case 'strong':
      return `<strong>${escapeHtml(r.text)}</strong>`;
    case 'code':
      return `<code>${escapeHtml(r.text)}</code>`;
    case 'source':
      return `<a href="#${anchorId(SOURCE_ANCHOR, r.id)}">${escapeHtml(r.label ?? r.id)}</a>`;
    case 'severity':
      return badgeHtml(r.severity);
  }
}

export function runsHtml(runs: readonly Run[]): string {
  return runs.map(runHtml).join('');
}
