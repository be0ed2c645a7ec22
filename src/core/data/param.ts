import { isLimitData, type LimitData, type Param, type RulesData } from './rules-data.ts';

// The one way into the numbers of the rules data. A name the data does not
// hold is a fault, never a silent default; the loader checks that every
// parameter a model or rule declares is there, so these throw only on a
// reading the declarations missed.

function entry<T>(table: Record<string, Record<string, T>>, group: string, name: string): T | undefined {
  const g = Object.hasOwn(table, group) ? table[group] : undefined;
  return g && Object.hasOwn(g, name) ? g[name] : undefined;
}

/** A model parameter, from rules/parameters. */
export function param(data: RulesData, group: string, name: string): Param {
  const p = entry(data.params, group, name);
  if (!p) throw new Error(`rules data has no parameter ${group}.${name}; add it to rules/parameters`);
  return p;
}

/** A model parameter where the data may hold a more particular one first (`usable_hide_m2.rawhide`, then `usable_hide_m2`). */
export function paramOr(data: RulesData, group: string, names: readonly string[]): Param & { name: string } {
  for (const n of names) {
    const p = entry(data.params, group, n);
    if (p) return { ...p, name: n };
  }
  throw new Error(`rules data has no parameter ${group}.${names[names.length - 1]}; add it to rules/parameters`);
}

/** A rule's own parameter (a value, not a limit with levels), from rules/limits. */
export function ruleParam(data: RulesData, ruleId: string, name: string): Param {
  const p = entry(data.limits, ruleId, name);
  if (!p || isLimitData(p)) throw new Error(`rules data has no parameter ${ruleId}.${name}; add it to rules/limits`);
  return p;
}

/** A rule's limit with its levels, from rules/limits. */
export function ruleLimitData(data: RulesData, ruleId: string, name: string): LimitData {
  const l = entry(data.limits, ruleId, name);
  if (!l || !isLimitData(l)) throw new Error(`rules data has no limit ${ruleId}.${name} with levels; add it to rules/limits`);
  return l;
}

/** One level of a rule's limit (for the plots and figures that draw it). */
export function limitLevel(data: RulesData, ruleId: string, name: string, level: 'advisory' | 'hard'): number {
  const l = ruleLimitData(data, ruleId, name)[level];
  if (!l) throw new Error(`rules data has no ${level} level for ${ruleId}.${name}; add it to rules/limits`);
  return l.value;
}
