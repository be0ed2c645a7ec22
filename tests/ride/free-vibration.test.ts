import { describe, expect, it } from 'vitest';
import { integrate } from '../../src/core/ride/integrate.ts';
import { decayCycles, TurningPoints } from '../../src/core/ride/decay.ts';
import { bisectLeast } from '../../src/core/ride/bisect-least.ts';

// A single mass on a linear spring and damper, released from rest: the
// integrator and the decay measure against the closed form.
const m = 75, k = 20_000; // demo data: a person on a floor
const wn = Math.sqrt(k / m);

function freeVibration(zeta: number, x0 = 0.01, duration = 6) {
  const c = 2 * zeta * Math.sqrt(k * m);
  const tp = new TurningPoints(0, 0, 1);
  const record: { t: number; x: number }[] = [];
  let v0 = 0;
  integrate((_t, y, dy) => { dy[0] = y[1]; dy[1] = (-k * y[0] - c * y[1]) / m; }, () => 0, Float64Array.of(x0, 0), 0, duration, {
    rtol: 1e-9,
    atol: 1e-12,
    h0: (2 * Math.PI) / wn / 60,
    eventTolerance: 1e-9,
    onStep(t0, t1, y, _m, dense) {
      tp.step(t0, t1, v0, y[1], dense);
      v0 = y[1];
      record.push({ t: t1, x: y[0] });
      // the dense output between the step's ends, against the closed form as well
      record.push({ t: 0.5 * (t0 + t1), x: dense.value(0, 0.5 * (t0 + t1)) });
    },
  });
  return { tp, record };
}

/** x(t) = e^(−ζωt) (x0 cos ω_d t + ζω x0/ω_d sin ω_d t) */
function closedForm(zeta: number, x0: number, t: number) {
  const wd = wn * Math.sqrt(1 - zeta * zeta);
  return Math.exp(-zeta * wn * t) * (x0 * Math.cos(wd * t) + ((zeta * wn * x0) / wd) * Math.sin(wd * t));
}

describe('free vibration of a single mass', () => {
  it('follows the closed-form damped response', () => {
    const { record } = freeVibration(0.05);
    const worst = Math.max(...record.map((p) => Math.abs(p.x - closedForm(0.05, 0.01, p.t))));
    expect(worst).toBeLessThan(1e-6); // m: 0.001 mm against a 10 mm amplitude
  });

  it('gives the logarithmic decrement 2πζ/√(1 − ζ²) between turning points', () => {
    for (const zeta of [0.02, 0.1, 0.3]) {
      const pts = freeVibration(zeta).tp.points;
      const delta = Math.log(Math.abs(pts[0].z) / Math.abs(pts[2].z)); // one full cycle apart
      const exact = (2 * Math.PI * zeta) / Math.sqrt(1 - zeta * zeta);
      expect(Math.abs(delta / exact - 1)).toBeLessThan(1e-5);
    }
  });

  it('measures ln(10)/δ cycles to fall below 10 %', () => {
    const zeta = 0.08;
    const d = decayCycles(freeVibration(zeta).tp.points, 0.1);
    const delta = (2 * Math.PI * zeta) / Math.sqrt(1 - zeta * zeta);
    expect(d.cycles!).toBeCloseTo(Math.log(10) / delta, 4);
    expect(d.period).toBeCloseTo((2 * Math.PI) / (wn * Math.sqrt(1 - zeta * zeta)), 6);
  });

  it('the tuner finds the damping ratio 0.121 that the closed form needs for three cycles, to 1 %', () => {
    // Closed form (mechanics note, section 8): 2πζ/√(1 − ζ²) = ln(10)/3, ζ = 0.1213.
    const delta = Math.log(10) / 3;
    const exact = delta / Math.sqrt(4 * Math.PI ** 2 + delta ** 2);
    expect(exact).toBeCloseTo(0.121, 3);
    const found = bisectLeast((z) => (decayCycles(freeVibration(z).tp.points, 0.1).cycles ?? Infinity) <= 3, 0.01, 0.5, 1e-3); // above about 0.5 too few turning points remain to count
    expect(Math.abs(found.value! - exact) / exact).toBeLessThan(0.01);
    expect(Math.abs(found.value! - 0.121) / 0.121).toBeLessThan(0.01);
  });
});
