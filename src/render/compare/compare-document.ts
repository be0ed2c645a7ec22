import type { AccountLine } from '../../core/compare/account-line.ts';
import { lineText } from '../../core/compare/account-text.ts';
import type { CompareResult, PairAccount } from '../../core/compare/compare-result.ts';
import { SHORT_CAUTION } from '../../core/cautions.ts';
import type { CheckResult } from '../../core/result/check-result.ts';
import type { Block, ReportDocument, Section } from '../model/document.ts';
import { heading, paragraph, plain, strong } from '../model/runs.ts';
import { decisiveSection } from '../model/sections/decisive-section.ts';
import { comparedDrawingFile, type ComparedDrawings } from './compare-drawings.ts';
import { compareSection } from './compare-sections.ts';
import { accountTable, buildsTable, figuresTable, findingsTable, notApplicableTable, specDifferencesTable } from './compare-tables.ts';

/** What one change did, on its own: a line of the list under its finding. */
const LISTED: ReadonlySet<AccountLine['key']> = new Set(['effectLine', 'refused']);

/** One other build's account: its sentences, the single changes as a list under the finding they explain. */
function accountBlocks(a: PairAccount, many: boolean): Block[] {
  const blocks: Block[] = many ? [heading(3, `${a.other} against ${a.base}`)] : [];
  let items: Block & { kind: 'list' } = { kind: 'list', items: [] };
  a.lines.forEach((l, i) => {
    if (LISTED.has(l.key)) {
      if (items.items.length === 0) blocks.push(items);
      items.items.push([plain(lineText(l))]);
      return;
    }
    items = { kind: 'list', items: [] };
    blocks.push(i === 0 ? paragraph(strong(lineText(l))) : paragraph(lineText(l)));
  });
  return blocks;
}

function decisiveBlocks(c: CompareResult, results: readonly CheckResult[]): Block[] {
  return results.flatMap((r, i) => {
    const s = decisiveSection(r);
    const title = heading(3, `${c.builds[i].label}: ${r.spec_name}`);
    return [title, ...(s ? s.blocks : [paragraph('The search for decisive inputs was not run (compare --no-decisive).')])];
  });
}

function drawingBlocks(c: CompareResult, drawn: ComparedDrawings): Block[] {
  return drawn.builds[0].flatMap((d0) => [
    heading(3, `${d0.title}${drawn.scales[d0.id] ? `, every build at 1:${drawn.scales[d0.id]}` : ''}`),
    ...drawn.builds.flatMap((list, i) =>
      list
        .filter((d) => d.id === d0.id)
        .map((d): Block => ({ kind: 'figure', id: `${c.builds[i].label}-${d.id}`, role: 'drawing', title: `${c.builds[i].label}: ${c.builds[i].spec_name}`, caption: d.caption, file: comparedDrawingFile(c.builds[i].label, d.id), svg: d.svg })),
    ),
  ]);
}

/** The comparison as a document: why the verdicts differ first, then the figures, findings, decisive inputs and drawings side by side. */
export function compareDocument(c: CompareResult, results: readonly CheckResult[], drawn: ComparedDrawings): ReportDocument {
  if (c.cautions.length === 0) throw new Error('the comparison carries no cautions; refusing to render it');
  const sections: Section[] = [
    compareSection('why', [...c.accounts.flatMap((a) => accountBlocks(a, c.accounts.length > 1)), accountTable(c)]),
    compareSection('cautions', [{ kind: 'cautions', items: c.cautions }]),
    compareSection('builds', [buildsTable(c)]),
    compareSection('figures', [
      paragraph(`Every figure of each build; the differences and ratios are against the baseline, ${c.builds[0].label}. A figure a build does not have is named below with the reason.`),
      figuresTable(c),
      notApplicableTable(c),
    ]),
    compareSection('findings', [
      paragraph('Findings are matched by rule and subject. First those every build has, at different severities; then those some builds do not have.'),
      findingsTable('compare-findings-differing', c, c.findings_differing, 'No finding differs in severity between the builds.'),
      findingsTable('compare-findings-not-in-all', c, c.findings_not_in_all, 'Every build has the same findings.'),
    ]),
    compareSection('decisive', decisiveBlocks(c, results)),
    compareSection('drawings', drawingBlocks(c, drawn)),
    compareSection('specs', [specDifferencesTable(c, c.spec_differences)]),
  ];
  return {
    title: `Comparison: ${c.builds.map((b) => `${b.label} ${b.spec_name}`).join(' / ')}`,
    lede: `The same checks on each build, side by side; ${c.builds[0].label} is the baseline. Each build's own report comes from axletree check.`,
    sections,
    closing: SHORT_CAUTION,
  };
}
