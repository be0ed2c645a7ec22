import type { ModelView } from '../pipeline/define-model.ts';
import type { LoadEntry } from './load-entry.ts';

export function lashingLoads(a: ModelView<'lashingDemands'>): LoadEntry[] {
  return Object.values(a.lashingDemands).flatMap((d) =>
    d.cases.flatMap((c) => [
      { group: 'lashing', item: d.joint, case: c.title, quantity: 'force in the contact face', value: c.shear_N, unit: 'N' },
      { group: 'lashing', item: d.joint, case: c.title, quantity: 'force pulling apart', value: c.apart_N, unit: 'N' },
    ]),
  );
}
