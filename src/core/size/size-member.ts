import type { Finding, Severity } from '../findings/finding.ts';
import { severityRank } from '../findings/severity.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { seriesAxes, stockCandidates, type Basis } from './candidates.ts';
import { dimsOf, dimsText, withSections, type Dims, type Member, type Slot } from './members.ts';
import type { PartialCheck, TrialResult } from './partial-check.ts';
import { seriesFrontier } from './section-frontier.ts';
import { judge, rulePasses, type FindingChange } from './size-criterion.ts';

// The smallest section of one member that passes every check, the rest of
// the build held. Each slot's candidates are first tried on the member's own
// rule alone (quick: only the models the rule needs are recomputed), with the
// member's other slot, if it has one, at its largest candidate; then the
// sections that pass it are tried smallest first on the whole check.

/** Trials of the member's own rule, and of the whole check, one member may make. */
export const RULE_TRIALS = 160;
export const WHOLE_TRIALS = 30;
/** Sections kept per slot for the whole-check walk. */
const CAP = 3000;

export interface SizingContext {
  /** The parsed input with the rest of the build as held (the sections proposed so far for other members written in). */
  raw: unknown;
  /** The build as given: its sections are the ones changed from, its stock list the one chosen from. */
  spec: CheckedSpecification;
  /** The whole check of `raw`: the mass and cost changes are reckoned from it. */
  reference: TrialResult;
  /** The parsed input prepared again (schema, defaults, cross-field checks); null where it would be refused. */
  prepare(raw: unknown): CheckedSpecification | null;
  check: PartialCheck;
  /** `free`: every slot from the size series; `stock`: from the stock list where it lists the part's species. */
  mode: 'stock' | 'free';
}

export interface SectionChange {
  slot: string;
  label: string;
  /** The specification fields written, in the section's order (width, depth; or the diameter). */
  fields: string[];
  from: number[];
  to: number[];
  basis: Basis;
  /** Why a stock sizing fell back to the series. */
  basis_note?: string;
}

/** A smaller section tried on the whole check, and why it was not taken. */
export interface Rejected {
  sections: string;
  why: string;
}

export interface MemberSizing {
  rule: string;
  member: string;
  /** The worst of the rule's findings in the build as given. */
  severity: Severity;
  utilisation: number | null;
  found: boolean;
  sections: SectionChange[];
  /** With the proposed sections: the rule's worst utilisation, the build's mass and cost change. */
  utilisation_after: number | null;
  mass_change_kg: number | null;
  cost_change: number | null;
  cost_note: string;
  worse: FindingChange[];
  risen: FindingChange[];
  /** Smaller sections the whole check turned down, smallest first. */
  rejected: Rejected[];
  /** Where nothing was found, or the search was cut short: why. */
  reason?: string;
  trials: { rule: number; whole: number };
}

interface SlotPlan {
  slot: Slot;
  basis: Basis;
  note?: string;
  /** Candidates in order, smallest first (the stock list) or the series' axes. */
  list: Dims[] | null;
  axes: number[][] | null;
}

function planSlot(ctx: SizingContext, slot: Slot): SlotPlan {
  const stock = ctx.mode === 'stock' ? stockCandidates(ctx.spec, slot) : null;
  if (stock) return { slot, basis: 'stock', list: stock, axes: null };
  const note = ctx.mode === 'free' ? undefined : slot.fromStock ? `the stock list gives no ${slot.species}` : 'a bore is turned, not cut from stock';
  return { slot, basis: 'series', note, list: null, axes: seriesAxes(ctx.spec, slot) };
}

const largest = (p: SlotPlan): Dims => (p.list ? p.list[p.list.length - 1] : p.axes!.map((a) => a[a.length - 1]));

