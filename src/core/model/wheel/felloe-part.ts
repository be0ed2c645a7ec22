import type { CheckedSpecification } from '../../spec/spec.types.ts';
import { timberPart, type TimberPart } from '../timber/timber-part.ts';

// The felloe's timber as the strength model takes it: the part's own grade,
// or stock.grade; a steam-bent felloe counts as selected stock whatever the
// stock grade, since only straight-grained, clear stock survives the bend
// (design basis, section 6).

export function felloePart(spec: CheckedSpecification): TimberPart {
  const part = timberPart(spec, 'felloe');
  if (spec.wheels.felloe.bend_radius_mm === undefined) return part;
  return { ...part, grade: 'selected', gradeFrom: 'steam-bent: only straight-grained, clear stock takes the bend' };
}
