import { param } from '../../data/param.ts';
import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import { caseName, floorWorking, known } from './floor-working.ts';

export const floorConvergence: Rule = {
  id: 'floor.convergence',
  title: 'Floor model convergence',
  checks: 'Whether the cable-net model of the floor reached equilibrium, standing and at a bump, within the tolerance and the number of Newton steps allowed.',
  kind: 'check',
  limits: [],
  run(ctx) {
    const tol = param(ctx.data, 'floor.solver', 'tolerance_fraction');
    const steps = param(ctx.data, 'floor.solver', 'max_iterations');
    return [ctx.analysis.floorStatic, ctx.analysis.floorBump].map((m) =>
      makeFinding(this.id, {
        severity: m.converged ? 'pass' : 'fail',
        subject: caseName(m),
        value: known(m.residual_N),
        unit: 'N',
        limit: m.tolerance_N,
        message: m.converged ? 'floorConverged' : 'floorNotConverged',
        params: { case: caseName(m), iterations: m.iterations, value: Number.isFinite(m.residual_N) ? m.residual_N.toExponential(2) : 'unknown', limit: m.tolerance_N.toExponential(2), reason: m.stopped ?? '' },
        fix: m.converged ? 'None needed.' : 'Check the strap sizes, material and pretension for a slip of the pen (a strap far too thin or soft for the crew); if they are right, allow more Newton steps in rules/limits/floor.yaml and report the case.',
        source: `tolerance: ${tol.source}; steps: ${steps.source}`,
        working: [
          ...floorWorking(ctx.spec, ctx.data, m),
          `tolerance = ${tol.value} × applied load = ${tol.value} × ${m.appliedLoad_N.toFixed(2)} = ${m.tolerance_N.toExponential(3)} N; at most ${steps.value} steps`,
          m.history.length ? `largest out-of-balance force before the first step and after each: ${m.history.map((r) => r.toExponential(2)).join(', ')} N` : 'no steps taken',
        ].join('\n'),
      }),
    );
  },
};
