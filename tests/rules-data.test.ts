import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { defaultRulesDir, loadRulesData } from '../src/node/load-rules-data.ts';
import { RulesDataError } from '../src/core/data/rules-data-error.ts';
import type { RulesData, Sourced, Species } from '../src/core/data/rules-data.ts';

const data: RulesData = loadRulesData(defaultRulesDir());

/** Every { value, source } in a subtree, with its dotted path. */
function sourcedValues(node: unknown, path: string): { path: string; item: Sourced }[] {
  if (node === null || typeof node !== 'object') return [];
  const rec = node as Record<string, unknown>;
  if (typeof rec.value === 'number' && 'source' in rec) return [{ path, item: rec as unknown as Sourced }];
  return Object.entries(rec).flatMap(([k, v]) => sourcedValues(v, path === '' ? k : `${path}.${k}`));
}

const MARKED = /from memory|common practice/i;

// --- Expected figures, as written in the design notes' reference figures ---

/** Wood Handbook FPL-GTR-190 (2010), Table 5-3a, 12 % moisture, transcribed: SG, MOR kPa, MOE MPa, C par kPa, C perp kPa, shear kPa. */
const TABLE_5_3A_DRY12: Record<string, [number, number, number, number, number, number]> = {
  'white-ash': [0.6, 103000, 12000, 51100, 8000, 13200],
  'green-ash': [0.56, 97000, 11400, 48800, 9000, 13200],
  'black-ash': [0.49, 87000, 11000, 41200, 5200, 10800],
  'american-elm': [0.5, 81000, 9200, 38100, 4800, 10400],
  'rock-elm': [0.63, 102000, 10600, 48600, 8500, 13200],
  'slippery-elm': [0.53, 90000, 10300, 43900, 5700, 11200],
  'white-oak': [0.68, 105000, 12300, 51300, 7400, 13800],
  'northern-red-oak': [0.63, 99000, 12500, 46600, 7000, 12300],
  'shagbark-hickory': [0.72, 139000, 14900, 63500, 12100, 16800],
  'pignut-hickory': [0.75, 139000, 15600, 63400, 13700, 14800],
  'yellow-birch': [0.62, 114000, 13900, 56300, 6700, 13000],
  'sugar-maple': [0.63, 109000, 12600, 54000, 10100, 16100],
  'american-beech': [0.64, 103000, 11900, 50300, 7000, 13900],
  'black-locust': [0.69, 134000, 14100, 70200, 12600, 17100],
  'black-willow': [0.39, 54000, 7000, 28300, 3000, 8600],
};

/** Wood Handbook FPL-GTR-282 (2021), Table 5-3a, green, transcribed: basic SG, MOR kPa, MOE MPa. */
const TABLE_5_3A_GREEN: Record<string, [number, number, number]> = {
  'white-ash': [0.55, 65500, 9930],
  'green-ash': [0.53, 66000, 9700],
  'american-elm': [0.46, 50000, 7700],
  'rock-elm': [0.57, 65500, 8200],
  'white-oak': [0.6, 57000, 8600],
  'northern-red-oak': [0.56, 57000, 9300],
  'shagbark-hickory': [0.64, 76000, 10800],
  'sugar-maple': [0.56, 65000, 10700],
  'american-beech': [0.56, 59000, 9500],
  'yellow-birch': [0.55, 57200, 10300],
  'black-locust': [0.66, 95100, 12800],
  'black-willow': [0.36, 33100, 5400],
};

/** Wood Handbook Table 4-3, shrinkage green to oven-dry, %: radial, tangential. */
const TABLE_4_3: Record<string, [number, number]> = {
  'white-ash': [4.9, 7.8],
  'green-ash': [4.6, 7.1],
  'black-ash': [5.0, 7.8],
  'american-elm': [4.2, 9.5],
  'rock-elm': [4.8, 8.1],
  'slippery-elm': [4.9, 8.9],
  'white-oak': [5.6, 10.5],
  'northern-red-oak': [4.0, 8.6],
  'pignut-hickory': [7.2, 11.5],
  'yellow-birch': [7.3, 9.5],
  'sugar-maple': [4.8, 9.9],
  'american-beech': [5.5, 11.9],
  'black-willow': [3.3, 8.7],
};

