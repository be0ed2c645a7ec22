import { readFile, readdir } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { freshDir, REPO, runCli } from '../support/run-cli.ts';
import { readDemo, rulesData } from '../support/fixtures.ts';
import { run } from '../../cli/run.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import { setIsComplete } from '../../src/node/write-file-set.ts';
import { setPath } from '../../src/core/sweep/spec-diff.ts';
import type { SweepResult } from '../../src/core/sweep/sweep-result.ts';

const DEMO = join(REPO, 'specs', 'demo-two-crew.yaml');
const json = async (dir: string, file = 'sweep.json') => JSON.parse(await readFile(join(dir, file), 'utf8')) as SweepResult;

/** A whole check of the demo with the axle at x, run afresh: passes = a verdict short of fail. */
async function passesAt(x: number): Promise<boolean> {
  const p = prepareSpec(setPath(readDemo('demo-two-crew'), ['axle', 'x_mm'], x), rulesData);
  if (!p.ok) return false;
  const v = runCheck(p.spec, p.entries, rulesData, { lp: await loadLpSolver(), decisive: false }).verdict;
  return v === 'pass' || v === 'advice' || v === 'warning';
}

describe('axletree sweep', () => {
  it('over one value with one point gives what `check` gives for the spec: verdict, worst utilisation, the figure', async () => {
    const dir = await freshDir('axletree-sweep-one-');
    const sweep = await runCli(['sweep', DEMO, '--vary', 'axle.x_mm=235..235:1', '--jobs', '1', '--out', join(dir, 'sweep')], dir);
    expect(sweep).toMatchObject({ code: 0, err: '' });
    const check = await runCli(['check', DEMO, '--no-decisive', '--out', join(dir, 'check')], dir);
    expect(check.code).toBe(0);
    const result = JSON.parse(await readFile(join(dir, 'check', 'result.json'), 'utf8')) as { verdict: string; findings: { utilisation: number | null; rule: string; subject: string }[]; figures: Record<string, { value: number }> };
    const [point] = (await json(join(dir, 'sweep'))).points;
    const worst = result.findings.filter((f) => f.utilisation !== null).reduce((w, f) => (f.utilisation! > w.utilisation! ? f : w));
    expect(point).toMatchObject({ values: [235], verdict: result.verdict, worst_utilisation: worst.utilisation, worst: { rule: worst.rule, subject: worst.subject }, figures: [result.figures.yoke_load_per_horse.value] });
  }, 120_000);

  it('finds each envelope edge where bisection on the whole check finds it, to the sweep\'s resolution', async () => {
    const dir = await freshDir('axletree-sweep-edge-');
    const r = await runCli(['sweep', DEMO, '--vary', 'axle.x_mm=150..350:9', '--jobs', '1', '--out', dir], dir);
    expect(r.code).toBe(0);
    const res = await json(dir);
    const [env] = res.envelope!;
    // The range is 200 mm: the resolution is a thousandth of it.
    expect(env.resolution).toBeCloseTo(0.2, 12);
    const edges = env.intervals.flatMap((i) => [i.low_edge, i.high_edge]).filter((e) => e !== null);
    expect(edges.length).toBeGreaterThan(0);
    for (const e of edges) {
      // An independent bisection with runCheck from the grid's bracket (a quarter of the 25 mm step either side of the edge holds it).
      const step = 25;
      let [pass, fail] = [e.pass, e.fail];
      const lo = 150 + step * Math.floor((Math.min(pass, fail) - 150) / step);
      [pass, fail] = pass < fail ? [lo, lo + step] : [lo + step, lo];
      expect(await passesAt(pass)).toBe(true);
      expect(await passesAt(fail)).toBe(false);
      while (Math.abs(fail - pass) > env.resolution) {
        const mid = (pass + fail) / 2;
        if (await passesAt(mid)) pass = mid;
        else fail = mid;
      }
      expect([e.pass, e.fail]).toEqual([pass, fail]);
      expect(Math.abs(e.fail - e.pass)).toBeLessThanOrEqual(env.resolution);
    }
  }, 300_000);

  it('split in three shards and merged gives the same outputs as the sweep run whole', async () => {
    const dir = await freshDir('axletree-sweep-shards-');
    const args = [DEMO, '--vary', 'axle.x_mm=200..320:4', '--vary', 'crew[0].x_mm=250..400:3', '--figure', 'yoke_load_per_horse', '--figure', 'floor_sag_static_max'];
    const whole = await runCli(['sweep', ...args, '--jobs', '2', '--out', 'whole'], dir);
    expect(whole).toMatchObject({ code: 0, err: '' });
    for (const i of [1, 2, 3]) expect((await runCli(['sweep', ...args, '--jobs', '1', '--shard', `${i}/3`, '--out', `part${i}`], dir)).code).toBe(0);
    expect(await readdir(join(dir, 'part2'))).toEqual(['manifest.json', 'sweep-part.json']);
    const merged = await runCli(['sweep', '--merge', 'part3', 'part1', 'part2', '--jobs', '1', '--out', 'merged'], dir);
    expect(merged).toMatchObject({ code: 0, err: '' });
    const files = (await readdir(join(dir, 'whole'))).filter((f) => f !== 'manifest.json');
    expect(files.sort()).toEqual(['sweep-plot.svg', 'sweep.csv', 'sweep.html', 'sweep.json', 'sweep.md']);
    for (const f of files) expect({ f, text: await readFile(join(dir, 'merged', f), 'utf8') }).toEqual({ f, text: await readFile(join(dir, 'whole', f), 'utf8') });
    const res = await json(join(dir, 'whole'));
    expect(res.points).toHaveLength(12);
    expect(JSON.stringify(res)).not.toMatch(/elapsed|_ms"|_s"|time/);
    // Refused: a shard missing, and shards of another split.
    expect(await runCli(['sweep', '--merge', 'part1', 'part2', '--out', 'm2'], dir)).toMatchObject({ code: 2, err: expect.stringContaining('shard(s) 3/3 missing') });
    expect(await runCli(['sweep', '--merge', 'part1', 'part1', 'part2', '--out', 'm2'], dir)).toMatchObject({ code: 2, err: expect.stringContaining('shard 1/3 is given twice') });
    expect(await runCli(['sweep', '--merge', 'part1', 'part2', 'part3', '--out', 'part1'], dir)).toMatchObject({ code: 2, err: expect.stringContaining('is one of the shards\' folders') });
  }, 300_000);

  it('gives a point whose spec is refused as a row with its reason, and goes on', async () => {
    const dir = await freshDir('axletree-sweep-refused-');
    const r = await runCli(['sweep', DEMO, '--vary', 'axle.x_mm=500..600:3', '--statics', '--jobs', '1', '--out', dir], dir);
    expect(r.code).toBe(0);
    const res = await json(dir);
    expect(res.points.map((p) => p.verdict)).toEqual(['fail', 'fail', 'refused']);
    // The demo's floor is 560 mm deep.
    expect(res.points[2].reason).toMatch(/^axle\.x_mm: .*560/);
    const csv = (await readFile(join(dir, 'sweep.csv'), 'utf8')).trim().split('\n');
    expect(csv[0]).toMatch(/^# Planning aid, not a certification/);
    expect(csv[1]).toBe('point,axle.x_mm (mm),verdict,worst utilisation,worst rule,worst subject,yoke_load_per_horse (N),reason');
    expect(csv[4]).toMatch(/^2,600,refused,,,,,"?axle\.x_mm: /);
    expect(res.cautions.join(' ')).toContain('Statics only');
    expect(r.out).toContain('statics only: the ride model off');
  }, 120_000);

  it('draws a Latin hypercube from its seed: the same seed, the same sweep', async () => {
    const dir = await freshDir('axletree-sweep-lhs-');
    const args = ['sweep', DEMO, '--vary', 'team.horse_mass_kg=300..600:3', '--vary', 'operation.turn_radius_m=8..20:3', '--samples', '5', '--seed', '3', '--statics', '--jobs', '1', '--json'];
    const a = await runCli([...args, '--out', 'a'], dir);
    const b = await runCli([...args, '--out', 'b'], dir);
    expect(a.code).toBe(0);
    expect(a.out).toBe(await readFile(join(dir, 'a', 'sweep.json'), 'utf8'));
    expect(a.out).toBe(b.out);
    const res = JSON.parse(a.out) as SweepResult;
    expect(res.mode).toEqual({ kind: 'samples', samples: 5, seed: 3 });
    expect(res.points).toHaveLength(5);
    expect(res.robust).toBeNull();
    expect(res.notes).toContain('Robust ranges need a grid: a Latin hypercube gives none.');
    expect(res.envelope).toHaveLength(2);
  }, 120_000);

  it('stopped by Ctrl-C, keeps the finished points as a complete smaller set', async () => {
    const dir = await freshDir('axletree-sweep-stop-');
    const stop = new AbortController();
    let err = '';
    const con = {
      out: () => undefined,
      // Stop at the first progress line: after the first run of points.
      err: (t: string) => {
        err += t;
        if (t.includes('"progress"')) stop.abort();
      },
      cwd: dir,
      stop: stop.signal,
      keepPartial: () => undefined,
    };
    const code = await run(['sweep', DEMO, '--vary', 'team.horse_mass_kg=300..600:40', '--statics', '--jobs', '1', '--json', '--out', 'out'], con);
    expect(code).toBe(130);
    const res = await json(join(dir, 'out'));
    expect(res.complete).toBe(false);
    expect(res.points.length).toBeGreaterThan(0);
    expect(res.points.length).toBeLessThan(40);
    expect(res.envelope).toBeNull();
    expect(await setIsComplete(join(dir, 'out'))).toBe(true);
    expect((await readFile(join(dir, 'out', 'sweep.csv'), 'utf8')).trim().split('\n')).toHaveLength(res.points.length + 2);
    expect(err).toContain('"stopped":true');
  }, 120_000);

  it.each([
    [['--vary', 'axle.x_mm=150..350'], 'option --vary axle.x_mm: give the count of values after the range, :N'],
    [['--vary', 'axle.nope=1..2:2'], 'option --vary axle.nope: the specification has no value there'],
    [[], 'give one to 3 values to vary with --vary'],
    [['--vary', 'axle.x_mm=150..350:3', '--samples', 'ten'], 'option --samples "ten" must be a whole number'],
    [['--vary', 'axle.x_mm=150..350:3', '--shard', '4/3'], 'option --shard "4/3" must be I/N'],
    [['--vary', 'axle.x_mm=150..350:3', '--jobs', '0'], 'option --jobs "0" must be a whole number of threads'],
    [['--vary', 'axle.x_mm=150..350:3', '--figure', 'horse_load', '--jobs', '1'], 'option --figure "horse_load": no such figure; figures: '],
  ])('refuses bad options with exit 2 and a message naming the option, writing nothing (%j)', async (extra, says) => {
    const dir = await freshDir('axletree-sweep-bad-');
    const r = await runCli(['sweep', DEMO, ...extra, '--out', 'out'], dir);
    expect(r).toMatchObject({ code: 2, out: '' });
    expect(r.err).toContain(`axletree sweep: ${says}`);
    expect(await readdir(dir)).toEqual([]);
  }, 60_000);
});
