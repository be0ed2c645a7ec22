import { param } from '../data/param.ts';
import type { Param, RulesData } from '../data/rules-data.ts';
import type { WorkingStep } from '../findings/finding.ts';
import { num, step } from '../findings/working.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';

// The lightest horse's body mass, the one way the specification gives it:
// weighed; estimated from a tape round the girth and along the body
// (Carroll and Huntington 1988); or a preset band for the horse's type and
// height (rules/parameters/horses.yaml). A band's LOW end is what the checks
// use: they limit the load on a horse and count on its pull, and a lighter
// horse is the safe side of both.

export type HorseBasis = 'given' | 'girth-length' | 'preset';

export const HORSE_TYPES = ['pony', 'cob', 'riding', 'draught'] as const;
export type HorseType = (typeof HORSE_TYPES)[number];

export interface HorseMass {
  /** The mass the checks use: as given, as estimated, or the low end of the preset band. */
  mass_kg: number;
  basis: HorseBasis;
  /** The preset band at this height, where the mass comes from one. */
  low_kg?: number;
  high_kg?: number;
  /** How the mass was found, in words a message can carry. */
  basis_text: string;
  sources: string[];
  working: WorkingStep[];
}

const PRESET_KEYS = ['reference_height_m', 'low_kg', 'high_kg', 'min_height_m', 'max_height_m'] as const;

/** The parameters the horse model reads, as `group.name`. */
export const HORSE_PARAMS: readonly `${string}.${string}`[] = [
  'horses.girth_length_divisor',
  'horses.height_exponent',
  ...HORSE_TYPES.flatMap((t) => PRESET_KEYS.map((k) => `horses.${t}.${k}` as const)),
];

export type HorsePreset = Record<(typeof PRESET_KEYS)[number], Param>;

/** A type's preset band and the heights it holds for. */
export function horsePreset(data: RulesData, type: HorseType): HorsePreset {
  return Object.fromEntries(PRESET_KEYS.map((k) => [k, param(data, `horses.${type}`, k)])) as HorsePreset;
}

/** Carroll and Huntington's estimate: girth² × length / Y, cm and kg. */
export function girthLengthMass(girth_cm: number, length_cm: number, divisor: number): number {
  return (girth_cm * girth_cm * length_cm) / divisor;
}

export function horseMass(spec: CheckedSpecification, data: RulesData): HorseMass {
  const { horse_mass_kg: given, horse } = spec.team;
  if (given !== undefined) {
    return { mass_kg: given, basis: 'given', basis_text: 'as given', sources: [], working: [step('m_horse (given)', '', given, 'kg')] };
  }
  if (horse?.girth_cm !== undefined && horse.body_length_cm !== undefined) return byTape(horse.girth_cm, horse.body_length_cm, data);
  if (horse?.type !== undefined && horse.height_m !== undefined) return byPreset(horse.type, horse.height_m, data);
  throw new Error('the team gives no horse mass; the input checks should have refused the specification');
}

function byTape(girth: number, length: number, data: RulesData): HorseMass {
  const Y = param(data, 'horses', 'girth_length_divisor');
  const m = girthLengthMass(girth, length, Y.value);
  return {
    mass_kg: m,
    basis: 'girth-length',
    basis_text: 'estimated from its girth and length',
    sources: Y.sources,
    working: [step('m_horse = G²·L / Y (Carroll and Huntington 1988)', `${num(girth, 'cm')}² × ${num(length, 'cm')} / ${num(Y.value)}`, m, 'kg')],
  };
}

function byPreset(type: HorseType, height: number, data: RulesData): HorseMass {
  const p = horsePreset(data, type);
  const n = param(data, 'horses', 'height_exponent');
  const scale = (height / p.reference_height_m.value) ** n.value;
  const low = p.low_kg.value * scale;
  const high = p.high_kg.value * scale;
  const ratio = `(${num(height, 'm')} / ${num(p.reference_height_m.value, 'm')})^${num(n.value)}`;
  return {
    mass_kg: low,
    basis: 'preset',
    low_kg: low,
    high_kg: high,
    basis_text: `the low end of the ${type} preset band, the safe side`,
    sources: [...new Set([...p.reference_height_m.sources, ...p.low_kg.sources, ...p.high_kg.sources, ...n.sources])],
    working: [
      step(`m_low = m_low,ref·(h/h_ref)^n (${type} preset)`, `${num(p.low_kg.value, 'kg')} × ${ratio}`, low, 'kg'),
      step(`m_high = m_high,ref·(h/h_ref)^n (${type} preset)`, `${num(p.high_kg.value, 'kg')} × ${ratio}`, high, 'kg'),
      step('m_horse = m_low: the low end of the band, the safe side for the load a horse carries and the pull it gives', '', low, 'kg'),
    ],
  };
}
