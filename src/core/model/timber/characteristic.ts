import type { GreenDry, RulesData, Species } from '../../data/rules-data.ts';
import { UNITS } from '../../units/units.ts';
import { hankinson } from './hankinson.ts';
import { propertyAtMoisture } from './moisture-strength.ts';
import { intersectionMoisture, strengthFactor, type StrengthFactorName } from './strength-factors.ts';

// The characteristic (5th percentile) value of a clear-wood property for one
// part (mechanics note, section 1): the handbook mean at 12 %, corrected to
// the moisture content, then to the grain angle, then f_k = f (1 - z COV).

export type TimberProperty = 'bending' | 'compression' | 'shear' | 'stiffness';

type SpeciesKey = 'mor_kPa' | 'compression_parallel_kPa' | 'compression_perpendicular_kPa' | 'shear_kPa' | 'moe_MPa';

interface PropertyDef {
  key: SpeciesKey;
  /** Factor from the data's unit to MPa. */
  toMPa: number;
  cov: StrengthFactorName;
  name: string;
  /** How the strength across the grain is found for Hankinson's formula; null: not applied. */
  across: { n: StrengthFactorName; ratio: StrengthFactorName } | { n: StrengthFactorName; key: SpeciesKey } | null;
}

const PROPERTIES: Record<TimberProperty, PropertyDef> = {
  bending: { key: 'mor_kPa', toMPa: 1e-3, cov: 'cov_mor', name: 'modulus of rupture', across: { n: 'hankinson_n_bending', ratio: 'hankinson_ratio_bending' } },
  compression: { key: 'compression_parallel_kPa', toMPa: 1e-3, cov: 'cov_compression_parallel', name: 'compression parallel to the grain', across: { n: 'hankinson_n_compression', key: 'compression_perpendicular_kPa' } },
  shear: { key: 'shear_kPa', toMPa: 1e-3, cov: 'cov_shear', name: 'shear parallel to the grain', across: null },
  stiffness: { key: 'moe_MPa', toMPa: 1, cov: 'cov_moe', name: 'modulus of elasticity', across: { n: 'hankinson_n_modulus', ratio: 'hankinson_ratio_modulus' } },
};

export interface CharacteristicValue {
  property: TimberProperty;
  /** e.g. "white-ash modulus of rupture". */
  name: string;
  /** Mean after the moisture and grain corrections, MPa. */
  mean: number;
  /** 5th percentile of clear wood, MPa. */
  fk: number;
  working: string[];
  /** The sources as text, for older readers. */
  sources: string[];
  /** The same sources as catalogue ids (rules/sources.yaml). */
  sourceIds: string[];
}

const f = (v: number, d = 1) => v.toFixed(d);

/** Moisture content the strength is taken at, and how it was found. */
function moistureOf(data: RulesData, species: string, moisturePct: number) {
  const credit = strengthFactor(data, 'min_moisture_credit_pct');
  const mp = intersectionMoisture(data, species);
  return { M: Math.max(moisturePct, credit.value), credit, mp };
}

/** The mean of one species property at the moisture content, MPa, with its working line. */
function meanAtMoisture(data: RulesData, sp: Species, speciesId: string, key: SpeciesKey, toMPa: number, moisturePct: number) {
  const gd: GreenDry = sp[key];
  const p12 = gd.dry12.value * toMPa;
  const pg = gd.green.value * toMPa;
  const { M, credit, mp } = moistureOf(data, speciesId, moisturePct);
  const value = propertyAtMoisture(p12, pg, M, mp.value);
  const sources = [gd.dry12.source];
  const sourceIds = [...gd.dry12.sources];
  if (moisturePct < credit.value) sourceIds.push(...credit.sources);
  let line: string;
  if (M === 12) {
    line = moisturePct < 12 ? `at ${moisturePct} % moisture: no strength credited below ${credit.value} %, the value at 12 % applies: ${f(value)} MPa` : `at 12 % moisture: the handbook value applies`;
  } else {
    sources.push(gd.green.source, mp.source);
    sourceIds.push(...gd.green.sources, ...mp.sources);
    line = M >= mp.value
      ? `at ${M} % moisture, at or above M_p = ${mp.value} %: the green value applies: ${f(value)} MPa`
      : `at ${M} % moisture: P_M = P_12 (P_12/P_g)^((12 − M)/(M_p − 12)) = ${f(p12)} × (${f(p12)}/${f(pg)})^((12 − ${M})/(${mp.value} − 12)) = ${f(value)} MPa`;
  }
  return { p12, pg, value, line, sources, sourceIds };
}

export function characteristicValue(data: RulesData, speciesId: string, property: TimberProperty, moisturePct: number, grainDeg: number): CharacteristicValue {
  const def = PROPERTIES[property];
  const sp = data.species[speciesId];
  const name = `${speciesId} ${def.name}`;
  const main = meanAtMoisture(data, sp, speciesId, def.key, def.toMPa, moisturePct);
  const working = [`${name}: handbook mean ${f(main.p12)} MPa at 12 %, ${f(main.pg)} MPa green`, main.line];
  const sources = [...main.sources];
  const sourceIds = [...main.sourceIds];
  let mean = main.value;
  if (grainDeg > 0 && def.across !== null) {
    const n = strengthFactor(data, def.across.n);
    let perp: number;
    let perpText: string;
    if ('ratio' in def.across) {
      const ratio = strengthFactor(data, def.across.ratio);
      perp = ratio.value * mean;
      perpText = `f_perp = ${ratio.value} × f_par = ${f(perp, 2)} MPa`;
      sources.push(ratio.source);
      sourceIds.push(...ratio.sources);
    } else {
      const across = meanAtMoisture(data, sp, speciesId, def.across.key, def.toMPa, moisturePct);
      perp = across.value;
      perpText = `f_perp = ${f(perp, 2)} MPa (across the grain at the same moisture)`;
      sources.push(...across.sources);
      sourceIds.push(...across.sourceIds);
    }
    const theta = grainDeg * UNITS.deg.si;
    const at = hankinson(mean, perp, theta, n.value);
    working.push(`grain at ${f(grainDeg)}° to the part: Hankinson f_θ = f_par·f_perp / (f_par·sin^n θ + f_perp·cos^n θ), n = ${n.value}, ${perpText}: = ${f(at, 2)} MPa`);
    sources.push(n.source);
    sourceIds.push(...n.sources);
    mean = at;
  } else if (grainDeg > 0) {
    working.push(`grain at ${f(grainDeg)}° to the part: not applied to ${def.name}`);
  }
  const z = strengthFactor(data, 'fifth_percentile_z');
  const cov = strengthFactor(data, def.cov);
  const fk = mean * (1 - z.value * cov.value);
  working.push(`5th percentile: f_k = f·(1 − z·COV) = ${f(mean, 2)} × (1 − ${z.value} × ${cov.value}) = ${f(fk, 2)} MPa`);
  sources.push(cov.source);
  sourceIds.push(...z.sources, ...cov.sources);
  return { property, name, mean, fk, working, sources, sourceIds: [...new Set(sourceIds)] };
}
