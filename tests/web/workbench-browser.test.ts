// The workbench in headless Chromium, served by `axletree serve` and opened
// from disk: the verdict equals the command line's; moving the axle moves the
// horse load and the verdict; a value out of range is marked at its field
// while the last result stays; an edit's verdict shows before the rest of its
// answer, which follows marked busy; a YAML file opened and saved comes back
// unchanged; a reload finds the build still there. Skipped, saying why, only
// where no browser is installed (.ci/run installs Debian's chromium).
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { existsSync } from 'node:fs';
import { parse } from 'yaml';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { run } from '../../cli/run.ts';
import { CHROMIUM, hasChromium, launchChromium } from '../../scripts/headless-chromium.ts';
import { writeWorkbench } from '../../scripts/build-web.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { serveWorkbench, type RunningServer } from '../../src/node/serve-web.ts';
import { WORKBENCH_PAGE, withInitialBuild } from '../../src/node/workbench-page.ts';
import { rulesData } from '../support/fixtures.ts';
import { REPO } from '../support/run-cli.ts';

const browser = hasChromium();
if (!browser) console.warn(`workbench-browser.test: skipped, no browser at ${CHROMIUM}; install Debian's chromium package to run it.`);

const DEMO = join(REPO, 'specs', 'demo-two-crew.yaml');
const demoText = readFileSync(DEMO, 'utf8');

/** The command line's answer for a spec: the same runCheck `axletree check` calls. */
function cliVerdict(raw: unknown): { verdict: string; yoke: number } {
  const p = prepareSpec(raw, rulesData);
  if (!p.ok) throw new Error('does not prepare');
  const r = runCheck(p.spec, p.entries, rulesData);
  return { verdict: r.verdict, yoke: r.figures.yoke_load.value };
}

/**
 * Waits for a newer check's whole answer with the ride drawn: its verdict comes first, then the findings, figures and
 * the rest in the page's next task (data-drawn names the check they belong to).
 */
const wholeAnswer = (page: Page, old: string | null) =>
  page.waitForFunction((o) => document.body.dataset.checked !== o && document.body.dataset.stage === 'full' && document.body.dataset.drawn === `${document.body.dataset.checked}-full`, old, { timeout: 60_000 });

const figureText = async (page: Page, name: string) => (await page.locator(`#figures tr[data-figure="${name}"] td`).first().textContent()) ?? '';

