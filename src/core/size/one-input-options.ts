import type { RulesData } from '../data/rules-data.ts';
import { breakEven, type Outcome } from '../decisive/break-even.ts';
import { stepsOf, withInput, type InputInfo } from '../decisive/input-path.ts';
import { inputRange } from '../decisive/input-range.ts';
import type { Finding, Severity } from '../findings/finding.ts';
import { severityRank } from '../findings/severity.ts';
import type { InputKey } from '../pipeline/read-tracer.ts';
import { crossChecks } from '../spec/cross-checks.ts';
import type { SpecEntry } from '../spec/spec-entry.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { PartialCheck } from './partial-check.ts';
import { judge, passing, type FindingChange } from './size-criterion.ts';

// For a failing finding that is not a member's: the smallest change of one
// specification input that makes it pass, found by the decisive search's
// break-even bisection on the pipeline with pass and not-pass as its two
// severities. Each input the finding's rule reads is first moved a tenth;
// the INPUTS_PER_FINDING that move the finding most are searched. An option
// is listed, never applied, with what it does to the other findings.

export const INPUTS_PER_FINDING = 3;
export const SCREEN = 0.1;

export interface InputOption {
  input: string;
  unit: string;
  from: number;
  /** A value at which the finding passes (the passing end of the search's last bracket). */
  to: number;
  /** to / from − 1. */
  change: number;
  to_severity: Severity;
  worse: FindingChange[];
}

export interface FindingOptions {
  rule: string;
  subject: string;
  label: string;
  severity: Severity;
  utilisation: number | null;
  options: InputOption[];
  /** Where no option was found: why. */
  reason?: string;
  /** Inputs the finding's rule reads that the search could move, and how many it searched. */
  inputs: number;
  searched: number;
}

export interface OptionsContext {
  spec: CheckedSpecification;
  entries: readonly SpecEntry[];
  data: RulesData;
  check: PartialCheck;
  /** A rule's findings with one input changed, kept so findings of one rule share their trials. */
  memo: Map<string, Finding[] | null>;
}

/** Trials one finding's screening may make, and then its bisections together. */
export const SCREEN_TRIALS = 80;
export const SEARCH_TRIALS = 60;

const keyOf = (f: { rule: string; subject: string }) => `${f.rule}|${f.subject}`;

/** The numeric specification inputs a rule read that the search may move. */
function inputsOf(ctx: OptionsContext, rule: string): InputInfo[] {
  const out: InputInfo[] = [];
  for (const key of ctx.check.readsOf(rule)) {
    if (!key.startsWith('spec:') || key.startsWith('spec:stock.')) continue;
    let node: unknown = ctx.spec;
    let parent: unknown = null;
    for (const s of stepsOf(key)) {
      parent = node;
      node = typeof node === 'object' && node !== null ? (node as Record<string | number, unknown>)[s] : undefined;
    }
    // A list's length is read as a number but is no input (the count of crew is changed by adding one).
    if (typeof node !== 'number' || node === 0 || Array.isArray(parent)) continue;
    const path = stepsOf(key).join('.');
    const entry = ctx.entries.find((e) => e.path.replace(/\[(\d+)\]/g, '.$1') === path);
    out.push({ key, input: path, origin: 'spec', value: node, unit: entry?.unit ?? '', status: entry?.defaulted ? 'defaulted' : 'given' });
  }
  return out.filter((i) => inputRange(i) !== null);
}

/** The finding (by rule and subject) in the rule's findings with one input changed; where its subject is gone, the rule's worst. */
function findingAt(ctx: OptionsContext, f: Finding, key: InputKey, v: number): Finding | null {
  const id = `${f.rule}|${key}=${v}`;
  if (!ctx.memo.has(id)) {
    const changed = withInput(key, v, ctx.spec, ctx.data);
    ctx.memo.set(id, crossChecks(changed.spec, ctx.data).length ? null : ctx.check.runOnly(changed.spec, new Set([f.rule])));
  }
  const mine = ctx.memo.get(id);
  if (!mine) return null;
  return mine.find((g) => keyOf(g) === keyOf(f)) ?? [...mine].sort((a, b) => severityRank(b.severity) - severityRank(a.severity))[0] ?? null;
}

