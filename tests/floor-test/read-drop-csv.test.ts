// The floor-test CSV: good files read, malformed ones name the line (and column).
import { describe, expect, it } from 'vitest';
import { parseDropCsv } from '../../src/node/read-drop-csv.ts';

const rows = (n: number, from = 0) => Array.from({ length: n }, (_, i) => `${(from + i) / 1000},${Math.sin(i / 5).toFixed(4)}`);
const good = ['time_s,displacement_mm', ...rows(30)].join('\n');

function issuesOf(text: string) {
  const r = parseDropCsv(text, 'rec.csv');
  if (r.ok) throw new Error('expected the file to be refused');
  return r.issues;
}

describe('parseDropCsv', () => {
  it('reads the two columns, in any order, ignoring others, comments and blank lines', () => {
    const text = ['# made up', '"force_N",displacement_mm, time_s', ...rows(30).map((r, i) => `${i},${r.split(',')[1]},${r.split(',')[0]}`), '', ''].join('\r\n');
    const r = parseDropCsv(text);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.record.t_s.length).toBe(30);
    expect(r.record.t_s[2]).toBeCloseTo(0.002, 12);
    expect(r.record.x_mm[5]).toBeCloseTo(Math.sin(1), 4);
    expect(r.ignored).toEqual(['force_N']);
  });

  it('a missing column names the header line', () => {
    const [i] = issuesOf(['# note', 'time_s,disp', ...rows(30)].join('\n'));
    expect(i.code).toBe(2902);
    expect(i.at).toEqual({ line: 2, column: 1 });
    expect(i.message).toMatch(/displacement_mm/);
    expect(i.message).toMatch(/found: time_s, disp/);
  });

  it('a column named twice names it', () => {
    const [i] = issuesOf(['time_s,displacement_mm,time_s', ...rows(30).map((r) => `${r},0`)].join('\n'));
    expect(i.code).toBe(2903);
    expect(i.at).toEqual({ line: 1, column: 24 });
  });

  it('a value that is not a number names its line and column', () => {
    const lines = good.split('\n');
    lines[7] = '0.0065,abc';
    const [i] = issuesOf(lines.join('\n'));
    expect(i.code).toBe(2905);
    expect(i.at).toEqual({ line: 8, column: 8 });
    expect(i.message).toBe('displacement_mm is "abc"; allowed: a finite number.');
  });

  it('a short row names its line', () => {
    const lines = good.split('\n');
    lines[4] = '0.0035';
    const [i] = issuesOf(lines.join('\n'));
    expect(i.code).toBe(2904);
    expect(i.at?.line).toBe(5);
  });

  it('a time that does not increase names both lines', () => {
    const lines = good.split('\n');
    lines[10] = lines[9];
    const [i] = issuesOf(lines.join('\n'));
    expect(i.code).toBe(2906);
    expect(i.at?.line).toBe(11);
    expect(i.message).toMatch(/on line 10/);
  });

  it('lists several problems at once', () => {
    const lines = good.split('\n');
    lines[3] = 'x,1';
    lines[6] = '0.005,';
    expect(issuesOf(lines.join('\n')).map((i) => i.at?.line)).toEqual([4, 7]);
  });

  it('an empty file or too few samples', () => {
    expect(issuesOf('\n# only a comment\n')[0].code).toBe(2901);
    expect(issuesOf(['time_s,displacement_mm', ...rows(5)].join('\n'))[0].code).toBe(2907);
  });
});
