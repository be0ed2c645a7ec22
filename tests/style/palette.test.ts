// The severity palette and the workbooks' neutral colours meet the rules
// docs/style.md gives for them, and that page's numbers are the ones computed
// here from the code. The arithmetic is in colour-science.ts (WCAG 2 contrast,
// CIELAB, Machado et al. 2009 simulation).
import { describe, expect, it } from 'vitest';
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { SEVERITIES, type Severity } from '../../src/core/findings/finding.ts';
import { SEVERITY_COLOURS, SEVERITY_MARKS } from '../../src/render/severity-palette.ts';
import { CAUTION_FILL, CAUTION_INK, HEADER_FILL, INPUT_EDGE, INPUT_FILL, LABEL_FILL, QUIET_INK } from '../../src/render/sheets/sheet-palette.ts';
import { REPO } from '../support/run-cli.ts';
import { contrast, distance, lightness, type Deficiency } from './colour-science.ts';

const STYLE = readFileSync(join(REPO, 'docs', 'style.md'), 'utf8');
/** Best to worst, the order the fills darken in. */
const LIGHT_TO_DARK: Severity[] = ['info', 'pass', 'advice', 'warning', 'fail', 'error'];
const fill = (s: Severity) => SEVERITY_COLOURS[s].fill;

/** The cells of the docs table row that starts with `first`. */
function docRow(first: string): string[] {
  const line = STYLE.split('\n').find((l) => l.startsWith(`| ${first} |`));
  if (!line) throw new Error(`docs/style.md has no table row for ${first}`);
  return line.split('|').slice(1, -1).map((c) => c.trim());
}

const pairs = LIGHT_TO_DARK.flatMap((a, i) => LIGHT_TO_DARK.slice(i + 1).map((b) => [a, b] as const));

/** The closest two fills, as seen with normal vision or a deficiency. */
function closest(as?: Deficiency): { d: number; a: Severity; b: Severity } {
  return pairs.map(([a, b]) => ({ d: distance(fill(a), fill(b), as), a, b })).reduce((m, x) => (x.d < m.d ? x : m));
}

describe('the severity palette', () => {
  it('covers every severity with a fill, a text colour and a mark of its own', () => {
    expect(new Set(LIGHT_TO_DARK)).toEqual(new Set(SEVERITIES));
    expect(new Set(SEVERITIES.map(fill)).size).toBe(SEVERITIES.length);
    expect(new Set(SEVERITIES.map((s) => SEVERITY_MARKS[s])).size).toBe(SEVERITIES.length);
    for (const s of SEVERITIES) expect([...SEVERITY_MARKS[s]], s).toHaveLength(1);
  });

  it('keeps text on every fill at 7:1 or more', () => {
    for (const s of SEVERITIES) expect(contrast(fill(s), SEVERITY_COLOURS[s].text), s).toBeGreaterThanOrEqual(7);
  });

  it('darkens as the severity worsens, each step at least 7 L* in grey', () => {
    const l = LIGHT_TO_DARK.map((s) => lightness(fill(s)));
    for (let i = 1; i < l.length; i++) expect(l[i - 1] - l[i], `${LIGHT_TO_DARK[i - 1]} to ${LIGHT_TO_DARK[i]}`).toBeGreaterThanOrEqual(7);
  });

  it.each([undefined, 'protan', 'deutan', 'tritan'] as const)('keeps every pair of fills 10 ΔE apart, seen as %s', (as) => {
    expect(closest(as).d).toBeGreaterThanOrEqual(10);
  });

  it('is what docs/style.md says, to the digits it prints', () => {
    for (const s of SEVERITIES) {
      const { fill: f, text } = SEVERITY_COLOURS[s];
      expect(docRow(s), s).toEqual([s, SEVERITY_MARKS[s], `\`${f}\``, `\`${text}\``, `${contrast(f, text).toFixed(1)}:1`, lightness(f).toFixed(0)]);
    }
    for (const as of ['normal', 'protan', 'deutan', 'tritan'] as const) {
      const c = closest(as === 'normal' ? undefined : as);
      expect(docRow(as), as).toEqual([as, c.d.toFixed(1), `${c.a} and ${c.b}`]);
    }
  });
});

describe('the workbooks\' neutral colours', () => {
  it('keep their text at 7:1 or more and the input outline at 3:1, as docs/style.md says', () => {
    const rows: [string, string, string][] = [
      ['table header', HEADER_FILL, '#000000'],
      ['caution line', CAUTION_FILL, CAUTION_INK],
      ['label, help, computed cell', LABEL_FILL, '#000000'],
      ['input cell', INPUT_FILL, '#000000'],
    ];
    for (const [use, back, ink] of rows) {
      expect(contrast(back, ink), use).toBeGreaterThanOrEqual(7);
      expect(docRow(use), use).toEqual([use, `\`${back}\``, `\`${ink}\``, `${contrast(back, ink).toFixed(1)}:1`, lightness(back).toFixed(0)]);
    }
    expect(contrast(QUIET_INK, LABEL_FILL)).toBeGreaterThanOrEqual(7);
    expect(docRow('quiet text (keys, defaults)')).toEqual(['quiet text (keys, defaults)', `\`${QUIET_INK}\` on \`${LABEL_FILL}\``, '', `${contrast(QUIET_INK, LABEL_FILL).toFixed(1)}:1`, lightness(QUIET_INK).toFixed(0)]);
    expect(contrast(INPUT_EDGE, INPUT_FILL)).toBeGreaterThanOrEqual(3);
    expect(STYLE).toContain(`\`${INPUT_EDGE}\`, ${contrast(INPUT_EDGE, INPUT_FILL).toFixed(1)}:1`);
  });
});

// A spreadsheet program's stock cell-style and theme swatches, which our own colours replace.
const STOCK = ['#C6EFCE', '#006100', '#FFC7CE', '#9C0006', '#FFEB9C', '#9C5700', '#FFF2CC', '#E2EFDA', '#D9D9D9', '#F2F2F2', '#BDD7EE', '#FFC000', '#E06666', '#E7E6E6', '#7F7F7F', '#DDEBF7', '#FCE4D6', '#A9D08E', '#A9C79A', '#7F2704'];

describe('no stock swatch', () => {
  it('is left in the workbook and palette sources', () => {
    const dirs = ['src/render/sheets', 'src/render/spec-workbook'];
    const files = [...dirs.flatMap((d) => readdirSync(join(REPO, d)).map((f) => join(d, f))), 'src/render/severity-palette.ts', 'src/render/stock-palette.ts'];
    for (const file of files) {
      const text = readFileSync(join(REPO, file), 'utf8').toUpperCase();
      for (const hex of STOCK) {
        expect(text.includes(hex) || text.includes(`FF${hex.slice(1)}`), `${hex} in ${file}`).toBe(false);
      }
    }
  });
});
