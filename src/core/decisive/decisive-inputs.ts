import type { RulesData } from '../data/rules-data.ts';
import type { Finding } from '../findings/finding.ts';
import { carriesSpec, specObjects } from '../pipeline/carries-spec.ts';
import { ModelGraph } from '../pipeline/model-graph.ts';
import type { ModelInputs } from '../pipeline/define-model.ts';
import type { Rule } from '../pipeline/define-rule.ts';
import type { ModelId } from '../pipeline/model-values.ts';
import { MODELS } from '../pipeline/models.ts';
import { ReadTracer, type InputKey } from '../pipeline/read-tracer.ts';
import { runRules } from '../pipeline/run-rules.ts';
import { trialWeight } from '../pipeline/trial-weight.ts';
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
/** The screening step: each candidate is tried a tenth up (or down, at the top of its range). */
export const SCREEN = 0.1;
/**
 * The work the whole search may do, in units of one re-run that does not
 * reach the ride model (trial-weight.ts): a work limit, not a clock, so the
 * answer does not depend on the machine or its load.
 */
export const WORK_LIMIT = 1000;

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

/** What the search reads of a trial's finding; kept for every trial, so the rest (its working, its text) is let go at once. */
type TrialFinding = Pick<Finding, 'severity' | 'utilisation' | 'value'> & { params: { advisory?: unknown; hard?: unknown } };
const trialFinding = (f: Finding): TrialFinding => ({ severity: f.severity, utilisation: f.utilisation, value: f.value, params: { advisory: f.params.advisory, hard: f.params.hard } });

/**
 * Which builder's guesses and remembered data values each decisive finding
 * hangs on, and how far each may move before the finding changes severity.
 * One traced run finds what every finding read; each trial then re-runs only
 * the models the changed input reaches, and only the rules that read it.
 */
