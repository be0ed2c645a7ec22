import type { RulesData } from '../data/rules-data.ts';
import { horsePreset } from '../model/horse-mass.ts';
import { issue, type InputIssue, type KeyPath } from './input-issue.ts';
import type { CheckedSpecification } from './spec.types.ts';

// The horse's mass comes exactly one way: weighed (team.horse_mass_kg), taped
// (team.horse.girth_cm and body_length_cm) or a preset (team.horse.type and
// height_m). None, two, or half of a pair is refused where it was written; a
// preset's height must lie in the range its band holds for.

const TEAM: KeyPath = ['team'];
const HORSE: KeyPath = ['team', 'horse'];

interface Pair {
  way: string;
  keys: readonly [string, string];
}

const PAIRS: readonly Pair[] = [
  { way: 'a mass by tape', keys: ['girth_cm', 'body_length_cm'] },
  { way: 'a preset mass', keys: ['type', 'height_m'] },
];

export function horseIssues(spec: CheckedSpecification, data: RulesData): InputIssue[] {
  const out: InputIssue[] = [];
  const horse = (spec.team.horse ?? {}) as Record<string, unknown>;
  const ways: string[] = spec.team.horse_mass_kg === undefined ? [] : ['horse_mass_kg'];
  for (const { way, keys } of PAIRS) {
    const given = keys.filter((k) => horse[k] !== undefined);
    if (given.length === 0) continue;
    ways.push(keys.map((k) => `horse.${k}`).join(' with '));
    if (given.length === 1) {
      const missing = keys.find((k) => k !== given[0])!;
      out.push(issue([...HORSE, missing], 'horseHalfWay', { given: `horse.${given[0]}`, missing: `horse.${missing}`, way }));
    }
  }
  if (ways.length === 0) out.push(issue(TEAM, 'horseMassNone'));
  if (ways.length > 1) out.push(issue(spec.team.horse_mass_kg === undefined ? HORSE : [...TEAM, 'horse_mass_kg'], 'horseMassTwice', { ways: ways.join('; ') }));
  const { type, height_m: height } = spec.team.horse ?? {};
  if (out.length === 0 && type !== undefined && height !== undefined) {
    const p = horsePreset(data, type);
    if (height < p.min_height_m.value || height > p.max_height_m.value) {
      out.push(issue([...HORSE, 'height_m'], 'horseHeightOutside', { value: height, type, min: p.min_height_m.value, max: p.max_height_m.value }));
    }
  }
  return out;
}
