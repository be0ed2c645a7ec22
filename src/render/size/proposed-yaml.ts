import { parseDocument, stringify } from 'yaml';
import { sectionsAt, withSections } from '../../core/size/members.ts';
import type { SectionChange } from '../../core/size/size-member.ts';
import { formatQuantity } from '../../core/format/number-format.ts';
import { SHORT_CAUTION } from '../../core/cautions.ts';

// The specification with every proposed section written in, as YAML. From a
// YAML or JSON file the text is edited in place, so its comments and order
// stay; from a workbook the parsed input is written out. The input file
// itself is never written to.

const pathOf = (field: string) => field.split('.');

function header(changes: readonly SectionChange[]): string {
  const lines = changes.map((c) => `#   ${c.fields.map((f, i) => `${f}: ${formatQuantity(c.from[i], 'mm')} -> ${formatQuantity(c.to[i], 'mm')}`).join(', ')}`);
  return [`# ${SHORT_CAUTION}`, '# Sections proposed by axletree size, written in below (check this file before building from it):', ...lines, ''].join('\n');
}

export function proposedYaml(sourceText: string | null, raw: unknown, changes: readonly SectionChange[]): string {
  if (sourceText !== null) {
    const doc = parseDocument(sourceText);
    if (doc.errors.length === 0) {
      for (const c of changes) c.fields.forEach((f, i) => doc.setIn(pathOf(f), c.to[i]));
      return `${header(changes)}${doc.toString()}`;
    }
  }
  return `${header(changes)}${stringify(withSections(raw, sectionsAt(changes)))}`;
}
