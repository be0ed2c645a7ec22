import type { PartMass } from '../model/part-mass.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { Layout } from '../model/layout.ts';
import { mm } from '../units/units.ts';
import { frameBar } from '../model/spec-sections.ts';

// The rolling assembly without its crew as one rigid body (mechanics note,
// section 8): mass, centre of mass and the pitch and roll inertias about it,
// the sum of m·d² and each part's own inertia where it matters. SI units.
//
// Own inertias (approximations, said once here):
// - wheels: they turn freely on the axle, so they add nothing of their own to
//   pitch; in roll each is a ring at the felloe's mean radius, m·r²/2 (the
//   mass of a spoked wheel sits mostly in the felloe; a disc would give half);
// - axle: a bar across the chariot, m·L²/12 in roll;
// - pole: a bar along its horizontal run from its rear end to the yoke,
//   m·L²/12 in pitch;
// - floor frame and siding: a rectangle of rails with the mass spread along
//   its perimeter; straps and a measured box: a plate over the floor;
// - lashings and loads: point masses.

export interface RigidBody {
  mass_kg: number;
  /** Centre of mass, m. */
  x: number;
  y: number;
  z: number;
  /** Pitch (about y) and roll (about x) inertia about the centre of mass, kg·m². */
  Ipitch: number;
  Iroll: number;
  /** One line per term kind, for the working. */
  working: string;
}

interface Own {
  pitch: number;
  roll: number;
}

/** Own inertia of a rectangle of rails a long (x) by b wide (y), mass m spread along the perimeter. */
export function frameOwn(m: number, a: number, b: number): Own {
  const lambda = m / (2 * (a + b));
  return { pitch: lambda * (a ** 3 / 6 + (a * a * b) / 2), roll: lambda * (b ** 3 / 6 + (b * b * a) / 2) };
}

function ownInertia(p: PartMass, spec: CheckedSpecification, lay: Layout): Own {
  const rail = frameBar(spec).width;
  const depth = mm(spec.box.floor.depth_mm + rail);
  const width = mm(spec.box.floor.width_mm + rail);
  const m = p.mass_kg;
  if (p.part.startsWith('wheel')) {
    const r = mm((lay.felloeInner + lay.felloeOuter) / 2);
    return { pitch: 0, roll: (m * r * r) / 2 };
  }
  if (p.part === 'axle') return { pitch: 0, roll: (m * mm(spec.axle.length_mm) ** 2) / 12 };
  if (p.part === 'pole') return { pitch: (m * mm(spec.pole.yoke_x_mm - spec.pole.rear_x_mm) ** 2) / 12, roll: 0 };
  if (p.part === 'floor frame' || p.part === 'siding') return frameOwn(m, depth, width);
  if (p.part === 'floor straps' || p.part === 'box') return { pitch: (m * depth * depth) / 12, roll: (m * width * width) / 12 };
  return { pitch: 0, roll: 0 };
}

export function rigidBody(parts: readonly PartMass[], spec: CheckedSpecification, lay: Layout): RigidBody {
  const body = parts.filter((p) => p.group === 'rolling' && !p.part.startsWith('crew, '));
  const M = body.reduce((s, p) => s + p.mass_kg, 0);
  const at = (k: 'x_mm' | 'y_mm' | 'z_mm') => mm(body.reduce((s, p) => s + p.mass_kg * p[k], 0) / M);
  const x = at('x_mm'), y = at('y_mm'), z = at('z_mm');
  let pitchD = 0, rollD = 0, pitchOwn = 0, rollOwn = 0;
  for (const p of body) {
    const dx = mm(p.x_mm) - x, dy = mm(p.y_mm) - y, dz = mm(p.z_mm) - z;
    pitchD += p.mass_kg * (dx * dx + dz * dz);
    rollD += p.mass_kg * (dy * dy + dz * dz);
    const own = ownInertia(p, spec, lay);
    pitchOwn += own.pitch;
    rollOwn += own.roll;
  }
  const f = (v: number) => v.toFixed(2);
  return {
    mass_kg: M, x, y, z,
    Ipitch: pitchD + pitchOwn,
    Iroll: rollD + rollOwn,
    working: `rolling assembly without the crew: M = ${f(M)} kg at x_g = ${(x * 1000).toFixed(0)} mm, z_g = ${(z * 1000).toFixed(0)} mm; I_pitch = Σm·d² + own = ${f(pitchD)} + ${f(pitchOwn)} = ${f(pitchD + pitchOwn)} kg·m²; I_roll = ${f(rollD)} + ${f(rollOwn)} = ${f(rollD + rollOwn)} kg·m²`,
  };
}