describe.skipIf(!browser)('the workbench in headless Chromium', () => {
  let context: BrowserContext;
  let server: RunningServer;
  let page: Page;

  beforeAll(async () => {
    if (!existsSync(WORKBENCH_PAGE)) await writeWorkbench();
    server = await serveWorkbench(withInitialBuild(readFileSync(WORKBENCH_PAGE, 'utf8'), demoText, 'demo-two-crew.yaml'), 0);
    context = await launchChromium();
    page = await context.newPage();
    await page.goto(server.url);
    await page.locator('#verdict[data-stage="full"]').waitFor({ timeout: 60_000 });
  }, 120_000);

  afterAll(async () => {
    await context?.close();
    await server?.close();
  });

  it('shows the verdict the command line gives for the served build, with drawings and plots', async () => {
    const cli = cliVerdict(parse(demoText));
    expect(await page.locator('#verdict').getAttribute('data-verdict')).toBe(cli.verdict);
    expect(await page.locator('#pictures figure.drawing svg').count()).toBeGreaterThanOrEqual(3);
    expect(await page.locator('#pictures figure.plot[data-id="yoke-load"] svg').count()).toBe(1);
    expect(await page.locator('#pictures figure.plot[data-id="turn-speed"] svg').count()).toBe(1);
    expect(await page.locator('#cautions li').count()).toBeGreaterThanOrEqual(3);
  }, 60_000);

  it('follows an edit of the axle position: the horse load and the verdict move as the command line says', async () => {
    const before = await figureText(page, 'yoke_load');
    const raw = parse(demoText) as { axle: { x_mm: number } };
    raw.axle.x_mm = 0;
    const cli = cliVerdict(raw);
    const checked = await page.locator('body').getAttribute('data-checked');
    await page.locator('[id="f-axle.x_mm"]').fill('0');
    await wholeAnswer(page, checked);
    expect(await page.locator('#verdict').getAttribute('data-verdict')).toBe(cli.verdict);
    const after = await figureText(page, 'yoke_load');
    expect(after).not.toBe(before);
    expect(Number(after.replace(/[^\d.-]/g, ''))).toBeCloseTo(cli.yoke, -1);
  }, 60_000);

  it("shows an edit's verdict at once and the rest of its answer after it, marked busy until then", async () => {
    const checked = await page.locator('body').getAttribute('data-checked');
    // Recorded by the page itself at each change of the body's marks: which check the verdict and the findings belong to.
    await page.evaluate(() => {
      const marks: string[] = [];
      (window as unknown as { marks: string[] }).marks = marks;
      new MutationObserver(() => marks.push(`${document.body.dataset.checked}|${document.body.dataset.drawn}|${document.getElementById('result-host')?.getAttribute('aria-busy')}`)).observe(document.body, { attributes: true });
    });
    const x = await page.locator('[id="f-axle.x_mm"]').inputValue();
    await page.locator('[id="f-axle.x_mm"]').fill(String(Number(x) + 20));
    await wholeAnswer(page, checked);
    const marks = await page.evaluate(() => (window as unknown as { marks: string[] }).marks);
    const id = await page.locator('body').getAttribute('data-checked');
    // The new verdict was on the page before its findings were drawn, and the page said it was still busy then.
    expect(marks.some((m) => m.startsWith(`${id}|`) && !m.startsWith(`${id}|${id}-`) && m.endsWith('|true'))).toBe(true);
    // In the end the findings drawn are this check's, with the ride, and the page is no longer busy.
    expect(await page.locator('body').getAttribute('data-drawn')).toBe(`${id}-full`);
    expect(await page.locator('#result-host').getAttribute('aria-busy')).toBe('false');
    expect(await page.locator('#findings tbody tr').count()).toBeGreaterThan(10);
    await page.locator('[id="f-axle.x_mm"]').fill(x);
    await wholeAnswer(page, id);
  }, 60_000);

  it('marks a value out of range at its field and keeps the last result on screen', async () => {
    const verdict = await page.locator('#verdict').getAttribute('data-verdict');
    const length = await page.locator('[id="f-axle.length_mm"]').inputValue();
    await page.locator('[id="f-axle.length_mm"]').fill('10');
    const msg = page.locator('[id="f-axle.length_mm-msg"]');
    await msg.filter({ hasText: /\S/ }).waitFor({ timeout: 30_000 });
    expect(await page.locator('[id="f-axle.length_mm"]').getAttribute('aria-invalid')).toBe('true');
    // spec.schema.json: axle.length_mm from 500 to 4000 mm.
    expect(await msg.innerText()).toMatch(/500/);
    expect(await page.locator('#verdict').getAttribute('data-verdict')).toBe(verdict);
    expect(await page.locator('#verdict .stale').innerText()).toMatch(/last valid build/);
    await page.locator('[id="f-axle.length_mm"]').fill(length);
    await page.waitForFunction(() => document.getElementById('f-axle.length_mm-msg')?.textContent === '', undefined, { timeout: 30_000 });
  }, 60_000);

  it('keeps the build in progress across a reload', async () => {
    await page.locator('[id="f-axle.x_mm"]').fill('120');
    await page.waitForTimeout(200);
    await page.reload();
    await page.locator('#verdict').waitFor({ timeout: 60_000 });
    expect(await page.locator('[id="f-axle.x_mm"]').inputValue()).toBe('120');
  }, 60_000);

  it('opens a YAML file and saves it back unchanged, from the page opened from disk', async () => {
    const local = await context.newPage();
    await local.goto(pathToFileURL(WORKBENCH_PAGE).href);
    const file = join(REPO, 'specs', 'demo-rear-axle.yaml');
    await local.locator('#open-file').setInputFiles(file);
    await local.locator('#status', { hasText: 'Opened demo-rear-axle.yaml' }).waitFor({ timeout: 30_000 });
    await local.locator('#verdict').waitFor({ timeout: 60_000 });
    const [download] = await Promise.all([local.waitForEvent('download'), local.locator('#save-yaml').click()]);
    expect(download.suggestedFilename()).toBe('demo-rear-axle.yaml');
    expect(readFileSync(await download.path(), 'utf8')).toBe(readFileSync(file, 'utf8'));
    await local.close();
  }, 90_000);

  it('downloads the result workbook and the report made in the page', async () => {
    await page.locator('#verdict[data-stage="full"]').waitFor({ timeout: 60_000 });
    const [book] = await Promise.all([page.waitForEvent('download', { timeout: 60_000 }), page.locator('#get-workbook').click()]);
    expect(book.suggestedFilename()).toBe('result.xlsx');
    const bytes = readFileSync(await book.path());
    // A workbook is a zip: it starts with the local file header PK\x03\x04.
    expect(bytes.subarray(0, 4)).toEqual(Buffer.from([0x50, 0x4b, 0x03, 0x04]));
    expect(bytes.length).toBeGreaterThan(20_000);
    const [report] = await Promise.all([page.waitForEvent('download', { timeout: 60_000 }), page.locator('#get-report').click()]);
    const html = readFileSync(await report.path(), 'utf8');
    expect(html).toContain('planning aid, not a certification');
    expect(html).toContain('<svg');
  }, 120_000);

  it('moves a person with the arrow keys and shows each change against a pinned baseline', async () => {
    await page.locator('#pin').click();
    const x = Number(await page.locator('[id="f-crew.0.x_mm"]').inputValue());
    const checked = await page.locator('body').getAttribute('data-checked');
    await page.locator('.crew-plan .person[data-index="0"]').focus();
    await page.keyboard.press('ArrowUp');
    expect(await page.locator('[id="f-crew.0.x_mm"]').inputValue()).toBe(String(x + 10));
    await wholeAnswer(page, checked);
    // The figures table now has a baseline and a change column; the crew moved forward, so the yoke load changed.
    expect(await page.locator('#figures thead th').count()).toBe(4);
    const change = await page.locator('#figures tr[data-figure="yoke_load"] td').nth(2).textContent();
    expect(change).toMatch(/^[+-]?\d/);
    expect(change).not.toBe('0');
    await page.locator('#unpin').click();
  }, 90_000);

  it('opens a filled-in workbook (read in the worker) with the build it holds', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'axletree-wb-'));
    const book = join(dir, 'rear.xlsx');
    expect(await run(['new', book, '--from', join(REPO, 'specs', 'demo-rear-axle.yaml')], { out: () => undefined, err: () => undefined, cwd: dir })).toBe(0);
    const local = await context.newPage();
    await local.goto(server.url);
    await local.locator('#open-file').setInputFiles(book);
    await local.locator('#status', { hasText: 'Opened rear.xlsx' }).waitFor({ timeout: 60_000 });
    const rear = parse(readFileSync(join(REPO, 'specs', 'demo-rear-axle.yaml'), 'utf8')) as { name: string; axle: { x_mm: number } };
    expect(await local.locator('[id="f-name"]').inputValue()).toBe(rear.name);
    expect(await local.locator('[id="f-axle.x_mm"]').inputValue()).toBe(String(rear.axle.x_mm));
    await local.close();
  }, 90_000);

  it('drags a person on the floor plan with the pointer: the position follows, and the horse-load plot marks it', async () => {
    const person = page.locator('.crew-plan .person[data-index="1"]');
    const before = Number(await page.locator('[id="f-crew.1.x_mm"]').inputValue());
    await person.scrollIntoViewIfNeeded();
    const box = (await person.boundingBox())!;
    const checked = await page.locator('body').getAttribute('data-checked');
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.down();
    // Up the screen is forward on the plan.
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2 - 30, { steps: 5 });
    await page.mouse.up();
    const after = Number(await page.locator('[id="f-crew.1.x_mm"]').inputValue());
    expect(after).toBeGreaterThan(before);
    await page.waitForFunction((old) => document.body.dataset.checked !== old && document.body.dataset.pictures === `${document.body.dataset.checked}-full`, checked, { timeout: 60_000 });
    expect(await page.locator('#pictures figure.plot[data-id="yoke-load"] svg').count()).toBe(1);
  }, 90_000);

  it('prints the answer without the form and the tools', async () => {
    await page.emulateMedia({ media: 'print' });
    try {
      expect(await page.locator('#build').isVisible()).toBe(false);
      expect(await page.locator('nav').isVisible()).toBe(false);
      expect(await page.locator('#verdict').isVisible()).toBe(true);
      expect(await page.locator('#cautions').isVisible()).toBe(true);
    } finally {
      await page.emulateMedia({ media: 'screen' });
    }
  }, 30_000);

  it('searches for decisive inputs beside the checks: an edit made while it searches is checked at once, and the search ends with its table', async () => {
    await page.locator('#find-decisive').click();
    await page.locator('#decisive [role="status"]').waitFor({ timeout: 10_000 });
    const checked = await page.locator('body').getAttribute('data-checked');
    const axle = await page.locator('[id="f-axle.x_mm"]').inputValue();
    await page.locator('[id="f-axle.x_mm"]').fill(String(Number(axle) + 10));
    await page.waitForFunction((old) => document.body.dataset.checked !== old, checked, { timeout: 30_000 });
    // The edit's verdict arrived while the search (seconds of re-runs, in its own worker) was still running.
    expect(await page.locator('#decisive [role="status"]').count()).toBe(1);
    await page.locator('#decisive table').waitFor({ timeout: 120_000 });
    expect(await page.locator('#decisive tbody tr').count()).toBeGreaterThan(0);
  }, 180_000);
});
