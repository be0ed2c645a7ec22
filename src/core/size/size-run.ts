import { CAUTIONS } from '../cautions.ts';
import type { RulesData } from '../data/rules-data.ts';
import type { Finding } from '../findings/finding.ts';
import type { ModelInputs } from '../pipeline/define-model.ts';
import type { Rule } from '../pipeline/define-rule.ts';
import { prepareSpec } from '../spec/prepare.ts';
import type { SpecEntry } from '../spec/spec-entry.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { SERIES_TEXT, STOCK_TEXT } from './candidates.ts';
import { membersOf, sectionsAt, withSections, type Member } from './members.ts';
import { optionsFor, type FindingOptions } from './one-input-options.ts';
import { PartialCheck } from './partial-check.ts';
import { CRITERION_TEXT, judge, rulePasses, type FindingChange } from './size-criterion.ts';
import { sizeMember, type MemberSizing } from './size-member.ts';

// A sizing run as a list of items (each failing or warning member, then each
// failing finding of another rule), run one at a time so the caller can show
// progress and stop between items; what is finished is a complete result.

export interface SizeResult {
  spec_name: string;
  mode: 'stock' | 'free';
  /** How "passes every check" is decided, in words. */
  criterion: string;
  /** Where the sections come from, in words. */
  sections_from: string;
  /** The build as given: its mass and the stock plan's cost. */
  given: { mass_kg: number; cost: number | null; failing_or_warning: number };
  members: MemberSizing[];
  /** Every proposed section written in at once and checked: whether each sized member's rule still passes, and what it does to the build. */
  together: Together | null;
  others: FindingOptions[];
  /** False where the run was stopped before every item was done; the items not done are named. */
  complete: boolean;
  not_done: string[];
  search: { trials: number; work: number };
  notes: string[];
  cautions: string[];
}

export interface Together {
  /** Every sized member's rule passes with all the proposals in, and no other finding is worse than in the build as given. */
  passes: boolean;
  /** Sized members whose rule does not pass with all the proposals in. */
  failing: string[];
  worse: FindingChange[];
  /** Rounds of re-sizing the members that failed together, each with the others' proposals held. */
  rounds: number;
  mass_change_kg: number | null;
  cost_change: number | null;
}

/** Rounds in which members that fail with every proposal in are sized again. */
export const ROUNDS = 3;

export interface SizeArgs {
  raw: unknown;
  spec: CheckedSpecification;
  entries: readonly SpecEntry[];
  data: RulesData;
  rules: readonly Rule[];
  inputs: Omit<ModelInputs, 'spec' | 'data'>;
  mode: 'stock' | 'free';
}

export interface SizeRun {
  /** Each item's words, in the order they run. */
  items: string[];
  /** Runs the next item; false when none is left. */
  next(): boolean;
  /** The result of the items finished so far. */
  result(): SizeResult;
}

const NOTES = [
  'Each proposal holds the rest of the build as given; a default the specification computes from a section (the floor height) follows the new section, as a check of the written-back file would.',
  "Each one-input option is worked from the build as given, not with the proposed sections, and is listed, not applied: options for different findings may pull one input different ways.",
  'A part whose mass the specification gives (mass_kg) keeps that mass: its mass change is then not counted.',
  "The series search takes a member rule's stress to fall as either dimension of its section grows (the extra weight is small beside the extra strength); the sections it proposes are each checked on the whole build.",
];