const DRY12_KEYS = [
  'specific_gravity',
  'mor_kPa',
  'moe_MPa',
  'compression_parallel_kPa',
  'compression_perpendicular_kPa',
  'shear_kPa',
] as const;

/**
 * European species, as printed in the tables the validation research read (12 % or air-dry):
 * density kg/m³, MOR, MOE, compression parallel, shear in N/mm² (null: none printed), and the
 * table's catalogue id. Lavers 1969 via Dinwoodie Table 54.1; Niemz 1993 via treeland.de;
 * Lohmann's handbook ranges via timber merchants (typical value, or the low end for willow).
 * SG at 12 % is the density over 1000 × 1.12: mass and volume both at 12 %.
 */
const EUROPEAN: Record<string, [number, number, number, number, number | null, RegExp]> = {
  'european-ash': [689, 116, 11900, 53.3, 16.6, /Lavers/],
  'european-oak': [689, 97, 10100, 51.6, 13.7, /Lavers/],
  'european-beech': [690, 120, 14000, 60, 10, /Niemz/],
  'european-birch': [650, 120, 14000, 60, 12, /Niemz/],
  'european-elm': [640, 72, 11000, 46, null, /Lohmann/],
  hornbeam: [800, 160, 16200, 82, null, /Lohmann/],
  'european-willow': [450, 31, 7200, 24, null, /Lohmann/],
};

/**
 * Their shrinkage green to oven-dry, %, radial and tangential, from the printed figures:
 * Bauwerk's swelling per 1 % moisture × 30 % (fibre saturation); espen's green-to-12 % × 30/18;
 * German Wikipedia's willow totals as printed.
 */
const EUROPEAN_SHRINKAGE: Record<string, [number, number, RegExp]> = {
  'european-ash': [0.17 * 30, 0.28 * 30, /Bauwerk/],
  'european-oak': [0.18 * 30, 0.35 * 30, /Bauwerk/],
  'european-beech': [0.2 * 30, 0.42 * 30, /Bauwerk/],
  'european-birch': [0.2 * 30, 0.27 * 30, /Bauwerk/],
  'european-elm': [0.19 * 30, 0.32 * 30, /Bauwerk/],
  hornbeam: [(4.6 * 30) / 18, (7.7 * 30) / 18, /espen/],
  'european-willow': [3.9, 6.8, /Wikipedia/],
};

/** Path -> [expected value, the table it must cite]. */
function transcribedFigures(): Map<string, [number, RegExp]> {
  const m = new Map<string, [number, RegExp]>();
  for (const [id, row] of Object.entries(TABLE_5_3A_DRY12)) {
    DRY12_KEYS.forEach((k, i) => m.set(`${id}.${k}.dry12`, [row[i], /FPL-GTR-190.*Table 5-3a/]));
  }
  for (const [id, row] of Object.entries(TABLE_5_3A_GREEN)) {
    DRY12_KEYS.slice(0, 3).forEach((k, i) => m.set(`${id}.${k}.green`, [row[i], /FPL-GTR-282.*Table 5-3a/]));
  }
  for (const [id, [r, t]] of Object.entries(TABLE_4_3)) {
    m.set(`${id}.shrinkage_pct.radial`, [r, /Table 4-3/]);
    m.set(`${id}.shrinkage_pct.tangential`, [t, /Table 4-3/]);
  }
  for (const [id, [density, mor, moe, cpar, shear, table]] of Object.entries(EUROPEAN)) {
    m.set(`${id}.specific_gravity.dry12`, [Number((density / 1120).toFixed(3)), table]);
    m.set(`${id}.mor_kPa.dry12`, [mor * 1000, table]);
    m.set(`${id}.moe_MPa.dry12`, [moe, table]);
    m.set(`${id}.compression_parallel_kPa.dry12`, [cpar * 1000, table]);
    if (shear !== null) m.set(`${id}.shear_kPa.dry12`, [shear * 1000, table]);
  }
  for (const [id, [r, t, table]] of Object.entries(EUROPEAN_SHRINKAGE)) {
    m.set(`${id}.shrinkage_pct.radial`, [Number(r.toFixed(1)), table]);
    m.set(`${id}.shrinkage_pct.tangential`, [Number(t.toFixed(1)), table]);
  }
  return m;
}

