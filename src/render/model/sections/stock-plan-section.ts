import { formatNumber, formatQuantity } from '../../../core/format/number-format.ts';
import type { StockPlan, StockPlanGroup } from '../../../core/cutlist/cutting-result.ts';
import type { CheckResult } from '../../../core/result/check-result.ts';
import { baselineText, BOUND_NOTE, boughtText, cutsText, minimisesText, sectionText } from '../../cutting-text.ts';
import { stockBarSvg } from '../../stock-bar-svg.ts';
import { textBars } from '../../stock-bar-text.ts';
import { partLabels } from '../../stock-bar.ts';
import type { Block, FigureBlock, Section, TableBlock } from '../document.ts';
import { blank, dimsCell, left, numberCell, percentCell, right, row, textCell } from '../cells.ts';
import { heading, paragraph } from '../runs.ts';
import { section } from '../section-titles.ts';

const NO_PRICES = 'no prices';

function totalsLine(plan: StockPlan): string {
  const cost = plan.cost === null ? 'no stock prices given, so the plan minimises the count of pieces' : `cost ${formatNumber(plan.cost, 'currency')} in the currency of the stock prices`;
  return `${formatNumber(plan.pieces, 'count')} stock pieces to buy; ${cost}; waste ${formatQuantity(plan.waste_pct, '%')} of the stock length.`;
}

function groupsTable(plan: StockPlan): TableBlock {
  const rows = plan.groups.map((g, i) => {
    const p = g.plan;
    return row([
      numberCell(i + 1, 'count'), textCell(g.species), dimsCell([g.section.width_mm, g.section.thickness_mm], 'mm'), textCell(p.method), textCell(boughtText(p)),
      numberCell(p.pieces_used, 'count'), numberCell(p.cost, 'currency', { none: NO_PRICES }), textCell(minimisesText(p)), numberCell(p.lower_bound, 'currency'),
      percentCell(p.gap), textCell(p.optimal ? 'yes' : 'not proven'), numberCell(p.waste_pct, '%'), textCell(baselineText(p)),
    ]);
  });
  if (plan.groups.length > 0) {
    rows.push(row([textCell('All groups'), blank, blank, blank, blank, numberCell(plan.pieces, 'count'), numberCell(plan.cost, 'currency', { none: NO_PRICES }), blank, blank, blank, blank, numberCell(plan.waste_pct, '%'), blank], { total: true }));
  }
  const columns = [
    right('Group', { unit: 'count' }), left('Species'), right('Section', { unit: 'mm', parts: ['W', 'T'] }), left('Method'), left('Stock bought'),
    right('Pieces', { unit: 'count' }), right('Cost', { unit: 'currency' }), left('Minimises'), right('LP bound', { unit: 'currency' }),
    right('Gap'), left('Optimal'), right('Waste', { unit: '%' }), left('First-fit decreasing'),
  ];
  return { kind: 'table', id: 'stock-groups', columns, rows, empty: 'No parts are cut from listed stock.' };
}

function patternsTable(g: StockPlanGroup, i: number): TableBlock {
  const rows = g.plan.patterns.map((p, k) =>
    row([textCell(`${i + 1}.${k + 1}`), numberCell(p.stock_length_mm, 'mm'), numberCell(p.count, 'count'), textCell(cutsText(p)), numberCell(p.offcut_mm, 'mm')]),
  );
  const columns = [left('Pattern'), right('Stock length', { unit: 'mm' }), right('Count', { unit: 'count' }), left('Cuts in order'), right('Offcut', { unit: 'mm' })];
  return { kind: 'table', id: `stock-patterns-${i}`, columns, rows, empty: 'No patterns.' };
}

/** Each pattern as a bar: SVG in HTML, a line of letters in plain text. */
function barsFigure(g: StockPlanGroup, i: number, labels: readonly string[]): FigureBlock {
  const longest = Math.max(...g.plan.patterns.map((p) => p.stock_length_mm));
  const strips = g.plan.patterns.map((p, k) => {
    const caption = `${i + 1}.${k + 1}: ${formatNumber(p.stock_length_mm, 'mm')} mm x ${formatNumber(p.count, 'count')}`;
    return { caption, svg: stockBarSvg(p, longest, labels, caption) };
  });
  return { kind: 'figure', id: `stock-bars-${i + 1}`, role: 'stock-bars', title: `Group ${i + 1}, stock bars`, caption: '', strips, text: textBars(g, i + 1) };
}

function groupBlocks(g: StockPlanGroup, i: number, labels: readonly string[]): Block[] {
  return [heading(3, `Group ${i + 1}: ${g.species}, ${sectionText(g.section)} mm`), patternsTable(g, i), barsFigure(g, i, labels)];
}

function unservedBlocks(plan: StockPlan): Block[] {
  if (plan.unserved.length === 0) return [];
  const rows = plan.unserved.map((u) => row([textCell(u.part), textCell(u.reason), textCell(u.buy)]));
  const table: TableBlock = { kind: 'table', id: 'stock-unserved', columns: [left('Part'), left('Why no listed stock serves it'), left('Buy instead')], rows, empty: '' };
  return [heading(3, 'Parts no listed stock serves'), table];
}

/** The totals, one table of groups, then each group's patterns with their bars, then what no stock serves. */
export function stockPlanSection(result: CheckResult): Section {
  const plan = result.cutting.stock_plan;
  const labels = partLabels(plan);
  return section('stockPlan', [
    paragraph(totalsLine(plan)),
    groupsTable(plan),
    ...(plan.groups.length > 0 ? [paragraph(BOUND_NOTE)] : []),
    ...plan.groups.flatMap((g, i) => groupBlocks(g, i, labels)),
    ...unservedBlocks(plan),
  ]);
}
