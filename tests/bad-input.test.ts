// `axletree check` on bad input: every case must end with exit code 2, name
// the key and where it is, say what is allowed, show no stack trace, write
// nothing and leave the input file as it was.
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { existsSync, readFileSync } from 'node:fs';
import { mkdir, readdir, readFile, rm, stat, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { parse, stringify } from 'yaml';
import { freshDir, positionOf, replaceOnce, REPO, runBinary, runCli, type CliRun } from './support/run-cli.ts';

const DEMO_TEXT = readFileSync(join(REPO, 'specs', 'demo-two-crew.yaml'), 'utf8');
const DEMO = parse(DEMO_TEXT);
const FLOOR = DEMO.box.floor as { depth_mm: number; width_mm: number; frame: { width_mm: number } };

/** The demo text with each [find, replace] applied once. */
function edited(...edits: [string, string][]): string {
  return edits.reduce((text, [find, replace]) => replaceOnce(text, find, replace), DEMO_TEXT);
}

/** The demo spec changed as an object and written out again. */
function changed(mutate: (spec: typeof DEMO) => void, as: 'yaml' | 'json'): string {
  const spec = structuredClone(DEMO);
  mutate(spec);
  return as === 'json' ? JSON.stringify(spec, null, 2) + '\n' : stringify(spec);
}

interface Expected {
  /** Key path as printed; '' for a problem with the file as a whole. */
  path: string;
  /** [context, token]: the problem is reported where token sits in the one occurrence of context. */
  at?: [string, string?];
  /** Fragments the message must contain: what is wrong and what is allowed. */
  says: string[];
}

interface Case {
  name: string;
  file?: string;
  text: string;
  issues: Expected[];
}

const CASES: Case[] = [
  {
    name: 'malformed YAML: a colon inside a plain value',
    text: edited(['name: Oak-hollow two-crew', 'name: Oak-hollow: two-crew']),
    issues: [{ path: '', at: ['name: Oak-hollow: two-crew', 'Oak-hollow'], says: ['not valid YAML', 'Nested mappings'] }],
  },
  {
    name: 'text in a whole-number field',
    text: edited(['spokes: 6', 'spokes: six']),
    issues: [{ path: 'wheels.spokes', at: ['spokes: six', 'six'], says: ['"six"', 'wrong type', 'allowed: a whole number'] }],
  },
  {
    name: 'a negative length',
    text: edited(['length_mm: 2080', 'length_mm: -2080']),
    issues: [{ path: 'axle.length_mm', at: ['length_mm: -2080', '-2080'], says: ['-2080', 'out of range', 'allowed: at least 500 and at most 4000 mm'] }],
  },
  {
    name: 'a zero length',
    text: edited(['length_mm: 1150', 'length_mm: 0']),
    issues: [{ path: 'yoke.length_mm', at: ['yoke:\n  species: white-oak\n  length_mm: 0', '0'], says: ['value 0', 'out of range', 'allowed: at least 300 and at most 4000 mm'] }],
  },
  {
    name: 'an unknown species',
    text: edited(['  x_mm: 235\n  species: rock-elm', '  x_mm: 235\n  species: bog-oak']),
    issues: [{ path: 'axle.species', at: ['species: bog-oak', 'bog-oak'], says: ['unknown species "bog-oak"', 'known species:', 'white-ash', 'rock-elm', 'white-oak'] }],
  },
  {
    name: 'an unknown leather material',
    text: edited(['material: rawhide\n  width_mm: 30', 'material: vinyl\n  width_mm: 30']),
    issues: [{ path: 'floor_straps.material', at: ['material: vinyl', 'vinyl'], says: ['unknown material "vinyl"', 'known materials:', 'rawhide'] }],
  },
  {
    name: 'a unit string the units library cannot read',
    text: edited(['x_mm: 235', 'x_mm: "twelve inches"']),
    issues: [{ path: 'axle.x_mm', at: ['x_mm: "twelve inches"', '"twelve'], says: ['"twelve inches"', 'allowed: a number in mm, or a string such as'] }],
  },
  {
    name: 'a mass given for a length',
    text: edited(['length_mm: 2080', 'length_mm: "3 kg"']),
    issues: [{ path: 'axle.length_mm', at: ['length_mm: "3 kg"', '"3 kg"'], says: ['"3 kg"', 'cannot be converted to mm', 'allowed: a number in mm'] }],
  },
  {
    name: 'the axle outside the floor',
    text: edited(['x_mm: 235', 'x_mm: 600']),
    issues: [{ path: 'axle.x_mm', at: ['x_mm: 600', '600'], says: ['x = 600 mm', 'outside the floor', `allowed: 0 to ${FLOOR.depth_mm} mm`] }],
  },
  {
    name: 'a crew member off the back of the floor (x)',
    text: edited(['role: driver,    mass_kg: 78, x_mm: 320', 'role: driver,    mass_kg: 78, x_mm: -40']),
    issues: [{ path: 'crew[0].x_mm', at: ['x_mm: -40', '-40'], says: ['"driver"', 'x = -40 mm', 'off the floor', `allowed: 0 to ${FLOOR.depth_mm} mm`] }],
  },
  {
    name: 'a crew member off the side of the floor (y)',
    text: edited(['y_mm:  210', 'y_mm:  600']),
    issues: [{ path: 'crew[1].y_mm', at: ['y_mm:  600', '600'], says: ['"companion"', 'y = 600 mm', 'off the floor', `allowed: ${-FLOOR.width_mm / 2} to ${FLOOR.width_mm / 2} mm`] }],
  },
  {
    name: 'the yoke behind the front of the box',
    text: edited(['yoke_x_mm: 2950', 'yoke_x_mm: 590']),
    issues: [
      { path: 'pole.yoke_x_mm', at: ['yoke_x_mm: 590', '590'], says: ['x = 590 mm', 'not ahead of the box', `allowed: more than ${FLOOR.depth_mm + FLOOR.frame.width_mm} mm`] },
      // So short a pole also cannot take the demo's bend.
      { path: 'pole.bend_radius_mm', at: ['bend_radius_mm: 1200', '1200'], says: ['radius 1200 mm', 'allowed: a radius below'] },
    ],
  },
  {
    // A missing key is reported at the key of the mapping that lacks it.
    name: 'a required key missing',
    text: edited(['  x_mm: 235\n  species: rock-elm\n', '  x_mm: 235\n']),
    issues: [{ path: 'axle.species', at: ['axle:\n  x_mm: 235', 'axle'], says: ['required key species is missing'] }],
  },
  {
    name: 'NaN for a length',
    text: edited(['x_mm: 235', 'x_mm: .nan']),
    issues: [{ path: 'axle.x_mm', at: ['x_mm: .nan', '.nan'], says: ['NaN', 'allowed: a finite number'] }],
  },
  {
    name: 'Infinity for a length',
    text: edited(['diameter_mm: 940', 'diameter_mm: .inf']),
    issues: [{ path: 'wheels.diameter_mm', at: ['diameter_mm: .inf', '.inf'], says: ['Infinity', 'allowed: a finite number'] }],
  },
  {
    name: 'an absurd size: a 40 m pole',
    text: edited(['yoke_x_mm: 2950', 'yoke_x_mm: "40 m"']),
    issues: [{ path: 'pole.yoke_x_mm', at: ['yoke_x_mm: "40 m"', '"40 m"'], says: ['40000', 'out of range', 'at most 8000 mm'] }],
  },
  {
    // The horse's mass must come one way: here none (shown where the team's mapping starts).
    name: 'no horse mass given',
    text: edited(['  horse_mass_kg: 430\n', '']),
    issues: [{ path: 'team', at: ['team:\n  horses: 2', 'horses'], says: ['gives no horse mass', 'horse.girth_cm with horse.body_length_cm', 'horse.type with horse.height_m'] }],
  },
  {
    name: 'the horse mass given two ways',
    text: edited(['  horse_mass_kg: 430\n', '  horse_mass_kg: 430\n  horse: { type: riding, height_m: 1.6 }\n']),
    issues: [{ path: 'team.horse_mass_kg', at: ['horse_mass_kg: 430', '430'], says: ['more than one way', 'horse_mass_kg; horse.type with horse.height_m', 'give exactly one'] }],
  },
  {
    name: 'the same crew role twice',
    text: edited(['role: companion', 'role: driver   ']),
    issues: [{ path: 'crew[1].role', at: ['role: driver   ', 'driver'], says: ['"driver"', 'more than once', 'must be unique'] }],
  },
  {
    // The unknown key is shown at itself; the missing top-level key where the
    // top-level mapping starts.
    name: 'an unknown key (a typo)',
    text: edited(['wheels:\n', 'whels:\n']),
    issues: [
      { path: 'whels', at: ['whels:\n  diameter_mm', 'whels'], says: ['unknown key whels', 'allowed keys here:', 'wheels'] },
      { path: 'wheels', at: ['spec_version: 1', 'spec_version'], says: ['required key wheels is missing'] },
    ],
  },
  {
    name: 'a bore as large as the nave',
    text: edited(['bore_mm: 76', 'bore_mm: 160']),
    issues: [{ path: 'wheels.nave.bore_mm', at: ['bore_mm: 160', '160'], says: ['bore 160 mm', 'not smaller than the nave diameter 160 mm'] }],
  },
  {
    // Track 1280 less nave 340 leaves exactly the bearing span 940: no clearance.
    name: 'a track not wider than the bearing span plus a nave',
    text: edited(['track_mm: 1640', 'track_mm: 1280']),
    issues: [{ path: 'wheels.track_mm', at: ['track_mm: 1280', '1280'], says: ['track 1280 mm', 'not wider than the axle bearing span 940 mm plus the nave length 340 mm'] }],
  },
  {
    name: 'several schema errors, all in one run',
    text: edited(['spokes: 6', 'spokes: six'], ['length_mm: 1150', 'length_mm: 0'], ['x_mm: 235', 'x_mm: "twelve inches"'], ['diameter_mm: 940', 'diameter_mm: .nan'], ['pole:\n  species: white-ash\n', 'pole:\n']),
    issues: [
      { path: 'wheels.spokes', at: ['spokes: six', 'six'], says: ['wrong type'] },
      { path: 'yoke.length_mm', at: ['yoke:\n  species: white-oak\n  length_mm: 0', '0'], says: ['out of range'] },
      { path: 'axle.x_mm', at: ['x_mm: "twelve inches"', '"twelve'], says: ['"twelve inches"'] },
      { path: 'wheels.diameter_mm', at: ['diameter_mm: .nan', '.nan'], says: ['allowed: a finite number'] },
      { path: 'pole.species', at: ['pole:\n  width_mm', 'pole'], says: ['required key species is missing'] },
    ],
  },
  {
    name: 'several geometry errors, all in one run',
    text: edited(['x_mm: 235', 'x_mm: 600'], ['y_mm:  210', 'y_mm:  600'], ['bore_mm: 76', 'bore_mm: 160']),
    issues: [
      { path: 'axle.x_mm', at: ['x_mm: 600', '600'], says: ['outside the floor'] },
      { path: 'crew[1].y_mm', at: ['y_mm:  600', '600'], says: ['off the floor'] },
      { path: 'wheels.nave.bore_mm', at: ['bore_mm: 160', '160'], says: ['not smaller than the nave diameter'] },
    ],
  },
  {
    // Reported at the second comma.
    name: 'a JSON spec with a doubled comma',
    file: 'spec.json',
    text: replaceOnce(changed(() => {}, 'json'), '"spokes": 6,', '"spokes": 6,,'),
    issues: [{ path: '', at: ['"spokes": 6,,\n', ',\n'], says: ['not valid JSON'] }],
  },
  {
    // The YAML reader would let this through; a .json file is held to JSON.
    name: 'a JSON spec with a trailing comma',
    file: 'spec.json',
    text: replaceOnce(changed(() => {}, 'json'), '"ground": "turf"', '"ground": "turf",'),
    issues: [{ path: '', at: ['"ground": "turf",\n  }', '}'], says: ['not valid JSON', 'no trailing comma', 'found "}"'] }],
  },
  {
    name: 'a JSON spec with text in a number field',
    file: 'spec.json',
    text: changed((s) => (s.wheels.spokes = 'six'), 'json'),
    issues: [{ path: 'wheels.spokes', at: ['"spokes": "six"', '"six"'], says: ['wrong type', 'allowed: a whole number'] }],
  },
  {
    name: 'a re-serialised YAML spec with a negative frame width',
    text: changed((s) => (s.box.floor.frame.width_mm = -80), 'yaml'),
    issues: [{ path: 'box.floor.frame.width_mm', at: ['width_mm: -80', '-80'], says: ['out of range', 'allowed: at least 10 and at most 300 mm'] }],
  },
];

/** The line the formatter prints for one expected issue. */
function heading(text: string, e: Expected): string {
  const at = e.at ? positionOf(text, e.at[0], e.at[1]) : undefined;
  const where = [e.path, at ? `(line ${at.line}, column ${at.column})` : ''].filter(Boolean).join(' ');
  return `  ${where}: `;
}

function expectNoStackTrace(r: CliRun): void {
  for (const stream of [r.err, r.out]) {
    expect(stream).not.toMatch(/^\s+at /m);
    expect(stream).not.toMatch(/\b\w*Error:/);
  }
}

let dir: string;
beforeEach(async () => {
  dir = await freshDir();
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('axletree check on a bad specification', () => {
  it('starts from a demo spec that passes, so each case fails for its own edit', async () => {
    await writeFile(join(dir, 'spec.yaml'), DEMO_TEXT);
    const r = await runCli(['check', '--no-decisive', 'spec.yaml', '--out', join(dir, 'out')], dir);
    // 0 or 1 are verdicts on an accepted spec; only 2 means the input was refused.
    expect([0, 1]).toContain(r.code);
    expect(r.err).not.toContain('cannot be checked');
  });

  it.each(CASES.map((c) => [c.name, c] as const))('%s', async (_name, c) => {
    const file = c.file ?? 'spec.yaml';
    await writeFile(join(dir, file), c.text);
    const before = await readFile(join(dir, file));

    const r = await runCli(['check', file], dir);

    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    const n = c.issues.length;
    expect(r.err).toContain(`axletree: ${file} cannot be checked: ${n} problem${n === 1 ? '' : 's'}; nothing was written.`);
    const lines = r.err.split('\n');
    for (const e of c.issues) {
      const head = heading(c.text, e);
      const line = lines.find((l) => l.startsWith(head));
      expect(line, `a line starting "${head}" in:\n${r.err}`).toBeDefined();
      for (const s of e.says) expect(line).toContain(s);
      expect(line).toMatch(/ \[1\d{3}\]$/);
    }
    expectNoStackTrace(r);
    expect(existsSync(join(dir, 'axletree-out'))).toBe(false);
    expect(await readdir(dir)).toEqual([file]);
    expect((await readFile(join(dir, file))).equals(before)).toBe(true);
  });
});

describe('axletree check on something that is not a specification file', () => {
  it('reports an empty file', async () => {
    await writeFile(join(dir, 'empty.yaml'), '\n  \n');
    const r = await runCli(['check', 'empty.yaml'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${join(dir, 'empty.yaml')} is empty; a specification needs at least spec_version, name`);
    expectNoStackTrace(r);
    expect(await readdir(dir)).toEqual(['empty.yaml']);
    expect(await readFile(join(dir, 'empty.yaml'), 'utf8')).toBe('\n  \n');
  });

  it('reports a file that holds only a comment as empty', async () => {
    await writeFile(join(dir, 'comment.yaml'), '# nothing yet\n');
    const r = await runCli(['check', 'comment.yaml'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('is empty');
    expectNoStackTrace(r);
    expect(await readdir(dir)).toEqual(['comment.yaml']);
  });

  it('reports a directory given instead of a file', async () => {
    await mkdir(join(dir, 'specs.yaml'));
    const r = await runCli(['check', 'specs.yaml'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${join(dir, 'specs.yaml')} is a directory; give the specification file inside it.`);
    expectNoStackTrace(r);
    expect((await stat(join(dir, 'specs.yaml'))).isDirectory()).toBe(true);
    expect(await readdir(join(dir, 'specs.yaml'))).toEqual([]);
    expect(await readdir(dir)).toEqual(['specs.yaml']);
  });

  it('reports a missing file', async () => {
    const r = await runCli(['check', 'nowhere.yaml'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`No file at ${join(dir, 'nowhere.yaml')}.`);
    expectNoStackTrace(r);
    expect(await readdir(dir)).toEqual([]);
  });

  it('reports a file that is not YAML or JSON by its name', async () => {
    await writeFile(join(dir, 'spec.txt'), DEMO_TEXT);
    const r = await runCli(['check', 'spec.txt'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('a specification is a .yaml, .yml, .json or .xlsx (fill-in workbook) file');
    expectNoStackTrace(r);
    expect(await readdir(dir)).toEqual(['spec.txt']);
  });

  it('reports a list at the top level', async () => {
    await writeFile(join(dir, 'list.yaml'), '- spec_version: 1\n');
    const r = await runCli(['check', 'list.yaml'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('must be a mapping of keys to values at the top level');
    expectNoStackTrace(r);
    expect(await readdir(dir)).toEqual(['list.yaml']);
  });
});

describe('the real binary on bad input', () => {
  it('exits with 2 and prints the problem without a stack trace', { timeout: 60_000 }, async () => {
    const text = edited(['spokes: 6', 'spokes: six']);
    await writeFile(join(dir, 'spec.yaml'), text);
    const r = runBinary(['check', 'spec.yaml'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain(heading(text, { path: 'wheels.spokes', at: ['spokes: six', 'six'], says: [] }));
    expectNoStackTrace(r);
    expect(await readdir(dir)).toEqual(['spec.yaml']);
    expect(await readFile(join(dir, 'spec.yaml'), 'utf8')).toBe(text);
  });
});

describe('--out that would overwrite the spec', () => {
  it('refuses when the spec is named like an output file in the --out directory', async () => {
    const text = changed(() => {}, 'json');
    await writeFile(join(dir, 'result.json'), text);
    const before = await readFile(join(dir, 'result.json'));
    const r = await runCli(['check', '--no-decisive', 'result.json', '--out', dir], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`refusing to write ${join(dir, 'result.json')}: it is the input file`);
    expect(r.err).toContain('choose another --out directory');
    expectNoStackTrace(r);
    expect((await readFile(join(dir, 'result.json'))).equals(before)).toBe(true);
    // Checked before anything is written: no workbook or report beside it.
    expect(await readdir(dir)).toEqual(['result.json']);
  });
});
