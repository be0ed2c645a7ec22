import type { RulesData } from '../data/rules-data.ts';
import { recordingData, recordingSpec } from '../decisive/recording-proxy.ts';
import type { Finding } from '../findings/finding.ts';
import { verdictOf } from '../findings/severity.ts';
import type { ModelInputs } from '../pipeline/define-model.ts';
import { ModelGraph } from '../pipeline/model-graph.ts';
import type { ModelId } from '../pipeline/model-values.ts';
import { MODELS } from '../pipeline/models.ts';
import { ReadTracer, type InputKey } from '../pipeline/read-tracer.ts';
import { runRules } from '../pipeline/run-rules.ts';
import { splitFigures, type FigureEntry } from '../result/figure.ts';
import { dampingFigure } from '../ride/damping-figure.ts';
import { RULES } from '../rules/index.ts';
import { pathText, type KeyPath } from '../spec/input-issue.ts';
import { prepareSpec } from '../spec/prepare.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { LpSolver } from '../stock/cutting-types.ts';
import { carriesSpec, specObjects } from '../pipeline/carries-spec.ts';
import type { PointCheck } from './point-outcome.ts';
import { ReuseCache } from './reuse-cache.ts';
import { changedKeys, keySteps, setPath, valueAtKey } from './spec-diff.ts';

// The check of one point of a sweep, reusing all it can. The design point is
// checked once with every read traced (as the decisive-input search does);
// at each point the spec is prepared as `check` prepares it (so a refused
// point is refused for the same reason), the inputs it changed are found, and
// each model and each rule the changes do not reach keeps its design-point
// value. Those they reach are looked up by the values of the changed inputs
// they read, and computed only when no earlier point had the same.

export interface CheckerOptions {
  lp?: LpSolver;
  /** False for a statics-only sweep. */
  ride: boolean;
  /** The figures kept at each point. */
  figures: readonly string[];
  /** Earlier values kept per model or rule. */
  keepPerReader?: number;
}

/** runCheck reports the floor-damping tuner's figure only where a rule asked for the tuner. */
const TUNER = 'floorDampingNeeded' satisfies ModelId;

/** Whole points kept by their values (small: a verdict and a few numbers each). */
const POINTS_KEPT = 4096;

interface RuleResult {
  findings: Finding[];
  asksTuner: boolean;
}

export type Checker = { ok: true; check(values: readonly number[]): PointCheck; design: PointCheck; spec: CheckedSpecification; figureUnits: Record<string, string>; cache: ReuseCache; computed: ReadonlyMap<ModelId, number> } | { ok: false; reason: string };

const refusalText = (issues: readonly { path: KeyPath; message: string }[]) => issues.map((i) => `${pathText(i.path)}: ${i.message}`).join('; ');

