import type { CheckResult } from '../../../core/result/check-result.ts';
import { FIRST_DRAWING, drawingsOf } from '../../report-drawings.ts';
import type { Section } from '../document.ts';
import { drawingFigure, plotFigure } from '../figure-blocks.ts';
import { section } from '../section-titles.ts';

/** The drawings after the first, under their own heading; none, no section. */
export function drawingsSection(result: CheckResult): Section[] {
  const rest = drawingsOf(result).filter((d) => d.id !== FIRST_DRAWING);
  return rest.length ? [section('drawings', rest.map(drawingFigure))] : [];
}

/** The balance and turn plots the core computed, each with its caption. */
export function plotsSection(result: CheckResult): Section[] {
  const plots = result.plots ?? [];
  return plots.length ? [section('plots', plots.map((p) => plotFigure(p)))] : [];
}
