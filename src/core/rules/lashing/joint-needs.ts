import { jointedCorners } from '../../model/corner-demand.ts';
import type { Joint } from '../../model/lashing-demand.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';

// Which joints this construction needs held, and why. Required: the joints
// through which the team moves the chariot and the box rides on the running
// gear; a lashing is the only fastening the vocabulary can describe there.
// Advised: joints that joinery (mortise, peg, bent rail) may hold instead,
// which the specification cannot show. The reasons are words only: a
// finding's message takes its numbers from params.

export interface JointNeed {
  level: 'required' | 'advised' | 'none';
  why: string;
}

export function jointNeed(joint: Joint, spec: CheckedSpecification): JointNeed {
  switch (joint) {
    case 'pole-to-axle':
      return { level: 'required', why: "the pole rests on the axle and passes the team's pull and hold-back to the running gear there" };
    case 'pole-to-yoke':
      return { level: 'required', why: 'the team pulls the chariot and holds it back through this joint' };
    case 'axle-to-floor':
      // The box always bears on the axle (axle.bearing_span_mm; the axle lies under the floor).
      return { level: 'required', why: 'the box rests on the axle at its two bearings: unheld, a bump lifts it off and a hard stop slides it forward, crew and all' };
    case 'pole-to-floor':
      return { level: 'advised', why: "the pole is fixed under the floor at its rear end and carries the box's share of the pull there" };
    case 'frame-corners':
      return { level: 'advised', why: `the strap floor pulls the rails inwards at ${jointedCorners(spec)}` };
    case 'siding-to-frame':
      return spec.box.siding_mass_kg > 0
        ? { level: 'advised', why: 'the siding rides on the frame' }
        : { level: 'none', why: 'the specification has no siding' };
  }
}
