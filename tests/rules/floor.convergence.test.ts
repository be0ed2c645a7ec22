import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { G } from '../../src/core/units/units.ts';
import { deepMerge, findingsOf, withParams, fractionHitting, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const RULE = 'floor.convergence';
const raw = (patch: unknown = {}) => deepMerge(readDemo('demo-two-crew'), patch);
const standing = () => new Analysis(prepared(raw()), rulesData).floorStatic;

describe(RULE, () => {
  it('passes a demo floor, showing the steps and the residual', async () => {
    const found = await findingsOf(RULE, raw());
    const m = standing();
    // Every floor the check solves: standing, rough ground and the stone as loaded, and the
    // fundamental combination's design states standing and over rough ground.
    expect(found.map((f) => f.severity)).toEqual(['pass', 'pass', 'pass', 'pass', 'pass']);
    expect(found.map((f) => [f.subject, f.load_case, f.combination, f.message_key])).toEqual([
      ['floor.net', 'static', 'characteristic', 'converged'],
      ['floor.net', 'rough-ground', 'characteristic', 'converged'],
      ['floor.net', 'stone', 'accidental', 'converged'],
      ['floor.net', 'static', 'fundamental', 'converged'],
      ['floor.net', 'rough-ground', 'fundamental', 'converged'],
    ]);
    expect(found[0].value).toBe(m.residual_N);
    expect(found[0].limit).toBe(m.tolerance_N);
    expect(found[0].value!).toBeLessThanOrEqual(found[0].limit!);
    expect(found[0].utilisation!).toBeCloseTo(m.residual_N / m.tolerance_N, 12);
    expect(found[0].message).toContain(`${m.iterations} Newton steps`);
    // The message gives the forces in millinewtons (a solved residual is far below a newton).
    expect(found[0].params).toMatchObject({ case: 'crew standing', iterations: m.iterations, residual: m.residual_N * 1e3, tolerance: m.tolerance_N * 1e3 });
    // Tolerance: tolerance_fraction × the crew's weight (rules/parameters/floor.yaml); by hand the demo crew
    // of 78 + 72 kg weigh 150 × 9.80665 = 1471 N, so 1e-6 of it is 1.471 mN.
    expect(m.appliedLoad_N).toBeCloseTo(150 * G, 9);
    expect(m.tolerance_N).toBeCloseTo(rulesData.params['floor.solver'].tolerance_fraction.value * m.appliedLoad_N, 15);
    const tol = found[0].working.find((s) => s.formula === 'tolerance = tolerance_fraction × applied load')!;
    expect(tol.result!).toBeCloseTo(1e-6 * 150 * G * 1e3, 12);
    expect(tol.unit).toBe('mN');
    expect(found[0].sources).toEqual(expect.arrayContaining(['design-basis-floor', 'common-practice']));
  });

  it('fails when the solve runs out of steps, with the steps and the residual left', async () => {
    const [first] = await findingsOf(RULE, raw(), {}, withParams('floor.solver', { max_iterations: 1 }));
    expect(first.severity).toBe('fail');
    expect(first.message_key).toBe('notConverged');
    expect(first.value!).toBeGreaterThan(first.limit!);
    expect(first.message).toContain('after 1 Newton steps');
    expect(first.message).toContain('no convergence in 1 iterations');
  });

  it('boundary: exactly the steps it needs passes, one fewer fails', async () => {
    const n = standing().iterations;
    expect((await findingsOf(RULE, raw(), {}, withParams('floor.solver', { max_iterations: n })))[0].severity).toBe('pass');
    expect((await findingsOf(RULE, raw(), {}, withParams('floor.solver', { max_iterations: n - 1 })))[0].severity).toBe('fail');
  });

  it('boundary: a residual equal to the tolerance has converged', async () => {
    const m = standing();
    const fraction = fractionHitting(m.residual_N, m.appliedLoad_N);
    const [at] = await findingsOf(RULE, raw(), {}, withParams('floor.solver', { tolerance_fraction: fraction }));
    expect(at.value).toBe(at.limit);
    expect(at.severity).toBe('pass');
  });

  it('boundary: a residual equal to the limit on it passes, a hair above fails', async () => {
    const m = standing();
    const level = fractionHitting(m.residual_N, m.tolerance_N);
    const [at] = await findingsOf(RULE, raw(), { 'residual.hard': level });
    expect(at.limit).toBe(m.residual_N);
    expect(at.severity).toBe('pass');
    const [over] = await findingsOf(RULE, raw(), { 'residual.hard': level * (1 - 1e-9) });
    expect(over.severity).toBe('fail');
    expect(over.fix).toMatch(/^Check the strap sizes/);
  });

  it('fails a net too fine to solve within the time, naming the limit', async () => {
    const found = await findingsOf(RULE, raw({ floor_straps: { width_mm: 5, thickness_mm: 1, pitch_mm: 5 } }));
    expect(found.map((f) => [f.severity, f.code, f.message_key, f.value])).toEqual(Array(5).fill(['fail', 2223, 'declined', null]));
    expect(found[0].message).toContain('max_nodes');
  });
});
