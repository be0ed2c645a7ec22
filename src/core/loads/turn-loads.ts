import type { ModelView } from '../pipeline/define-model.ts';
import type { LoadEntry } from './load-entry.ts';

export function turnLoads(a: ModelView<'turn'>): LoadEntry[] {
  const t = a.turn;
  if (!t.steady) return [];
  const entry = (item: string, quantity: string, value: number, unit = 'N'): LoadEntry => ({ group: 'turn', item, case: 'design turn', quantity, value, unit });
  return [
    entry('outer wheel', 'vertical force', t.outerWheel),
    entry('inner wheel', 'vertical force', t.innerWheel),
    entry('outer wheel', 'lateral ground force', t.outerLateral),
    entry('inner wheel', 'lateral ground force', t.innerLateral),
    entry('rolling assembly', 'lateral acceleration', t.lateralAccel, 'm/s²'),
  ];
}
