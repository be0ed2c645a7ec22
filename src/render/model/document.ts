// The report as a document model: what it says, in order, with numbers kept
// as numbers and their units. Built once from a check result; the Markdown,
// HTML and workbook renderers each write it out, so they cannot disagree.

import type { Severity, WorkingStep } from '../../core/findings/finding.ts';

/** A piece of inline text. `source` names a catalogue entry by id; `severity` is a badge with its word. */
export type Run =
  | { kind: 'text'; text: string }
  | { kind: 'strong'; text: string }
  | { kind: 'code'; text: string }
  /** `label` is what the reader sees for it (a short number in a dense table); the id by default. */
  | { kind: 'source'; id: string; label?: string }
  | { kind: 'severity'; severity: Severity };

/** One table cell. Numbers stay raw with their unit; renderers format them (text) or keep them (cells). */
export type Cell =
  /** `runs`, where given, is the same text with marks and source links (text = its plain text); HTML writes the runs. */
  | { kind: 'text'; text: string; mark?: 'strong' | 'em'; runs?: Run[] }
  /** `none` is said where the value is null; `sig` asks the formatter for more significant figures. */
  | { kind: 'number'; value: number | null; unit: string; none?: string; sig?: number }
  /** A fraction, written as a percentage. */
  | { kind: 'percent'; value: number | null }
  /** Several lengths of one thing, written "L x W x T"; a workbook gives each its own column. */
  | { kind: 'dims'; values: number[]; unit: string }
  | { kind: 'severity'; severity: Severity };

export interface Column {
  label: string;
  align: 'left' | 'right';
  /** The unit every number in the column is in, named in the header; the cells then show bare numbers. */
  unit?: string;
  /** Names of the parts of a dims column ("L", "W", "T"). */
  parts?: string[];
  /** The cells' own units stand in a column of their own, so the numbers are shown bare. */
  bare?: true;
  /** Shown only in the workbook, which has room for it; the text outputs show it elsewhere or not at all. */
  only?: 'sheet';
}

export interface Row {
  cells: Cell[];
  /** A total or summary row, set in bold. */
  total?: true;
  /** A row set apart as less weighty (a default the user did not give). */
  muted?: true;
  /** An id other text links to (a source's id). */
  anchor?: string;
  /** The row opens a group of rows (a rule family): HTML sets this title on a line of its own above it. */
  group?: string;
}

export interface TableBlock {
  kind: 'table';
  /** Stable name the workbook picks the table by. */
  id: string;
  columns: Column[];
  rows: Row[];
  /** Said instead of an empty table. */
  empty: string;
  /** Written only in the workbook, which picks it by id: the text outputs give its rows in another table of their own. */
  only?: 'sheet';
}

export type FigureRole = 'drawing' | 'plot' | 'setting-out' | 'stock-bars';

export interface FigureBlock {
  kind: 'figure';
  id: string;
  role: FigureRole;
  title: string;
  caption: string;
  /** The file beside report.md that holds the figure: Markdown links it, HTML inlines the SVG drawn for it. */
  file?: string;
  /** The SVG, where the model holds it (drawings, the setting-out). */
  svg?: string;
  /** Small SVGs with their own captions, one a row (stock bars). */
  strips?: { caption: string; svg: string }[];
  /** The figure as plain text, for outputs without pictures. */
  text?: string;
}

/** A finding as a reader audits it: what, how bad, what to do, on what sources, by what working. */
export interface FindingBlock {
  kind: 'finding';
  /** Its number in the findings or notes table. */
  ref: string;
  severity: Severity;
  rule: string;
  subject_label: string;
  message: string;
  fix: string;
  sources: string[];
  steps: WorkingStep[];
}

export type Block =
  | { kind: 'heading'; level: 3 | 4; text: string }
  | { kind: 'paragraph'; runs: Run[] }
  | { kind: 'list'; items: Run[][] }
  | TableBlock
  | FigureBlock
  | FindingBlock
  | { kind: 'working'; steps: WorkingStep[] }
  | { kind: 'cautions'; items: string[] };

export interface Section {
  id: string;
  title: string;
  /** A severity badge after the title (the verdict). */
  badge?: Severity;
  /** A big section that starts a new printed page. */
  newPage: boolean;
  /** Where the section stands: in the summary a reviewer reads first, or in the appendix of rarely read material; else in the body. */
  part?: 'summary' | 'appendix';
  blocks: Block[];
}

export interface ReportDocument {
  title: string;
  /** A line under the title saying what the document is and how it is laid out. */
  lede?: string;
  sections: Section[];
  /** The last line, under a rule: the one-line caution. */
  closing?: string;
}
