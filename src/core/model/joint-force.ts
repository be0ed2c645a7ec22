// One load case's force on a lashed joint, split about the contact face of
// the two members: along and across it (held by the clamp's friction) and
// normal to it. Of the normal force, the wood carries the part that presses
// the members together in bearing; the fastening must hold the part that
// pulls them apart. Where the sign is not known, all of it is taken as
// pulling apart (the safe side).

export interface JointForce {
  id: string;
  title: string;
  /** The load combination the case is checked in, and the factor on its forces there (design basis, section 2). */
  combination: 'fundamental' | 'accidental';
  gamma: number;
  along_N: number;
  across_N: number;
  /** Magnitude of the force normal to the contact face. */
  normal_N: number;
  /** The part of it that pulls the members apart. */
  apart_N: number;
  /** In the contact face, √(along² + across²): what the clamp's friction must hold. */
  shear_N: number;
  /** √(along² + across² + apart²): what the fastening holds once the clamp gives. */
  held_N: number;
  working: string;
}

export interface ForceParts {
  along?: number;
  across?: number;
  normal?: number;
  /** Default: all of the normal force (its sign not known). */
  apart?: number;
}

const f1 = (v: number) => v.toFixed(1);

/** The combination a joint's case belongs to: the stone and the stopping shock are accidental, the rest fundamental. */
export function caseCombination(id: string): 'fundamental' | 'accidental' {
  return id === 'stone' || id === 'stopping-shock' ? 'accidental' : 'fundamental';
}

/** A joint force from its parts (characteristic, as the action gives them); `lines` say where each part comes from. */
export function jointForce(id: string, title: string, p: ForceParts, lines: string[], gammaQ: number): JointForce {
  const along = p.along ?? 0;
  const across = p.across ?? 0;
  const normal = Math.abs(p.normal ?? 0);
  const apart = Math.abs(p.apart ?? normal);
  const shear = Math.hypot(along, across);
  const held = Math.hypot(along, across, apart);
  const sums = [
    `in the contact face √(along² + across²) = √(${f1(along)}² + ${f1(across)}²) = ${f1(shear)} N`,
    `held by the fastening √(along² + across² + apart²) = √(${f1(along)}² + ${f1(across)}² + ${f1(apart)}²) = ${f1(held)} N`,
  ];
  const combination = caseCombination(id);
  return { id, title, combination, gamma: combination === 'accidental' ? 1 : gammaQ, along_N: along, across_N: across, normal_N: normal, apart_N: apart, shear_N: shear, held_N: held, working: [`${title}:`, ...[...lines, ...sums].map((l) => `  ${l}`)].join('\n') };
}

/** The case with the largest value of a measure, or undefined for none. */
export function governing(cases: readonly JointForce[], measure: 'shear_N' | 'held_N'): JointForce | undefined {
  return cases.reduce<JointForce | undefined>((w, c) => (w === undefined || c[measure] > w[measure] ? c : w), undefined);
}

/** jointForce with the fundamental combination's γ_Q of the data bound in. */
export const jointForceWith =
  (gammaQ: number) =>
  (id: string, title: string, p: ForceParts, lines: string[]): JointForce =>
    jointForce(id, title, p, lines, gammaQ);
