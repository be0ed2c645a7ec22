// A felloe of many dowelled pieces with no tyre to tie them is hinged at every
// joint; with more than two hinges between two spokes a length of rim is a
// mechanism and the ring frame's stiffness matrix is singular. The model says
// so (no throw): the ring result carries the reason, the wheel's stiffness is
// not known, and the rules that read the ring fail with it.
import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { deepMerge, findingsOf, prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { wheelRingSpec } from '../../src/core/model/wheel/wheel-ring-spec.ts';
import { scanWheelRing } from '../../src/core/model/wheel/wheel-ring-scan.ts';

// 24 pieces on 6 spokes: four hinges in every spoke span (the demo's dowelled joints, no tyre).
const raw = deepMerge(readDemo('demo-two-crew'), { wheels: { felloe: { pieces: 24 } } });

describe('a ring its spokes do not hold', () => {
  const a = new Analysis(prepared(raw), rulesData);

  it('gives the reason, not numbers, and does not throw', () => {
    const ws = wheelRingSpec(a.spec, rulesData, a.mass.layout);
    expect(ws.hinged).toBe(true);
    const [scan] = scanWheelRing(ws, [1000]);
    expect(scan[0].result.unsettled).toMatch(/not held.*24 felloe joints hinged on 6 spokes/);
    expect(Number.isNaN(scan[0].result.contactDeflection)).toBe(true);
  });

  it('leaves the wheel stiffness unknown, saying why, and the ride model not run', () => {
    const k = a.graph.get('wheelStiffness');
    expect(Number.isNaN(k.rolling)).toBe(true);
    expect(k.working).toMatch(/not known: the ring model could not be solved/);
    const ride = a.graph.get('ride')!;
    expect(ride['rough-ridge'].stopped).toMatch(/the wheel's own stiffness is not known/);
  });

  it('fails the felloe, its joints and the spoke tenons: not shown safe', async () => {
    for (const rule of ['member.felloe', 'wheel.felloe-joint', 'wheel.spoke-tenon']) {
      const found = await findingsOf(rule, raw);
      expect(found.map((f) => f.severity), rule).toEqual(['fail']);
      expect(found[0].message, rule).toMatch(/not checked: the wheel's ring model/);
    }
  });

  it('the same felloe in six pieces is solved as before', () => {
    const six = new Analysis(prepared(deepMerge(readDemo('demo-two-crew'), { wheels: { felloe: { pieces: 6 } } })), rulesData);
    expect(Number.isFinite(six.graph.get('wheelStiffness').rolling)).toBe(true);
  });
});
