import { limitLevel, ruleParam } from '../data/param.ts';
import type { RulesData } from '../data/rules-data.ts';
import type { WorkingStep } from '../findings/finding.ts';
import { num, step } from '../findings/working.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { G } from '../units/units.ts';
import type { HorseMass } from './horse-mass.ts';
import type { MassModel } from './mass-model.ts';
import { rollingResistance } from './rolling-resistance.ts';

// The pull up the design grade (design basis, section 3, Draught): the rolling
// assembly's weight times the soil's and the hub's rolling resistance (the
// balance model's own) plus the grade, against the pull the team gives: a
// fraction of the lightest horse's weight times the team factor. Loads as
// they are (characteristic): a capacity of animals, not a strength.
//
// The weight pulled is the rolling assembly: chariot, pole, crew and loads.
// The yoke's own weight rests on the necks: the horses carry it, they do not
// pull it. All of the rolling weight is taken on the wheels for the rolling
// resistance; the pole's small share on the yoke is left in (the safe side).
// The grade counts as i for sin θ and 1 for cos θ (high by under 1 % up to 10 %).

/** The rule whose limits and parameters the draught reads. */
export const DRAUGHT_RULE = 'draught.pull';

export interface Draught {
  /** The design grade as a fraction (rise over distance). */
  grade: number;
  /** True where the specification gives operation.grade_pct, false where the data's default stands. */
  grade_given: boolean;
  /** The weight pulled: the rolling assembly, N. */
  weight_N: number;
  /** The soil's and the hub's rolling resistance, per newton on the wheels. */
  soil: number;
  hub: number;
  /** The pull needed up the grade, N. */
  pull_N: number;
  horses: number;
  /** The lightest horse's mass the capacity counts on (the low end of a preset band). */
  horse_kg: number;
  team_factor: number;
  /** The weight the pull fractions apply to: team factor × lightest horse × g. */
  team_weight_N: number;
  /** The pull the team keeps up (the advisory level) and the short pull it can give (the hard level), N. */
  sustained_N: number;
  short_N: number;
  sources: string[];
  working: WorkingStep[];
}

/** How many single horses' pull a team gives: one horse its own, a team less than the sum (the data's team factors). */
export function teamFactor(data: RulesData, horses: number): { value: number; sources: string[] } {
  if (horses === 1) return { value: 1, sources: [] };
  const p = ruleParam(data, DRAUGHT_RULE, `team_factor_${horses}`);
  return { value: p.value, sources: p.sources };
}

export function draught(spec: CheckedSpecification, data: RulesData, mass: MassModel, horse: HorseMass): Draught {
  const rr = rollingResistance(spec, data);
  const W = mass.rolling.mass_kg * G;
  const defaultGrade = ruleParam(data, DRAUGHT_RULE, 'default_grade_pct');
  const given = spec.operation.grade_pct;
  const gradePct = given ?? defaultGrade.value;
  const i = gradePct / 100;
  const pull = W * (rr.soil + rr.hub + i);
  const n = spec.team.horses;
  const k = teamFactor(data, n);
  const teamWeight = k.value * horse.mass_kg * G;
  const sustained = limitLevel(data, DRAUGHT_RULE, 'pull_fraction', 'advisory') * teamWeight;
  const short = limitLevel(data, DRAUGHT_RULE, 'pull_fraction', 'hard') * teamWeight;
  return {
    grade: i,
    grade_given: given !== undefined,
    weight_N: W,
    soil: rr.soil,
    hub: rr.hub,
    pull_N: pull,
    horses: n,
    horse_kg: horse.mass_kg,
    team_factor: k.value,
    team_weight_N: teamWeight,
    sustained_N: sustained,
    short_N: short,
    sources: [...new Set([...rr.sources, ...horse.sources, ...k.sources, ...(given === undefined ? defaultGrade.sources : [])])],
    working: [
      step('W = m_rolling·g (chariot, pole, crew and loads; the yoke rests on the necks)', `${num(mass.rolling.mass_kg, 'kg')} × ${num(G)}`, W, 'N'),
      ...rr.working.filter((s) => s.formula.startsWith('C_')),
      step(given === undefined ? 'i = design grade (the data\'s default_grade_pct: the specification gives none)' : 'i = design grade (operation.grade_pct)', `${num(gradePct, '%')}`, i, '1'),
      step('P = W·(C_s + C_b + i)', `${num(W)} × (${num(rr.soil)} + ${num(rr.hub)} + ${num(i)})`, pull, 'N'),
      ...horse.working,
      step(`k = team factor (${n} ${n === 1 ? 'horse' : 'horses'})`, '', k.value, '1'),
      step('W_team = k·m_horse·g (the lightest horse)', `${num(k.value)} × ${num(horse.mass_kg, 'kg')} × ${num(G)}`, teamWeight, 'N'),
    ],
  };
}
