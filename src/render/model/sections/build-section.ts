import type { CheckResult } from '../../../core/result/check-result.ts';
import { FIRST_DRAWING, drawingsOf } from '../../report-drawings.ts';
import type { Section } from '../document.ts';
import { drawingFigure } from '../figure-blocks.ts';
import { paragraph } from '../runs.ts';
import { section } from '../section-titles.ts';

/** The build in one drawing: the side elevation. */
export function buildSection(result: CheckResult): Section {
  const first = drawingsOf(result).filter((d) => d.id === FIRST_DRAWING);
  return section('build', first.length ? first.map(drawingFigure) : [paragraph('No side elevation could be drawn for this build.')]);
}
