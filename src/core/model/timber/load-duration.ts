import type { RulesData } from '../../data/rules-data.ts';
import { strengthFactor } from './strength-factors.ts';

// Load-duration classes of EN 1995-1-1 (section 2.3.1.2) and their k_mod.
// The mechanics note, section 1: dead load permanent, crew standing short;
// bump, drop and braking shock instantaneous.

export type Duration = 'permanent' | 'long' | 'medium' | 'short' | 'instantaneous';

export function kMod(data: RulesData, d: Duration): { value: number; source: string; sources: string[] } {
  const f = strengthFactor(data, `k_mod_${d}`);
  return { value: f.value, source: f.source, sources: f.sources };
}
