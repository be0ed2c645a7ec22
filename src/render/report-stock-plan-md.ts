import type { CheckResult } from '../core/result/check-result.ts';
import type { StockPlan, StockPlanGroup } from '../core/cutlist/cutting-result.ts';
import { baselineText, BOUND_NOTE, boughtText, boundText, cutsText, gapText, minimisesText, sectionText } from './cutting-text.ts';
import { escapeInline as esc, fencedBlock, table } from './markdown-escape.ts';
import { formatNumber, UNIT_SPACE } from './number-format.ts';
import { STOCK_BARS_INFO } from './report-figures.ts';
import { SECTIONS } from './report-sections.ts';
import { textBars } from './stock-bar-text.ts';

/** The stock plan section: totals, one table of groups, then each group's patterns with bars. */
export function stockPlanSections(result: CheckResult): string[] {
  const plan = result.cutting.stock_plan;
  return [
    `## ${SECTIONS.stockPlan.title}`,
    totalsLine(plan),
    groupsTable(plan.groups),
    ...(plan.groups.length > 0 ? [BOUND_NOTE] : []),
    ...plan.groups.flatMap((g, i) => groupSection(g, i)),
    ...unservedSection(plan),
  ];
}

function totalsLine(plan: StockPlan): string {
  const cost = plan.cost === null ? 'no stock prices given, so the plan minimises the count of pieces' : `cost ${formatNumber(plan.cost, 'currency')} in the currency of the stock prices`;
  return `${plan.pieces} stock pieces to buy; ${cost}; waste ${formatNumber(plan.waste_pct, '%')}${UNIT_SPACE}% of the stock length.`;
}

function groupsTable(groups: readonly StockPlanGroup[]): string {
  if (groups.length === 0) return 'No parts are cut from listed stock.';
  const rows = groups.map((g, i) => {
    const p = g.plan;
    return [
      String(i + 1),
      esc(g.species),
      sectionText(g.section),
      esc(p.method),
      boughtText(p),
      String(p.pieces_used),
      p.cost === null ? 'no prices' : formatNumber(p.cost, 'currency'),
      minimisesText(p),
      boundText(p),
      gapText(p),
      p.optimal ? 'yes' : 'not proven',
      formatNumber(p.waste_pct, '%'),
      baselineText(p),
    ];
  });
  const header = ['Group', 'Species', 'Section (mm)', 'Method', 'Stock bought', 'Pieces', 'Cost', 'Minimises', 'LP bound', 'Gap', 'Optimal', 'Waste (%)', 'First-fit decreasing'];
  return table(header, rows, ['r', 'l', 'r', 'l', 'l', 'r', 'r', 'l', 'r', 'r', 'l', 'r', 'l']);
}

function groupSection(g: StockPlanGroup, i: number): string[] {
  const rows = g.plan.patterns.map((p, k) => [
    `${i + 1}.${k + 1}`,
    formatNumber(p.stock_length_mm, 'mm'),
    String(p.count),
    esc(cutsText(p)),
    formatNumber(p.offcut_mm, 'mm'),
  ]);
  return [
    `### Group ${i + 1}: ${esc(g.species)}, ${sectionText(g.section)} mm`,
    table(['Pattern', 'Stock length (mm)', 'Count', 'Cuts in order', 'Offcut (mm)'], rows, ['l', 'r', 'r', 'l', 'r']),
    fencedBlock(textBars(g, i + 1), `${STOCK_BARS_INFO} ${i}`),
  ];
}

function unservedSection(plan: StockPlan): string[] {
  if (plan.unserved.length === 0) return [];
  const rows = plan.unserved.map((u) => [esc(u.part), esc(u.reason), esc(u.buy)]);
  return ['### Parts no listed stock serves', table(['Part', 'Why', 'Buy instead'], rows)];
}
