// `axletree ride` on the two-crew demo: CSV, plots, report, JSON without the long series.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readdir, readFile, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { freshDir, REPO, runCli } from '../support/run-cli.ts';
import { formatNumber } from '../../src/core/format/number-format.ts';

const DEMO = join(REPO, 'specs', 'demo-two-crew.yaml');
let dir: string;
beforeAll(async () => {
  dir = await freshDir('axletree-ride-');
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('axletree ride', () => {
  it('one case with --json: the result without its series, files in axletree-out/<spec>/ride/', async () => {
    const r = await runCli(['ride', DEMO, '--case', 'rough-ridge', '--json'], dir);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out);
    expect(out.cases).toHaveLength(1);
    const c = out.cases[0];
    expect(c.case).toBe('rough-ridge');
    expect(c).not.toHaveProperty('series');
    for (const key of ['crew', 'wheels', 'yokeForceMin_N', 'yokeForceMax_N', 'decayCycles', 'method', 'steps']) expect(c).toHaveProperty(key);
    const outDir = join(dir, 'axletree-out', 'demo-two-crew', 'ride');
    expect(c.series_csv).toBe(join(outDir, 'ride-rough-ridge.csv'));
    expect((await readdir(outDir)).sort()).toEqual(['ride-rough-ridge-floor-forces.svg', 'ride-rough-ridge-heights.svg', 'ride-rough-ridge-support-forces.svg', 'ride-rough-ridge.csv', 'ride.md', 'manifest.json'].sort());
    const csv = (await readFile(c.series_csv, 'utf8')).split('\n');
    expect(csv[0]).toMatch(/^time \(s\),.* height \(mm\),.* floor force \(N\)/);
    const md = await readFile(join(outDir, 'ride.md'), 'utf8');
    expect(md).toMatch(/^# Ride model: /);
    expect(md).toContain('](ride-rough-ridge-heights.svg)');
    for (const crew of c.crew) expect(md).toContain(`| ${crew.role} | ${formatNumber(crew.rise_mm, 'mm')} |`);
  });

  it('every case without --case', async () => {
    const out = join(dir, 'all');
    const r = await runCli(['ride', DEMO, '--out', out], dir);
    expect(r.code).toBe(0);
    const files = await readdir(out);
    for (const c of ['rough-ridge', 'rough-one-wheel', 'stone-ridge', 'stone-one-wheel', 'drop']) expect(files).toContain(`ride-${c}.csv`);
  });

  it('a spec that cannot be read: exit 2, nothing written', async () => {
    const r = await runCli(['ride', join(dir, 'none.yaml')], dir);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/No file at/);
  });

  it('an unknown case: exit 2, the cases listed', async () => {
    const r = await runCli(['ride', DEMO, '--case', 'pothole'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/rough-ridge, rough-one-wheel, stone-ridge, stone-one-wheel, drop/);
  });
});