export function pointChecker(raw: unknown, data: RulesData, paths: readonly KeyPath[], options: CheckerOptions): Checker {
  const base = prepareSpec(raw, data);
  if (!base.ok) return { ok: false, reason: refusalText(base.issues) };
  const inputs = (spec: CheckedSpecification): ModelInputs => ({ spec, data, lp: options.lp, ride: options.ride });

  // What every model and rule read, at the design point.
  const tracer = new ReadTracer();
  const traced = { spec: recordingSpec(base.spec, tracer), data: recordingData(data, tracer) };
  const tracedGraph = new ModelGraph(MODELS, { ...inputs(base.spec), ...traced }, { tracer });
  runRules(RULES, traced.spec, traced.data, tracedGraph, tracer);
  tracedGraph.get('figures');
  const specKeys = (reader: string) => [...tracer.closure(reader).inputs].filter((k) => k.startsWith('spec:'));
  const modelKeys = new Map([...tracedGraph.values().keys()].map((id) => [id, new Set(specKeys(`model:${id}`))]));
  const ruleKeys = RULES.map((r) => new Set(specKeys(`rule:${r.id}`)));

  // The design point's own values, computed without the tracer's views.
  const graph = new ModelGraph(MODELS, inputs(base.spec));
  const baseRules: RuleResult[] = RULES.map((r) => ({ findings: runRules([r], base.spec, data, graph), asksTuner: tracer.closure(`rule:${r.id}`).models.has(`model:${TUNER}`) }));
  graph.get('figures');
  const baseValues = graph.values();
  const inSpec = specObjects(base.spec);
  const carriers = new Set([...baseValues].filter(([, v]) => carriesSpec(v, inSpec)).map(([id]) => id));

  const cache = new ReuseCache(options.keepPerReader ?? 512);
  /** How many times each model was computed after the design point (the tests and the bench read it). */
  const computed = new Map<ModelId, number>();
  const stepsOf = new Map<InputKey, string[]>();
  const steps = (k: InputKey) => stepsOf.get(k) ?? stepsOf.set(k, keySteps(k)).get(k)!;
  const readers = [...[...modelKeys.values()], ...ruleKeys];
  /** For each set of changed inputs (most sweeps change the same few at every point): the changed inputs each reader read. */
  const readByChange = new Map<string, InputKey[][]>();
  const changedRead = (changed: ReadonlySet<InputKey>) => {
    const id = [...changed].join('\n');
    let lists = readByChange.get(id);
    if (!lists) readByChange.set(id, (lists = readers.map((keys) => [...changed].filter((k) => keys.has(k)))));
    return lists;
  };
  /** A reader's changed inputs as a lookup key of their names and values at this point; '' where it read none. */
  const reuseKey = (read: readonly InputKey[], spec: CheckedSpecification) => (read.length ? read.map((k) => `${k}=${String(valueAtKey(spec, steps(k)))}`).join('|') : '');

  const summarise = (results: readonly RuleResult[], g: ModelGraph): PointCheck => {
    const findings = results.flatMap((r) => r.findings);
    const tuner = results.some((r) => r.asksTuner) ? (g.get(TUNER) ?? null) : null;
    const { figures } = splitFigures({ ...g.get('figures'), floor_damping_ratio_needed: dampingFigure(tuner) });
    let worst: Finding | null = null;
    for (const f of findings) if (f.utilisation !== null && (worst === null || f.utilisation > worst.utilisation!)) worst = f;
    return {
      verdict: verdictOf(findings.map((f) => f.severity)),
      worst_utilisation: worst?.utilisation ?? null,
      worst: worst && { rule: worst.rule, subject: worst.subject },
      figures: options.figures.map((n) => figures[n]?.value ?? null),
    };
  };
  const design = summarise(baseRules, graph);
  const figureUnits = figureUnitsOf({ ...graph.get('figures'), floor_damping_ratio_needed: dampingFigure(null) });

  /** Points already checked, by their values: an envelope line crosses the grid, and bisection may come back. */
  const pointKey = (values: readonly number[]) => values.join('|');
  const done = new ReuseCache(POINTS_KEPT);
  const check = (values: readonly number[]): PointCheck => {
    const key = pointKey(values);
    const kept = done.get('point', key) as PointCheck | undefined;
    if (kept) return kept;
    const out = checkAfresh(values);
    done.set('point', key, out);
    return out;
  };
  const checkAfresh = (values: readonly number[]): PointCheck => {
    let pointRaw = raw;
    paths.forEach((p, i) => (pointRaw = setPath(pointRaw, p, values[i])));
    const prepared = prepareSpec(pointRaw, data, { entries: false });
    if (!prepared.ok) return { verdict: 'refused', worst_utilisation: null, worst: null, figures: options.figures.map(() => null), reason: refusalText(prepared.issues) };
    const spec = prepared.spec;
    const changed = changedKeys(base.spec, spec);
    if (changed.size === 0) return design;

    const read = changedRead(changed);
    // A reader that read every varied value (and every other changed input) is computed afresh: on a grid no
    // later point repeats all of them. One that read fewer is kept, also where this point changed only what it
    // read (an envelope line's point, the others at the design point): the grid's points come back to it.
    const keeps = (list: readonly InputKey[]) => list.length < changed.size || list.length < paths.length;
    const seed = new Map<ModelId, unknown>();
    const toKeep = new Map<ModelId, string>();
    let r = 0;
    for (const id of modelKeys.keys()) {
      const list = read[r++];
      const key = reuseKey(list, spec);
      if (key === '') {
        if (!carriers.has(id)) seed.set(id, baseValues.get(id));
        continue;
      }
      if (carriers.has(id) || !keeps(list)) continue;
      const kept = cache.get(`model:${id}`, key);
      if (kept !== undefined) seed.set(id, kept);
      else toKeep.set(id, key);
    }
    const pointTracer = new ReadTracer();
    // A point's ride is judged and summed up, never drawn: its cases keep no time series.
    const g = new ModelGraph(MODELS, { ...inputs(spec), rideSeries: false }, { seed, tracer: pointTracer });
    const results = RULES.map((rule, i): RuleResult => {
      const list = read[modelKeys.size + i];
      const key = reuseKey(list, spec);
      if (key === '') return baseRules[i];
      const kept = keeps(list) ? (cache.get(`rule:${rule.id}`, key) as RuleResult | undefined) : undefined;
      if (kept) return kept;
      const r = { findings: runRules([rule], spec, data, g, pointTracer), asksTuner: pointTracer.closure(`rule:${rule.id}`).models.has(`model:${TUNER}`) };
      if (keeps(list)) cache.set(`rule:${rule.id}`, key, r);
      return r;
    });
    const out = summarise(results, g);
    for (const id of g.computed) {
      if (toKeep.has(id)) cache.set(`model:${id}`, toKeep.get(id)!, g.peek(id));
      computed.set(id, (computed.get(id) ?? 0) + 1);
    }
    return out;
  };
  return { ok: true, check, design, spec: base.spec, figureUnits, cache, computed };
}

/** Every figure's unit ('' for one that does not apply at the design point). */
function figureUnitsOf(entries: Record<string, FigureEntry>): Record<string, string> {
  return Object.fromEntries(Object.entries(entries).map(([n, e]) => [n, 'unit' in e ? e.unit : '']));
}