export function startSizing(a: SizeArgs): SizeRun {
  const check = new PartialCheck({ spec: a.spec, data: a.data, rules: a.rules, inputs: a.inputs });
  const prepare = (raw: unknown) => {
    const p = prepareSpec(raw, a.data);
    return p.ok ? p.spec : null;
  };
  const bad = check.base.findings.filter((f) => f.severity === 'fail' || f.severity === 'warning');
  // The most overloaded member first: it has the least room, and the later ones are sized with its section held.
  const worstUse = (m: Member) => Math.max(...bad.filter((f) => f.rule === m.rule).map((f) => f.utilisation ?? Infinity));
  const members = membersOf(a.spec)
    .filter((m) => bad.some((f) => f.rule === m.rule))
    .sort((x, y) => worstUse(y) - worstUse(x));
  const memberRules = new Set(membersOf(a.spec).map((m) => m.rule));
  const others = check.base.findings.filter((f) => f.severity === 'fail' && !memberRules.has(f.rule));
  const memberItems = members.map((m) => `${m.rule}: ${m.label}`);
  const items = [...memberItems, ...(members.length ? ['every proposed section together'] : []), ...others.map((f) => `${f.rule}: ${f.subject_label}`)];
  const sized = new Map<string, MemberSizing>();
  const options: FindingOptions[] = [];
  const memo = new Map<string, Finding[] | null>();
  let together: Together | null = null;
  let done = 0;
  /** The input with every proposal but `except`'s written in. */
  const heldRaw = (except: string | null) => withSections(a.raw, sectionsAt([...sized.values()].filter((m) => m.found && m.rule !== except).flatMap((m) => m.sections)));
  const trialOf = (raw: unknown) => {
    const spec = prepare(raw);
    return spec ? check.run(spec) : null;
  };
  const size = (m: Member) => {
    const raw = heldRaw(m.rule);
    const reference = sized.size ? trialOf(raw) : check.base;
    sized.set(m.rule, sizeMember({ raw, spec: a.spec, reference: reference ?? check.base, prepare, check, mode: a.mode }, m));
  };
  const combine = (): Together => {
    let rounds = 0;
    for (;;) {
      const trial = trialOf(heldRaw(null));
      const failing = trial ? [...sized.values()].filter((m) => m.found && !rulePasses(trial.findings, m.rule)).map((m) => m.rule) : [...sized.keys()];
      if (!trial || failing.length === 0 || rounds >= ROUNDS) {
        const worse = trial ? judgeAll(check.base.findings, trial.findings, new Set(sized.keys())) : [];
        return {
          passes: trial !== null && failing.length === 0 && worse.length === 0,
          failing,
          worse,
          rounds,
          mass_change_kg: trial ? trial.mass_kg - check.base.mass_kg : null,
          cost_change: trial && trial.cost !== null && check.base.cost !== null ? trial.cost - check.base.cost : null,
        };
      }
      rounds++;
      for (const rule of failing) size(members.find((m) => m.rule === rule)!);
    }
  };
  return {
    items,
    next() {
      if (done >= items.length) return false;
      if (done < members.length) size(members[done]);
      else if (done === members.length && members.length) together = combine();
      else options.push(optionsFor({ spec: a.spec, entries: a.entries, data: a.data, check, memo }, others[done - memberItems.length - 1]));
      done++;
      return true;
    },
    result: () => ({
      spec_name: a.spec.name,
      mode: a.mode,
      criterion: CRITERION_TEXT,
      sections_from: a.mode === 'free' ? `the size series: ${SERIES_TEXT}` : `the stock list: ${STOCK_TEXT}; where it lists none of a part's species, the size series (${SERIES_TEXT})`,
      given: { mass_kg: check.base.mass_kg, cost: check.base.cost, failing_or_warning: bad.length },
      members: [...sized.values()],
      together,
      others: [...options],
      complete: done === items.length,
      not_done: items.slice(done),
      search: { trials: check.trials, work: check.work },
      notes: [...NOTES, ...members.flatMap((m) => (m.tie ? [`${m.label}: ${m.tie.text}.`] : []))],
      cautions: [...CAUTIONS],
    }),
  };
}

/** 0 when every failing or warning member has a passing section and every other failing finding an option; 1 otherwise. */
export function sizeFound(r: SizeResult): boolean {
  return r.members.every((m) => m.found) && (r.together?.passes ?? true) && r.others.every((o) => o.options.length > 0) && r.not_done.length === 0;
}

/** Findings outside the sized rules that are worse than in the build as given (the sized rules are judged by passing). */
function judgeAll(base: readonly Finding[], now: readonly Finding[], sizedRules: ReadonlySet<string>): FindingChange[] {
  const outside = now.filter((f) => !sizedRules.has(f.rule));
  return judge(base, outside, '').worse;
}
