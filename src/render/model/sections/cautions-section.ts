import type { CheckResult } from '../../../core/result/check-result.ts';
import { FIRST_DRAWING, drawingsOf } from '../../report-drawings.ts';
import { requireCautions } from '../../result-cautions.ts';
import type { Section } from '../document.ts';
import { drawingFigure } from '../figure-blocks.ts';
import { section } from '../section-titles.ts';

/** Every caution the core gave (a result without them is refused), then the side elevation on the first page. */
export function cautionsSection(result: CheckResult): Section {
  const first = drawingsOf(result).filter((d) => d.id === FIRST_DRAWING);
  return section('cautions', [{ kind: 'cautions', items: requireCautions(result) }, ...first.map(drawingFigure)]);
}
