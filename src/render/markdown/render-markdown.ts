import type { Block, FigureBlock, ReportDocument, Section } from '../model/document.ts';
import { stepLine } from '../model/cell-text.ts';
import { findingParts } from '../model/finding-parts.ts';
import { PART_TITLES, sectionsByPart } from '../model/parts.ts';
import { escapeBlock, escapeInline, fencedBlock } from './markdown-escape.ts';
import { runsMd, severityMark } from './markdown-runs.ts';
import { tableMd } from './markdown-table.ts';

// The report model as Markdown. Every text from the user or the core is
// escaped, so it shows literally here and in any viewer; figures are linked as
// the files written beside the report, or given as text where they have none.

function figureMd(f: FigureBlock): string[] {
  const caption = f.caption ? [`*${escapeBlock(f.caption)}*`] : [];
  if (f.file) return [`![${escapeInline(f.title)}](${f.file})`, ...caption];
  return [...(f.text ? [fencedBlock(f.text)] : []), ...caption];
}

function blockMd(b: Block): string[] {
  switch (b.kind) {
    case 'heading':
      return [`${'#'.repeat(b.level)} ${escapeInline(b.text)}`];
    case 'paragraph':
      return [runsMd(b.runs, true)];
    case 'list':
      return [b.items.map((runs) => `- ${runsMd(runs, true)}`).join('\n')];
    case 'cautions':
      return [b.items.map((c) => `- ${escapeBlock(c)}`).join('\n')];
    case 'table':
      return b.only === 'sheet' ? [] : [tableMd(b)];
    case 'figure':
      return figureMd(b);
    case 'working':
      return [fencedBlock(b.steps.map(stepLine).join('\n'))];
    case 'finding': {
      const { title, body } = findingParts(b);
      return [`### ${runsMd(title, false)}`, ...body.flatMap(blockMd)];
    }
  }
}

function sectionMd(s: Section): string[] {
  const heading = s.title ? [`## ${escapeInline(s.title)}${s.badge ? ` ${severityMark(s.badge)}` : ''}`] : [];
  return [...heading, ...s.blocks.flatMap(blockMd)];
}

/** The sections part by part, each part after the first under its own top-level title. */
function partsMd(doc: ReportDocument): string[] {
  return sectionsByPart(doc.sections).flatMap(({ part, sections }, i) => {
    const title = PART_TITLES[part];
    return [...(i > 0 && title ? [`# ${escapeInline(title)}`] : []), ...sections.flatMap(sectionMd)];
  });
}

/** The document as Markdown: title, what it is, the parts in order, the closing line under a rule. */
export function renderMarkdown(doc: ReportDocument): string {
  const lede = doc.lede ? [`*${escapeInline(doc.lede)}*`] : [];
  const blocks = [`# ${escapeInline(doc.title)}`, ...lede, ...partsMd(doc), ...(doc.closing ? ['---', `*${escapeInline(doc.closing)}*`] : [])];
  return `${blocks.join('\n\n')}\n`;
}
