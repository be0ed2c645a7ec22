import type { Block, Section } from '../model/document.ts';

/** The comparison's sections: titles, and where each stands (the first page, the body, the appendix). */
export const COMPARE_SECTIONS = {
  why: { title: 'Why the verdicts differ', part: 'summary' },
  cautions: { title: 'Cautions', part: 'summary' },
  builds: { title: 'The builds', part: 'summary' },
  figures: { title: 'Figures side by side', part: 'body' },
  findings: { title: 'Findings that differ', part: 'body' },
  decisive: { title: 'Decisive inputs of each build', part: 'body' },
  drawings: { title: 'Drawings at one scale', part: 'body' },
  specs: { title: 'Values that differ between the specifications', part: 'appendix' },
} as const satisfies Record<string, { title: string; part: 'summary' | 'body' | 'appendix' }>;

export type CompareSectionId = keyof typeof COMPARE_SECTIONS;

export function compareSection(id: CompareSectionId, blocks: Block[]): Section {
  const { title, part } = COMPARE_SECTIONS[id];
  return { id, title, newPage: false, ...(part === 'body' ? {} : { part }), blocks };
}
