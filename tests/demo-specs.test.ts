import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { readDemo, rulesData } from './support/fixtures.ts';

const FIGURES = ['total_mass', 'rolling_mass', 'cg_x', 'cg_z', 'yoke_load', 'yoke_load_per_horse', 'yoke_load_min', 'yoke_load_max', 'axle_load'];

function check(name: string) {
  const p = prepareSpec(readDemo(name), rulesData);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return runCheck(p.spec, p.entries, rulesData);
}

// Each demo's comment block promises a verdict; these hold the demos to it.
describe('demo specifications', () => {
  it('the central-axle demo has no warnings or failures', () => {
    const r = check('demo-two-crew');
    expect(['pass', 'advice']).toContain(r.verdict);
    expect(readFileSync(new URL('../specs/demo-two-crew.yaml', import.meta.url), 'utf8')).toContain('no failures and no warnings');
  });

  it('the rear-axle demo loads each horse nearly twice as much as the central-axle demo, within the advisory level, and only advises on unlashed joints', () => {
    const r = check('demo-rear-axle');
    expect(r.verdict).toBe('advice');
    expect([...new Set(r.findings.filter((f) => f.severity === 'advice').map((f) => f.rule))]).toEqual(['lashing.missing']);
    expect(r.findings.filter((f) => f.severity === 'warning' || f.severity === 'fail')).toEqual([]);
    const share = (x: ReturnType<typeof check>) => Math.max(...x.findings.filter((f) => f.rule === 'balance.horse-load').map((f) => f.params.share as number));
    expect(share(r)).toBeGreaterThan(1.6 * share(check('demo-two-crew')));
  });

  it('the teaching example fails the rules its comment names', () => {
    const text = readFileSync(new URL('../specs/teaching-flawed.yaml', import.meta.url), 'utf8');
    const r = check('teaching-flawed');
    expect(r.verdict).toBe('fail');
    const failed = new Set(r.findings.filter((f) => f.severity === 'fail').map((f) => f.rule));
    const promised = [...text.matchAll(/^# - ([a-z]+\.[a-z-]+):/gm)].map((m) => m[1]);
    expect(promised.length).toBeGreaterThan(1);
    for (const id of promised) expect(failed.has(id), id).toBe(true);
  });

  it('every demo gives the named figures with units, and the central axle loads the horses less', () => {
    const mid = check('demo-two-crew');
    const rear = check('demo-rear-axle');
    for (const r of [mid, rear]) for (const f of FIGURES) expect(Number.isFinite(r.figures[f]?.value), f).toBe(true);
    expect(mid.figures.yoke_load.value).toBeLessThan(rear.figures.yoke_load.value);
    // Vertical equilibrium: wheels and pole carry the rolling weight.
    const g = 9.80665;
    expect(mid.figures.axle_load.value + mid.figures.yoke_load.value - mid.mass.yoke_mass_kg * g).toBeCloseTo(mid.figures.rolling_mass.value * g, 6);
    expect(mid.figures.yoke_load_min.value).toBeLessThanOrEqual(mid.figures.yoke_load.value);
    expect(mid.figures.yoke_load_max.value).toBeGreaterThanOrEqual(mid.figures.yoke_load.value);
  });

  it('marks defaulted values in the spec as checked', () => {
    const r = check('demo-rear-axle');
    const entry = (p: string) => r.spec_as_checked.find((e) => e.path === p)!;
    expect(entry('operation.acceleration_g')).toMatchObject({ value: 0.2, defaulted: true });
    expect(entry('box.floor.height_mm').defaulted).toBe(true);
    expect(entry('box.floor.height_mm').note).toContain('computed');
    expect(entry('axle.x_mm')).toMatchObject({ value: 0, defaulted: false, unit: 'mm' });
    expect(entry('box.floor.depth_mm').value).toBeCloseTo(508, 9); // "20 in"
  });
});
