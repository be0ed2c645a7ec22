import type { CitedSource } from '../core/sources.ts';
import { citationText } from '../core/data/source-text.ts';
import type { CheckResult } from '../core/result/check-result.ts';
import type { SpecEntry } from '../core/spec/spec-entry.ts';
import type { LoadCaseResult } from '../core/model/load-case-result.ts';
import type { PartMass } from '../core/model/part-mass.ts';
import type { Finding } from '../core/findings/finding.ts';
import { countBySeverity, findingsWorstFirst, SEVERITIES_WORST_FIRST } from './severity-order.ts';
import { severityMark } from './severity-mark.ts';
import { escapeBlock, escapeInline as esc, fencedBlock, table } from './markdown-escape.ts';
import { formatNumber, formatPercent, UNIT_SPACE } from './number-format.ts';
import { specValueText } from './spec-value.ts';
import { headlineCaution, requireCautions } from './result-cautions.ts';
import { SECTIONS, VERDICT_PREFIX } from './report-sections.ts';
import { cutListSections } from './report-cutting-md.ts';
import { stockPlanSections } from './report-stock-plan-md.ts';
import { rideSections } from './report-ride-md.ts';
import { drawingSections, firstDrawingBlocks } from './report-drawings.ts';
import { plotSections } from './report-plots.ts';

/** The check report as Markdown: verdict and cautions first, then the evidence. */
export function renderMarkdown(result: CheckResult): string {
  const ordered = findingsWorstFirst(result.findings);
  const blocks = [
    `# Design-rule check: ${esc(result.spec_name)}`,
    `## ${VERDICT_PREFIX}${severityMark(result.verdict)}`,
    countsLine(result.findings),
    `Checked by ${esc(`${result.tool.name} ${result.tool.version}`)}.`,
    `## ${SECTIONS.cautions.title}`,
    requireCautions(result).map((c) => `- ${escapeBlock(c)}`).join('\n'),
    ...firstDrawingBlocks(result),
    `## ${SECTIONS.findings.title}`,
    findingsTable(ordered),
    `## ${SECTIONS.working.title}`,
    ...workingSections(ordered),
    `## ${SECTIONS.figures.title}`,
    figuresTable(result),
    ...drawingSections(result),
    ...plotSections(result),
    `## ${SECTIONS.massBalance.title}`,
    '### Parts',
    partsTable(result),
    '### Load cases',
    loadCasesTable(result.balance.cases),
    ...result.balance.cases.flatMap(loadCaseWorking),
    '## Loads',
    loadsTable(result),
    ...rideSections(result),
    ...cutListSections(result),
    ...stockPlanSections(result),
    `## ${SECTIONS.spec.title}`,
    specTable(result.spec_as_checked),
    `## ${SECTIONS.sources.title}`,
    sourcesList(result.sources),
    '---',
    `*${esc(headlineCaution(result))}*`,
  ];
  return `${blocks.join('\n\n')}\n`;
}

function countsLine(findings: readonly Finding[]): string {
  const counts = countBySeverity(findings);
  const parts = SEVERITIES_WORST_FIRST.map((s) => `${counts[s]} ${s}`);
  return `${findings.length} findings: ${parts.join(', ')}.`;
}

function withUnit(value: number | null, unit: string): string {
  const text = formatNumber(value, unit);
  return value === null || unit === '' ? text : `${text}${UNIT_SPACE}${esc(unit)}`;
}

function findingsTable(ordered: readonly Finding[]): string {
  if (ordered.length === 0) return 'No findings.';
  const rows = ordered.map((f, i) => [
    String(i + 1),
    severityMark(f.severity),
    esc(f.rule),
    String(f.code),
    esc(f.subject),
    withUnit(f.value, f.unit),
    withUnit(f.limit, f.unit),
    formatPercent(f.utilisation),
    esc(f.message),
  ]);
  const header = ['#', 'Severity', 'Rule', 'Code', 'Subject', 'Value', 'Limit', 'Utilisation', 'Message'];
  return table(header, rows, ['r', 'l', 'l', 'r', 'l', 'r', 'r', 'r', 'l']);
}