describe('rules data as shipped', () => {
  it('holds the species, leathers and grounds the specification vocabulary names', () => {
    expect(Object.keys(data.species).length).toBeGreaterThanOrEqual(12);
    for (const id of ['white-ash', 'rock-elm', 'white-oak']) expect(data.species).toHaveProperty([id]);
    for (const id of ['rawhide', 'vegetable-tanned-leather']) expect(data.leathers).toHaveProperty([id]);
    for (const id of ['turf', 'packed-earth', 'sand', 'gravel', 'paved']) expect(data.grounds).toHaveProperty([id]);
  });

  // Every number cites sources of the catalogue; a document is cited at a place in it
  // (a table, section, chapter, equation or page), or the value is marked as recalled or as practice.
  const citesPlace = (ids: string[]) =>
    ids.every((id) => {
      const e = data.sources[id];
      if (e.kind === 'from-memory' || e.kind === 'common-practice') return true;
      return /\b(table|section|clause|chapter|equation|problem|page|abstract|question)\b/i.test(e.where ?? '');
    });

  it('gives every material and ground value a source that cites a table or is marked', () => {
    const items = sourcedValues({ species: data.species, leathers: data.leathers, grounds: data.grounds }, '');
    // 15 species x 16 numbers alone exceed this; a walk that finds nothing must fail.
    expect(items.length).toBeGreaterThan(200);
    for (const { path, item } of items) {
      expect(item.sources.length, path).toBeGreaterThan(0);
      for (const id of item.sources) expect(data.sources, `${path}: ${id}`).toHaveProperty([id]);
      expect(citesPlace(item.sources), `${path}: ${item.source}`).toBe(true);
    }
  });

  it('gives every limit and parameter a source that cites a place in a document or is marked', () => {
    const items = sourcedValues({ limits: data.limits, params: data.params }, '');
    expect(items.length).toBeGreaterThan(60);
    for (const { path, item } of items) {
      expect(item.sources.length, path).toBeGreaterThan(0);
      expect(citesPlace(item.sources), `${path}: ${item.source}`).toBe(true);
    }
  });

  it('matches the transcribed Wood Handbook tables, and claims a table only for figures in it', () => {
    const expected = transcribedFigures();
    for (const [path, [value, table]] of expected) {
      const [id, ...rest] = path.split('.');
      const item = rest.reduce<unknown>((n, k) => (n as Record<string, unknown>)[k], data.species[id]) as Sourced;
      expect(item.value, path).toBe(value);
      expect(item.source, path).toMatch(table);
      expect(item.source, path).not.toMatch(MARKED);
    }
    // Anything else in the species file is not in the reference figures, so it must say so.
    for (const { path, item } of sourcedValues(data.species, '')) {
      if (!expected.has(path)) expect(item.source, path).toMatch(/from memory/);
    }
  });

  it('marks the shrinkage figures the reference notes give as recalled', () => {
    // Reference figures: shagbark hickory 7.0 / 10.5 and black locust 4.6 / 7.2 are from memory.
    expect(data.species['shagbark-hickory'].shrinkage_pct.radial).toMatchObject({ value: 7.0 });
    expect(data.species['black-locust'].shrinkage_pct.tangential).toMatchObject({ value: 7.2 });
    for (const id of ['shagbark-hickory', 'black-locust']) {
      expect(data.species[id].shrinkage_pct.radial.source).toMatch(/from memory/);
      expect(data.species[id].shrinkage_pct.tangential.source).toMatch(/from memory/);
    }
  });

  it('has every steam-bend figure marked from memory with a note to make trial bends', () => {
    for (const [id, s] of Object.entries(data.species)) {
      for (const ratio of [s.steam_bend_ratio.supported, s.steam_bend_ratio.unsupported]) {
        if (ratio === null) continue;
        expect(ratio.source, id).toMatch(/from memory/);
        expect(ratio.note ?? '', id).toMatch(/trial bends/);
      }
      const { supported, unsupported } = s.steam_bend_ratio;
      // A strap lets wood bend tighter, never less tight.
      if (supported && unsupported) expect(supported.value, id).toBeLessThan(unsupported.value);
    }
  });

  it('has green values below dry values for specific gravity and every strength', () => {
    for (const [id, s] of Object.entries(data.species)) {
      for (const k of DRY12_KEYS) expect(s[k].green.value, `${id}.${k}`).toBeLessThan(s[k].dry12.value);
    }
  });
});