export function decisiveInputs(a: DecisiveArgs): { inputs: DecisiveInput[]; search: DecisiveSearch } {
  const workLimit = a.workLimit ?? WORK_LIMIT;
  const chosen = decisiveFindings(a.findings, a.rules);
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

  // A model whose value holds the spec or the data (the ride's input hands the
  // spec on) would hand the old values to whatever re-runs after it: never reused.
  const original = specObjects(a.spec);
  for (const o of specObjects(a.data)) original.add(o);
  const carriers = new Set([...a.computed].filter(([, v]) => carriesSpec(v, original)).map(([m]) => m));

  let reruns = 0;
  let work = 0;
  const memo = new Map<string, Map<string, TrialFinding> | null>();
  const staleOf = new Map<InputKey, Set<string>>();
  /** Every chosen finding that reads the input, re-checked with the input at v; null where the input would be refused. */
  const trial = (key: InputKey, v: number) => {
    const id = `${key}=${v}`;
    if (memo.has(id)) return memo.get(id)!;
    reruns++;
    const changed = withInput(key, v, a.spec, a.data);
    let out: Map<string, TrialFinding> | null = null;
    if (!key.startsWith('spec:') || crossChecks(changed.spec, changed.data).length === 0) {
      if (!staleOf.has(key)) staleOf.set(key, tracer.staleModels(new Set([key])));
      const stale = staleOf.get(key)!;
      work += trialWeight(stale);
      const seed = new Map([...a.computed].filter(([m]) => !stale.has(m) && !carriers.has(m)));
      // No output draws a trial's ride: its cases keep no time series.
      // Where the trial kept the check's net, its standing floor starts from the check's (the same answer to the solver's tolerance).
      const graph = new ModelGraph(MODELS, { ...a.inputs, ...changed, rideSeries: false, startFrom: a.computed }, { seed });
      const readers = rules.filter((r) => readsOf.get(r.id)!.has(key));
      out = new Map(runRules(readers, changed.spec, changed.data, graph).map((f) => [findingKey(f), trialFinding(f)]));
    }
    memo.set(id, out);
    return out;
  };
  const outcome = (f: Finding, key: InputKey, v: number): (Outcome & { utilisation: number | null }) | null => {
    const o = trial(key, v)?.get(findingKey(f));
    return o && o.severity !== 'error' ? { severity: o.severity, utilisation: o.utilisation, gap: gapOf(o, guideOf(f)) } : null;
  };

  // 1. Screen: each input once, a tenth up (down at the top of its range); one trial serves every finding that reads it.
  //    Inputs more findings read go first; half the work limit is kept for the searches.
  const STATUS_ORDER = { 'from-memory': 0, defaulted: 1, given: 2 } as const;
  const readers = (k: InputKey) => chosen.filter((f) => readsOf.get(f.rule)!.has(k)).length;
  const keys = [...infos.keys()].sort((x, y) => readers(y) - readers(x) || STATUS_ORDER[infos.get(x)!.status] - STATUS_ORDER[infos.get(y)!.status] || x.localeCompare(y));
  const screenAt = new Map<InputKey, number>();
  for (const k of keys) {
    const info = infos.get(k)!;
    const range = inputRange(info);
    if (!range || work >= workLimit / 2) continue;
    const up = Math.min(range.high, info.value * (1 + SCREEN));
    const v0 = up !== info.value ? up : Math.max(range.low, info.value * (1 - SCREEN));
    const v = range.integer ? Math.round(v0) : v0;
    trial(k, v);
    screenAt.set(k, v);
  }
  let unsearched = chosen.reduce((n, f) => n + [...readsOf.get(f.rule)!].filter((k) => infos.has(k) && inputRange(infos.get(k)!) && !screenAt.has(k)).length, 0);

  // 2. Per finding, the inputs that moved it most; those that change its severity within a tenth are searched first.
  const pairs: { f: Finding; info: InputInfo; score: number; order: number }[] = [];
  chosen.forEach((f, order) => {
    const scored: { info: InputInfo; score: number }[] = [];
    for (const k of readsOf.get(f.rule)!) {
      const at = screenAt.get(k);
      if (at === undefined) continue;
      const o = outcome(f, k, at);
      let score = 0;
      if (o && o.severity !== f.severity) score = Infinity;
      else if (o && o.utilisation !== null && f.utilisation !== null) score = Math.abs(o.utilisation - f.utilisation);
      if (score > 0) scored.push({ info: infos.get(k)!, score });
    }
    scored.sort((x, y) => y.score - x.score || x.info.input.localeCompare(y.info.input));
    for (const x of scored.slice(0, KEEP_PER_FINDING)) pairs.push({ f, ...x, order });
  });
  pairs.sort((x, y) => Number(y.score === Infinity) - Number(x.score === Infinity) || x.order - y.order || y.score - x.score);

  // 3. Search each pair for its break-even value while the work limit allows.
  const found = pairs.map(({ f, info, order }) => {
    const range = inputRange(info)!;
    const base = { rule: f.rule, subject: f.subject, severity: f.severity, input: info.input, origin: info.origin, value: info.value, unit: info.unit, status: info.status };
    if (work >= workLimit) {
      unsearched++;
      return { order, d: { ...base, break_even: null, to_severity: null, change: null, reason: 'not searched: the work limit of the search was reached' } };
    }
    const be = breakEven(info.value, { severity: f.severity, gap: gapOf(f, guideOf(f)) }, range, (v) => outcome(f, info.key, v), range.text);
    const d: DecisiveInput =
      be.break_even === null
        ? { ...base, break_even: null, to_severity: null, change: null, reason: be.reason }
        : { ...base, break_even: be.break_even, to_severity: be.to_severity, change: be.break_even / info.value - 1 };
    return { order, d };
  });
  // Findings in their order; within one, the inputs that need the smallest move first.
  const reach = (d: DecisiveInput) => (d.change === null ? Infinity : Math.abs(d.change));
  const inputs = found.sort((x, y) => x.order - y.order || reach(x.d) - reach(y.d)).map((x) => x.d);
  return { inputs, search: { findings: chosen.length, candidates: infos.size, reruns, work, work_limit: workLimit, unsearched } };
}

type Level = 'advisory' | 'hard';

/** The level a finding's value is nearest to, in proportion: the one its severity would turn at first. */
function guideOf(f: Finding): Level | null {
  const x = f.value;
  if (x === null) return null;
  const levels = (['advisory', 'hard'] as const).filter((l) => typeof f.params[l] === 'number' && f.params[l] !== 0);
  if (!levels.length) return null;
  return levels.reduce((best, l) => (Math.abs(x / (f.params[l] as number) - 1) < Math.abs(x / (f.params[best] as number) - 1) ? l : best));
}

/** The finding's value over the guiding level, less one. */
function gapOf(f: Pick<TrialFinding, 'value' | 'params'>, level: Level | null): number | null {
  const L = level === null ? undefined : f.params[level];
  return f.value === null || typeof L !== 'number' || L === 0 ? null : f.value / L - 1;
}
