import type { ModelView } from '../pipeline/define-model.ts';
import type { LoadEntry } from './load-entry.ts';

export function balanceLoads(a: ModelView<'loadCases'>): LoadEntry[] {
  return a.loadCases.flatMap((c) => [
    { group: 'balance', item: 'pole on the yoke', case: c.id, quantity: 'vertical force', value: c.pole_load_N, unit: 'N' },
    { group: 'balance', item: 'yoke on each horse', case: c.id, quantity: 'vertical force', value: c.per_horse_N, unit: 'N' },
    { group: 'balance', item: 'axle (both wheels)', case: c.id, quantity: 'vertical force', value: c.axle_load_N, unit: 'N' },
  ]);
}
