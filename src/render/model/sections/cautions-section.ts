import type { CheckResult } from '../../../core/result/check-result.ts';
import { requireCautions } from '../../result-cautions.ts';
import type { Section } from '../document.ts';
import { section } from '../section-titles.ts';

/** Every caution the core gave; a result without them is refused, so no output can leave them out. */
export function cautionsSection(result: CheckResult): Section {
  return section('cautions', [{ kind: 'cautions', items: requireCautions(result) }]);
}
