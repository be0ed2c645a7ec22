import type { ModelView } from '../pipeline/define-model.ts';
import type { LoadEntry } from './load-entry.ts';
import { balanceLoads } from './balance-loads.ts';
import { floorLoads } from './floor-loads.ts';
import { lashingLoads } from './lashing-loads.ts';
import { memberLoads } from './member-loads.ts';
import { turnLoads } from './turn-loads.ts';

/** The models the Loads sheet lists. */
export type LoadsView = ModelView<'loadCases' | 'turn' | 'floorStatic' | 'floorBump' | 'memberCases' | 'lashingDemands'>;

/** Each model family lists the loads it computed; the Loads sheet shows them all. */
const SOURCES: ((a: LoadsView) => LoadEntry[])[] = [balanceLoads, turnLoads, floorLoads, memberLoads, lashingLoads];

export function collectLoads(a: LoadsView): LoadEntry[] {
  return SOURCES.flatMap((f) => f(a));
}
