import type { Section } from './document.ts';

export type PartId = 'summary' | 'body' | 'appendix';

/** The titles the body and the appendix open under; the summary opens the document under its title. */
export const PART_TITLES: Record<PartId, string | null> = {
  summary: null,
  body: 'The check in detail',
  appendix: 'Appendix: the working and the evidence',
};

export const partOf = (s: Section): PartId => s.part ?? 'body';

/** The sections in runs of one part each, in order (a part that comes back opens again). */
export function sectionsByPart(sections: readonly Section[]): { part: PartId; sections: Section[] }[] {
  const runs: { part: PartId; sections: Section[] }[] = [];
  for (const s of sections) {
    const last = runs.at(-1);
    if (last && last.part === partOf(s)) last.sections.push(s);
    else runs.push({ part: partOf(s), sections: [s] });
  }
  return runs;
}

/** The document without its appendix: what a reviewer prints and reads. */
export function withoutAppendix(sections: readonly Section[]): Section[] {
  return sections.filter((s) => partOf(s) !== 'appendix');
}
