import type { Combination, WorkingStep } from '../../findings/finding.ts';
import type { Params } from '../../format/template.ts';
import type { DesignValue, TimberStrength } from '../../model/timber/design-strength.ts';
import type { Duration } from '../../model/timber/load-duration.ts';
import type { Report, ResolvedLimit } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import type { STRESS_MESSAGES } from './member-messages.ts';
import { strengthStep } from './strength-step.ts';

// One finding per member check: every load case is worked, the one with the
// highest utilisation governs and is reported with its load-duration class.
// The finding's value is the governing demand, its limit the `utilisation`
// level times the governing capacity.

export type Working = WorkingStep | string;

/** A load case as the finding shows it (a member case, or a rule's own). */
export interface CaseInfo {
  id: string;
  title: string;
  /** The load combination (design basis, section 2) and its material factor. */
  combination: Combination;
  gammaM: number;
  duration: Duration;
  working: string;
  /** Catalogue ids of the factors the case applies. */
  sourceIds: readonly string[];
}

export interface CaseCheck {
  memberCase: CaseInfo;
  /** What is checked, e.g. "bending at the bearing". */
  mode: string;
  /** Stress (MPa) or force (N) in this case. */
  demand: number;
  /** Design strength or capacity in this case, same unit. */
  capacity: number;
  /** The raw numbers the message gives about what the capacity rests on (k_mod, a factor). */
  basis: Params;
  /** The check worked, step by step. */
  steps: readonly Working[];
  /** Catalogue ids this case adds (its k_mod). */
  sources: readonly string[];
}

export interface MemberCheck<M extends string> {
  /** Stable id of the part checked: `axle.arm`, `wheel.spoke`. */
  subject: string;
  label: string;
  /** The part in the message: "axle", "spoke". */
  part: string;
  unit: 'MPa' | 'N';
  checks: readonly CaseCheck[];
  /** The rule's `utilisation` limit as resolved. */
  limit: ResolvedLimit;
  message: { pass: M; fail: M };
  /** Geometry, section and strength working, before the cases. */
  intro: readonly Working[];
  /** Catalogue ids of the data the strength rests on. */
  sources: readonly string[];
  /** What to change where the check fails. */
  fix: string;
}

/** A stress against the design strength of the case's load duration; the strength's step closes the check's steps. */
export function strengthCheck(memberCase: CaseInfo, mode: string, demand: number, s: TimberStrength, d: DesignValue, steps: readonly Working[]): CaseCheck {
  return { memberCase, mode, demand, capacity: d.value, basis: { kMod: d.kMod }, sources: d.kModSources, steps: [...steps, strengthStep(s, d)] };
}

const PASS_FIX = 'None needed. The strength rests on handbook means of small clear specimens reduced to a 5th percentile and graded; confirm the grade of the stock you use.';

const ratio = (c: CaseCheck) => (c.capacity > 0 ? c.demand / c.capacity : c.demand > 0 ? Infinity : 0);

/** The check with the highest utilisation (the first of equals). */
export function governing(checks: readonly CaseCheck[]): CaseCheck {
  if (checks.length === 0) throw new Error('no load case to check the member in');
  return checks.reduce((w, c) => (ratio(c) > ratio(w) ? c : w));
}

/** The report of one member check: every case worked, the governing one compared with its capacity. */
export function memberReport<M extends string>(i: MemberCheck<M>): Report<'utilisation', M> {
  const gov = governing(i.checks);
  const level = i.limit.hard ?? i.limit.advisory;
  if (level === null) throw new Error(`the limit ${i.limit.name} has no level`);
  const limit = level * gov.capacity;
  const working: Working[] = [...i.intro];
  let lastCase = '';
  for (const c of i.checks) {
    if (c.memberCase.id !== lastCase) working.push(`${c.memberCase.title} [${c.memberCase.combination}, ${c.memberCase.duration}]: ${c.memberCase.working}`);
    lastCase = c.memberCase.id;
    working.push(`${c.mode}:`, ...c.steps, step('utilisation = demand / capacity', `${num(c.demand)} / ${num(c.capacity)}`, ratio(c), '1'));
  }
  working.push(`governing: ${gov.mode}, ${gov.memberCase.title}`, step('limit = utilisation level × capacity', `${num(level)} × ${num(gov.capacity)}`, limit, i.unit));
  return {
    subject: i.subject,
    label: i.label,
    message: i.message,
    params: { part: i.part, mode: gov.mode, case: gov.memberCase.title, duration: gov.memberCase.duration, ...gov.basis },
    value: gov.demand,
    unit: i.unit,
    against: { limit: 'utilisation', times: gov.capacity },
    load_case: gov.memberCase.id,
    combination: gov.memberCase.combination,
    fix: gov.demand > limit ? i.fix : PASS_FIX,
    sources: [...i.sources, ...gov.memberCase.sourceIds, ...gov.sources],
    working,
  };
}

/** The report of a stress check, in MPa with the stress messages. */
export function stressReport(i: Omit<MemberCheck<keyof typeof STRESS_MESSAGES>, 'unit' | 'message'>): Report<'utilisation', keyof typeof STRESS_MESSAGES> {
  return memberReport({ ...i, unit: 'MPa', message: { pass: 'within', fail: 'over' } });
}
