// One strap over the pole, worked by hand through the whole model: the
// rear-axle demo (floor 508 × 980 mm, white-ash rails 45 × 80 mm, square
// rigid corners) with a single side-to-side strap (pitch 300 mm: one strap at
// x = 254 mm, nodes at y = −300, 0 and 300 mm) and one person of 80 kg
// standing on it at the centre on a 300 × 300 mm patch (all the weight on the
// middle node). No lashing holds the rails. The frame's flexibility for the
// strap is the closed form of tests/floor-frame/frame-loop.test.ts (a
// rectangle pulled in at the middle of its sides a = 588, b = 1060 mm); the
// strap is the hand model of tests/floor-frame/coupled-strap.test.ts (compatibility of
// the strap's stretch with the rails' deflection, solved by bisection).
export const ONE_STRAP = {
  lashings: [{ joint: 'pole-to-axle', material: 'rawhide', width_mm: 16, thickness_mm: 3, wraps: 20, pretension_N: 150, anchor_turns: 2 }],
  floor_straps: { weave: 'side-to-side', pitch_mm: 300 },
  box: { floor: { foot_patch: { length_mm: 300, width_mm: 300 } } },
  crew: [{ role: 'driver', mass_kg: 80, x_mm: 254, y_mm: 0 }],
};

export interface OneStrapHand {
  sag: number;
  pull: number;
  tension: number;
  /** The side rail's moment under the strap, M_A, and at the corners, M_C, N·mm. */
  MA: number;
  MC: number;
  /** The frame's flexibility for the strap, mm/N, and the moments per newton of pull, mm. */
  F: number;
  mA: number;
  mC: number;
}

/** The hand solution of ONE_STRAP for a load P on the middle node, with the E of the rails and the E·A of the strap from the data. */
export function oneStrapHand(P: number, E: number, EA: number): OneStrapHand {
  const [t, w, a, b, L] = [45, 80, 508 + 80, 980 + 80, 980];
  const EI = (E * t * w ** 3) / 12;
  const EAr = E * t * w;
  const mA = (a * (a + 2 * b)) / (8 * (a + b));
  const mC = -(a * a) / (8 * (a + b));
  const F = (4 / EI) * ((mA * mA * a) / 2 - (mA * a * a) / 8 + a ** 3 / 96 + (mC * mC * b) / 2) + b / (2 * EAr);
  const T0 = 60;
  const L0 = L / (1 + T0 / EA);
  const strap = (sag: number, e: number) => {
    const half = Math.hypot((L - e) / 2, sag);
    const T = (EA * (2 * half - L0)) / L0;
    return { T, H: (T * (L - e)) / 2 / half, V: (2 * T * sag) / half };
  };
  const bisect = (f: (x: number) => number, lo: number, hi: number) => {
    for (let i = 0; i < 200; i++) {
      const m = (lo + hi) / 2;
      if (f(lo) * f(m) <= 0) hi = m;
      else lo = m;
    }
    return (lo + hi) / 2;
  };
  const eAt = (sag: number) => bisect((e) => e - F * strap(sag, e).H, 0, 50);
  const sag = bisect((s) => strap(s, eAt(s)).V - P, 1, 500);
  const q = strap(sag, eAt(sag));
  return { sag, pull: q.H, tension: q.T, MA: q.H * mA, MC: -q.H * mC, F, mA, mC: -mC };
}

