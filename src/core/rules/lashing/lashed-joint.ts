import { makeFinding } from '../../engine/make-finding.ts';
import type { Finding } from '../../findings/finding.ts';
import type { JointDemand } from '../../model/lashing-demand.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';

// What the lashing rules share: how a lashing is named and sized in a finding,
// and the finding for a joint whose force could not be found.

export type Lashing = CheckedSpecification['lashings'][number];

export const lashingSize = (l: Lashing) => `${l.width_mm} × ${l.thickness_mm}`;

export const lashingSubject = (l: Lashing) => `lashing, ${l.joint}`;

/** A lashing the model could not load is not a pass: say so. */
export function demandUnknown(rule: string, l: Lashing, d: JointDemand): Finding {
  return makeFinding(rule, {
    severity: 'warning',
    subject: lashingSubject(l),
    value: null,
    unit: 'N',
    limit: null,
    message: 'lashingDemandUnknown',
    params: { joint: l.joint, why: d.unknown ?? 'no reason given' },
    fix: 'Fix what stops the model (see its own finding), then check again.',
    source: 'mechanics note, section 7',
    working: `${d.joint}: ${d.where}\n${d.unknown}`,
  });
}

/** One line listing every case's value of a measure, so the governing one can be seen in context. */
export function caseList(d: JointDemand, measure: 'shear_N' | 'held_N'): string {
  return `all cases: ${d.cases.map((c) => `${c.id} ${c[measure].toFixed(1)} N`).join(', ')}`;
}
