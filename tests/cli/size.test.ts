// axletree size through the command line: the teaching example's proposals
// written back and checked afresh, a build with nothing to size, a refused
// input, a stop that keeps a complete smaller set, and cautions on every output.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { copyFileSync, existsSync, readFileSync, writeFileSync } from 'node:fs';
import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import { parse, stringify } from 'yaml';
import { run } from '../../cli/run.ts';
import { CAUTIONS, SHORT_CAUTION } from '../../src/core/cautions.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import type { SizeResult } from '../../src/core/size/size-run.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { setIsComplete } from '../../src/node/write-file-set.ts';
import { readDemo, rulesData } from '../support/fixtures.ts';
import { freshDir, REPO, runCli } from '../support/run-cli.ts';

let dir: string;
beforeAll(async () => {
  dir = await freshDir('axletree-size-');
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

const readJson = (d: string) => JSON.parse(readFileSync(join(d, 'size.json'), 'utf8')) as SizeResult;

describe('axletree size', () => {
  it('proposes sections for the teaching example that pass when written back and checked', async () => {
    const spec = join(dir, 'teaching-flawed.yaml');
    copyFileSync(join(REPO, 'specs', 'teaching-flawed.yaml'), spec);
    const before = readFileSync(spec, 'utf8');
    const out = join(dir, 'tf');
    const r = await runCli(['size', spec, '--out', out], dir);
    // The missing lashings have no one-input option: exit 1, and the summary says which.
    expect(r.code).toBe(1);
    expect(r.out).toContain('lashing.missing');
    expect(readFileSync(spec, 'utf8')).toBe(before);
    expect(await setIsComplete(out)).toBe(true);
    const result = readJson(out);
    const sized = result.members.filter((m) => m.found);
    expect(sized.length).toBeGreaterThan(0);
    expect(result.together?.passes).toBe(true);
    // The proposed file, checked afresh: each sized member's findings pass.
    const proposed = parse(readFileSync(join(out, 'size-proposed.yaml'), 'utf8'));
    const p = prepareSpec(proposed, rulesData);
    if (!p.ok) throw new Error(p.issues.map((i) => i.message).join('; '));
    const after = runCheck(p.spec, p.entries, rulesData);
    for (const m of sized) {
      const mine = after.findings.filter((f) => f.rule === m.rule);
      expect(mine.length, m.rule).toBeGreaterThan(0);
      expect(mine.filter((f) => f.severity !== 'pass' && f.severity !== 'advice').map((f) => f.subject), m.rule).toEqual([]);
    }
    // The proposed file is the input with the sections changed, and nothing else.
    const given = parse(before);
    for (const m of sized) for (const s of m.sections) s.fields.forEach((f, i) => f.split('.').reduce((o: any, k, j, all) => (j === all.length - 1 ? (o[k] = s.to[i]) : o[k]), given));
    expect(proposed).toEqual(given);
    // Cautions on every output; no number that is not finite.
    expect(readFileSync(join(out, 'size.md'), 'utf8')).toContain(CAUTIONS[0]);
    expect(readFileSync(join(out, 'size.html'), 'utf8')).toContain(CAUTIONS[1]);
    expect(result.cautions).toEqual(CAUTIONS);
    expect(readFileSync(join(out, 'size-proposed.yaml'), 'utf8')).toContain(SHORT_CAUTION);
    for (const f of ['size.md', 'size.html', 'size.json']) expect(readFileSync(join(out, f), 'utf8')).not.toMatch(/NaN|Infinity/);
  }, 600_000);

  it('says there is nothing to size for a build that passes, and exits 0', async () => {
    const out = join(dir, 'demo');
    const r = await runCli(['size', join(REPO, 'specs', 'demo-two-crew.yaml'), '--out', out], dir);
    expect(r.code).toBe(0);
    expect(r.out).toContain('nothing to size');
    expect(readFileSync(join(out, 'size.md'), 'utf8')).toContain('there is nothing to size');
    expect(existsSync(join(out, 'size-proposed.yaml'))).toBe(false);
  }, 120_000);

  it('refuses a specification it cannot read, writes nothing and exits 2', async () => {
    const bad = join(dir, 'bad.yaml');
    const raw = readDemo('demo-two-crew') as Record<string, any>;
    raw.pole.width_mm = -5;
    writeFileSync(bad, stringify(raw));
    const out = join(dir, 'bad-out');
    const r = await runCli(['size', bad, '--out', out], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('pole.width_mm');
    expect(existsSync(out)).toBe(false);
  }, 120_000);

  it('stopped before the first item, writes a complete smaller set naming what is not done', async () => {
    const thin = join(dir, 'thin.yaml');
    const raw = readDemo('demo-two-crew') as Record<string, any>;
    raw.pole.height_mm = 40;
    writeFileSync(thin, stringify(raw));
    const out = join(dir, 'stopped');
    const stop = new AbortController();
    stop.abort();
    let text = '';
    const code = await run(['size', thin, '--out', out, '--json'], { out: (s) => (text += s), err: () => undefined, cwd: dir, stop: stop.signal, keepPartial: () => undefined });
    expect(code).toBe(130);
    expect(await setIsComplete(out)).toBe(true);
    const result = JSON.parse(text) as SizeResult;
    expect(result.complete).toBe(false);
    expect(result.members).toEqual([]);
    expect(result.not_done[0]).toContain('member.pole');
  }, 120_000);
});
