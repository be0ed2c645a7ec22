import type { CheckResult } from '../../core/result/check-result.ts';
import { headlineCaution } from '../result-cautions.ts';
import type { ReportDocument, Section } from './document.ts';
import { buildSection } from './sections/build-section.ts';
import { cautionsSection } from './sections/cautions-section.ts';
import { costsSection } from './sections/costs-section.ts';
import { decisiveBriefSection } from './sections/decisive-section.ts';
import { openQuestionsSection } from './sections/open-questions-section.ts';
import { utilisationSection } from './sections/utilisation-section.ts';
import { verdictSection } from './sections/verdict-section.ts';

/**
 * The feasibility summary, a reviewer's ten minutes on one or two printed
 * pages: the verdict and what each severity means, the cautions, the findings
 * nearest their limits, what decides the verdict, the questions the builder
 * must answer, the build in one drawing, and what it takes in timber and cost.
 */
export function summarySections(result: CheckResult): Section[] {
  return [
    verdictSection(result),
    cautionsSection(result),
    utilisationSection(result),
    decisiveBriefSection(result),
    openQuestionsSection(result),
    buildSection(result),
    costsSection(result),
  ];
}

/** The summary on its own (summary.html); a result without cautions is refused. */
export function summaryDocument(result: CheckResult): ReportDocument {
  return {
    title: `Feasibility summary: ${result.spec_name}`,
    lede: 'The design-rule check in brief. The report beside it (report.html) opens with this summary, then gives every finding, the cut list and the stock plan, and in its appendix the working of every check.',
    sections: summarySections(result),
    closing: headlineCaution(result),
  };
}
