import type { CheckResult } from '../../core/result/check-result.ts';
import { headlineCaution } from '../result-cautions.ts';
import type { ReportDocument } from './document.ts';
import { decisiveSection } from './sections/decisive-section.ts';
import { cautionsSection } from './sections/cautions-section.ts';
import { cutListSection, leatherSection } from './sections/cut-list-section.ts';
import { drawingsSection, plotsSection } from './sections/drawings-section.ts';
import { figuresSection } from './sections/figures-section.ts';
import { findingsSection, notesSection, workingSection } from './sections/findings-section.ts';
import { loadsSection } from './sections/loads-section.ts';
import { massBalanceSection } from './sections/mass-balance-section.ts';
import { rideSection } from './sections/ride-section.ts';
import { settingOutSection } from './sections/setting-out-section.ts';
import { sourcesSection } from './sections/sources-section.ts';
import { specSection } from './sections/spec-section.ts';
import { stockPlanSection } from './sections/stock-plan-section.ts';
import { verdictSection } from './sections/verdict-section.ts';

/**
 * The check report as a document: verdict and cautions first, the side
 * elevation, the findings and their working, then the evidence. Pure; a
 * result without cautions is refused here, so no output can leave them out.
 */
export function reportDocument(result: CheckResult): ReportDocument {
  return {
    title: `Design-rule check: ${result.spec_name}`,
    sections: [
      verdictSection(result),
      ...[decisiveSection(result)].filter((s) => s !== null),
      cautionsSection(result),
      findingsSection(result),
      workingSection(result),
      notesSection(result),
      figuresSection(result),
      ...drawingsSection(result),
      ...plotsSection(result),
      massBalanceSection(result),
      loadsSection(result),
      ...rideSection(result),
      cutListSection(result),
      leatherSection(result),
      settingOutSection(result),
      stockPlanSection(result),
      specSection(result),
      sourcesSection(result),
    ],
    closing: headlineCaution(result),
  };
}
