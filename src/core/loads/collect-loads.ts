import type { Analysis } from '../engine/analysis.ts';
import type { LoadEntry } from './load-entry.ts';
import { balanceLoads } from './balance-loads.ts';
import { floorLoads } from './floor-loads.ts';
import { lashingLoads } from './lashing-loads.ts';
import { memberLoads } from './member-loads.ts';
import { turnLoads } from './turn-loads.ts';

/** Each model family lists the loads it computed; the Loads sheet shows them all. */
const SOURCES: ((a: Analysis) => LoadEntry[])[] = [balanceLoads, turnLoads, floorLoads, memberLoads, lashingLoads];

export function collectLoads(a: Analysis): LoadEntry[] {
  return SOURCES.flatMap((f) => f(a));
}
