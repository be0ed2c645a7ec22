import { isLimitData, type Param, type RulesData } from '../data/rules-data.ts';
import { ruleParam } from '../data/param.ts';
import type { Finding } from '../findings/finding.ts';
import { severityRank, type Severity } from '../findings/severity.ts';
import { stepOf, stepText } from '../findings/working.ts';
import { renderTemplate, type Params } from '../format/template.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { Report, ResolvedLimit, Rule, RuleContext } from './define-rule.ts';
import { grade } from './grade.ts';
import type { ModelGraph } from './model-graph.ts';
import type { ModelId } from './model-values.ts';

/** A limit of a rule as the data holds it, with the direction the rule declares. */
export function resolveLimit(rule: Rule, data: RulesData, name: string): ResolvedLimit {
  const spec = rule.limits[name];
  if (!spec) throw new Error(`rule ${rule.id} reads the limit "${name}" but does not declare it`);
  const entries = Object.hasOwn(data.limits, rule.id) ? data.limits[rule.id] : undefined;
  const d = entries && Object.hasOwn(entries, name) ? entries[name] : undefined;
  if (!d || !isLimitData(d)) throw new Error(`rules data has no limit ${rule.id}.${name} with levels; add it to rules/limits`);
  return {
    name,
    unit: d.unit,
    direction: spec.direction,
    advisory: d.advisory?.value ?? null,
    hard: d.hard?.value ?? null,
    sources: [...(d.advisory?.sources ?? []), ...(d.hard?.sources ?? [])],
  };
}

const finite = (what: string, v: number | null | undefined, rule: string) => {
  if (v !== null && v !== undefined && !Number.isFinite(v)) throw new Error(`rule ${rule} reported a ${what} that is not a finite number (${v})`);
};

/** The finding a report makes: severity from the limit, utilisation, sources, the message rendered. */
export function findingOf(rule: Rule, data: RulesData, r: Report<string, string>): Finding {
  finite('value', r.value, rule.id);
  finite('capacity', r.against?.times, rule.id);
  const params: Params = { ...(r.params ?? {}) };
  for (const [k, v] of Object.entries(params)) if (typeof v === 'number') finite(`param ${k}`, v, rule.id);
  let severity: Severity;
  let limit: number | null = null;
  let utilisation: number | null = null;
  const sources = [...rule.method];
  if (r.against) {
    if (r.severity !== undefined) throw new Error(`rule ${rule.id} gives a severity and a limit to compare; the limit decides`);
    if (r.value === null || r.value === undefined) throw new Error(`rule ${rule.id} compares no value with its limit ${r.against.limit}`);
    const lim = resolveLimit(rule, data, r.against.limit);
    const g = grade(r.value, lim, rule.limits[r.against.limit], r.against.times ?? 1);
    severity = g.severity;
    limit = g.limit;
    utilisation = g.utilisation;
    sources.push(...lim.sources);
    // The numbers a template prints about the limit come from the limit.
    params.limit ??= g.limit;
    if (g.advisory !== null) params.advisory ??= g.advisory;
    if (g.hard !== null) params.hard ??= g.hard;
  } else {
    if (r.severity === undefined) throw new Error(`rule ${rule.id} reports neither a limit to compare nor a severity`);
    severity = r.severity;
  }
  if (rule.kind === 'note' && severity !== 'info') throw new Error(`rule ${rule.id} is a note and may only inform; it gave ${severity}`);
  if (rule.kind === 'check' && severity === 'info') throw new Error(`rule ${rule.id} is a check and must grade; it gave info`);
  if (severityRank(severity) > severityRank(rule.worst ?? 'fail')) throw new Error(`rule ${rule.id} can give at most ${rule.worst}; it gave ${severity}`);
  if (severity === 'pass' && utilisation !== null && utilisation > 1 + 1e-12) throw new Error(`rule ${rule.id} passes at a utilisation of ${utilisation}`);
  if (r.value !== undefined && r.value !== null) params.value ??= r.value;
  const key = typeof r.message === 'string' ? r.message : r.message[severity];
  if (key === undefined) throw new Error(`rule ${rule.id} has no message for a ${severity} finding`);
  const msg = rule.messages[key];
  if (!msg) throw new Error(`rule ${rule.id} reports the message "${key}" it does not declare`);
  const working = r.working.map(stepOf);
  return {
    rule: rule.id,
    code: msg.code,
    severity,
    subject: r.subject,
    subject_label: r.label,
    message_key: key,
    params,
    message: renderTemplate(msg.text, params),
    value: r.value ?? null,
    unit: r.unit ?? '',
    limit,
    utilisation,
    combination: r.combination ?? null,
    load_case: r.load_case ?? null,
    fix: r.fix,
    sources: [...new Set([...sources, ...(r.sources ?? [])])],
    working,
    working_text: working.map(stepText).join('\n'),
  };
}

/** The context a rule runs in: the models it names, its limits and parameters, and the report it fills. */
export function ruleContext(rule: Rule, spec: CheckedSpecification, data: RulesData, graph: ModelGraph, out: Finding[]): RuleContext<ModelId, string, string, string> {
  return {
    spec,
    data,
    models: graph.view(rule.needs, `rule ${rule.id}`),
    param: (name: string): Param => {
      if (!rule.params.includes(name)) throw new Error(`rule ${rule.id} reads the parameter "${name}" but does not declare it`);
      return ruleParam(data, rule.id, name);
    },
    limit: (name: string) => resolveLimit(rule, data, name),
    report: (r) => out.push(findingOf(rule, data, r)),
  };
}
