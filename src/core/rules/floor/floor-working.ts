import type { RulesData } from '../../data/rules-data.ts';
import type { Combination, WorkingStep } from '../../findings/finding.ts';
import type { Severity } from '../../findings/severity.ts';
import { formatNumber } from '../../format/number-format.ts';
import type { FloorModel } from '../../model/cable-net/floor-model.ts';
import type { MessageSpec, Report } from '../../pipeline/define-rule.ts';
import type { BumpFactors } from '../../pipeline/model-values.ts';
import { num, step } from '../../pipeline/step.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';
import { G } from '../../units/units.ts';

// What the floor rules share: the two cases the floor is solved in, the
// steps every floor finding opens its working with (the net, the loads and
// how the solve ended), and the finding for a floor that was not solved.

/** One case the floor is solved in, as the findings name it. */
export interface FloorCase {
  model: FloorModel;
  load_case: 'static' | 'rough-ground' | 'stone';
  /** In words, for a message: `crew standing`, `bump`. */
  name: string;
  /** For a finding's label, with the factor on the crew's weight. */
  label: string;
  /** The sources of that factor. */
  sources: string[];
  /** For the serviceability checks (sag, clearance): unfactored loads; the stone strike is accidental. */
  combination: Combination;
}

export function standingCase(model: FloorModel): FloorCase {
  return { model, load_case: 'static', name: 'crew standing', label: 'crew standing', sources: [], combination: 'characteristic' };
}

const times = (m: FloorModel) => `${formatNumber(m.factor)} × crew weight`;

/** The routine rough ground's case: its factor comes from the ride model or, without one, the data's bound. */
export function bumpCase(model: FloorModel, bump: BumpFactors): FloorCase {
  return { model, load_case: 'rough-ground', name: 'rough ground', label: `rough ground, ${times(model)}`, sources: bump.crew.sources, combination: 'characteristic' };
}

/** The stone: an accidental case, every action × 1.0, so the same floor serves the clearance and the strength checks. */
export function stoneCase(model: FloorModel, stone: BumpFactors): FloorCase {
  return { model, load_case: 'stone', name: 'stone', label: `stone, ${times(model)}`, sources: [...stone.crew.sources, 'en-1990-6-11'], combination: 'accidental' };
}

type ServiceModels = { floorStatic: FloorModel; floorBump: FloorModel; floorStone: FloorModel; bumpFactors: BumpFactors; stoneFactors: BumpFactors };
type StrengthModels = { floorDesign: FloorModel; floorDesignRough: FloorModel; floorStone: FloorModel; bumpFactors: BumpFactors; stoneFactors: BumpFactors };

/** The floor as it is loaded (sag, clearance): standing and over rough ground unfactored, and the stone. */
export function serviceCases(m: ServiceModels): FloorCase[] {
  return [standingCase(m.floorStatic), bumpCase(m.floorBump, m.bumpFactors), stoneCase(m.floorStone, m.stoneFactors)];
}

/** The floor in its design states (strap and rail strength): the fundamental combination standing and over rough ground, and the stone. */
export function strengthCases(m: StrengthModels): FloorCase[] {
  const combo = ['en-1990-6-10', 'en-1990-a1-2b'];
  return [
    { model: m.floorDesign, load_case: 'static', name: 'crew standing', label: `crew standing, ${times(m.floorDesign)}`, sources: combo, combination: 'fundamental' },
    { model: m.floorDesignRough, load_case: 'rough-ground', name: 'rough ground', label: `rough ground, ${times(m.floorDesignRough)}`, sources: [...m.bumpFactors.crew.sources, ...combo], combination: 'fundamental' },
    stoneCase(m.floorStone, m.stoneFactors),
  ];
}

/** Every floor the check solves, once each: the service states and the design states. */
export function everyFloorCase(m: ServiceModels & StrengthModels): FloorCase[] {
  const [standing, rough, stone] = serviceCases(m);
  const [designStanding, designRough] = strengthCases(m);
  return [standing, rough, stone, designStanding, designRough];
}