export function sizeMember(ctx: SizingContext, member: Member): MemberSizing {
  const own = ctx.check.base.findings.filter((f) => f.rule === member.rule);
  const worst = worstOf(own);
  const given = (p: SlotPlan) => dimsOf(ctx.spec, p.slot);
  // Series values the specification would refuse (a bore as wide as the nave) are dropped, each tried with the section's other dimension as given.
  const accepted = (p: SlotPlan, dims: Dims) => ctx.prepare(withSections(ctx.raw, [{ slot: p.slot, dims }])) !== null;
  const plans = member.slots.map((s) => planSlot(ctx, s)).map((p) => (p.axes ? { ...p, axes: p.axes.map((a, i) => a.filter((v) => accepted(p, given(p).map((g, j) => (j === i ? v : g))))) } : p));
  let ruleTrials = 0;
  let wholeTrials = 0;
  const only = new Set([member.rule]);

  // 1. Per slot, the sections on which the rule passes, the other slot generous (its largest accepted candidate).
  const generous = plans.map((p) => (accepted(p, largest(p)) ? largest(p) : given(p)));
  const ruleTest = (k: number) => (dims: Dims) => {
    if (ruleTrials >= RULE_TRIALS) return null;
    const spec = ctx.prepare(withSections(ctx.raw, plans.map((p, i) => ({ slot: p.slot, dims: i === k ? dims : generous[i] }))));
    if (!spec) return false;
    ruleTrials++;
    return rulePasses(ctx.check.runOnly(spec, only), member.rule);
  };
  let cut = false;
  const rejected: Rejected[] = [];
  const named = (p: SlotPlan, d: Dims) => (plans.length > 1 ? `${p.slot.label} ${dimsText(d)}` : dimsText(d));
  const lists = plans.map((p, k) => {
    const test = ruleTest(k);
    if (p.list) {
      const out: Dims[] = [];
      for (const d of p.list) {
        const ok = test(d);
        if (ok === null) cut = true;
        if (ok) out.push(d);
        else if (ok === false) rejected.push({ sections: named(p, d), why: `${member.rule} does not pass` });
      }
      return out;
    }
    const f = seriesFrontier(p.axes!, test, CAP);
    if (!f.complete) cut = true;
    return f.passing;
  });

  // 2. The combinations smallest first (by the sum of the slots' ranks), each on the whole check.
  const base = ctx.check.base;
  for (const combo of combinations(lists)) {
    if (wholeTrials >= WHOLE_TRIALS) {
      cut = true;
      break;
    }
    if (member.tie && !member.tie.holds(combo)) continue;
    const sections = plans.map((p, i) => ({ slot: p.slot, dims: combo[i] }));
    const spec = ctx.prepare(withSections(ctx.raw, sections));
    const text = plans.map((p, i) => named(p, combo[i])).join(', ');
    if (!spec) {
      rejected.push({ sections: text, why: 'the specification would be refused with it' });
      continue;
    }
    wholeTrials++;
    const trial = ctx.check.run(spec);
    const j = judge(base.findings, trial.findings, member.rule);
    const unserved = plans.filter((p) => p.basis === 'stock' && trial.unserved.some((u) => u.startsWith(p.slot.parts)));
    const why = !j.answered
      ? `${member.rule} does not pass with the rest of the build as it then is`
      : j.worse.length
        ? `makes worse: ${j.worse.map((w) => `${w.rule} (${w.label}) ${w.from} → ${w.to}`).join('; ')}`
        : unserved.length
          ? `the stock plan cannot cut the ${unserved.map((p) => p.slot.label).join(' and ')} from the listed section`
          : null;
    if (why) {
      rejected.push({ sections: text, why });
      continue;
    }
    return {
      ...head(member, worst),
      found: true,
      sections: plans.map((p, i) => change(p, given(p), combo[i])),
      ...effects(ctx.reference, trial, member.rule),
      worse: [],
      risen: j.risen,
      rejected,
      trials: { rule: ruleTrials, whole: wholeTrials },
    };
  }
  const reason = cut
    ? `not found within the search's budget (${RULE_TRIALS} trials of the rule, ${WHOLE_TRIALS} of the whole check)`
    : lists.some((l) => l.length === 0)
      ? `no ${plans.find((_, i) => lists[i].length === 0)!.basis === 'stock' ? 'listed' : 'series'} section of the ${plans.find((_, i) => lists[i].length === 0)!.slot.label} passes ${member.rule}`
      : 'every section on which the rule passes makes another finding worse';
  return { ...head(member, worst), found: false, sections: [], utilisation_after: null, mass_change_kg: null, cost_change: null, cost_note: '', worse: [], risen: [], rejected, reason, trials: { rule: ruleTrials, whole: wholeTrials } };
}

function head(member: Member, worst: Finding | undefined) {
  return { rule: member.rule, member: member.label, severity: worst?.severity ?? 'pass', utilisation: worst?.utilisation ?? null };
}

function change(p: SlotPlan, from: Dims, to: Dims): SectionChange {
  return { slot: p.slot.id, label: p.slot.label, fields: p.slot.fields.map((f) => [...p.slot.at, f].join('.')), from: [...from], to: [...to], basis: p.basis, ...(p.note ? { basis_note: p.note } : {}) };
}

function effects(base: TrialResult, trial: TrialResult, rule: string) {
  const mine = trial.findings.filter((f) => f.rule === rule);
  const priced = base.cost !== null && trial.cost !== null;
  const cost_note = priced ? '' : base.cost === null && trial.cost === null ? 'no stock plan cost: the stock list prices not every part cut from it, or nothing is cut from listed stock' : 'the stock plan is priced on one side only';
  return {
    utilisation_after: worstOf(mine)?.utilisation ?? null,
    mass_change_kg: trial.mass_kg - base.mass_kg,
    cost_change: priced ? trial.cost! - base.cost! : null,
    cost_note,
  };
}

/** The worst finding: highest severity, then highest utilisation. */
function worstOf(findings: readonly Finding[]): Finding | undefined {
  return [...findings].sort((a, b) => severityRank(b.severity) - severityRank(a.severity) || (b.utilisation ?? 0) - (a.utilisation ?? 0))[0];
}

/** Index tuples over the lists, by the sum of their ranks, then by the earlier slots' ranks. */
function* combinations(lists: readonly Dims[][]): Generator<Dims[]> {
  if (lists.some((l) => l.length === 0)) return;
  const maxSum = lists.reduce((s, l) => s + l.length - 1, 0);
  for (let sum = 0; sum <= maxSum; sum++) {
    const rec = function* (k: number, left: number, acc: Dims[]): Generator<Dims[]> {
      if (k === lists.length - 1) {
        if (left < lists[k].length) yield [...acc, lists[k][left]];
        return;
      }
      for (let i = 0; i <= Math.min(left, lists[k].length - 1); i++) yield* rec(k + 1, left - i, [...acc, lists[k][i]]);
    };
    yield* rec(0, sum, []);
  }
}

