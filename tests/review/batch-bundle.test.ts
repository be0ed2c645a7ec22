// The batch review from the bundle `npm run build` makes: its check threads
// run the bundled worker (review-worker.mjs), not the TypeScript source. Built
// into a directory of its own, so the dist/ other tests may use is left alone.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bundle } from '../../scripts/bundle.ts';
import type { ReviewTable } from '../../src/core/review/review-table.ts';
import { setIsComplete } from '../../src/node/write-file-set.ts';
import { freshDir, REPO } from '../support/run-cli.ts';

// Inside node_modules, so the packages left out of the bundle are found as they are from dist/.
const cache = join(REPO, 'node_modules', '.cache');
let out: string;
let work: string;
beforeAll(async () => {
  mkdirSync(cache, { recursive: true });
  out = mkdtempSync(join(cache, 'axletree-bundle-review-'));
  work = await freshDir('axletree-bundle-review-run-');
  expect(await bundle(out)).toMatchObject({ files: expect.any(Number) });
});
afterAll(() => {
  for (const dir of [out, work]) if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('the built command', () => {
  it('checks a batch on its bundled check threads', async () => {
    const specs = ['trade-light-two-crew', 'tutankhamun-light-chariot'].map((f) => join(REPO, 'specs', 'validation', `${f}.yaml`));
    const r = spawnSync(process.execPath, [join(out, 'axletree.mjs'), 'check', ...specs, '--json', '--no-decisive', '--jobs', '2'], { cwd: work, encoding: 'utf8', timeout: 120_000 });
    // Both are warnings at worst (validation-verdicts.test.ts): exit 0.
    expect(r.status).toBe(0);
    const table = JSON.parse(r.stdout) as ReviewTable;
    expect(table.rows.map((x) => [x.name, x.status])).toEqual([
      ['trade-light-two-crew', 'checked'],
      ['tutankhamun-light-chariot', 'checked'],
    ]);
    expect(await setIsComplete(join(work, 'axletree-out', 'review'))).toBe(true);
    expect(await setIsComplete(join(work, 'axletree-out', 'review', 'tutankhamun-light-chariot'))).toBe(true);
  }, 180_000);
});
