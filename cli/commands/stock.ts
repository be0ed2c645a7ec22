import { resolve } from 'node:path';
import { writeFileSet } from '../../src/node/write-file-set.ts';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import { readSpec } from '../../src/node/read-spec.ts';
import { baselineText, boughtText, BOUND_NOTE, cutsText, gapText } from '../../src/render/cutting-text.ts';
import { formatNumber } from '../../src/core/format/number-format.ts';
import { MESSAGES } from '../../src/core/diagnostics/messages.ts';
import { issue } from '../../src/core/spec/input-issue.ts';
import { checkCuttingInstance } from '../../src/core/stock/check-instance.ts';
import { CuttingInputError } from '../../src/core/stock/cutting-problem.ts';
import type { CuttingPlan } from '../../src/core/stock/cutting-types.ts';
import { planCutting } from '../../src/core/stock/plan-cutting.ts';
import { StockShortfallError } from '../../src/core/stock/stock-shortfall.ts';
import type { Console } from '../console.ts';
import { EXIT } from '../exit-codes.ts';
import { formatIssues } from '../format-issues.ts';
import { writeOrRefuse } from '../write-or-refuse.ts';
import { STOCK_FILES } from '../declarations/stock-files.ts';

export interface StockOptions {
  /** Also write the plan here, as JSON and as text. */
  out?: string;
  json: boolean;
}

/** `axletree stock <instance.json> [--out DIR] [--json]`: the stock plan of one plain cutting instance. */
export async function stockCommand(file: string, opts: StockOptions, con: Console): Promise<number> {
  const input = resolve(con.cwd, file);
  const read = await readSpec(input, { workbooks: false });
  if (!read.ok) {
    // The reader's empty-file message speaks of specifications.
    const issues = read.issues.map((i) => (i.code === MESSAGES.fileEmpty.code ? issue([], 'stockInstanceEmpty', { path: file }) : i));
    con.err(formatIssues(file, issues));
    return EXIT.badInput;
  }
  const checked = checkCuttingInstance(read.raw);
  if (!checked.ok) {
    con.err(formatIssues(file, checked.issues, read.locate));
    return EXIT.badInput;
  }
  let plan: CuttingPlan;
  try {
    plan = planCutting(checked.instance, await loadLpSolver());
  } catch (e) {
    // Shortages the instance checks cannot see come back from the planner.
    if (e instanceof StockShortfallError) {
      con.err(formatIssues(file, [issue(['stock'], 'stockShortPlan', { reason: e.message })], read.locate));
      return EXIT.badInput;
    }
    if (e instanceof CuttingInputError) {
      con.err(formatIssues(file, [{ path: e.path, code: MESSAGES.stockShortPlan.code, message: e.message }], read.locate));
      return EXIT.badInput;
    }
    throw e;
  }
  const json = JSON.stringify(plan, null, 2) + '\n';
  const table = planTable(plan);
  let written: string[] = [];
  if (opts.out !== undefined) {
    const files: [string, string][] = [[STOCK_FILES.json, json], [STOCK_FILES.text, table]];
    const dir = resolve(con.cwd, opts.out);
    const paths = await writeOrRefuse(() => writeFileSet(dir, files, input), con);
    if (paths === null) return EXIT.badInput;
    written = paths;
  }
  const where = written.length ? ['written:', ...written.map((w) => `  ${w}`)].join('\n') + '\n' : '';
  // Standard output holds the plan alone; with --json, where the files went is said on standard error.
  if (opts.json) {
    con.out(json);
    if (where) con.err(where);
  } else {
    con.out(table + where);
  }
  return EXIT.ok;
}

/** The LP bound rounded up to a whole step, and how far the plan is above it (none where no LP was solved). */
function roundedText(plan: CuttingPlan): string {
  if (plan.lp_bound === null || plan.lp_gap === null) return '';
  return ` (rounded up ${formatNumber(plan.lp_bound, 'currency')}; the plan ${formatNumber(plan.lp_gap, 'currency')} above it)`;
}

function planTable(plan: CuttingPlan): string {
  const rows = plan.patterns.map((p) => [String(p.count), formatNumber(p.stock_length_mm, 'mm'), formatNumber(p.offcut_mm, 'mm'), cutsText(p)]);
  const head = ['count', 'stock mm', 'offcut mm', 'cuts, in cutting order'];
  const width = head.map((h, c) => Math.max(h.length, ...rows.map((r) => r[c].length)));
  const line = (r: string[]) => r.map((v, c) => (c === r.length - 1 ? v : v.padStart(width[c]))).join('  ');
  const cost = plan.cost === null ? '' : `, cost ${formatNumber(plan.cost, 'currency')}`;
  return [
    `stock plan: ${plan.pieces_used} stock piece${plan.pieces_used === 1 ? '' : 's'}${cost}; ${plan.optimal ? 'optimal' : 'not proven optimal'}`,
    `buy: ${boughtText(plan)}`,
    `LP lower bound ${formatNumber(plan.lower_bound, 'currency')}${roundedText(plan)}, gap ${gapText(plan)}; waste ${formatNumber(plan.waste_mm, 'mm')} mm (${formatNumber(plan.waste_pct, '%')} %, kerfs and offcuts)`,
    `method: ${plan.method}; first-fit decreasing alone: ${baselineText(plan)}`,
    '',
    line(head),
    ...rows.map(line),
    '',
    BOUND_NOTE,
  ].join('\n') + '\n';
}