describe('specific gravity at 12 % from basic specific gravity', () => {
  // Wood Handbook FPL-GTR-190, chapter 4 (mechanics note section 1):
  // G_M = G_b / (1 - 0.265 a G_b), a = (30 - M)/30. A check between two columns of Table 5-3a.
  const a = (30 - 12) / 30;
  const fromHandbookRelation = (s: Species) => {
    const gb = s.specific_gravity.green.value;
    return gb / (1 - 0.265 * a * gb);
  };
  // The 0.265 G_b term stands for a typical volumetric shrinkage; with the species'
  // own Table 4-3 shrinkage instead: G_M = G_b / (1 - S_v a), S_v = 1 - (1 - S_R)(1 - S_T).
  const fromOwnShrinkage = (s: Species) => {
    const r = s.shrinkage_pct.radial.value / 100;
    const t = s.shrinkage_pct.tangential.value / 100;
    return s.specific_gravity.green.value / (1 - (1 - (1 - r) * (1 - t)) * a);
  };
  // Black locust shrinks far less than the relation assumes (about 10 % by volume
  // against 17 % predicted), so the handbook's own columns stand 0.05 apart for it.
  const LOW_SHRINKAGE = ['black-locust'];

  it('reproduces the worked check of the mechanics note: 0.55 gives 0.603', () => {
    const gb = 0.55;
    expect(gb / (1 - 0.265 * a * gb)).toBeCloseTo(0.603, 3);
  });

  it('lands within 0.03 of the listed 12 % value for every species but the low-shrinkage ones', () => {
    const outliers: string[] = [];
    for (const [id, s] of Object.entries(data.species)) {
      const err = Math.abs(fromHandbookRelation(s) - s.specific_gravity.dry12.value);
      if (err > 0.03) outliers.push(id);
    }
    expect(outliers.sort()).toEqual(LOW_SHRINKAGE);
  });

  it('lands within 0.03 for every species when each uses its own shrinkage', () => {
    for (const [id, s] of Object.entries(data.species)) {
      expect(Math.abs(fromOwnShrinkage(s) - s.specific_gravity.dry12.value), id).toBeLessThanOrEqual(0.03);
    }
  });
});

