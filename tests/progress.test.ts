import { describe, expect, it } from 'vitest';
import { barText, durationText, secondsLeft, startProgress } from '../src/node/progress.ts';

// The progress of a long run: time left at the rate so far (a straight-line
// estimate: elapsed / done x remaining), a bar only on a terminal and only
// after a second, JSON lines for scripts.

describe('progress', () => {
  it('estimates the time left from the rate so far', () => {
    // 10 of 40 done in 5 s: 0.5 s each, 30 left -> 15 s.
    expect(secondsLeft(5000, 10, 40)).toBeCloseTo(15, 12);
    expect(secondsLeft(5000, 0, 40)).toBeNull();
    expect(secondsLeft(5000, 40, 40)).toBe(0);
  });

  it('writes durations the way a person reads them', () => {
    expect(durationText(12.4)).toBe('12 s');
    expect(durationText(185)).toBe('3 min 05 s');
    expect(durationText(3720)).toBe('1 h 02 min');
  });

  it('fills the bar in proportion', () => {
    expect(barText('sweep', 12, 24, 6)).toBe(`sweep [${'#'.repeat(12)}${'.'.repeat(12)}] 12/24, about 6 s left`);
    expect(barText('sweep', 0, 24, null)).toBe(`sweep [${'.'.repeat(24)}] 0/24`);
  });

  it('draws nothing on a terminal before a second has passed, then a bar, and clears it at the end', () => {
    let t = 0;
    const out: string[] = [];
    const p = startProgress({ label: 'batch', total: 4, err: (s) => out.push(s), terminal: true, json: false, now: () => t });
    t = 500;
    p.step(1);
    expect(out).toEqual([]);
    t = 1500;
    p.step(2);
    expect(out).toHaveLength(1);
    expect(out[0]).toContain('batch [');
    expect(out[0]).toContain('2/4, about 2 s left');
    p.finish(4);
    expect(out.at(-1)).toBe('\r\u001b[K');
  });

  it('draws nothing where standard error is not a terminal and JSON was not asked for', () => {
    let t = 0;
    const out: string[] = [];
    const p = startProgress({ label: 'batch', total: 4, err: (s) => out.push(s), terminal: false, json: false, now: () => t });
    t = 5000;
    p.step(2);
    p.finish(4);
    expect(out).toEqual([]);
  });

  it('writes one JSON line per step for scripts, the last one saying whether the run was stopped', () => {
    let t = 0;
    const out: string[] = [];
    const p = startProgress({ label: 'sweep', total: 10, err: (s) => out.push(s), terminal: false, json: true, now: () => t });
    t = 300;
    p.step(3);
    t = 350;
    p.step(4); // within 200 ms of the last line: skipped
    t = 900;
    p.finish(6, true);
    const lines = out.map((l) => JSON.parse(l) as { progress: Record<string, unknown> });
    expect(lines).toHaveLength(2);
    expect(lines[0].progress).toMatchObject({ label: 'sweep', done: 3, total: 10, elapsed_s: 0.3, left_s: 0.7 });
    expect(lines[1].progress).toMatchObject({ done: 6, stopped: true, finished: false });
  });
});
