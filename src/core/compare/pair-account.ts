import type { RulesData } from '../data/rules-data.ts';
import type { Finding } from '../findings/finding.ts';
import type { ModelInputs } from '../pipeline/define-model.ts';
import type { Rule } from '../pipeline/define-rule.ts';
import type { CheckResult } from '../result/check-result.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { AccountLine, Quantity } from './account-line.ts';
import { accountText, line } from './account-text.ts';
import { ABSENT_WORD, SEVERITY_WORD } from './account-templates.ts';
import { BaselineTrials, type TrialOutcome } from './change-trials.ts';
import { changeLine } from './change-words.ts';
import type { PairAccount, SpecDifference } from './compare-result.ts';
import { decidingFindings, type FindingPair } from './deciding-findings.ts';
import { findingKey } from './finding-diff.ts';
import { diffSpecs } from './spec-diff.ts';

/** How many single changes the account names for a deciding finding: those that move it most. */
export const NAMED_CHANGES = 3;
/** How many of the changes that move it most are tried together. */
export const TOGETHER_MOST = 6;
/** How many deciding findings are explained in full; the rest are counted. */
export const EXPLAINED_FINDINGS = 2;

export interface ComparedSpec {
  label: string;
  spec: CheckedSpecification;
  result: CheckResult;
}

export interface AccountArgs {
  base: ComparedSpec;
  other: ComparedSpec;
  data: RulesData;
  inputs: Omit<ModelInputs, 'spec' | 'data'>;
  rules: readonly Rule[];
}

/** What one change of the baseline did to the deciding finding. */
interface Effect {
  diff: SpecDifference;
  /** Null: refused alone by the cross-field checks. */
  outcome: TrialOutcome | null;
  finding: Finding | null;
  /** The part of the move from baseline to other build this change makes alone; null where there are no values to measure. */
  share: number | null;
  reaches: boolean;
}

const word = (f: Finding | null) => (f ? SEVERITY_WORD[f.severity] : ABSENT_WORD);
const valueOf = (f: Finding | null): Quantity | null => (f && f.value !== null && Number.isFinite(f.value) ? { value: f.value, unit: f.unit } : null);
const sameSeverity = (a: Finding | null, b: Finding | null) => (a?.severity ?? null) === (b?.severity ?? null);
const size = (e: Effect) => (e.reaches ? Infinity : Math.abs(e.share ?? 0));

/**
 * Why the other build's verdict differs from the baseline's, in plain words
 * from the computation: the findings that decide the difference, the values
 * of the specifications that differ and that those findings read, and what
 * each of them does on its own when the baseline is re-run with it changed
 * (and the ones that move it most, together). The "because" is measured,
 * never assumed.
 */
export function pairAccount(a: AccountArgs): PairAccount {
  const diffs = diffSpecs([a.base.spec, a.other.spec]);
  const names = { base: a.base.label, other: a.other.label };
  const [vb, vo] = [a.base.result.verdict, a.other.result.verdict];
  const deciding = decidingFindings(a.base.result, a.other.result);
  const lines: AccountLine[] = [];
  const who = { ...names, baseName: a.base.result.spec_name, otherName: a.other.result.spec_name };
  if (vb !== vo) lines.push(line('verdictsDiffer', { ...who, baseVerdict: SEVERITY_WORD[vb], otherVerdict: SEVERITY_WORD[vo] }));
  else lines.push(line(deciding.length ? 'verdictsSame' : 'noDifference', { ...who, verdict: SEVERITY_WORD[vb] }));
  let reruns = 0;
  for (const pair of deciding.slice(0, EXPLAINED_FINDINGS)) {
    const rule = a.rules.find((r) => r.id === (pair.other ?? pair.base)!.rule);
    if (!rule) continue;
    const trials = new BaselineTrials(a.base.spec, a.data, a.inputs, [rule]);
    lines.push(...explain(pair, rule, trials, diffs, a));
    reruns += trials.reruns;
  }
  if (deciding.length > EXPLAINED_FINDINGS) lines.push(line('moreDeciding', { count: deciding.length - EXPLAINED_FINDINGS }));
  return { base: a.base.label, other: a.other.label, spec_differences: diffs, lines, text: accountText(lines), reruns };
}

function decidingLine(pair: FindingPair, rule: Rule, names: { base: string; other: string }): AccountLine {
  const f = (pair.other ?? pair.base)!;
  const common = { title: rule.title, rule: rule.id, subject: f.subject_label, baseSeverity: word(pair.base), otherSeverity: word(pair.other), ...names };
  const [vb, vo] = [valueOf(pair.base), valueOf(pair.other)];
  return vb && vo ? line('deciding', { ...common, baseValue: vb, otherValue: vo }) : line('decidingNoValue', common);
}

