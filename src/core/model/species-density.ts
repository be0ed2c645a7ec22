import type { RulesData } from '../data/rules-data.ts';
import { densityFromSG, specificGravityAt } from './density.ts';

/** Density of a listed species at moisture M, kg/m^3, from its two handbook SG columns (density.ts). */
export function speciesDensity(data: RulesData, species: string, M: number): number {
  const sg = data.species[species].specific_gravity;
  return densityFromSG(specificGravityAt(sg.green.value, sg.dry12.value, M), M);
}
