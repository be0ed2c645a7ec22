import { describe, expect, it } from 'vitest';
import { eventWindow, sampleRange, SETTLED_FRACTION } from '../../src/render/plots/event-window.ts';

// The window a ride plot shows, on records whose settling time is known in
// closed form: a damped free vibration x = e^(-zeta wn tau) cos(wd tau) from
// t0 falls below a fraction f of its first swing once e^(-zeta wn tau) < f,
// tau = ln(1/f) / (zeta wn) (any vibration text, e.g. the logarithmic
// decrement's derivation; common practice).

const dt = 0.002;
const times = (T: number) => Array.from({ length: Math.round(T / dt) + 1 }, (_, i) => i * dt);

function ringing(t0: number, zeta: number, fn: number, T: number) {
  const wn = 2 * Math.PI * fn;
  const wd = wn * Math.sqrt(1 - zeta ** 2);
  const t = times(T);
  return { t, x: t.map((v) => (v < t0 ? 0 : Math.exp(-zeta * wn * (v - t0)) * Math.cos(wd * (v - t0)))), settle: Math.log(1 / SETTLED_FRACTION) / (zeta * wn) };
}

describe('the event window', () => {
  it('starts just before the first change and ends once the motion has settled, with a little room', () => {
    // zeta 0.1 at 2 Hz from t0 = 1 s in a 6 s run: settled 1.83 s after the start, within half a period (0.25 s).
    const { t, x, settle } = ringing(1, 0.1, 2, 6);
    expect(settle).toBeCloseTo(1.8326, 3);
    const w = eventWindow(t, [x]);
    expect(w.from).toBeLessThan(1);
    expect(w.from).toBeGreaterThan(1 - 0.12 * (settle + 0.5));
    expect(w.to).toBeGreaterThan(1 + settle - 0.25);
    expect(w.to).toBeLessThan(1 + settle + 0.25 + 0.1 * (settle + 0.5));
  });

  it('keeps the start where a channel moves from the first sample, as a drop does', () => {
    const { t, x } = ringing(0, 0.1, 2, 6);
    expect(eventWindow(t, [x]).from).toBe(0);
  });

  it('shows the whole run where a channel never settles, or nothing changes', () => {
    const t = times(3);
    expect(eventWindow(t, [t.map((v) => Math.sin(2 * Math.PI * v))])).toEqual({ from: 0, to: 3 });
    expect(eventWindow(t, [t.map(() => 5)])).toEqual({ from: 0, to: 3 });
  });

  it('takes the latest settling of all the channels', () => {
    const fast = ringing(1, 0.3, 2, 6);
    const slow = ringing(1, 0.05, 2, 6);
    expect(eventWindow(fast.t, [fast.x, slow.x]).to).toBe(eventWindow(slow.t, [slow.x]).to);
  });

  it('picks the samples inside the window', () => {
    expect(sampleRange([0, 0.1, 0.2, 0.3, 0.4], { from: 0.1, to: 0.3 })).toEqual([1, 4]);
  });
});
