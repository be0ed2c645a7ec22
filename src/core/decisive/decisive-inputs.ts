import type { RulesData } from '../data/rules-data.ts';
import type { Finding } from '../findings/finding.ts';
import { ModelGraph } from '../pipeline/model-graph.ts';
import type { ModelInputs } from '../pipeline/define-model.ts';
import type { Rule } from '../pipeline/define-rule.ts';
import type { ModelId } from '../pipeline/model-values.ts';
import { MODELS } from '../pipeline/models.ts';
import { ReadTracer, type InputKey } from '../pipeline/read-tracer.ts';
import { runRules } from '../pipeline/run-rules.ts';
import { crossChecks } from '../spec/cross-checks.ts';
import type { SpecEntry } from '../spec/spec-entry.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { breakEven, type Outcome } from './break-even.ts';
import type { DecisiveInput, DecisiveSearch } from './decisive-input.ts';
import { inputInfo, withInput, type InputInfo } from './input-path.ts';
import { inputRange } from './input-range.ts';
import { recordingData, recordingSpec } from './recording-proxy.ts';
import { decisiveFindings } from './select-findings.ts';

/** The inputs listed per finding: those that move its utilisation most at plus and minus a tenth. */
export const KEEP_PER_FINDING = 5;
/** The screening step: each candidate is tried a tenth up and a tenth down. */
export const SCREEN = 0.1;
/** Re-runs of the affected part of the check the whole search may make (a work limit, not a clock: the answer does not depend on the machine). */
export const WORK_LIMIT = 400;

export interface DecisiveArgs {
  spec: CheckedSpecification;
  entries: readonly SpecEntry[];
  data: RulesData;
  rules: readonly Rule[];
  findings: readonly Finding[];
  /** The models the check computed, reused wherever a changed input does not reach them. */
  computed: ReadonlyMap<ModelId, unknown>;
  inputs: Omit<ModelInputs, 'spec' | 'data'>;
  workLimit?: number;
}

const findingKey = (f: { rule: string; subject: string }) => `${f.rule}|${f.subject}`;

/**
 * Which builder's guesses and remembered data values each decisive finding
 * hangs on, and how far each may move before the finding changes severity.
 * One traced run finds what every finding read; each trial then re-runs only
 * the models the changed input reaches, and only the rules that read it.
 */
export function decisiveInputs(a: DecisiveArgs): { inputs: DecisiveInput[]; search: DecisiveSearch } {
  const workLimit = a.workLimit ?? WORK_LIMIT;
  const chosen = decisiveFindings(a.findings);
  const ruleIds = new Set(chosen.map((f) => f.rule));
  const rules = a.rules.filter((r) => ruleIds.has(r.id));

  // What each chosen rule read, through the models it asked for.
  const tracer = new ReadTracer();
  const traced = { spec: recordingSpec(a.spec, tracer), data: recordingData(a.data, tracer) };
  runRules(rules, traced.spec, traced.data, new ModelGraph(MODELS, { ...a.inputs, ...traced }, { tracer }), tracer);
  const readsOf = new Map(rules.map((r) => [r.id, tracer.closure(`rule:${r.id}`).inputs]));

  const infos = new Map<InputKey, InputInfo>();
  for (const keys of readsOf.values())
    for (const k of keys)
      if (!infos.has(k)) {
        const info = inputInfo(k, a.spec, a.entries, a.data);
        if (info) infos.set(k, info);
      }

  let reruns = 0;
  const memo = new Map<string, Map<string, Outcome & { utilisation: number | null }> | null>();
  const staleOf = new Map<InputKey, Set<string>>();
  /** Every chosen finding that reads the input, re-checked with the input at v; null where the input would be refused. */
  const trial = (key: InputKey, v: number) => {
    const id = `${key}=${v}`;
    if (memo.has(id)) return memo.get(id)!;
    reruns++;
    const changed = withInput(key, v, a.spec, a.data);
    let out: Map<string, Outcome & { utilisation: number | null }> | null = null;
    if (!key.startsWith('spec:') || crossChecks(changed.spec, changed.data).length === 0) {
      if (!staleOf.has(key)) staleOf.set(key, tracer.staleModels(new Set([key])));
      const stale = staleOf.get(key)!;
      const seed = new Map([...a.computed].filter(([m]) => !stale.has(m)));
      const graph = new ModelGraph(MODELS, { ...a.inputs, ...changed }, { seed });
      const readers = rules.filter((r) => readsOf.get(r.id)!.has(key));
      out = new Map(runRules(readers, changed.spec, changed.data, graph).map((f) => [findingKey(f), { severity: f.severity, utilisation: f.utilisation }]));
    }
    memo.set(id, out);
    return out;
  };
  const outcome = (f: Finding, key: InputKey, v: number): (Outcome & { utilisation: number | null }) | null => {
    const o = trial(key, v)?.get(findingKey(f));
    return o && o.severity !== 'error' ? o : null;
  };

  const inputs: DecisiveInput[] = [];
  let unsearched = 0;
  for (const f of chosen) {
    // Screen: how much a tenth either way moves this finding.
    const scored: { info: InputInfo; score: number }[] = [];
    for (const k of readsOf.get(f.rule)!) {
      const info = infos.get(k);
      const range = info && inputRange(info);
      if (!info || !range) continue;
      if (reruns >= workLimit) {
        unsearched++;
        continue;
      }
      let score = 0;
      for (const s of [1 + SCREEN, 1 - SCREEN]) {
        const v = Math.min(range.high, Math.max(range.low, info.value * s));
        const o = outcome(f, k, range.integer ? Math.round(v) : v);
        if (!o) continue;
        if (o.severity !== f.severity) score = Math.max(score, Infinity);
        else if (o.utilisation !== null && f.utilisation !== null) score = Math.max(score, Math.abs(o.utilisation - f.utilisation));
      }
      if (score > 0) scored.push({ info, score });
    }
    scored.sort((x, y) => y.score - x.score || x.info.input.localeCompare(y.info.input));
    for (const { info } of scored.slice(0, KEEP_PER_FINDING)) {
      const range = inputRange(info)!;
      const base = { rule: f.rule, subject: f.subject, severity: f.severity, input: info.input, origin: info.origin, value: info.value, unit: info.unit, status: info.status };
      if (reruns >= workLimit) {
        unsearched++;
        inputs.push({ ...base, break_even: null, to_severity: null, change: null, reason: `not searched: the work limit of ${workLimit} re-runs was reached` });
        continue;
      }
      const be = breakEven(info.value, f.severity, range, (v) => outcome(f, info.key, v), range.text);
      inputs.push(
        be.break_even === null
          ? { ...base, break_even: null, to_severity: null, change: null, reason: be.reason }
          : { ...base, break_even: be.break_even, to_severity: be.to_severity, change: be.break_even / info.value - 1 },
      );
    }
  }
  return { inputs, search: { findings: chosen.length, candidates: infos.size, reruns, work_limit: workLimit, unsearched } };
}
