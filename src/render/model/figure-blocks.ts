import type { PlotData } from '../../core/plots/plot-data.ts';
import type { CheckResult } from '../../core/result/check-result.ts';
import type { Drawing } from '../drawings/drawing.ts';
import { plotFile } from '../plots/plot-svg.ts';
import { drawingFile } from '../report-drawings.ts';
import { SETTING_OUT_SVG_FILE, settingOutSvg } from '../report-figures.ts';
import type { FigureBlock } from './document.ts';

// The figures of the report: each names the file beside report.md that holds
// it; the drawings carry their SVG, the plots are drawn later, by file name.

export function drawingFigure(d: Drawing): FigureBlock {
  return { kind: 'figure', id: d.id, role: 'drawing', title: d.title, caption: d.caption, file: drawingFile(d.id), svg: d.svg };
}

/** A plot by the file it is drawn to: plot-<id>.svg unless named (the ride plots are ride-<case>-<kind>.svg). */
export function plotFigure(p: Pick<PlotData, 'id' | 'title' | 'caption'>, file = plotFile(p)): FigureBlock {
  return { kind: 'figure', id: p.id, role: 'plot', title: p.title, caption: p.caption, file };
}

export function settingOutFigure(result: CheckResult): FigureBlock {
  return {
    kind: 'figure',
    id: 'wheel-setting-out',
    role: 'setting-out',
    title: 'Wheel setting-out drawing',
    caption: '',
    file: SETTING_OUT_SVG_FILE,
    svg: settingOutSvg(result),
  };
}
