import type { LoadCaseResult } from '../../../core/model/load-case-result.ts';
import type { CheckResult } from '../../../core/result/check-result.ts';
import type { Block, Section, TableBlock } from '../document.ts';
import { blank, left, numberCell, right, row, textCell } from '../cells.ts';
import { heading, workingLines } from '../runs.ts';
import { section } from '../section-titles.ts';

function partsTable(result: CheckResult): TableBlock {
  const { parts, rolling_mass_kg, yoke_mass_kg, total_mass_kg } = result.mass;
  const rows = parts.map((p) =>
    row([textCell(p.part), textCell(p.group), numberCell(p.mass_kg, 'kg'), numberCell(p.x_mm, 'mm'), numberCell(p.y_mm, 'mm'), numberCell(p.z_mm, 'mm'), textCell(p.measured ? 'measured' : 'computed'), textCell(p.basis)]),
  );
  const totals: [string, string, number][] = [
    ['Total, rolling assembly', 'rolling', rolling_mass_kg],
    ['Total, yoke', 'yoke', yoke_mass_kg],
    ['Total', '', total_mass_kg],
  ];
  for (const [label, group, kg] of totals) rows.push(row([textCell(label), textCell(group), numberCell(kg, 'kg'), blank, blank, blank, blank, blank], { total: true }));
  const columns = [
    left('Part'), left('Group'), right('Mass', { unit: 'kg' }), right('x', { unit: 'mm' }), right('y', { unit: 'mm' }), right('z', { unit: 'mm' }), left('Measured or computed'), left('Basis'),
  ];
  return { kind: 'table', id: 'parts', columns, rows, empty: '' };
}

function loadCasesTable(cases: readonly LoadCaseResult[]): TableBlock {
  const rows = cases.map((c) =>
    row([
      textCell(c.id), textCell(c.title), textCell(c.crew_position), numberCell(c.accel_g, 'g'),
      numberCell(c.pole_load_N, 'N'), numberCell(c.yoke_load_N, 'N'), numberCell(c.per_horse_N, 'N'), numberCell(c.axle_load_N, 'N'), textCell(c.working),
    ]),
  );
  const columns = [
    left('Id'), left('Load case'), left('Crew'), right('Accel', { unit: 'g' }), right('Pole load', { unit: 'N' }), right('Yoke load', { unit: 'N' }),
    right('Per horse', { unit: 'N' }), right('Axle load', { unit: 'N' }), left('Working', { only: 'sheet' }),
  ];
  return { kind: 'table', id: 'load-cases', columns, rows, empty: 'No load cases.' };
}

function loadCaseWorking(c: LoadCaseResult): Block[] {
  return [heading(4, `Load case ${c.id}: ${c.title}`), workingLines(c.working.split('\n'))];
}

/** The parts with their masses and totals, and the load cases; their working is in the appendix. */
export function massBalanceSection(result: CheckResult): Section {
  return section('massBalance', [heading(3, 'Parts'), partsTable(result), heading(3, 'Load cases'), loadCasesTable(result.balance.cases)]);
}

/** Each load case's working, step by step. */
export function loadWorkingSection(result: CheckResult): Section {
  return section('loadWorking', result.balance.cases.flatMap(loadCaseWorking));
}
