import { describe, expect, it } from 'vitest';
import { slipCapacity, strandPull, tensileCapacity } from '../src/core/model/lashing-capacity.ts';

// Hand calculations of the mechanics note, section 7.
describe('lashing capacities', () => {
  it('tensile capacity 2 n b t f_t / SF', () => {
    // 12 wraps of 16 x 3 mm at 20 MPa: one strand 48 mm² × 20 MPa = 960 N;
    // 24 strands 23,040 N; over a safety factor of 4, 5,760 N.
    expect(tensileCapacity({ wraps: 12, width_mm: 16, thickness_mm: 3 }, 20, 4)).toBeCloseTo(5760, 9);
    // 8 wraps of 12 x 3 mm at 20 × 0.4 = 8 MPa (wet): 36 mm² × 8 = 288 N a strand, 16 strands 4,608 N, / 4 = 1,152 N.
    expect(tensileCapacity({ wraps: 8, width_mm: 12, thickness_mm: 3 }, 8, 4)).toBeCloseTo(1152, 9);
  });

  it('the strands carry their own pretension until the joint force exceeds it', () => {
    // 12 wraps at 110 N: 24 strands × 110 N = 2,640 N
    expect(strandPull(1000, 12, 110)).toBe(2640);
    expect(strandPull(3000, 12, 110)).toBe(3000);
  });

  it('slip capacity mu × 2 n T_pre', () => {
    // 0.36 × 24 strands × 110 N = 950.4 N
    expect(slipCapacity(0.36, 12, 110)).toBeCloseTo(950.4, 9);
    expect(slipCapacity(0.36, 12, 0)).toBe(0);
  });
});
