import { formatNumber, formatQuantity } from '../../core/format/number-format.ts';
import { SHORT_CAUTION } from '../../core/cautions.ts';
import type { Edge } from '../../core/sweep/envelope.ts';
import type { PointCheck } from '../../core/sweep/point-outcome.ts';
import type { SweepResult } from '../../core/sweep/sweep-result.ts';
import type { Block, Cell, ReportDocument, Row, Section } from '../model/document.ts';
import { SWEEP_PLOT_FILE, sweepPlotTitle } from './sweep-plot.ts';

// The sweep's report as a document model: sweep.md and sweep.html are both
// written from it by the report's own renderers. The cautions first, then
// what was varied and how the points came out, the picture, the envelope and
// the robust ranges; every point is in sweep.csv and sweep.json.

const VERDICTS = ['pass', 'advice', 'warning', 'fail', 'error', 'refused'] as const;

const text = (t: string): Block => ({ kind: 'paragraph', runs: [{ kind: 'text', text: t }] });
const section = (id: string, title: string, blocks: Block[]): Section => ({ id, title, newPage: false, part: 'summary', blocks });
const q = (v: number, unit: string) => formatQuantity(v, unit);

/** What a point gives, in words: its verdict and the finding of highest utilisation, or why it was refused. */
export function outcomeWords(c: PointCheck): string {
  if (c.verdict === 'refused') return `the spec is refused: ${c.reason ?? ''}`;
  if (c.verdict === 'error') return `the check could not finish: ${c.reason ?? 'a rule could not run'}`;
  const worst = c.worst ? `; highest utilisation ${formatNumber(c.worst_utilisation)} (${c.worst.rule}, ${c.worst.subject})` : '';
  return `${c.verdict}${worst}`;
}

const edgeWords = (e: Edge | null, unit: string) => (e ? `${outcomeWords(e.beyond)} at ${q(e.fail, unit)}` : 'the end of the swept range: it may pass further on');

function variedTable(r: SweepResult): Block {
  return {
    kind: 'table',
    id: 'sweep-varied',
    columns: [
      { label: 'varied value', align: 'left' },
      { label: 'from', align: 'right' },
      { label: 'to', align: 'right' },
      { label: r.mode.kind === 'grid' ? 'values' : 'values on the envelope line', align: 'right' },
      { label: 'design point', align: 'right' },
    ],
    rows: r.varied.map((v) => ({
      cells: [
        { kind: 'text', text: v.path },
        { kind: 'number', value: v.from, unit: v.unit },
        { kind: 'number', value: v.to, unit: v.unit },
        { kind: 'number', value: v.count, unit: 'count' },
        { kind: 'number', value: v.design_value, unit: v.unit },
      ],
    })),
    empty: 'Nothing was varied.',
  };
}

function countsText(r: SweepResult): string {
  const counts = VERDICTS.map((v) => [v, r.points.filter((p) => p.verdict === v).length] as const).filter(([, n]) => n > 0);
  const how = r.mode.kind === 'grid' ? 'a grid' : `a Latin hypercube (seed ${r.mode.seed})`;
  return `${r.points.length} point(s) of ${how}, ${r.statics ? 'statics only (the ride model off)' : 'with the ride model'}: ${counts.map(([v, n]) => `${n} ${v}`).join(', ')}.`;
}

/** One row per interval of a varied value (its path first), or one row saying there is none. */
function intervalRows<I>(path: string, intervals: readonly I[], none: string, width: number, cells: (i: I) => Cell[]): Row[] {
  const name: Cell = { kind: 'text', text: path };
  if (intervals.length === 0) return [{ cells: [name, { kind: 'text', text: none }, ...Array.from({ length: width - 2 }, (): Cell => ({ kind: 'text', text: '' }))] }];
  return intervals.map((i) => ({ cells: [name, ...cells(i)] }));
}

function envelopeTable(r: SweepResult): Block {
  const rows = (r.envelope ?? []).flatMap((e) =>
    intervalRows(e.path, e.intervals, 'no value passes', 5, (i) => [
      { kind: 'number', value: i.low, unit: e.unit },
      { kind: 'number', value: i.high, unit: e.unit },
      { kind: 'text', text: edgeWords(i.low_edge, e.unit) },
      { kind: 'text', text: edgeWords(i.high_edge, e.unit) },
    ]),
  );
  return {
    kind: 'table',
    id: 'sweep-envelope',
    columns: [
      { label: 'varied value', align: 'left' },
      { label: 'passes from', align: 'right' },
      { label: 'to', align: 'right' },
      { label: 'below it', align: 'left' },
      { label: 'above it', align: 'left' },
    ],
    rows,
    empty: 'No envelope was found.',
  };
}

function robustTable(r: SweepResult): Block {
  const rows = (r.robust ?? []).flatMap((g) =>
    intervalRows(g.path, g.intervals, 'none: every value fails somewhere', 3, (i) => [
      { kind: 'number', value: i.low, unit: g.unit },
      { kind: 'number', value: i.high, unit: g.unit },
    ]),
  );
  return { kind: 'table', id: 'sweep-robust', columns: [{ label: 'varied value', align: 'left' }, { label: 'passes with any other from', align: 'right' }, { label: 'to', align: 'right' }], rows, empty: 'No robust range.' };
}

export function sweepDocument(r: SweepResult, plotCaption: string | null): ReportDocument {
  const design = r.design ? [text(`The design point (the spec as given): ${outcomeWords(r.design)}.`)] : [];
  const figures = r.figures.length ? [text(`Figures kept at each point: ${r.figures.map((f) => f.name).join(', ')}.`)] : [];
  const sections: Section[] = [
    section('cautions', 'Cautions', [{ kind: 'cautions', items: r.cautions }]),
    section('sweep', 'What was varied', [variedTable(r), text(countsText(r)), ...design, ...figures, ...r.notes.map(text)]),
  ];
  if (plotCaption !== null) sections.push(section('plot', 'The sweep', [{ kind: 'figure', id: 'sweep-plot', role: 'plot', title: sweepPlotTitle(r), caption: plotCaption, file: SWEEP_PLOT_FILE }]));
  if (r.envelope) {
    const res = r.envelope.map((e) => `${e.path} to ${q(e.resolution, e.unit)}`).join(', ');
    sections.push(
      section('envelope', 'Feasible envelope', [
        text(`For each varied value with the others held at the design point: the values that pass (a verdict short of fail). Each edge between a passing and a failing value was found by bisection on the whole check, ${res}; "below it" and "above it" say what the check gives just beyond.`),
        envelopeTable(r),
      ]),
    );
  }
  if (r.robust) sections.push(section('robust', 'Robust ranges', [text('For each varied value: its grid values at which every grid value of the others passes.'), robustTable(r)]));
  sections.push(section('files', 'Every point', [text('sweep.csv and sweep.json hold every point: its values, verdict, worst utilisation and the finding it is of, the chosen figures, and the reason a refused point was refused.')]));
  return {
    title: `Sweep of ${r.spec_name}`,
    lede: `${r.spec_file}: ${r.varied.map((v) => v.path).join(', ')} varied.`,
    sections,
    closing: SHORT_CAUTION,
  };
}
