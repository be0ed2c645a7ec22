import type { RulesData } from '../data/rules-data.ts';
import { loadFactor } from './load-factors.ts';

/**
 * The catalogue ids a bump case's dynamic factor rests on: the ride model
 * where the factor came from one of its cases, else the placeholder
 * bump_dynamic_factor's own sources.
 */
export function bumpFactorSources(data: RulesData, from: string | null | undefined): string[] {
  return from ? ['design-basis-ride'] : loadFactor(data, 'bump_dynamic_factor').sources;
}
