// A plot as data: lines over a shared x axis, reference lines (limits,
// thresholds, positions) and marked points. The core computes these; the edge
// draws them as SVG (src/render/plots). result.json carries them, so any
// other program can draw the same figures.

export type LineStyle = 'solid' | 'dashed' | 'dots';

export interface PlotLine {
  label: string;
  x: readonly number[];
  y: readonly number[];
  style?: LineStyle;
}

/** What a reference line stands for: it sets its colour and dash. */
export type RuleKind = 'advisory' | 'hard' | 'threshold' | 'position';

/** A horizontal (axis y) or vertical (axis x) reference line across the plot. */
export interface PlotRule {
  label: string;
  axis: 'x' | 'y';
  value: number;
  kind: RuleKind;
}

export interface PlotData {
  /** Short name, also the file name stem (plot-<id>.svg). */
  id: string;
  title: string;
  caption: string;
  xLabel: string;
  yLabel: string;
  lines: PlotLine[];
  rules: PlotRule[];
}
