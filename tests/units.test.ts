import { describe, expect, it } from 'vitest';
import { parseQuantity } from '../src/core/units/parse-quantity.ts';
import { UNITS, unitOfKey } from '../src/core/units/units.ts';

// Exact conversion factors: 1 in = 25.4 mm, 1 ft = 12 in, 1 lb = 0.45359237 kg,
// 1 mile = 1609.344 m (NIST SP 811, 2008, Appendix B.8); g_n = 9.80665 m/s^2 (same, B.8).
describe('unit strings', () => {
  const ok = (text: string, unit: keyof typeof UNITS) => {
    const r = parseQuantity(text, UNITS[unit]);
    if (!r.ok) throw new Error(r.reason);
    return r.value;
  };

  it('reads single terms', () => {
    expect(ok('65 in', 'mm')).toBeCloseTo(1651, 9);
    expect(ok('1.65 m', 'mm')).toBeCloseTo(1650, 9);
    expect(ok('176 lb', 'kg')).toBeCloseTo(176 * 0.45359237, 9);
    expect(ok('12 mph', 'kmh')).toBeCloseTo(12 * 1.609344, 9);
    expect(ok('2 m/s^2', 'g')).toBeCloseTo(2 / 9.80665, 9);
  });

  it('sums compound terms', () => {
    expect(ok('5 ft 4 in', 'mm')).toBeCloseTo((5 * 12 + 4) * 25.4, 9);
    expect(ok('6 ft 9 in', 'mm')).toBeCloseTo(81 * 25.4, 9);
    expect(ok('1 m 20 cm', 'mm')).toBeCloseTo(1200, 9);
  });

  it('rejects what it cannot read or convert, saying why', () => {
    for (const [text, unit] of [['twelve inches', 'mm'], ['3 kg', 'mm'], ['2 m 3', 'mm'], ['', 'mm'], ['40 N', 'kg']] as const) {
      const r = parseQuantity(text, UNITS[unit]);
      expect(r.ok, text).toBe(false);
      if (!r.ok) expect(r.reason).toContain(`"${text}"`);
    }
  });

  it('finds the unit in the key name, longest suffix first', () => {
    expect(unitOfKey('depth_mm')?.symbol).toBe('mm');
    expect(unitOfKey('turn_radius_m')?.symbol).toBe('m');
    expect(unitOfKey('braking_g')?.symbol).toBe('g');
    expect(unitOfKey('pretension_N')?.symbol).toBe('N');
    expect(unitOfKey('weave')).toBeUndefined();
  });
});