/** One section per finding that is not a pass; numbered as in the findings table. */
function workingSections(ordered: readonly Finding[]): string[] {
  const flagged = ordered.map((f, i) => ({ f, n: i + 1 })).filter(({ f }) => f.severity !== 'pass');
  if (flagged.length === 0) return ['Every finding is a pass.'];
  return flagged.flatMap(({ f, n }) => [
    `### ${n}. ${severityMark(f.severity)} ${esc(f.rule)}: ${esc(f.subject)}`,
    escapeBlock(f.message),
    `**Fix:** ${esc(f.fix)}`,
    `**Sources:** ${esc(f.sources.join(', ') || 'none cited')}`,
    fencedBlock(f.working_text),
  ]);
}

function figuresTable(result: CheckResult): string {
  const rows = Object.entries(result.figures).map(([name, fig]) => [
    esc(name),
    formatNumber(fig.value, fig.unit),
    esc(fig.unit),
  ]);
  if (rows.length === 0) return 'No figures.';
  return table(['Figure', 'Value', 'Unit'], rows, ['l', 'r', 'l']);
}

function loadsTable(result: CheckResult): string {
  if (result.loads.length === 0) return 'No loads.';
  const rows = result.loads.map((l) => [esc(l.group), esc(l.item), esc(l.case), esc(l.quantity), formatNumber(l.value, l.unit)]);
  return table(['Model', 'Part', 'Load case', 'Quantity', 'Value'], rows, ['l', 'l', 'l', 'l', 'r']);
}

function partsTable(result: CheckResult): string {
  const { parts, rolling_mass_kg, yoke_mass_kg, total_mass_kg } = result.mass;
  const rows = parts.map((p: PartMass) => [
    esc(p.part),
    p.group,
    formatNumber(p.mass_kg, 'kg'),
    formatNumber(p.x_mm, 'mm'),
    formatNumber(p.y_mm, 'mm'),
    formatNumber(p.z_mm, 'mm'),
    p.measured ? 'measured' : 'computed',
    esc(p.basis),
  ]);
  const total = (label: string, kg: number) => [`**${label}**`, '', `**${formatNumber(kg, 'kg')}**`, '', '', '', '', ''];
  rows.push(
    total('Rolling assembly', rolling_mass_kg),
    total('Yoke', yoke_mass_kg),
    total('Total', total_mass_kg),
  );
  const header = ['Part', 'Group', 'Mass (kg)', 'x (mm)', 'y (mm)', 'z (mm)', 'Measured/computed', 'Basis'];
  return table(header, rows, ['l', 'l', 'r', 'r', 'r', 'r', 'l', 'l']);
}

function loadCasesTable(cases: readonly LoadCaseResult[]): string {
  if (cases.length === 0) return 'No load cases.';
  const rows = cases.map((c) => [
    esc(c.id),
    esc(c.title),
    c.crew_position,
    formatNumber(c.accel_g, 'g'),
    formatNumber(c.pole_load_N, 'N'),
    formatNumber(c.yoke_load_N, 'N'),
    formatNumber(c.per_horse_N, 'N'),
    formatNumber(c.axle_load_N, 'N'),
  ]);
  const header = ['Id', 'Load case', 'Crew', 'Accel (g)', 'Pole (N)', 'Yoke (N)', 'Per horse (N)', 'Axle (N)'];
  return table(header, rows, ['l', 'l', 'l', 'r', 'r', 'r', 'r', 'r']);
}

function loadCaseWorking(c: LoadCaseResult): string[] {
  return [`#### Load case ${esc(c.id)}: ${esc(c.title)}`, fencedBlock(c.working)];
}

function specTable(entries: readonly SpecEntry[]): string {
  if (entries.length === 0) return 'No entries.';
  const rows = entries.map((e) => [
    esc(e.path),
    esc(specValueText(e.value)),
    esc(e.unit),
    e.defaulted ? '*default*' : '',
    esc(e.note ?? ''),
  ]);
  return table(['Path', 'Value', 'Unit', 'Default', 'Note'], rows);
}

function sourcesList(sources: readonly CitedSource[]): string {
  if (sources.length === 0) return 'No sources cited.';
  return sources.map((s) => `- **${esc(s.id)}**: ${escapeBlock(citationText(s))} (${esc(s.kind)})${s.note ? `. ${escapeBlock(s.note)}` : ''}`).join('\n');
}
