import type { Run } from '../model/document.ts';
import { escapeBlock, escapeInline, inlineCode } from './markdown-escape.ts';

/** A severity as Markdown writes it: the word, in capitals, in bold. */
export function severityMark(severity: string): string {
  return `**${severity.toUpperCase()}**`;
}

function runMd(r: Run, first: boolean): string {
  switch (r.kind) {
    case 'text':
      // Only text that begins a block can start a list or a heading by accident.
      return first ? escapeBlock(r.text) : escapeInline(r.text);
    case 'strong':
      return `**${escapeInline(r.text)}**`;
    case 'code':
      return inlineCode(r.text);
    case 'source':
      return escapeInline(r.label ?? r.id);
    case 'severity':
      return severityMark(r.severity);
  }
}

/** Runs as one line of Markdown; `atBlockStart` where the line begins a paragraph or list item. */
export function runsMd(runs: readonly Run[], atBlockStart: boolean): string {
  // escapeInline trims, so the spaces between runs are kept here.
  return runs
    .map((r, i) => {
      const text = runMd(r, atBlockStart && i === 0);
      if (r.kind !== 'text') return text;
      if (r.text.trim() === '') return ' ';
      const lead = i > 0 && /^\s/.test(r.text) ? ' ' : '';
      const trail = i < runs.length - 1 && /\s$/.test(r.text) ? ' ' : '';
      return `${lead}${text}${trail}`;
    })
    .join('');
}
