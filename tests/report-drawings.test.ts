import { describe, expect, it } from 'vitest';
import { barCells, barScale, barSegments } from '../src/render/stock-bar.ts';
import { textBars } from '../src/render/stock-bar-text.ts';
import { DRAWING_SCOPE, inlineSvg, scopeClass, scopeStyles } from '../src/render/inline-svg.ts';
import type { CuttingPattern } from '../src/core/stock/cutting-types.ts';
import type { StockPlanGroup } from '../src/core/cutlist/cutting-result.ts';
import { fitText } from '../src/render/stock-bar-svg.ts';
import { textWidth } from '../src/render/drawings/text-box.ts';

// A 1000 mm stock cut to 400 + 300 mm with one 3 mm kerf between them: the
// offcut is 1000 - 700 - 3 = 297 mm. Demo numbers, laid out by hand below.
const PATTERN: CuttingPattern = {
  stock_length_mm: 1000,
  count: 2,
  cuts: [{ label: 'rail', length_mm: 400 }, { label: 'spoke', length_mm: 300 }],
  offcut_mm: 297,
};

describe('stock bars', () => {
  it('places the parts at their true positions with the kerf between them, then the offcut', () => {
    expect(barSegments(PATTERN)).toEqual([
      { label: 'rail', from_mm: 0, length_mm: 400 },
      { label: 'spoke', from_mm: 403, length_mm: 300 },
      { label: null, from_mm: 703, length_mm: 297 },
    ]);
  });

  it('picks the smallest round length per cell that fits the stock in the cells allowed', () => {
    expect(barScale(3000, 60)).toBe(50);
    expect(barScale(3001, 60)).toBe(100);
    expect(barScale(6000, 60)).toBe(100);
    expect(barScale(1000, 60)).toBe(20);
  });

  it('gives each 100 mm cell to the segment covering most of it', () => {
    // Cell 4 is 400-500 mm: the spoke covers 403-500. Cell 7 is 700-800: the offcut covers 703-800.
    const cells = barCells(barSegments(PATTERN), 1000, 100);
    expect(cells.map((c) => c.segment)).toEqual([0, 0, 0, 0, 1, 1, 1, 2, 2, 2]);
    expect(cells.flatMap((c, i) => (c.first ? [i] : []))).toEqual([0, 4, 7]);
  });

  it('writes a text bar with a run per part, dots for the offcut and a legend', () => {
    const group: StockPlanGroup = {
      species: 'white-ash',
      section: { width_mm: 50, thickness_mm: 50 },
      plan: {
        pieces_used: 2, cost: null, lower_bound: 1.4, optimal: true, gap: 0, lp_value: null, lp_bound: null, lp_gap: null, patterns: [PATTERN],
        bought: [{ length_mm: 1000, count: 2, cost: null }], waste_mm: 600, waste_pct: 30, method: 'test', baseline: { pieces_used: 2, cost: null },
      },
    };
    // 1000 mm in at most 60 characters: 20 mm each; 400 mm is 20 characters, 300 mm 15, 297 mm 15.
    const [line, , legend] = textBars(group, 3).split('\n');
    expect(line).toBe(`3.1  1000 mm x 2  |${'A'.repeat(19)}|${'B'.repeat(14)}${'.'.repeat(15)}|`);
    expect(legend).toBe('One character = 20 mm; dots are offcut. A = rail; B = spoke');
  });
});

describe('inlineSvg', () => {
  it('drops an XML prolog and keeps a plain drawing', () => {
    const svg = '<svg xmlns="http://www.w3.org/2000/svg"><line x1="0" y1="0" x2="1" y2="1"/><use href="#a"/></svg>';
    expect(inlineSvg(`<?xml version="1.0" encoding="UTF-8"?>\n${svg}\n`)).toBe(svg.replace('<svg ', `<svg class="${scopeClass(svg)}" `));
  });

  it('gives each drawing its own scope, so one sheet reaches no other drawing', () => {
    const a = '<svg><style>path { stroke: #000; }</style><path/></svg>';
    const b = '<svg><path stroke="red"/></svg>';
    expect(scopeClass(a)).not.toBe(scopeClass(b));
    expect(scopeClass(a).startsWith(`${DRAWING_SCOPE}-`)).toBe(true);
    expect(inlineSvg(a)).toContain(`.${scopeClass(a)} path { stroke: #000; }`);
    expect(inlineSvg(b)).toBe(`<svg class="${scopeClass(b)}"><path stroke="red"/></svg>`);
  });

  it('refuses anything active or external', () => {
    for (const bad of [
      '<svg><script>x</script></svg>',
      '<svg><a href="http://example.com">x</a></svg>',
      '<svg><rect onclick="x()"/></svg>',
      '<svg><foreignObject></foreignObject></svg>',
      '<svg><rect style="fill:url(http://example.com/x)"/></svg>',
      '<div></div>',
    ]) expect(inlineSvg(bad), bad).toBeNull();
  });
});

describe('scopeStyles', () => {
  it('confines the drawing\'s style rules to the drawing', () => {
    const svg = '<svg xmlns="http://www.w3.org/2000/svg"><style>rect, text { fill: none; } .dim { stroke-width: 0.2; }</style><rect/></svg>';
    expect(scopeStyles(svg, DRAWING_SCOPE)).toBe(
      `<svg class="${DRAWING_SCOPE}" xmlns="http://www.w3.org/2000/svg"><style>.${DRAWING_SCOPE} rect, .${DRAWING_SCOPE} text { fill: none; } .${DRAWING_SCOPE} .dim { stroke-width: 0.2; }</style><rect/></svg>`,
    );
  });

  it('joins a class already on the root and reads a CDATA sheet', () => {
    const out = scopeStyles('<svg class="wheel" width="1"><style><![CDATA[ line { stroke: #000; } ]]></style></svg>', DRAWING_SCOPE)!;
    expect(out.startsWith(`<svg class="${DRAWING_SCOPE} wheel" width="1">`)).toBe(true);
    expect(out).toContain(`.${DRAWING_SCOPE} line { stroke: #000; }`);
  });

  it('does not inline a sheet it cannot scope', () => {
    expect(scopeStyles('<svg><style>@media print { rect { fill: red; } }</style></svg>', DRAWING_SCOPE)).toBeNull();
    expect(scopeStyles('<svg><style>/* note */ rect { fill: red; }</style></svg>', DRAWING_SCOPE)).toBeNull();
  });
});

describe('stock bar labels', () => {
  it('keep a label whole where it fits, cut it short with an ellipsis where not, and drop it where not two letters fit', () => {
    const width = (t: string) => textWidth(t, { size: 11 });
    const label = 'front rail, left';
    expect(fitText([label], width(label) + 6)).toBe(label);
    const cut = fitText([label], width(label));
    expect(cut.endsWith('…')).toBe(true);
    expect(width(cut)).toBeLessThanOrEqual(width(label) - 6);
    expect(fitText(['offcut 250 mm', '250 mm', '250'], width('250 mm') + 6)).toBe('250 mm');
    expect(fitText([label], 8)).toBe('');
  });
});
