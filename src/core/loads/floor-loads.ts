import type { ModelView } from '../pipeline/define-model.ts';
import type { FloorResult } from '../model/floor-result.ts';
import type { LoadEntry } from './load-entry.ts';

function floorCase(r: FloorResult, name: string): LoadEntry[] {
  if (!r.converged) return [];
  const e = (item: string, quantity: string, value: number, unit: string): LoadEntry => ({ group: 'floor', item, case: name, quantity, value, unit });
  return [
    e('floor straps', 'largest strap tension', r.maxTension_N, 'N'),
    ...r.crew.map((c) => e(`floor under the ${c.role}`, 'sag', c.sag_mm, 'mm')),
    ...r.rails.filter((rail) => rail.total_N > 0).map((rail) => e(`${rail.rail} rail`, 'strap pull, total', rail.total_N, 'N')),
  ];
}

export function floorLoads(a: ModelView<'floorStatic' | 'floorBump'>): LoadEntry[] {
  return [...floorCase(a.floorStatic, 'crew standing'), ...floorCase(a.floorBump, `bump, × ${a.floorBump.factor}`)];
}
