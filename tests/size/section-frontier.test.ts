import { describe, expect, it } from 'vitest';
import { areaOf, bySize } from '../../src/core/size/members.ts';
import { seriesFrontier } from '../../src/core/size/section-frontier.ts';

// The staircase walk against trying every section of the series: a
// rectangle's section modulus b·h²/6 against a required one (a monotone pass
// test, as a member rule's stress is), and a round bar's π·d³/32.

describe('series frontier', () => {
  const widths = Array.from({ length: 30 }, (_, i) => 20 + 5 * i);
  const depths = Array.from({ length: 30 }, (_, i) => 20 + 5 * i);

  it.each([40_000, 120_000, 400_000, 2_000_000])('finds every passing rectangle for W ≥ %d mm³, in fewer trials than the series holds', (need) => {
    let trials = 0;
    const test = ([b, h]: readonly number[]) => {
      trials++;
      return (b * h * h) / 6 >= need;
    };
    const f = seriesFrontier([widths, depths], test, 10_000);
    const all = widths.flatMap((b) => depths.map((h) => [b, h])).filter(([b, h]) => (b * h * h) / 6 >= need).sort(bySize);
    expect(f.complete).toBe(true);
    expect(f.passing).toEqual(all);
    expect(trials).toBeLessThan(widths.length + depths.length + 8);
  });

  it('finds the least round bar by bisection', () => {
    const ds = Array.from({ length: 40 }, (_, i) => 10 + 5 * i);
    const f = seriesFrontier([ds], ([d]) => (Math.PI * d ** 3) / 32 >= 50_000, 100);
    // π d³/32 ≥ 50 000 mm³: d ≥ 79.9 mm, so 80 mm is the least of the series (hand calculation).
    expect(f.passing[0]).toEqual([80]);
    expect(areaOf([80])).toBeCloseTo((Math.PI * 6400) / 4, 9);
  });

  it('finds nothing where the largest section fails, and stops when the budget is spent', () => {
    expect(seriesFrontier([widths, depths], () => false, 100)).toEqual({ passing: [], complete: true });
    expect(seriesFrontier([widths, depths], () => null, 100).complete).toBe(false);
  });
});
