import type { RulesData } from '../../data/rules-data.ts';
import { makeFinding } from '../../engine/make-finding.ts';
import type { Finding, Severity } from '../../findings/finding.ts';
import type { FloorModel } from '../../model/cable-net/floor-model.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';
import { G } from '../../units/units.ts';

// The lines every floor finding opens its working with: the net, the loads
// and how the solve ended.

/** A number the solver may not have reached (NaN) as a finding's value. */
export const known = (v: number): number | null => (Number.isFinite(v) ? v : null);

export const caseName = (m: FloorModel): string => (m.factor === 1 ? 'crew standing' : `bump, ${Number(m.factor.toFixed(2))} × crew weight`);

export function floorWorking(spec: CheckedSpecification, data: RulesData, m: FloorModel): string[] {
  const s = spec.floor_straps;
  const E = data.leathers[s.material].modulus_MPa.value;
  const { length_mm, width_mm } = spec.box.floor.foot_patch;
  return [
    `EA = E × b × t = ${E} MPa × ${s.width_mm} × ${s.thickness_mm} mm = ${m.EA_N.toFixed(0)} N (${s.material}); T_0 = ${m.pretension_N} N; l_0 = p / (1 + T_0/EA) per segment`,
    `net: ${s.weave} weave at pitch ${s.pitch_mm} mm, ${m.nodes} nodes, ${Number.isFinite(m.segments) ? m.segments : 'no'} tension-only segments, ends fixed to the frame`,
    `crew load = m × g × factor, factor ${m.factor} (${m.factorSource}): ${spec.crew.map((c) => `${c.role} ${+c.mass_kg.toFixed(2)} kg × ${G} × ${m.factor} = ${(c.mass_kg * G * m.factor).toFixed(1)} N`).join('; ')}`,
    `each spread over a ${length_mm} × ${width_mm} mm foot patch (front to back × side to side)`,
    Number.isFinite(m.residual_N)
      ? `Newton-Raphson: ${m.iterations} steps, residual ${m.residual_N.toExponential(2)} N ${m.converged ? '≤' : '>'} tolerance ${m.tolerance_N.toExponential(2)} N${m.converged ? '' : ` (${m.stopped})`}`
      : `not solved: ${m.stopped}`,
    `equilibrium: frame reactions ${m.reactionSum_N.toFixed(2)} N, applied ${m.appliedLoad_N.toFixed(2)} N`,
  ];
}

/** A floor that was not solved: its values are not to be trusted, and the finding says so and points to floor.convergence. */
export function notSolvedFinding(rule: string, m: FloorModel, o: { severity: Severity; unit: string; value?: number | null; limit?: number | null; what: string; source: string; working: string }): Finding {
  return makeFinding(rule, {
    severity: o.severity,
    subject: caseName(m),
    value: o.value ?? null,
    unit: o.unit,
    limit: o.limit ?? null,
    message: 'floorNotSolved',
    params: { case: caseName(m), reason: m.stopped ?? 'not converged' },
    fix: `See floor.convergence; the floor must be solved before its ${o.what} can be judged.`,
    source: o.source,
    working: o.working,
  });
}