describe('loading broken rules data', () => {
  const dirs: string[] = [];
  afterEach(() => {
    for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
  });

  /** A temporary copy of the shipped rules directory. */
  function copyRules(): string {
    const dir = mkdtempSync(join(tmpdir(), 'axletree-rules-'));
    dirs.push(dir);
    cpSync(defaultRulesDir(), dir, { recursive: true });
    return dir;
  }

  function edit(file: string, from: string, to: string): void {
    const text = readFileSync(file, 'utf8');
    expect(text.includes(from), `test fixture text not found in ${file}: ${from}`).toBe(true);
    writeFileSync(file, text.replace(from, to));
  }

  function lineOf(file: string, needle: string): number {
    return readFileSync(file, 'utf8').split('\n').findIndex((l) => l.includes(needle)) + 1;
  }

  function loadError(dir: string): RulesDataError {
    try {
      loadRulesData(dir);
    } catch (e) {
      if (e instanceof RulesDataError) return e;
      throw e;
    }
    throw new Error('broken rules data was accepted');
  }

  it('rejects a number without a source and a negative strength, naming file, line and key', () => {
    const dir = copyRules();
    const file = join(dir, 'materials', 'species.yaml');
    const whiteAshMor = 'dry12: { value: 103000, source: wood-handbook-2010-t5-3a }';
    edit(file, whiteAshMor, 'dry12: { value: 103000 }');
    edit(file, 'green: { value: 8800,', 'green: { value: -8800,'); // rock elm shear, green
    const err = loadError(dir);

    expect(err.message).toContain(`${file}:${lineOf(file, 'dry12: { value: 103000 }')}: white-ash.mor_kPa.dry12: missing key "source"`);
    expect(err.message).toContain(`${file}:${lineOf(file, 'value: -8800')}: rock-elm.shear_kPa.green.value`);
    expect(err.message).toMatch(/rock-elm\.shear_kPa\.green\.value: must be a number greater than 0, found -8800/);
    expect(err.problems).toHaveLength(2);
  });

  it('rejects an unknown key and a bad identifier, saying what is allowed', () => {
    const dir = copyRules();
    const file = join(dir, 'grounds.yaml');
    edit(file, 'paved:', 'Paved Road:');
    edit(file, '  lateral_friction: { value: 0.45', '  lateral_frction: { value: 0.45');
    const err = loadError(dir);
    expect(err.message).toContain(`${file}:${lineOf(file, 'Paved Road:')}: Paved Road: key "Paved Road" is not allowed`);
    expect(err.message).toMatch(/lower case words joined by hyphens/);
    expect(err.message).toContain('turf.lateral_frction: unknown key "lateral_frction": allowed keys are name, lateral_friction, soil_resistance');
    expect(err.message).toContain('turf: missing key "lateral_friction"');
  });

  it('rejects an out-of-range leather value with its range', () => {
    const dir = copyRules();
    const file = join(dir, 'materials', 'leathers.yaml');
    edit(file, 'wet_strength_factor: { value: 0.8,', 'wet_strength_factor: { value: 1.8,');
    const err = loadError(dir);
    expect(err.message).toContain(
      `${file}:${lineOf(file, 'value: 1.8')}: vegetable-tanned-leather.wet_strength_factor.value: must be a number greater than 0 and at most 1`,
    );
  });

  it('traces a bad limit to the limits file that holds it, and refuses a rule given twice', () => {
    const dir = copyRules();
    mkdirSync(join(dir, 'limits'), { recursive: true });
    const a = join(dir, 'limits', 'zz-test-a.yaml');
    const b = join(dir, 'limits', 'zz-test-b.yaml');
    writeFileSync(a, 'test.rule:\n  span_mm: { value: 10, source: "from memory" }\n');
    writeFileSync(b, 'test.rule:\n  depth_mm: { value: 5, unit: mm, source: "from memory" }\n');
    const err = loadError(dir);
    expect(err.message).toContain(`${b}:1: test.rule: rule id is already given in ${a}`);
    writeFileSync(b, '# nothing yet\n');
    expect(loadError(dir).message).toContain(`${a}:2: test.rule.span_mm: missing key "unit"`);
  });

  it('names the file and line of a YAML syntax error', () => {
    const dir = copyRules();
    const file = join(dir, 'grounds.yaml');
    edit(file, 'sand:', 'turf:');
    expect(loadError(dir).message).toMatch(new RegExp(`${file}:\\d+: \\(whole file\\): not valid YAML: Map keys must be unique`));
  });

  it('names a missing file, and refuses a rules directory without the limits the rules declare', () => {
    const dir = copyRules();
    rmSync(join(dir, 'limits'), { recursive: true, force: true });
    expect(loadError(dir).message).toContain('the rule balance.yoke-lift compares with the limit pole_load, which the data does not hold');
    rmSync(join(dir, 'materials', 'leathers.yaml'));
    expect(loadError(dir).message).toContain(`${join(dir, 'materials', 'leathers.yaml')}: (whole file): file not found`);
  });
});
