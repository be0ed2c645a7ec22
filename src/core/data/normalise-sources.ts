import type { RulesData } from './rules-data.ts';
import { sourcesText } from './source-text.ts';

/**
 * Where a file cites a source (`source: id` or `source: [ids]`), the loaded
 * data carries `sources` (the ids) and `source` (them as text), in place.
 * Every object in the tree is visited once.
 */
export function normaliseSources(tree: unknown, catalogue: RulesData['sources']): void {
  if (typeof tree !== 'object' || tree === null) return;
  for (const v of Object.values(tree)) normaliseSources(v, catalogue);
  const o = tree as { source?: unknown; sources?: string[]; note?: string };
  if (typeof o.source === 'string' || Array.isArray(o.source)) {
    const ids = typeof o.source === 'string' ? [o.source] : (o.source as string[]);
    o.sources = ids;
    o.source = sourcesText(catalogue, ids, o.note);
  }
}

/** Every source id cited anywhere in a tree, with the key path where it is cited. */
export function citedSources(tree: unknown, path: string[] = [], out: { id: string; path: string[] }[] = []): { id: string; path: string[] }[] {
  if (typeof tree !== 'object' || tree === null) return out;
  for (const [k, v] of Object.entries(tree)) {
    if (k === 'source' && (typeof v === 'string' || Array.isArray(v))) {
      for (const id of typeof v === 'string' ? [v] : v) out.push({ id: String(id), path: [...path, 'source'] });
    } else citedSources(v, [...path, k], out);
  }
  return out;
}
