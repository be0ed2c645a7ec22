import { settingOutSvg } from '../src/render/report-figures.ts';
import { beforeAll, describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import type { CheckResult } from '../src/core/result/check-result.ts';
import type { LpSolver } from '../src/core/stock/cutting-types.ts';
import { loadLpSolver } from '../src/node/load-lp-solver.ts';
import { renderWorkbook } from '../src/render/workbook.ts';
import { htmlOf, markdownOf } from './support/report-outputs.ts';
import { drawReportPlots } from '../src/render/report-plots.ts';
import { DRAWING_SCOPE, scopeClass } from '../src/render/inline-svg.ts';
import { readDemo, rulesData } from './support/fixtures.ts';

const DEMOS = ['demo-two-crew', 'demo-rear-axle', 'teaching-flawed'];
const CUTTING_FIGURES = ['timber_volume', 'stock_pieces', 'stock_cost', 'stock_waste_pct'];

function check(name: string, lp?: LpSolver): CheckResult {
  const p = prepareSpec(readDemo(name), rulesData);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return runCheck(p.spec, p.entries, rulesData, { lp: lp });
}

const sum = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0);

/** The cutting figures agree with the cut list and the stock plan they summarise. */
function expectFiguresAgree(r: CheckResult): void {
  const { cut_list, stock_plan } = r.cutting;
  for (const name of CUTTING_FIGURES) expect(Number.isFinite(r.figures[name]?.value), name).toBe(true);
  expect(r.figures.timber_volume).toEqual({ value: sum(cut_list.map((c) => c.volume_m3 * (c.quantity + c.spares))), unit: 'm³' });
  expect(r.figures.timber_volume.value).toBeGreaterThan(0);
  const groups = stock_plan.groups.map((g) => g.plan);
  expect(r.figures.stock_pieces.value).toBe(sum(groups.map((p) => p.pieces_used)));
  expect(r.figures.stock_pieces.value).toBe(sum(groups.flatMap((p) => p.bought.map((b) => b.count))));
  expect(r.figures.stock_cost.value).toBeCloseTo(sum(groups.map((p) => p.cost ?? 0)), 9);
  expect(r.figures.stock_waste_pct.value).toBeGreaterThanOrEqual(0);
  expect(r.figures.stock_waste_pct.value).toBeLessThan(100);
}

describe('cutting figures of the demo specifications', () => {
  let lp: LpSolver;
  beforeAll(async () => {
    lp = await loadLpSolver();
  });

  it.each(DEMOS)('%s: without the solver, every group is planned by first-fit decreasing and the figures agree', (name) => {
    const r = check(name);
    expectFiguresAgree(r);
    for (const g of r.cutting.stock_plan.groups) {
      expect(g.plan.method).toBe('first-fit decreasing');
      expect(g.plan.pieces_used).toBe(g.plan.baseline.pieces_used);
    }
  });

  it.each(DEMOS)('%s: with the solver, no group is worse than first-fit decreasing and none beats its bound', (name) => {
    const r = check(name, lp);
    expectFiguresAgree(r);
    for (const g of r.cutting.stock_plan.groups) {
      const objective = g.plan.cost ?? g.plan.pieces_used;
      const baseline = g.plan.baseline.cost ?? g.plan.baseline.pieces_used;
      expect(objective).toBeLessThanOrEqual(baseline + 1e-9);
      expect(objective).toBeGreaterThanOrEqual(g.plan.lower_bound - 1e-6);
    }
  });

  it('the demo with listed stock cuts its parts from it and saves stock with the solver', () => {
    const plain = check('demo-two-crew');
    const solved = check('demo-two-crew', lp);
    expect(solved.cutting.stock_plan.groups.length).toBeGreaterThan(0);
    expect(solved.figures.stock_cost.value).toBeLessThanOrEqual(plain.figures.stock_cost.value);
    // The cut list does not depend on how the stock is planned.
    expect(solved.cutting.cut_list).toEqual(plain.cutting.cut_list);
    expect(solved.figures.timber_volume).toEqual(plain.figures.timber_volume);
  });

  it.each(DEMOS)('%s: the workbook and the report carry the cut list, setting-out and stock plan', async (name) => {
    const r = check(name, lp);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await renderWorkbook(r)) as unknown as ExcelJS.Buffer);
    const parts: unknown[] = [];
    wb.getWorksheet('Cut list')!.eachRow((row) => parts.push(row.getCell(1).value));
    for (const c of r.cutting.cut_list) expect(parts).toContain(c.part);
    let shoulders: unknown;
    wb.getWorksheet('Wheel setting-out')!.eachRow((row) => {
      if (row.getCell(1).value === 'Spoke length between shoulders') shoulders = row.getCell(2).value;
    });
    expect(shoulders).toBe(r.cutting.setting_out.spoke_length_shoulders_mm);
    expect(wb.getWorksheet('Stock plan')).toBeDefined();

    const md = markdownOf(r);
    for (const h of ['## Cut list', '## Leather and rawhide', '## Wheel setting-out', '## Stock plan']) expect(md, h).toContain(`\n${h}\n`);
    const html = htmlOf(r, drawReportPlots(r));
    expect(html).toContain(`<figure class="setting-out"><svg class="${scopeClass(settingOutSvg(r))}`);
    // Each drawing's style rules reach only that drawing, so the stock bars and the plots keep their paint.
    for (const [, scope, css] of html.matchAll(/<svg class="([^" ]+)[^>]*>(?:(?!<\/svg>)[\s\S])*?<style>([\s\S]*?)<\/style>/g)) {
      expect(scope.startsWith(`${DRAWING_SCOPE}-`)).toBe(true);
      for (const rule of css.split('}').filter((x) => x.trim())) {
        for (const selector of rule.split('{')[0].split(',')) expect(selector.trim().startsWith(`.${scope} `), selector).toBe(true);
      }
    }
    expect(html.match(/<svg [^>]*class="axletree-drawing-[0-9a-z]+ stock-bar"/g)?.length ?? 0).toBe(sum(r.cutting.stock_plan.groups.map((g) => g.plan.patterns.length)));
  });
});
