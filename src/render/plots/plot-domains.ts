import type { PlotData } from '../../core/plots/plot-data.ts';
import { niceDomain, type Domain } from './chart-scale.ts';

// The ranges a line chart's axes cover: every value drawn, with a little room
// so that no line runs along the frame.

/** Room above and below the values on the y axis, as a fraction of their span. */
const Y_PAD = 0.05;
/** Room beside the data on the x axis where a vertical line could sit on the frame. */
const X_PAD = 0.03;

const extent = (vs: number[]): Domain | null => {
  const finite = vs.filter(Number.isFinite);
  return finite.length ? [finite.reduce((a, b) => Math.min(a, b)), finite.reduce((a, b) => Math.max(a, b))] : null;
};

/** Every value drawn, with room either side; from zero where all are at least zero, so no force axis goes negative. */
export function yDomain(plot: PlotData): Domain {
  const e = extent([...plot.lines.flatMap((l) => l.y), ...plot.rules.filter((r) => r.axis === 'y').map((r) => r.value)]);
  if (!e) return [0, 1];
  const [lo, hi] = e;
  const pad = Y_PAD * (hi - lo || Math.abs(hi) || 1);
  return [lo >= 0 ? Math.max(0, lo - pad) : lo - pad, hi + pad];
}

/** With vertical lines, a little room past the outermost so none hides on the frame; otherwise the data widened to whole ticks. */
export function xDomain(plot: PlotData, ticks: number): Domain {
  const rules = plot.rules.filter((r) => r.axis === 'x').map((r) => r.value);
  const e = extent([...plot.lines.flatMap((l) => l.x), ...rules]);
  if (!e) return [0, 1];
  if (rules.length === 0) return niceDomain(e, ticks);
  const pad = X_PAD * (e[1] - e[0] || 1);
  return [e[0] - pad, e[1] + pad];
}
