import type { Limit } from '../../data/rules-data.ts';
import { makeFinding } from '../../engine/make-finding.ts';
import type { Finding } from '../../findings/finding.ts';
import type { Duration } from '../../model/timber/load-duration.ts';

// One finding per member check: every load case is worked, the one with the
// highest utilisation governs and is reported with its load-duration class.

/** A load case as the finding shows it (a member case, or a rule's own). */
export interface CaseInfo {
  id: string;
  title: string;
  duration: Duration;
  working: string;
  /** Sources of the factors the case applies. */
  sources: string[];
}

export interface CaseCheck {
  memberCase: CaseInfo;
  /** What is checked, e.g. "bending at the bearing". */
  mode: string;
  /** Stress (MPa) or force (N) in this case. */
  demand: number;
  /** Design strength or capacity in this case, same unit. */
  capacity: number;
  /** What the capacity rests on, e.g. "k_mod 0.9, short". */
  basis: string;
  /** The check with numbers, one line. */
  line: string;
  /** Sources this case adds (its k_mod). */
  sources: string[];
}

export interface MemberFindingInput {
  rule: string;
  part: string;
  unit: 'MPa' | 'N';
  checks: readonly CaseCheck[];
  /** The rule's utilisation_max limit. */
  umax: Limit;
  /** Geometry, section and strength working, before the cases. */
  intro: readonly string[];
  sources: readonly string[];
  fix: string;
}

const ratio = (c: CaseCheck) => (c.capacity > 0 ? c.demand / c.capacity : c.demand > 0 ? Infinity : 0);
const shown = (v: number, unit: string) => (unit === 'N' ? v.toFixed(0) : v.toFixed(2));

export function memberFinding(i: MemberFindingInput): Finding {
  const gov = i.checks.reduce((w, c) => (ratio(c) > ratio(w) ? c : w));
  const limit = i.umax.value * gov.capacity;
  const severity = gov.demand > limit ? 'fail' : 'pass';
  const lines = [...i.intro];
  let lastCase = '';
  for (const c of i.checks) {
    if (c.memberCase.id !== lastCase) lines.push(`${c.memberCase.title} [${c.memberCase.duration}]: ${c.memberCase.working}`);
    lastCase = c.memberCase.id;
    lines.push(`  ${c.mode}: ${c.line}; utilisation ${ratio(c).toFixed(3)}`);
  }
  const util = limit > 0 ? gov.demand / limit : Infinity;
  lines.push(`governing: ${gov.mode}, ${gov.memberCase.title}: ${shown(gov.demand, i.unit)} ${i.unit} against ${i.umax.value} × ${shown(gov.capacity, i.unit)} = ${shown(limit, i.unit)} ${i.unit}; utilisation ${util.toFixed(3)}`);
  const sources = [...new Set([i.umax.source, ...i.sources, ...gov.memberCase.sources, ...gov.sources])];
  return makeFinding(i.rule, {
    severity,
    subject: `${i.part}, ${gov.mode}`,
    value: gov.demand,
    unit: i.unit,
    limit,
    message: severity === 'pass' ? 'memberWithin' : 'memberOver',
    params: { part: i.part, mode: gov.mode, value: shown(gov.demand, i.unit), unit: i.unit, limit: shown(limit, i.unit), case: gov.memberCase.title, basis: gov.basis, util: util.toFixed(2) },
    fix: severity === 'pass'
      ? 'None needed. The strength rests on handbook means of small clear specimens reduced to a 5th percentile and graded; confirm the grade of the stock you use.'
      : i.fix,
    source: sources.join('; '),
    working: lines.join('\n'),
  });
}

/** "k_mod 0.9, short" */
export function kModBasis(kMod: number, duration: string): string {
  return `k_mod ${kMod}, ${duration}`;
}
