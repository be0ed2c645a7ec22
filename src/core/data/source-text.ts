import type { RulesData, SourceEntry } from './rules-data.ts';

/** One source as a reader would look it up: the citation and where in it. */
export function citationText(e: SourceEntry): string {
  return e.where ? `${e.citation}, ${e.where}` : e.citation;
}

/** A source as it reads beside a value: "from memory", "common practice", or its citation. */
function shortText(e: SourceEntry): string {
  if (e.kind === 'from-memory') return 'from memory';
  if (e.kind === 'common-practice') return 'common practice';
  return citationText(e);
}

/** Sources and a note as one line: "from memory: a margin for ...". */
export function sourcesText(catalogue: RulesData['sources'], ids: readonly string[], note?: string): string {
  const cited = ids.map((id) => (Object.hasOwn(catalogue, id) ? shortText(catalogue[id]) : id)).join('; ');
  return note ? `${cited}: ${note}` : cited;
}
