import type { Severity } from '../../core/findings/finding.ts';
import type { Block, Run } from './document.ts';

// Short constructors for inline text and the simplest blocks.

export const plain = (text: string): Run => ({ kind: 'text', text });
export const strong = (text: string): Run => ({ kind: 'strong', text });
export const code = (text: string): Run => ({ kind: 'code', text });
export const sourceRef = (id: string, label?: string): Run => (label === undefined ? { kind: 'source', id } : { kind: 'source', id, label });
export const badge = (severity: Severity): Run => ({ kind: 'severity', severity });

/** A paragraph of runs, or of one plain text. */
export function paragraph(...runs: (Run | string)[]): Block {
  return { kind: 'paragraph', runs: runs.map((r) => (typeof r === 'string' ? plain(r) : r)) };
}

export function heading(level: 3 | 4, text: string): Block {
  return { kind: 'heading', level, text };
}

/** Working from lines of prose (steps with nothing computed). */
export function workingLines(lines: readonly string[]): Block {
  return { kind: 'working', steps: lines.map((formula) => ({ formula, substituted: '', result: null, unit: '' })) };
}
