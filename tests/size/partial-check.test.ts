import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { changedInputs } from '../../src/core/size/changed-inputs.ts';
import { PartialCheck } from '../../src/core/size/partial-check.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';

// The partial re-run against the whole check run afresh on the changed build:
// the same findings, mass and cost, so reusing what a change does not reach
// changes no answer.

const summary = (fs: { rule: string; subject: string; severity: string; utilisation: number | null }[]) =>
  fs.map((f) => `${f.rule}|${f.subject}|${f.severity}|${f.utilisation}`).sort();

describe('partial check', () => {
  const raw = readDemo('demo-two-crew') as Record<string, any>;
  const check = new PartialCheck({ spec: prepared(raw), data: rulesData, rules: RULES, inputs: { ride: true } });

  it('gives the whole check of a build with changed sections', () => {
    const changed = structuredClone(raw);
    changed.axle.height_mm = 90;
    changed.yoke.width_mm = 45;
    const spec = prepared(changed);
    const keys = changedInputs(prepared(raw), spec);
    expect(keys.has('spec:axle.height_mm')).toBe(true);
    const trial = check.run(spec);
    const fresh = runCheck(spec, [], rulesData, { ride: true });
    expect(summary(trial.findings)).toEqual(summary(fresh.findings));
    expect(trial.mass_kg).toBe(fresh.mass.total_mass_kg);
    expect(trial.cost).toBe(fresh.cutting.stock_plan.cost);
  });

  it('reports the base as a whole check does', () => {
    const fresh = runCheck(prepared(raw), [], rulesData, { ride: true });
    expect(summary(check.base.findings)).toEqual(summary(fresh.findings));
  });

  it('finds the leaves that differ, in the tracer\'s keys', () => {
    expect([...changedInputs({ a: { b: 1, c: [1, 2] } }, { a: { b: 1, c: [1, 3] } })]).toEqual(['spec:a.c.1']);
    expect([...changedInputs({ a: { w: 1 } }, { a: { d: 2 } })].sort()).toEqual(['spec:a.d', 'spec:a.w']);
  });
});
