// Which findings the decisive-input search explains (select-findings.ts):
// every failing or warning one, or else the three highest utilisations, but
// never a check of the model's own arithmetic (floor.convergence, whose
// utilisation is the solver's residual over its tolerance). The case: the
// rear-axle demo's findings, one floor state's residual set near its
// tolerance (0.99 of it), as a solve stopped just inside it would leave it.
import { describe, expect, it } from 'vitest';
import { decisiveFindings, TOP_PASSING } from '../../src/core/decisive/select-findings.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { readDemo, rulesData } from '../support/fixtures.ts';

const p = prepareSpec(readDemo('demo-rear-axle'), rulesData);
if (!p.ok) throw new Error('the demo does not prepare');
const { findings } = runCheck(p.spec, p.entries, rulesData);

describe('the findings the decisive-input search explains', () => {
  it('leaves out the floor solver’s convergence, however near its tolerance, and takes the next highest', () => {
    const near = findings.map((f, i) => (f.rule === 'floor.convergence' && i === findings.findIndex((g) => g.rule === 'floor.convergence') ? { ...f, utilisation: 0.99 } : f));
    expect(near.some((f) => f.rule === 'floor.convergence' && f.utilisation === 0.99)).toBe(true);
    expect(near.some((f) => f.severity === 'fail' || f.severity === 'warning')).toBe(false);
    const chosen = decisiveFindings(near, RULES);
    expect(chosen).toHaveLength(TOP_PASSING);
    expect(chosen.some((f) => f.rule === 'floor.convergence')).toBe(false);
    const build = near.filter((f) => f.rule !== 'floor.convergence' && f.utilisation !== null && (f.severity === 'pass' || f.severity === 'advice'));
    const highest = build.map((f) => f.utilisation!).sort((a, b) => b - a).slice(0, TOP_PASSING);
    expect(chosen.map((f) => f.utilisation)).toEqual(highest);
    // Without the rule's mark the residual would lead the list: the mark is what keeps it out.
    expect(decisiveFindings(near, [])[0].rule).toBe('floor.convergence');
  });

  it('marks the floor’s convergence, and no check of the build, as a check of the model', () => {
    expect(RULES.filter((r) => r.ofTheModel).map((r) => r.id)).toEqual(['floor.convergence']);
  });
});
