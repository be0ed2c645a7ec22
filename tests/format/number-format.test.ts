import { describe, expect, it } from 'vitest';
import { formatNumber, formatPercent, formatQuantity, NO_VALUE, UNIT_SPACE } from '../../src/core/format/number-format.ts';
import { literalText, placeholders, renderTemplate } from '../../src/core/format/template.ts';

// The one formatter: three significant figures, lengths in whole mm from 10 mm,
// never more than four significant figures (issue: one number formatter).
const sigFigs = (text: string) => text.replace(/e-?\d+$/, '').replace(/^-/, '').replace('.', '').replace(/^0+/, '').length;

describe('number format', () => {
  it('writes three significant figures by default', () => {
    expect(formatNumber(0.012345)).toBe('0.0123');
    expect(formatNumber(1.2345)).toBe('1.23');
    expect(formatNumber(12.345)).toBe('12.3');
    expect(formatNumber(123.45)).toBe('123');
  });

  it('writes whole numbers from a thousand, with at most four significant figures', () => {
    expect(formatNumber(1234.5)).toBe('1235');
    expect(formatNumber(123456)).toBe('123500');
  });

  it('writes lengths in whole millimetres from 10 mm, one decimal below', () => {
    expect(formatNumber(2439.04, 'mm')).toBe('2439');
    expect(formatNumber(50, 'mm')).toBe('50');
    expect(formatNumber(15.24, 'mm')).toBe('15');
    expect(formatNumber(3.456, 'mm')).toBe('3.5');
  });

  it('writes a value below a thousandth with its exponent, so it never reads as zero', () => {
    expect(formatNumber(1.2345e-7, 'N')).toBe('1.23e-7');
    expect(formatNumber(-0.00042)).toBe('-4.2e-4');
  });

  it('never writes a negative zero, and writes a dash for what is not a number', () => {
    expect(formatNumber(-0.0000001, 'mm')).toBe('0');
    expect(formatNumber(-0.0004, 'mm')).toBe('0');
    expect(formatNumber(0)).toBe('0');
    for (const v of [NaN, Infinity, -Infinity, null, undefined]) expect(formatNumber(v)).toBe(NO_VALUE);
  });

  it('never prints more than four significant figures', () => {
    for (let e = -5; e <= 7; e++) {
      for (const m of [1.23456789, 9.87654321, 5.5555555]) {
        for (const unit of ['', 'mm', 'N', 'MPa']) {
          const text = formatNumber(m * 10 ** e, unit);
          const digits = text.replace(/0+$/, '');
          expect(sigFigs(digits), `${m}e${e} ${unit}: ${text}`).toBeLessThanOrEqual(4);
        }
      }
    }
  });

  it('joins a number and its unit with a no-break space; a ratio has no unit', () => {
    expect(formatQuantity(1234.5, 'N')).toBe(`1235${UNIT_SPACE}N`);
    expect(formatQuantity(0.5, '1')).toBe('0.5');
    expect(formatPercent(0.1234)).toBe(`12.3${UNIT_SPACE}%`);
  });
});

describe('message templates', () => {
  it('fills placeholders from raw params, each with its format', () => {
    const t = 'Each horse carries {value:N} ({share:%}) in "{case}", ratio {r:1}.';
    expect(placeholders(t).map((p) => p.name)).toEqual(['value', 'share', 'case', 'r']);
    expect(renderTemplate(t, { value: 171.6, share: 0.0876, case: 'braking', r: 0.51234 })).toBe(`Each horse carries 172${UNIT_SPACE}N (8.76${UNIT_SPACE}%) in "braking", ratio 0.512.`);
    expect(literalText(t)).not.toMatch(/\d/);
  });

  it('refuses a template whose param is missing', () => {
    expect(() => renderTemplate('{a:N} and {b}', { a: 1 })).toThrow(/needs the param "b"/);
  });

  it('never leaves a zero after the point, a bare point or a negative zero, and reads back within its figures', () => {
    let seed = 11;
    const r = () => (seed = (Math.imul(seed, 48271) % 2147483647) >>> 0) / 2147483647;
    for (let i = 0; i < 20_000; i++) {
      const v = (r() - 0.5) * 10 ** Math.floor(r() * 12 - 5);
      for (const unit of ['', 'mm', 'N', 'count']) {
        const t = formatNumber(v, unit);
        const mantissa = t.split('e')[0];
        expect(mantissa.includes('.') && /0$/.test(mantissa), t).toBe(false);
        expect(/\.$/.test(mantissa) || t === '-0', t).toBe(false);
        // Three significant figures (whole counts, and lengths from 10 mm, to the unit).
        const back = Number(t);
        expect(Math.abs(back - v), `${v} ${unit} -> ${t}`).toBeLessThanOrEqual(Math.max(Math.abs(v) * 5e-3, unit === 'count' || unit === 'mm' ? 0.5 : 0));
      }
    }
  });
});
