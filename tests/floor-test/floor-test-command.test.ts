// `axletree floor-test` on the shipped demo record and on bad input.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFile, rm, writeFile, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { freshDir, REPO, runBinary, runCli } from '../support/run-cli.ts';
import { FLOOR_TEST_DEMO } from '../../scripts/make-floor-test-demo.ts';

const DEMO = join(REPO, 'specs', 'floor-test-demo.csv');
let dir: string;
beforeAll(async () => {
  dir = await freshDir('axletree-floor-test-');
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('axletree floor-test on the demo record', () => {
  it('prints the estimate as JSON and writes the report and plot', async () => {
    const out = join(dir, 'demo');
    const r = await runCli(['floor-test', DEMO, '--mass-kg', '40', '--json', '--out', out], dir);
    expect(r.code).toBe(0);
    const e = JSON.parse(r.out);
    // The demo was made from these numbers (scripts/make-floor-test-demo.ts).
    expect(Math.abs(e.natural_frequency_hz / FLOOR_TEST_DEMO.natural_frequency_hz - 1)).toBeLessThan(0.005);
    expect(Math.abs(e.damping_ratio / FLOOR_TEST_DEMO.damping_ratio - 1)).toBeLessThan(0.05);
    expect(Math.abs(e.stiffness_N_per_mm / 60 - 1)).toBeLessThan(0.01);
    for (const key of ['damping_ratio_log_decrement', 'damping_ratio_fit']) expect(e).toHaveProperty(key);
    const md = await readFile(join(out, 'floor-test.md'), 'utf8');
    expect(md).toMatch(/!\[Record and fitted curve\]\(floor-test\.svg\)/);
    expect(md).toMatch(/Columns not used: sample/);
    const svg = await readFile(join(out, 'floor-test.svg'), 'utf8');
    expect(svg).toMatch(/^<svg[\s\S]*class="chart"[\s\S]*<path[\s\S]*<\/svg>\n$/);
  });

  it('defaults to axletree-out/<csv name>/ and never writes over the record', async () => {
    const csv = join(dir, 'floor-test.md');
    await writeFile(csv, await readFile(DEMO, 'utf8'));
    const r = await runCli(['floor-test', csv, '--mass-kg', '40', '--out', dir], dir);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/refusing to write/);
    const ok = await runCli(['floor-test', csv, '--mass-kg', '40'], dir);
    expect(ok.code).toBe(0);
    expect((await stat(join(dir, 'axletree-out', 'floor-test', 'floor-test.svg'))).isFile()).toBe(true);
  });
});

describe('axletree floor-test on bad input', () => {
  it('a malformed row: exit 2, the line named, nothing written', async () => {
    const csv = join(dir, 'bad.csv');
    await writeFile(csv, 'time_s,displacement_mm\n0,0\n0.001,0.1\n0.002,1e\n');
    const r = runBinary(['floor-test', csv, '--mass-kg', '40'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/\(line 4, column 7\): displacement_mm is "1e"; allowed: a finite number\. \[2905\]/);
    expect(r.err).not.toMatch(/at .*\.ts:\d+/);
    await expect(stat(join(dir, 'axletree-out', 'bad'))).rejects.toThrow();
  });

  it('no mass, or a mass that is not a positive number', async () => {
    for (const args of [[], ['--mass-kg=-3'], ['--mass-kg', '0'], ['--mass-kg', 'heavy']]) {
      const r = await runCli(['floor-test', DEMO, ...args], dir);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(/\[2911\]/);
    }
  });

  it('a missing file', async () => {
    const r = await runCli(['floor-test', join(dir, 'none.csv'), '--mass-kg', '40'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/No file at/);
  });
});