/** The finding's value over the level it must come within to pass, less one. */
function passGap(f: Finding, template: Finding): number | null {
  const level = typeof template.params.advisory === 'number' ? template.params.advisory : template.params.hard;
  return f.value === null || typeof level !== 'number' || level === 0 ? null : f.value / level - 1;
}

export function optionsFor(ctx: OptionsContext, f: Finding): FindingOptions {
  const budget = { trials: SCREEN_TRIALS };
  const inputs = inputsOf(ctx, f.rule);
  const head = { rule: f.rule, subject: f.subject, label: f.subject_label, severity: f.severity, utilisation: f.utilisation, inputs: inputs.length };
  // 1. Screen: each input a tenth up (down at the top of its range); the ones that move the finding most.
  const scored: { info: InputInfo; score: number }[] = [];
  for (const info of inputs) {
    if (budget.trials <= 0) break;
    const range = inputRange(info)!;
    const up = Math.min(range.high, info.value * (1 + SCREEN));
    let v = up !== info.value ? up : Math.max(range.low, info.value * (1 - SCREEN));
    if (range.integer) v = Math.round(v) === info.value ? info.value + (info.value < range.high ? 1 : -1) : Math.round(v);
    budget.trials--;
    const g = findingAt(ctx, f, info.key, v);
    if (!g) continue;
    const score = passing(g.severity) ? Infinity : g.utilisation !== null && f.utilisation !== null ? Math.abs(g.utilisation - f.utilisation) : g.value !== null && f.value ? Math.abs(g.value / f.value - 1) : 0;
    if (score > 0) scored.push({ info, score });
  }
  scored.sort((a, b) => b.score - a.score || a.info.input.localeCompare(b.info.input));
  const chosen = scored.slice(0, INPUTS_PER_FINDING);

  const screenedAll = budget.trials > 0;
  budget.trials = SEARCH_TRIALS;
  // 2. Each chosen input's nearest passing value, by break-even bisection on a pass / not-pass outcome.
  const options: InputOption[] = [];
  for (const { info } of chosen) {
    if (budget.trials <= 0) break;
    const range = inputRange(info)!;
    const passed: number[] = [];
    const probe = (v: number): Outcome | null => {
      budget.trials--;
      const g = findingAt(ctx, f, info.key, v);
      if (!g || g.severity === 'error') return null;
      if (passing(g.severity)) passed.push(v);
      return { severity: passing(g.severity) ? 'pass' : 'fail', gap: passGap(g, f) };
    };
    const be = breakEven(info.value, { severity: 'fail', gap: passGap(f, f) }, range, probe, range.text);
    if (be.break_even === null) continue;
    // The passing end of the last bracket: the passing value tried nearest the break-even.
    const to = passed.filter((v) => Math.sign(v - info.value) === Math.sign(be.break_even - info.value)).sort((a, b) => Math.abs(a - be.break_even) - Math.abs(b - be.break_even))[0];
    if (to === undefined) continue;
    const changed = withInput(info.key, to, ctx.spec, ctx.data);
    const whole = ctx.check.run(changed.spec);
    const after = whole.findings.find((g) => keyOf(g) === keyOf(f));
    options.push({ input: info.input, unit: info.unit, from: info.value, to, change: to / info.value - 1, to_severity: after?.severity ?? 'pass', worse: judge(ctx.check.base.findings, whole.findings, f.rule).worse });
  }
  options.sort((a, b) => Math.abs(a.change) - Math.abs(b.change));
  const reason = options.length
    ? undefined
    : budget.trials <= 0 || !screenedAll
      ? `not found within the search's budget (${SCREEN_TRIALS} trials to screen the inputs, ${SEARCH_TRIALS} to search them)`
      : inputs.length === 0
        ? 'the rule reads no number of the specification the search can move (a missing part or a choice of words decides it)'
        : `no single input the rule reads makes it pass within its range (the search tried ${chosen.length} of ${inputs.length})`;
  return { ...head, options, searched: chosen.length, ...(reason ? { reason } : {}) };
}
