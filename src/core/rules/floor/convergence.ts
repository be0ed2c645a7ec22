import { param } from '../../data/param.ts';
import { defineRule, type LimitSpec } from '../../pipeline/define-rule.ts';
import { grade } from '../../pipeline/grade.ts';
import { num, step } from '../../pipeline/step.ts';
import { everyFloorCase, floorWorking, mN, netSources } from './floor-working.ts';

const RESIDUAL: LimitSpec = { direction: 'max', unit: "of the solver's tolerance" };

export const floorConvergence = defineRule({
  id: 'floor.convergence',
  title: 'Floor model convergence',
  checks: 'Whether the cable-net model of the floor reached equilibrium in every state it is solved in (standing, rough ground and the stone as loaded, and the design states of the fundamental combination), within the tolerance and the number of Newton steps allowed.',
  kind: 'check',
  ofTheModel: true,
  method: ['design-basis-floor'],
  needs: ['floorStatic', 'floorBump', 'floorStone', 'floorDesign', 'floorDesignRough', 'bumpFactors', 'stoneFactors'],
  limits: { residual: RESIDUAL },
  params: [],
  messages: {
    converged: { code: 2221, text: 'The floor model settled in the {case} case in {iterations} Newton steps: largest out-of-balance force {residual:mN}, tolerance {tolerance:mN}.' },
    notConverged: { code: 2222, text: 'The floor model did not settle in the {case} case: after {iterations} Newton steps the largest out-of-balance force is {residual:mN} against the tolerance {tolerance:mN} ({reason}).' },
    declined: { code: 2223, text: 'The floor model was not solved in the {case} case: {reason}.' },
  },
  run(ctx) {
    const { spec, data } = ctx;
    // The solver's own settings (model parameters): the limit compares the residual with the tolerance they give.
    const tol = param(data, 'floor.solver', 'tolerance_fraction');
    const steps = param(data, 'floor.solver', 'max_iterations');
    const nodes = param(data, 'floor.solver', 'max_nodes');
    for (const c of everyFloorCase(ctx.models)) {
      const m = c.model;
      const fix = 'Check the strap sizes, material and pretension for a slip of the pen (a strap far too thin or soft for the crew); if they are right, allow more Newton steps (max_iterations in rules/parameters/floor.yaml) and report the case.';
      const common = { subject: 'floor.net', label: `floor net, ${c.label}`, load_case: c.load_case, combination: c.combination, sources: [...tol.sources, ...steps.sources, ...netSources(spec, data), ...c.sources] };
      const working = [
        ...floorWorking(spec, data, m),
        step('tolerance = tolerance_fraction × applied load', `${num(tol.value)} × ${num(m.appliedLoad_N)} N`, mN(m.tolerance_N), 'mN'),
        `at most ${num(steps.value, 'count')} Newton steps (max_iterations) and ${num(nodes.value, 'count')} nodes (max_nodes)`,
        m.history.length ? `largest out-of-balance force before the first step and after each: ${m.history.map((r) => num(mN(r))).join(', ')} mN` : 'no steps taken',
      ];
      if (!Number.isFinite(m.residual_N)) {
        // Declined before a step (too many nodes): there is no residual to compare.
        ctx.report({ ...common, message: 'declined', params: { case: c.name, reason: m.stopped ?? 'not solved' }, value: null, unit: 'N', severity: 'fail', fix, working });
        continue;
      }
      ctx.report({
        ...common,
        message: { pass: 'converged', fail: 'notConverged' },
        params: { case: c.name, iterations: m.iterations, residual: mN(m.residual_N), tolerance: mN(m.tolerance_N), reason: m.stopped ?? 'the residual is above the limit this rule sets' },
        value: m.residual_N,
        unit: 'N',
        against: { limit: 'residual', times: m.tolerance_N },
        fix: grade(m.residual_N, ctx.limit('residual'), RESIDUAL, m.tolerance_N).severity === 'pass' ? 'None needed.' : fix,
        working,
      });
    }
  },
});