/** A number the solver may not have reached (NaN) as a finding's value. */
export const known = (v: number): number | null => (Number.isFinite(v) ? v : null);

/** The sources of the net itself: the strap material's stiffness. */
export const netSources = (spec: CheckedSpecification, data: RulesData): string[] => data.leathers[spec.floor_straps.material].modulus_MPa.sources;

// Residuals are far below a newton once solved; millinewtons keep them readable.
export const mN = (force_N: number): number => force_N * 1e3;

export function floorWorking(spec: CheckedSpecification, data: RulesData, m: FloorModel): (WorkingStep | string)[] {
  const s = spec.floor_straps;
  const E = data.leathers[s.material].modulus_MPa.value;
  const { length_mm, width_mm } = spec.box.floor.foot_patch;
  return [
    step(`EA = E × b × t (${s.material})`, `${num(E)} MPa × ${num(s.width_mm, 'mm')} mm × ${num(s.thickness_mm, 'mm')} mm`, m.EA_N, 'N'),
    step('T_0 (pretension)', '', m.pretension_N, 'N'),
    'each segment of plan length p is cut to l_0 = p / (1 + T_0/EA), so it carries T_0 when flat',
    `net: ${s.weave} weave at a pitch of ${num(s.pitch_mm, 'mm')} mm, ${num(m.nodes, 'count')} nodes, ${Number.isFinite(m.segments) ? num(m.segments, 'count') : 'no'} tension-only segments, ends anchored on the frame`,
    ...(m.frame
      ? [
          `the frame bends in plan under the straps' pull (a closed loop of rails, ${m.frame.cornerRadius_mm > 0 ? 'bent front corners' : 'square corners'}${m.frame.struts.length ? `, the ${m.frame.struts.map((x) => x.part).join(' and ')} beneath as a strut` : ''}); the anchors move in with it and each strap's plan length shrinks by its anchors' movement, so the pretension relaxes`,
          step('largest inward movement of a strap end', '', m.frame.maxAnchorMove_mm, 'mm'),
        ]
      : []),
    `factor on the crew's weight ${num(m.factor)} (${m.factorSource})`,
    ...spec.crew.map((c) => step(`P = m × g × factor (${c.role})`, `${num(c.mass_kg)} × ${num(G)} × ${num(m.factor)}`, c.mass_kg * G * m.factor, 'N')),
    `each spread over a ${num(length_mm, 'mm')} × ${num(width_mm, 'mm')} mm foot patch (front to back × side to side)`,
    Number.isFinite(m.residual_N)
      ? `Newton-Raphson: ${num(m.iterations, 'count')} steps, residual ${num(mN(m.residual_N))} mN ${m.converged ? '≤' : '>'} tolerance ${num(mN(m.tolerance_N))} mN${m.converged ? '' : ` (${m.stopped})`}`
      : `not solved: ${m.stopped}`,
    step('equilibrium: Σ frame reactions', '', m.reactionSum_N, 'N'),
    step('equilibrium: Σ applied crew load', '', m.appliedLoad_N, 'N'),
  ];
}

/** The message a floor rule gives where the floor was not solved; each rule gives it its own code. */
export function notSolvedMessage(code: number): MessageSpec {
  return { code, text: 'The floor model did not settle in the {case} case ({reason}), so its tensions and sags cannot be trusted; see floor.convergence.' };
}

/** A floor that was not solved: its values are not to be trusted, and the finding says so and points to floor.convergence. */
export function notSolvedReport(
  c: FloorCase,
  o: { subject: string; severity: Severity; unit: string; value?: number | null; what: string; sources: readonly string[]; working: readonly (WorkingStep | string)[] },
): Report<never, 'notSolved'> {
  return {
    subject: o.subject,
    label: c.label,
    message: 'notSolved',
    params: { case: c.name, reason: c.model.stopped ?? 'not converged' },
    value: o.value ?? null,
    unit: o.unit,
    severity: o.severity,
    fix: `See floor.convergence; the floor must be solved before its ${o.what} can be judged.`,
    sources: [...o.sources, ...c.sources],
    working: o.working,
    load_case: c.load_case,
  };
}
