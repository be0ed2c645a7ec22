import type { RulesData } from '../../data/rules-data.ts';
import type { WorkingStep } from '../../findings/finding.ts';
import type { JointForce } from '../../model/joint-force.ts';
import type { Joint, JointDemand } from '../../model/lashing-demand.ts';
import { loadFactor } from '../../model/load-factors.ts';
import type { MessageSpec, Report } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import type { DynamicFactor } from '../../ride/dynamic-factors.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';

// What the lashing rules share: how a lashed joint is named in a finding, the
// working and sources of its force, and the finding for a joint whose force
// could not be found.

export type Lashing = CheckedSpecification['lashings'][number];

/** The stable id of a joint (a specification lashes each joint at most once). */
export const jointSubject = (joint: Joint) => `joint.${joint}`;

export const lashingLabel = (l: Lashing) => `${l.joint} lashing`;

/** The lashing in words, for the working. */
export const lashingText = (l: Lashing) => `${l.wraps} wraps of ${l.material} ${num(l.width_mm, 'mm')} × ${num(l.thickness_mm, 'mm')} mm`;

// The cases of the joint forces by their ids, in words without numbers (the
// titles carry the factors; the working shows them).
const CASE_NAMES: Readonly<Record<string, string>> = { draught: 'draught', braking: 'braking', 'stopping-shock': 'the stopping shock', 'rough-ground': 'rough ground', stone: 'the stone strike', turn: 'the design turn' };

/** The governing case in words for a message; the corners are loaded over the bump. */
export const caseName = (d: JointDemand, gov: JointForce): string => (d.joint === 'frame-corners' ? `${gov.id} corner over the bump` : (CASE_NAMES[gov.id] ?? gov.id));

/** The load case a joint's governing force belongs to: the corners are loaded in the bump case only. */
export const loadCaseOf = (d: JointDemand, gov: JointForce | undefined): string | null => (gov === undefined ? null : d.joint === 'frame-corners' ? 'rough-ground' : gov.id);

/** A case's design value of a measure: the force times the case's factor (1.5 fundamental, 1.0 accidental). */
export const designValue = (c: JointForce, measure: 'shear_N' | 'held_N') => c.gamma * c[measure];

/** The case with the largest design value of a measure, or undefined for none. */
export function governingDesign(cases: readonly JointForce[], measure: 'shear_N' | 'held_N'): JointForce | undefined {
  return cases.reduce<JointForce | undefined>((w, c) => (w === undefined || designValue(c, measure) > designValue(w, measure) ? c : w), undefined);
}

/** The governing case's own working, then every case's value of the measure, so it can be seen in context. */
export function forceWorking(d: JointDemand, gov: JointForce | undefined, measure: 'shear_N' | 'held_N'): (WorkingStep | string)[] {
  if (!gov) return ['no load reaches this joint'];
  const what = measure === 'shear_N' ? 'force in the contact face' : 'force held by the fastening';
  return [
    ...gov.working.split('\n'),
    ...d.cases.map((c) => step(`design ${what}, ${c.title} (${c.combination}, × ${num(c.gamma)})`, `${num(c.gamma)} × ${num(c[measure])}`, designValue(c, measure), 'N')),
  ];
}

/** Ids of the sources of the load factors the joint forces use: the rough ground's and the stone's (the ride model's, or the data's bounds) and the stopping shock's. */
export function demandSourceIds(data: RulesData, bump: DynamicFactor, stone: DynamicFactor): string[] {
  return [...bump.sources, ...stone.sources, ...loadFactor(data, 'stopping_shock_factor').sources];
}

/** The dynamic factors the forces use, and where they came from, as lines of working. */
export const factorLines = (bump: DynamicFactor, stone: DynamicFactor) => [`rough ground, the crew's factor φ = ${num(bump.value)}: ${bump.source}`, `stone, the crew's factor φ = ${num(stone.value)}: ${stone.source}`];

export const DEMAND_UNKNOWN: MessageSpec = { code: 2503, text: 'The force on the {joint} lashing could not be found, so it is not checked; the working says why.' };

/**
 * The lashings whose joint force was found, each with its demand, in the
 * specification's order; for each of the others a warning is reported as the
 * iteration reaches it.
 */
export function* loadedLashings(lashings: readonly Lashing[], demands: Record<Joint, JointDemand>, report: (r: Report<never, 'demandUnknown'>) => void): Generator<{ l: Lashing; d: JointDemand }> {
  for (const l of lashings) {
    const d = demands[l.joint];
    if (d.unknown === null) yield { l, d };
    else report(demandUnknown(l, d));
  }
}

/** A lashing the model could not load is not a pass: it says so, as a warning. */
export function demandUnknown(l: Lashing, d: JointDemand): Report<never, 'demandUnknown'> {
  return {
    subject: jointSubject(l.joint),
    label: lashingLabel(l),
    message: 'demandUnknown',
    params: { joint: l.joint },
    severity: 'warning',
    fix: 'Fix what stops the model (see its own finding), then check again.',
    working: [`${d.joint}: ${d.where}`, `not found: ${d.unknown ?? 'no reason given'}`],
  };
}
