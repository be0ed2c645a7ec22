import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { defaultRulesDir, loadRulesData } from '../../src/node/load-rules-data.ts';
import type { RulesData } from '../../src/core/data/rules-data.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import type { CheckedSpecification } from '../../src/core/spec/spec.types.ts';

export const rulesData: RulesData = loadRulesData(defaultRulesDir());

/**
 * The real data with one more ground type of the given soil resistance, and
 * the hub's journal friction set (0 by default: a hand calculation without
 * rolling resistance unless it asks for one).
 */
export function dataWithGround(id: string, soilResistance: number, journalFriction = 0): RulesData {
  const src = { sources: ['demo-data'], source: 'test fixture' };
  const withGround = { ...rulesData, grounds: { ...rulesData.grounds, [id]: { name: id, soil_resistance: { value: soilResistance, ...src }, lateral_friction: { value: 0.5, ...src } } } };
  return withParams('rolling', { journal_friction: journalFriction }, withGround);
}

export function readDemo(name: string): Record<string, unknown> {
  return parse(readFileSync(new URL(`../../specs/${name}.yaml`, import.meta.url), 'utf8'));
}

export function prepared(raw: unknown, data: RulesData = rulesData): CheckedSpecification {
  const p = prepareSpec(raw, data);
  if (!p.ok) throw new Error(p.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('\n'));
  return p.spec;
}

/**
 * A spec made for hand calculation: measured masses, a straight level pole,
 * one crew member, no lashings or loads. Every number is demo data.
 */
export function handSpec(): Record<string, any> {
  return {
    spec_version: 1,
    name: 'hand calculation',
    box: { floor: { depth_mm: 500, width_mm: 1000, height_mm: 600, frame: { species: 'white-ash', width_mm: 40, thickness_mm: 40 } }, mass_kg: 20 },
    axle: { x_mm: 250, species: 'rock-elm', length_mm: 2000, width_mm: 70, height_mm: 70, bearing_span_mm: 900, mass_kg: 8 },
    wheels: {
      diameter_mm: 900, track_mm: 1600, spokes: 6, mass_kg: 10,
      nave: { species: 'rock-elm', length_mm: 300, diameter_mm: 150, bore_mm: 70 },
      spoke: { species: 'white-ash', width_mm: 35, thickness_mm: 30 },
      felloe: { species: 'white-ash', depth_mm: 45, width_mm: 40, pieces: 2 },
    },
    // pole centre under the frame: 600 - 40 - 60/2 = 530 mm; the yoke at that height keeps it straight and level
    pole: { species: 'white-ash', width_mm: 60, height_mm: 60, rear_x_mm: 0, root_x_mm: 500, yoke_x_mm: 2500, yoke_height_mm: 530, mass_kg: 9 },
    yoke: { species: 'white-oak', length_mm: 1100, width_mm: 50, height_mm: 50, neck_spacing_mm: 700, mass_kg: 4 },
    floor_straps: { material: 'rawhide', width_mm: 25, thickness_mm: 4, pitch_mm: 32, weave: 'two-way' },
    crew: [{ role: 'driver', mass_kg: 80, x_mm: 300, y_mm: 0 }],
    team: { horses: 2, horse_mass_kg: 400 },
    operation: { speed_kmh: 15, turn_radius_m: 12, acceleration_g: 0.2, braking_g: 0.3, ground: 'hand-rigid' },
  };
}

/**
 * The data with some of one rule's numbers replaced: `name` for a parameter's
 * value, `name.hard` or `name.advisory` for a level of a limit.
 */
export function withRuleData(ruleId: string, values: Record<string, number>, data: RulesData = rulesData): RulesData {
  const own = structuredClone(data.limits[ruleId]) as Record<string, Record<string, any>>;
  for (const [k, v] of Object.entries(values)) {
    const [name, level] = k.split('.');
    if (!own[name]) throw new Error(`rules data has no ${ruleId}.${name}`);
    if (level) own[name][level] = { ...own[name][level], value: v };
    else own[name] = { ...own[name], value: v };
  }
  return { ...data, limits: { ...data.limits, [ruleId]: own as RulesData['limits'][string] } };
}

/** The data with some model parameters of one group replaced (rules/parameters). */
export function withParams(group: string, values: Record<string, number>, data: RulesData = rulesData): RulesData {
  const own = structuredClone(data.params[group]);
  for (const [k, v] of Object.entries(values)) {
    if (!own[k]) throw new Error(`rules data has no parameter ${group}.${k}`);
    own[k] = { ...own[k], value: v };
  }
  return { ...data, params: { ...data.params, [group]: own } };
}

/** Run one rule on a raw spec; optionally replace some of its numbers (see withRuleData). */
export async function findingsOf(ruleId: string, raw: unknown, limits: Record<string, number> = {}, data: RulesData = rulesData) {
  const { RULES } = await import('../../src/core/rules/index.ts');
  const { runRules } = await import('../../src/core/pipeline/run-rules.ts');
  const rule = RULES.find((r) => r.id === ruleId);
  if (!rule) throw new Error(`no rule ${ruleId}`);
  const withLimits = withRuleData(ruleId, limits, data);
  return runRules([rule], prepared(raw, withLimits), withLimits);
}

/** Objects merge key by key; anything else (arrays included) replaces. */
export function deepMerge<T>(base: T, patch: unknown): T {
  if (typeof patch !== 'object' || patch === null || Array.isArray(patch) || typeof base !== 'object' || base === null) return structuredClone(patch) as T;
  const out: Record<string, unknown> = { ...(base as Record<string, unknown>) };
  for (const [k, v] of Object.entries(patch)) out[k] = k in out ? deepMerge(out[k], v) : structuredClone(v);
  return out as T;
}

/**
 * A level f that puts the limit f * w on v: exactly where some double does, else the
 * nearest one step above it (f * w >= v), so a value "equal to the limit" is within it.
 */
export function fractionHitting(v: number, w: number): number {
  let f = v / w;
  for (let i = 0; i < 8 && f * w !== v; i++) f = f * w > v ? f - Number.EPSILON * f : f + Number.EPSILON * f;
  for (let i = 0; i < 16 && Math.abs(f * w) < Math.abs(v); i++) f += Number.EPSILON * Math.abs(f);
  return f;
}
