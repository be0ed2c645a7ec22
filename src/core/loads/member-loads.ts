import type { ModelView } from '../pipeline/define-model.ts';
import type { LoadEntry } from './load-entry.ts';

export function memberLoads(a: ModelView<'memberCases'>): LoadEntry[] {
  return a.memberCases.flatMap((c) => [
    { group: 'member', item: 'more loaded wheel', case: c.title, quantity: 'vertical ground force', value: c.wheel_N, unit: 'N' },
    { group: 'member', item: 'more loaded wheel', case: c.title, quantity: 'lateral ground force', value: c.wheelLateral_N, unit: 'N' },
    { group: 'member', item: 'pole at the yoke', case: c.title, quantity: 'vertical force', value: c.pole_N, unit: 'N' },
    { group: 'member', item: 'pole at the yoke', case: c.title, quantity: 'axial force (+ push)', value: c.poleAxial_N, unit: 'N' },
  ]);
}
