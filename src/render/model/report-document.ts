import type { CheckResult } from '../../core/result/check-result.ts';
import { headlineCaution } from '../result-cautions.ts';
import type { ReportDocument } from './document.ts';
import { decisiveSection } from './sections/decisive-section.ts';
import { cutListBasisSection, cutListSection, leatherSection } from './sections/cut-list-section.ts';
import { drawingsSection, plotsSection } from './sections/drawings-section.ts';
import { figuresSection } from './sections/figures-section.ts';
import { findingsSection, notesSection, workingSection } from './sections/findings-section.ts';
import { loadsSection } from './sections/loads-section.ts';
import { loadWorkingSection, massBalanceSection } from './sections/mass-balance-section.ts';
import { rideSection, ridePlotsSection } from './sections/ride-section.ts';
import { settingOutSection } from './sections/setting-out-section.ts';
import { sourcesSection } from './sections/sources-section.ts';
import { specSection } from './sections/spec-section.ts';
import { stockPlanSection } from './sections/stock-plan-section.ts';
import { summarySections } from './summary-document.ts';

/**
 * The check report as a document in three parts: the feasibility summary
 * (verdict, cautions and the side elevation first); the body (every finding
 * by rule family, the figures, drawings, balance, ride, cut list and stock
 * plan); and the appendix of rarely read material (the working of every
 * check, the notes, the load tables, the spec as checked, the sources). Pure;
 * a result without cautions is refused here, so no output can leave them out.
 */
export function reportDocument(result: CheckResult): ReportDocument {
  return {
    title: `Design-rule check: ${result.spec_name}`,
    sections: [
      ...summarySections(result),
      findingsSection(result),
      ...[decisiveSection(result)].filter((s) => s !== null),
      figuresSection(result),
      ...drawingsSection(result),
      ...plotsSection(result),
      massBalanceSection(result),
      ...rideSection(result),
      cutListSection(result),
      leatherSection(result),
      settingOutSection(result),
      stockPlanSection(result),
      workingSection(result),
      notesSection(result),
      loadWorkingSection(result),
      loadsSection(result),
      ...ridePlotsSection(result),
      cutListBasisSection(result),
      specSection(result),
      sourcesSection(result),
    ],
    closing: headlineCaution(result),
  };
}
