// `axletree serve`: the page on 127.0.0.1 with the given build in its slot,
// nothing else served, a refused port or file with exit 2, and Ctrl-C
// (the stop signal) closing it.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { run } from '../../cli/run.ts';
import { WORKBENCH_PAGE } from '../../src/node/workbench-page.ts';
import { writeWorkbench } from '../../scripts/build-web.ts';
import { freshDir, REPO } from '../support/run-cli.ts';

beforeAll(async () => {
  // npm ci builds the page; a checkout without it gets it built here.
  if (!existsSync(WORKBENCH_PAGE)) await writeWorkbench();
}, 120_000);

async function serving(argv: string[]) {
  const stop = new AbortController();
  let out = '';
  let err = '';
  const ended = run(['serve', ...argv, '--port', '0'], { out: (s) => (out += s), err: (s) => (err += s), cwd: REPO, stop: stop.signal, keepPartial: () => undefined });
  for (let i = 0; i < 200 && !out.includes('http://') && !err; i++) await new Promise((r) => setTimeout(r, 25));
  const url = /http:\/\/127\.0\.0\.1:\d+\//.exec(out)?.[0];
  return { url, err, stop: async () => (stop.abort(), ended) };
}

describe('axletree serve', () => {
  it('serves the page with the given build in its slot, on this machine only, and nothing else', async () => {
    const s = await serving([join('specs', 'demo-rear-axle.yaml')]);
    expect(s.err).toBe('');
    expect(s.url).toBeDefined();
    const page = await fetch(s.url!);
    expect(page.status).toBe(200);
    expect(page.headers.get('content-security-policy')).toContain("connect-src 'none'");
    expect(page.headers.get('content-security-policy')).not.toContain('unsafe-eval');
    const html = await page.text();
    const slot = /<script id="axletree-initial" type="application\/json">(.*?)<\/script>/s.exec(html)![1];
    const given = JSON.parse(slot) as { name: string; text: string };
    expect(given.name).toBe('demo-rear-axle.yaml');
    expect(given.text).toContain('name: ');
    expect((await fetch(`${s.url}secret`)).status).toBe(404);
    // Ctrl-C: the server closes and the command ends (130, as every stopped run).
    expect(await s.stop()).toBe(130);
    await expect(fetch(s.url!)).rejects.toThrow();
  });

  it('refuses a bad port and a file it cannot read, with exit 2', async () => {
    const dir = await freshDir('axletree-serve-');
    const con = { out: () => undefined, err: (t: string) => (err += t), cwd: dir };
    let err = '';
    expect(await run(['serve', '--port', 'eighty'], con)).toBe(2);
    expect(err).toContain('option --port "eighty" must be a whole number from 0 to 65535');
    err = '';
    expect(await run(['serve', 'missing.yaml'], con)).toBe(2);
    expect(err).toContain('missing.yaml');
    err = '';
    expect(await run(['serve', 'a.yaml', 'b.yaml'], con)).toBe(2);
    expect(err).toContain('give at most one specification file (got 2)');
  });
});
