import type { RulesData } from '../../data/rules-data.ts';
import { characteristicValue, type CharacteristicValue, type TimberProperty } from './characteristic.ts';
import { kMod, type Duration } from './load-duration.ts';
import { strengthFactor } from './strength-factors.ts';
import type { TimberPart } from './timber-part.ts';

// Design strength of one part in one property (mechanics note, section 1):
//   f_d = f_k · k_select · k_mod / gamma_M
// The characteristic part is found once; k_mod follows each load case.

export interface DesignValue {
  duration: Duration;
  kMod: number;
  kModSource: string;
  /** The catalogue ids k_mod rests on. */
  kModSources: string[];
  /** The material factor this value was found with (the combination's). */
  gammaM: number;
  /** MPa. */
  value: number;
  line: string;
}

export interface TimberStrength {
  characteristic: CharacteristicValue;
  /** The grade factor and the partial factor the design value uses. */
  kSelect: number;
  gammaM: number;
  working: string[];
  /** The sources as text, for older readers. */
  sources: string[];
  /** The same sources as catalogue ids: the species' values and the factors. */
  sourceIds: string[];
  /** The design value for a load duration; an accidental combination gives its own, smaller gamma_M. */
  design(d: Duration, gammaM: number): DesignValue;
}

const f = (v: number, d = 2) => v.toFixed(d);

/** Strength of a part; `extraGrainDeg` adds grain run-out the part's shape makes (a sawn felloe). */
export function timberStrength(data: RulesData, part: TimberPart, property: TimberProperty, moisturePct: number, extraGrainDeg = 0): TimberStrength {
  const grain = Math.min(90, part.grainSlopeDeg + extraGrainDeg);
  const ch = characteristicValue(data, part.species, property, moisturePct, grain);
  const sel = strengthFactor(data, part.grade === 'selected' ? 'k_select_selected' : 'k_select_sawn');
  const gamma = strengthFactor(data, 'gamma_M');
  const sources = [...ch.sources, sel.source, gamma.source];
  return {
    characteristic: ch,
    kSelect: sel.value,
    gammaM: gamma.value,
    working: [...ch.working, `grade ${part.grade} (${part.gradeFrom}): k_select = ${sel.value}; γ_M = ${gamma.value}`],
    sources,
    sourceIds: [...new Set([...ch.sourceIds, ...sel.sources, ...gamma.sources])],
    design(d, gammaM) {
      const k = kMod(data, d);
      const value = (ch.fk * sel.value * k.value) / gammaM;
      return { duration: d, kMod: k.value, kModSource: k.source, kModSources: k.sources, gammaM, value, line: `f_d = f_k·k_select·k_mod/γ_M = ${f(ch.fk)} × ${sel.value} × ${k.value} / ${gammaM} = ${f(value)} MPa` };
    },
  };
}

/** 5th-percentile modulus of elasticity at the moisture content and grain angle, MPa (for buckling). */
export function stiffness05(data: RulesData, part: TimberPart, moisturePct: number): CharacteristicValue {
  return characteristicValue(data, part.species, 'stiffness', moisturePct, Math.min(90, part.grainSlopeDeg));
}
