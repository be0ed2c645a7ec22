// The command bundled as `npm run build` bundles it, run as a process: from a
// directory of its own, so the dist/ other tests may be running is left alone.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bundle } from '../../scripts/bundle.ts';
import { run } from '../../cli/run.ts';
import { hasChromium } from '../../src/node/headless-chromium.ts';
import { freshDir, REPO } from '../support/run-cli.ts';
import pkg from '../../package.json' with { type: 'json' };

// Inside node_modules, so the packages left out of the bundle are found as they are from dist/.
const cache = join(REPO, 'node_modules', '.cache');
let out: string;
let work: string;
beforeAll(async () => {
  mkdirSync(cache, { recursive: true });
  out = mkdtempSync(join(cache, 'axletree-bundle-'));
  work = await freshDir('axletree-bundle-run-');
  expect(await bundle(out)).toMatchObject({ files: expect.any(Number) });
});
afterAll(() => {
  for (const dir of [out, work]) if (dir) rmSync(dir, { recursive: true, force: true });
});

const runBuilt = (...args: string[]) => spawnSync(process.execPath, [join(out, 'axletree.mjs'), ...args], { cwd: work, encoding: 'utf8', timeout: 60_000 });

describe('the built command', () => {
  it('prints its version and help', () => {
    expect(runBuilt('--version')).toMatchObject({ status: 0, stdout: `axletree ${pkg.version}\n` });
    expect(runBuilt('check', '--jsn')).toMatchObject({ status: 2, stderr: 'axletree check: unknown option --jsn; did you mean --json?\n' });
  });

  it('finds the rules data beside its sources and plans stock with the solver left out of the bundle', () => {
    const rules = runBuilt('rules', '--json');
    expect(rules.status).toBe(0);
    expect(JSON.parse(rules.stdout).map((r: { id: string }) => r.id)).toContain('balance.yoke-lift');
    writeFileSync(join(work, 'cuts.json'), JSON.stringify({ kerf_mm: 3, stock: [{ length_mm: 3000 }], pieces: [{ length_mm: 742, quantity: 5 }] }));
    const stock = runBuilt('stock', 'cuts.json', '--json');
    expect(stock.stderr).toBe('');
    // 5 × (742 + 3) = 3725 mm > 3000 mm, and four fit one piece: two stock pieces.
    expect(JSON.parse(stock.stdout).pieces_used).toBe(2);
  });

  it('starts the sweep\'s worker threads from the bundle\'s own entry', () => {
    const spec = join(REPO, 'specs', 'demo-two-crew.yaml');
    const sweep = runBuilt('sweep', spec, '--vary', 'team.horse_mass_kg=380..480:3', '--statics', '--jobs', '2', '--json', '--out', 'sweep');
    expect(sweep.status).toBe(0);
    const result = JSON.parse(sweep.stdout) as { points: { values: number[] }[]; complete: boolean };
    expect(result).toMatchObject({ complete: true });
    expect(result.points.map((p) => p.values[0])).toEqual([380, 430, 480]);
  });

  it('reads and writes workbooks with only the Workbook of the workbook library bundled: the same bytes as the sources write', async () => {
    const spec = join(REPO, 'specs', 'demo-rear-axle.yaml');
    expect(runBuilt('new', 'book.xlsx', '--from', spec)).toMatchObject({ status: 0 });
    const built = runBuilt('check', 'book.xlsx', '--no-decisive', '--out', 'built');
    expect(built.stderr).not.toMatch(/Error|undefined/);
    expect([0, 1]).toContain(built.status);
    // The same commands through the sources, with the whole library.
    const here = await freshDir('axletree-bundle-source-');
    const quiet = { out: () => undefined, err: () => undefined, cwd: here };
    expect(await run(['new', 'book.xlsx', '--from', spec], quiet)).toBe(0);
    expect(readFileSync(join(here, 'book.xlsx'))).toEqual(readFileSync(join(work, 'book.xlsx')));
    expect([0, 1]).toContain(await run(['check', 'book.xlsx', '--no-decisive', '--out', 'source'], quiet));
    expect(readFileSync(join(work, 'built', 'result.xlsx'))).toEqual(readFileSync(join(here, 'source', 'result.xlsx')));
    rmSync(here, { recursive: true, force: true });
  }, 120_000);

  it.skipIf(!hasChromium())('prints the report to PDF with the browser driver left out of the bundle', () => {
    const spec = join(REPO, 'specs', 'demo-two-crew.yaml');
    const check = runBuilt('check', spec, '--pdf', '--out', 'pdf-out');
    expect(check.stderr).not.toMatch(/__dirname|Error/);
    expect([0, 1]).toContain(check.status);
    const pdf = join(work, 'pdf-out', 'report.pdf');
    expect(existsSync(pdf)).toBe(true);
    expect(statSync(pdf).size).toBeGreaterThan(10_000);
  });
});
