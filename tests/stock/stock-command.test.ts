// `axletree stock`: a good instance gives a plan; every bad one ends with exit
// code 2 and a message naming the entry, with no stack trace.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { freshDir, runBinary, runCli } from '../support/run-cli.ts';

const GOOD = {
  kerf_mm: 3,
  stock: [{ length_mm: 3000, cost: 12.5, available: 10 }, { length_mm: 2400, cost: 9 }],
  pieces: [
    { length_mm: 742, quantity: 14, label: 'spoke' },
    { length_mm: 1210, quantity: 3, label: 'felloe blank' },
  ],
};

let dir: string;
beforeAll(async () => {
  dir = await freshDir('axletree-stock-');
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

async function stock(content: unknown, ...flags: string[]) {
  const file = join(dir, `instance-${Math.random().toString(36).slice(2)}.json`);
  await writeFile(file, typeof content === 'string' ? content : JSON.stringify(content, null, 2));
  return runCli(['stock', file, ...flags], dir);
}

describe('axletree stock on a good instance', () => {
  it('answers JSON with the plan', async () => {
    const r = await stock(GOOD, '--json');
    expect(r.code).toBe(0);
    const plan = JSON.parse(r.out);
    for (const key of ['pieces_used', 'cost', 'lower_bound', 'optimal', 'patterns', 'bought', 'waste_mm', 'waste_pct', 'gap', 'lp_value', 'lp_bound', 'lp_gap', 'method', 'baseline']) expect(plan).toHaveProperty(key);
    // 14 spokes and 3 felloe blanks are all cut.
    const cut = (label: string) => plan.patterns.reduce((n: number, p: { count: number; cuts: { label: string }[] }) => n + p.count * p.cuts.filter((c) => c.label === label).length, 0);
    expect([cut('spoke'), cut('felloe blank')]).toEqual([14, 3]);
    expect(plan.cost).toBeGreaterThanOrEqual(plan.lower_bound);
  });

  it('prints a table of patterns without --json', async () => {
    const r = await stock(GOOD);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/count\s+stock mm\s+offcut mm\s+cuts, in cutting order/);
    expect(r.out).toMatch(/spoke \(742 mm\)/); // lengths in whole millimetres from 10 mm, by the one formatter
    expect(r.out).toMatch(/LP lower bound/);
  });
});

interface Bad {
  name: string;
  content: unknown;
  /** The entry named, as printed. */
  path: string;
  says: RegExp;
}

const withPieces = (pieces: unknown[]) => ({ ...GOOD, pieces });
const BAD: Bad[] = [
  { name: 'a piece longer than every stock', content: withPieces([...GOOD.pieces, { length_mm: 3100, quantity: 1 }]), path: 'pieces[2].length_mm', says: /longer than every stock length \(the longest is 3000 mm\)/ },
  { name: 'a piece of zero length', content: withPieces([{ length_mm: 0, quantity: 1 }]), path: 'pieces[0].length_mm', says: /out of range; allowed: more than 0 and at most 100000 mm/ },
  { name: 'a negative stock length', content: { ...GOOD, stock: [{ length_mm: -3000 }] }, path: 'stock[0].length_mm', says: /out of range; allowed: more than 0 and at most 100000 mm/ },
  { name: 'a negative kerf', content: { ...GOOD, kerf_mm: -1 }, path: 'kerf_mm', says: /out of range; allowed: at least 0 and at most 100 mm/ },
  { name: 'a quantity that is not whole', content: withPieces([{ length_mm: 500, quantity: 1.5 }]), path: 'pieces[0].quantity', says: /wrong type; allowed: a whole number/ },
  { name: 'a missing key', content: { kerf_mm: 3, stock: GOOD.stock }, path: '', says: /required key pieces is missing/ },
  { name: 'an unknown key', content: { ...GOOD, blade: 'rip' }, path: 'blade', says: /unknown key blade/ },
  { name: 'a stock length listed twice', content: { ...GOOD, stock: [{ length_mm: 3000, cost: 1 }, { length_mm: 3000, cost: 2 }] }, path: 'stock[1].length_mm', says: /listed twice \(also at stock\[0\]\)/ },
  { name: 'a cost on some stock only', content: { ...GOOD, stock: [{ length_mm: 3000, cost: 1 }, { length_mm: 2400 }] }, path: 'stock[1].cost', says: /give a cost for every stock length or for none/ },
  // 800 mm fits only the 1000 mm stock, of which none is available.
  { name: 'no stock available that holds a piece', content: { kerf_mm: 0, stock: [{ length_mm: 1000, available: 0 }, { length_mm: 500 }], pieces: [{ length_mm: 800, quantity: 1 }] }, path: 'pieces[0].length_mm', says: /fits only stock of 1000 mm, and none of it is available/ },
  // 5 x (700 + 3) = 3515 mm needed; 1 x (3000 + 3) = 3003 mm available.
  { name: 'more length needed than available', content: { kerf_mm: 3, stock: [{ length_mm: 3000, available: 1 }], pieces: [{ length_mm: 700, quantity: 5 }] }, path: 'stock', says: /need 3515 mm of stock with their kerfs, but the available stock that holds them totals 3003 mm/ },
  // 3 x 600 mm fit 2000 mm by length, but each 1000 mm piece yields one.
  { name: 'more pieces than the stock yields', content: { kerf_mm: 0, stock: [{ length_mm: 1000, available: 2 }], pieces: [{ length_mm: 600, quantity: 3 }] }, path: 'stock', says: /3 pieces of 600 mm or longer.*at most 2 of them/ },
  // 7, 5, 4, 4 in two of 10: passes the checks above, yet 7 pairs with
  // nothing and 5 + 4 + 4 = 13 > 10: found only by planning.
  { name: 'a shortage only planning finds', content: { kerf_mm: 0, stock: [{ length_mm: 10, available: 2 }], pieces: [7, 5, 4, 4].map((length_mm) => ({ length_mm, quantity: 1 })) }, path: 'stock', says: /not enough stock available: no plan was found that cuts every piece from the stock available; first-fit decreasing leaves 1 × 4 mm uncut/ },
  { name: 'an empty file', content: '', path: '', says: /is empty; a stock instance needs kerf_mm, stock and pieces/ },
  { name: 'broken JSON', content: '{ "kerf_mm": 3, ', path: '', says: /not valid JSON/ },
];

describe('axletree stock on bad instances', () => {
  it.each(BAD)('$name: exit 2, names $path', async ({ content, path, says }) => {
    const r = await stock(content);
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).toMatch(says);
    if (path) expect(r.err).toContain(`  ${path}`);
    expect(r.err).not.toMatch(/\n\s+at /);
  });

  it('wants exactly one file', async () => {
    const r = await runCli(['stock'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/give exactly one instance file/);
  });

  it('as the real binary: exit 2 and no stack trace', async () => {
    const file = join(dir, 'too-long.json');
    await writeFile(file, JSON.stringify(BAD[0].content));
    const r = runBinary(['stock', file], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('pieces[2].length_mm');
    expect(r.err).not.toMatch(/\n\s+at /);
  });
});
