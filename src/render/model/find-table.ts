import type { ReportDocument, Section, TableBlock } from './document.ts';

/** The tables of a section, or of the whole document, in order. */
export function tablesOf(from: ReportDocument | Section): TableBlock[] {
  const sections = 'sections' in from ? from.sections : [from];
  return sections.flatMap((s) => s.blocks.filter((b): b is TableBlock => b.kind === 'table'));
}

/** The table of this id; a renderer asking for one the model does not hold is a fault. */
export function tableById(doc: ReportDocument, id: string): TableBlock {
  const table = tablesOf(doc).find((t) => t.id === id);
  if (!table) throw new Error(`the report has no table "${id}"`);
  return table;
}

/** The section of this id, if the report has it (the ride section only where the model ran). */
export function sectionById(doc: ReportDocument, id: string): Section | undefined {
  return doc.sections.find((s) => s.id === id);
}
