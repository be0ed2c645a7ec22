import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { loadLpSolver } from '../src/node/load-lp-solver.ts';
import { checkLoadingSolver, solverProbe } from '../src/node/solver-on-demand.ts';
import { readDemo, rulesData } from './support/fixtures.ts';
import { defineRule } from '../src/core/pipeline/define-rule.ts';
import { RULES } from '../src/core/rules/index.ts';
import { GENERATORS } from './support/bad-generators.ts';

// HiGHS is loaded only where the stock plan needs it, and the result is the
// same as a check with the solver at hand from the start.

const prepared = (raw: unknown) => {
  const p = prepareSpec(raw, rulesData);
  if (!p.ok) throw new Error('does not prepare');
  return p;
};

describe('the LP solver on demand', () => {
  it('the stand-in notes and refuses any call, and is not a promise', async () => {
    const probe = solverProbe();
    expect(probe.used()).toBe(false);
    expect(await Promise.resolve(probe.lp)).toBe(probe.lp);
    expect(() => (probe.lp as unknown as { solve(s: string): unknown }).solve('')).toThrow(/not loaded/);
    expect(probe.used()).toBe(true);
  });

  it("plans the demo's cut list without the solver, to the same result", async () => {
    const p = prepared(readDemo('demo-two-crew'));
    const probe = solverProbe();
    const without = runCheck(p.spec, p.entries, rulesData, { lp: probe.lp });
    expect(probe.used()).toBe(false);
    const withSolver = runCheck(p.spec, p.entries, rulesData, { lp: await loadLpSolver() });
    expect(JSON.stringify(without)).toBe(JSON.stringify(withSolver));
  });

  it('loads the solver where the plan needs it, and then gives the result the solver gives', async () => {
    // The demo with 41 kinds of small extra parts, hundreds of pieces: beyond the small exact search.
    const p = prepared(parse((await GENERATORS['demo-41-pegs']()) as string));
    const probe = solverProbe();
    runCheck(p.spec, p.entries, rulesData, { lp: probe.lp, ride: false });
    expect(probe.used()).toBe(true);
    const onDemand = await checkLoadingSolver(p.spec, p.entries, rulesData, { ride: false });
    const direct = runCheck(p.spec, p.entries, rulesData, { lp: await loadLpSolver(), ride: false });
    expect(JSON.stringify(onDemand)).toBe(JSON.stringify(direct));
  });

  it('runs the check once where the plan needs the solver: the stock plan is tried first, alone', async () => {
    const p = prepared(parse((await GENERATORS['demo-41-pegs']()) as string));
    let runs = 0;
    const counter = defineRule({
      id: 'test.counter',
      title: 'counter',
      checks: 'how many times the rules run',
      kind: 'note',
      method: ['design-basis-balance'],
      needs: ['mass'],
      limits: {},
      params: [],
      messages: { note: { code: 9901, text: 'counted' } },
      run: () => void runs++,
    });
    await checkLoadingSolver(p.spec, p.entries, rulesData, { ride: false, rules: [...RULES, counter] });
    expect(runs).toBe(1);
  });
});
