import { describe, expect, it } from 'vitest';
import { Analysis } from '../../src/core/engine/analysis.ts';
import { deepMerge, findingsOf, withParams, fractionHitting, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const RULE = 'floor.convergence';
const raw = (patch: unknown = {}) => deepMerge(readDemo('demo-two-crew'), patch);

describe(RULE, () => {
  it('passes a demo floor, showing the steps and the residual', async () => {
    const found = await findingsOf(RULE, raw());
    const m = new Analysis(prepared(raw()), rulesData).floorStatic;
    expect(found.map((f) => f.severity)).toEqual(['pass', 'pass']);
    expect(found[0].value).toBe(m.residual_N);
    expect(found[0].limit).toBe(m.tolerance_N);
    expect(found[0].value!).toBeLessThanOrEqual(found[0].limit!);
    expect(found[0].message).toContain(`${m.iterations} Newton steps`);
    // Tolerance: tolerance_fraction × the crew's weight (rules/limits/floor.yaml).
    expect(m.tolerance_N).toBeCloseTo(rulesData.params['floor.solver'].tolerance_fraction.value * m.appliedLoad_N, 15);
  });

  it('fails when the solve runs out of steps, with the steps and the residual left', async () => {
    const [standing] = await findingsOf(RULE, raw(), {}, withParams('floor.solver', { max_iterations: 1 }));
    expect(standing.severity).toBe('fail');
    expect(standing.value!).toBeGreaterThan(standing.limit!);
    expect(standing.message).toContain('after 1 Newton steps');
  });

  it('boundary: exactly the steps it needs passes, one fewer fails', async () => {
    const n = new Analysis(prepared(raw()), rulesData).floorStatic.iterations;
    expect((await findingsOf(RULE, raw(), {}, withParams('floor.solver', { max_iterations: n })))[0].severity).toBe('pass');
    expect((await findingsOf(RULE, raw(), {}, withParams('floor.solver', { max_iterations: n - 1 })))[0].severity).toBe('fail');
  });

  it('boundary: a residual equal to the tolerance has converged', async () => {
    const m = new Analysis(prepared(raw()), rulesData).floorStatic;
    const fraction = fractionHitting(m.residual_N, m.appliedLoad_N);
    const [at] = await findingsOf(RULE, raw(), {}, withParams('floor.solver', { tolerance_fraction: fraction }));
    expect(at.value).toBe(at.limit);
    expect(at.severity).toBe('pass');
  });

  it('fails a net too fine to solve within the time, naming the limit', async () => {
    const found = await findingsOf(RULE, raw({ floor_straps: { width_mm: 4, thickness_mm: 1, pitch_mm: 5 } }));
    expect(found.map((f) => f.severity)).toEqual(['fail', 'fail']);
    expect(found[0].message).toContain('max_nodes');
  });
});