function explain(pair: FindingPair, rule: Rule, trials: BaselineTrials, diffs: readonly SpecDifference[], a: AccountArgs): AccountLine[] {
  const names = { base: a.base.label, other: a.other.label };
  const key = findingKey((pair.other ?? pair.base)!);
  const out = [decidingLine(pair, rule, names)];
  const read = diffs.filter((d) => trials.reads(rule.id, d.path));
  if (read.length === 0) return [...out, line('notRead')];
  out.push(line('inputsRead', { differing: diffs.length, read: read.length, ...names }));
  // The baseline's own finding, from the traced run (the same as its check's).
  const start = trials.findings.get(key) ?? null;
  const effects: Effect[] = read.map((diff) => {
    const outcome = trials.trial([{ path: diff.path, value: diff.values[1] }]);
    const finding = outcome?.findings.get(key) ?? null;
    return { diff, outcome, finding, share: shareOf(start, finding, pair.other), reaches: outcome !== null && !sameSeverity(start, pair.other) && sameSeverity(finding, pair.other) };
  });
  const ranked = effects.filter((e) => e.outcome === null || size(e) > 0 || !sameSeverity(e.finding, start)).sort((x, y) => Number(x.outcome === null) - Number(y.outcome === null) || size(y) - size(x));
  const change = (e: Effect) => changeLine(e.diff, 1, a.base.spec, a.other.spec);
  for (const e of ranked.slice(0, NAMED_CHANGES)) {
    if (e.outcome === null) {
      out.push(line('refused', { change: change(e) }));
      continue;
    }
    out.push(line('effectLine', { effect: effectLine(change(e), start, e, trials), outcome: outcomeLine(e, rule, names) }));
  }
  if (!ranked.slice(0, NAMED_CHANGES).some((e) => e.reaches)) out.push(togetherLine(ranked.filter((e) => e.outcome !== null && (e.share === null || e.share > 0)).slice(0, TOGETHER_MOST), trials, key, pair.other, names));
  return out;
}

/** The part of the way from the baseline's value to the other build's that the trial goes. */
function shareOf(start: Finding | null, trial: Finding | null, target: Finding | null): number | null {
  const [s, t, g] = [valueOf(start), valueOf(trial), valueOf(target)];
  if (!s || !t || !g || g.value === s.value) return null;
  return (t.value - s.value) / (g.value - s.value);
}

/** The figure in the finding's unit that moves most nearly as the finding's value does, where one moves at all. */
function trackingFigure(start: Finding | null, e: Effect, trials: BaselineTrials): string | null {
  const unit = (e.finding ?? start)?.unit;
  if (!e.outcome || !unit) return null;
  const rel = (from: number, to: number) => (to - from) / Math.max(Math.abs(from), 1e-9);
  const s = valueOf(start);
  const t = valueOf(e.finding);
  const target = s && t ? rel(s.value, t.value) : null;
  let best: { name: string; miss: number } | null = null;
  for (const [name, fig] of Object.entries(e.outcome.figures)) {
    const before = trials.figures[name];
    if (!before || fig.unit !== unit || Math.abs(fig.value - before.value) <= 1e-9 * Math.max(1, Math.abs(before.value))) continue;
    const moved = rel(before.value, fig.value);
    const miss = target === null ? -Math.abs(moved) : Math.abs(moved - target);
    if (!best || miss < best.miss) best = { name, miss };
  }
  return best?.name ?? null;
}

function effectLine(change: AccountLine, start: Finding | null, e: Effect, trials: BaselineTrials): AccountLine {
  const [s, t] = [valueOf(start), valueOf(e.finding)];
  if (!s || !t) return line('effectSeverity', { change });
  const figure = trackingFigure(start, e, trials);
  if (!figure || !e.outcome) return line('effectValue', { change, valueBase: s, valueTrial: t });
  const [fb, ft] = [trials.figures[figure], e.outcome.figures[figure]];
  return line('effectFigure', { change, figure, figureBase: fb, figureTrial: ft, valueBase: s, valueTrial: t });
}

function outcomeLine(e: Effect, rule: Rule, names: { base: string; other: string }): AccountLine {
  const severity = word(e.finding);
  if (e.reaches) return line('reaches', { severity, title: rule.title, rule: rule.id, other: names.other });
  if (e.share !== null) return e.share > 0 ? line('partway', { share: e.share, severity, ...names }) : line('against', { severity, other: names.other });
  return line('noMove', { severity });
}

/** The changes that move the finding most, tried together: the fewest that take it to the other build's severity, or all of them. */
function togetherLine(effects: readonly Effect[], trials: BaselineTrials, key: string, target: Finding | null, names: { base: string; other: string }): AccountLine {
  if (effects.length < 2) return line('noneReach', { severity: word(target) });
  let last: Finding | null = trials.findings.get(key) ?? null;
  for (let n = 2; n <= effects.length; n++) {
    const outcome = trials.trial(effects.slice(0, n).map((e) => ({ path: e.diff.path, value: e.diff.values[1] })));
    if (!outcome) continue;
    last = outcome.findings.get(key) ?? null;
    if (sameSeverity(last, target)) return line('together', { count: n, paths: pathsOf(effects.slice(0, n)), severity: word(last), other: names.other });
  }
  return line('togetherShort', { count: effects.length, paths: pathsOf(effects), severity: word(last) });
}

const pathsOf = (effects: readonly Effect[]) => effects.map((e) => e.diff.path).join(', ');
