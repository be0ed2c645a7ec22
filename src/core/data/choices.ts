import type { RulesData } from './rules-data.ts';
import type { ChoiceTable } from '../spec/spec-fields.ts';

/** The ids a planner may choose from, by rules-data table. */
export type Choices = Record<ChoiceTable, string[]>;

export function choicesOf(data: RulesData): Choices {
  return { species: Object.keys(data.species), leathers: Object.keys(data.leathers), grounds: Object.keys(data.grounds) };
}
