// floor_straps.measured: a drop-tested floor named in the specification.
import { describe, expect, it } from 'vitest';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { readDemo, rulesData } from '../support/fixtures.ts';
import { Analysis } from '../support/analysis.ts';
import { floorDampingOf } from '../../src/core/ride/ride-build.ts';
import { rideInput } from '../support/analysis.ts';

function withMeasured(measured: unknown) {
  const raw = readDemo('demo-two-crew') as Record<string, any>;
  raw.floor_straps = { ...raw.floor_straps, measured };
  return prepareSpec(raw, rulesData);
}

describe('floor_straps.measured', () => {
  it('is optional: the demo has none', () => {
    const p = prepareSpec(readDemo('demo-two-crew'), rulesData);
    expect(p.ok && p.spec.floor_straps.measured).toBeUndefined();
  });

  it('takes the damping ratio, the stiffness (a unit string converted to N/mm) and the source', () => {
    const p = withMeasured({ damping_ratio: 0.09, stiffness_N_per_mm: '60 kN/m', source: 'drop test of a sample, 40 kg from 20 mm' });
    expect(p.ok ? p.spec.floor_straps.measured : p.issues).toEqual({ damping_ratio: 0.09, stiffness_N_per_mm: 60, source: 'drop test of a sample, 40 kg from 20 mm' });
  });

  it('refuses a damping ratio out of range, a missing source, an unknown key', () => {
    const codes = (m: unknown) => {
      const p = withMeasured(m);
      return p.ok ? [] : p.issues.map((i) => [i.path.join('.'), i.code]);
    };
    expect(codes({ damping_ratio: 0, source: 'x' })).toEqual([['floor_straps.measured.damping_ratio', 1033]]);
    expect(codes({ damping_ratio: 0.1 })).toEqual([['floor_straps.measured.source', 1030]]);
    expect(codes({ damping_ratio: 0.1, source: 'x', frequency_hz: 6 })).toEqual([['floor_straps.measured.frequency_hz', 1031]]);
  });

  it('gives the ride model its damping ratio, with its source', () => {
    const p = withMeasured({ damping_ratio: 0.09, source: 'sample B, 40 kg from 20 mm' });
    if (!p.ok) throw new Error('the spec should validate');
    const used = floorDampingOf(rideInput(new Analysis(p.spec, rulesData)));
    expect(used.value).toBe(0.09);
    expect(used.source).toMatch(/sample B, 40 kg from 20 mm/);
  });
});
