import type { CheckedGrade, CheckedSpecification } from '../../spec/spec.types.ts';

// The timber a member is made of, as the strength model needs it: species,
// grade of stock (the part's own or stock.grade) and slope of grain. A
// steam-bent part (a pole, frame rail or felloe with a bend radius) counts as
// selected stock whatever the grade given, since only straight-grained,
// clear stock survives the bend (design basis, sections 1 and 6).

export type Grade = CheckedGrade;

export interface TimberPart {
  /** Name in findings, e.g. "axle". */
  label: string;
  species: string;
  grade: Grade;
  /** Where the grade came from, for the working. */
  gradeFrom: string;
  /** Slope of grain given in the specification, degrees. */
  grainSlopeDeg: number;
}

export type TimberPartKey = 'axle' | 'pole' | 'yoke' | 'spoke' | 'felloe' | 'frame';

function partSpec(spec: CheckedSpecification, key: TimberPartKey): { species: string; grade?: Grade; grain_slope_deg: number; bend_radius_mm?: number } {
  switch (key) {
    case 'axle':
      return spec.axle;
    case 'pole':
      return spec.pole;
    case 'yoke':
      return spec.yoke;
    case 'spoke':
      return spec.wheels.spoke;
    case 'felloe':
      return spec.wheels.felloe;
    case 'frame':
      return spec.box.floor.frame;
  }
}

const PATH: Record<TimberPartKey, string> = { axle: 'axle', pole: 'pole', yoke: 'yoke', spoke: 'wheels.spoke', felloe: 'wheels.felloe', frame: 'box.floor.frame' };
const LABEL: Record<TimberPartKey, string> = { axle: 'axle', pole: 'pole', yoke: 'yoke', spoke: 'spoke', felloe: 'felloe', frame: 'floor frame rail' };

export function timberPart(spec: CheckedSpecification, key: TimberPartKey): TimberPart {
  const p = partSpec(spec, key);
  if (p.bend_radius_mm !== undefined) {
    return { label: LABEL[key], species: p.species, grade: 'selected', gradeFrom: 'steam-bent: only straight-grained, clear stock takes the bend', grainSlopeDeg: p.grain_slope_deg };
  }
  return {
    label: LABEL[key],
    species: p.species,
    grade: p.grade ?? spec.stock.grade,
    gradeFrom: p.grade ? `${PATH[key]}.grade` : 'stock.grade',
    grainSlopeDeg: p.grain_slope_deg,
  };
}

/** The nave as a part of its own: its species, the stock grade, straight grain (the specification gives the nave neither). */
export function navePart(spec: CheckedSpecification): TimberPart {
  return { label: 'nave', species: spec.wheels.nave.species, grade: spec.stock.grade, gradeFrom: 'stock.grade', grainSlopeDeg: 0 };
}
