import type { CheckResult } from '../../core/result/check-result.ts';
import { headlineCaution } from '../result-cautions.ts';
import type { Block, ReportDocument } from './document.ts';
import type { NumberedFinding } from './findings-table.ts';
import { numberedFindings } from './numbered-findings.ts';
import { familyId, familyOf } from './rule-families.ts';
import { cautionsSection } from './sections/cautions-section.ts';
import { code, heading, paragraph, plain, strong, workingLines } from './runs.ts';
import { section } from './section-titles.ts';
import { LESSONS } from './teach-words.ts';

/** How many steps of a finding's working the lesson shows: enough to see the method, not the whole sum. */
const STEPS_SHOWN = 4;

/** Where in the design basis a family is set out: the catalogue's "section N, ..." where the result cites it. */
function basisLine(result: CheckResult, basis: string | undefined): Block {
  const entry = basis === undefined ? undefined : result.sources.find((s) => s.id === basis);
  const where = entry?.where ? `, ${entry.where}` : '';
  return paragraph(strong('Read more:'), ' ', code('docs/design-basis.md'), plain(`${where}.`));
}

/** One family's lesson: its words, its formula, and the first finding of the family in this build, with its first steps. */
function lessonBlocks(result: CheckResult, family: string, { ref, finding }: NumberedFinding): Block[] {
  const f = familyOf(finding.rule);
  const lesson = LESSONS[family];
  const steps = finding.working.slice(0, STEPS_SHOWN);
  const rest = finding.working.length - steps.length;
  return [
    heading(3, `${f.title} (${family})`),
    ...(lesson ? [paragraph(lesson.words), workingLines(lesson.formula)] : [paragraph('No lesson is written for this family yet; its rules are documented under docs/rules/.')]),
    paragraph(strong('In this build:'), ` finding ${ref}, ${finding.rule} on ${finding.subject_label}: ${finding.message}`),
    ...(steps.length ? [{ kind: 'working' as const, steps }] : []),
    ...(rest > 0 ? [paragraph(`and ${rest === 1 ? 'one step more' : `${rest} steps more`}, in the report's appendix under finding ${ref}.`)] : []),
    basisLine(result, f.basis),
  ];
}

/**
 * The teaching view: each rule family this build was checked by, in plain
 * words with its formula, and a worked line from the build's own findings
 * (the first of the family, as numbered in the report). The cautions stand
 * first, as in every output.
 */
export function teachDocument(result: CheckResult): ReportDocument {
  const { graded, notes } = numberedFindings(result.findings);
  const all = [...graded, ...notes];
  const families = [...new Set(all.map((n) => familyId(n.finding.rule)))];
  const blocks = families.flatMap((family) => lessonBlocks(result, family, all.find((n) => familyId(n.finding.rule) === family)!));
  return {
    title: `How the checks work: ${result.spec_name}`,
    lede: 'For apprentices: what each family of rules asks, the formula it uses, and the first finding of the family in this build worked through its first steps. Finding numbers are those of the report.',
    sections: [
      cautionsSection(result),
      section('teach', [paragraph('A finding compares a value with a limit; its utilisation is the value over the limit (for a least limit, the limit over the value), so a part is within the limit while the utilisation is at most one hundred per cent.'), ...blocks]),
    ],
    closing: headlineCaution(result),
  };
}
