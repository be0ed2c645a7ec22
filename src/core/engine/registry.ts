import type { Rule } from './rule.ts';
import { axlePosition } from '../rules/balance/axle-position.ts';
import { horseLoad } from '../rules/balance/horse-load.ts';
import { yokeLift } from '../rules/balance/yoke-lift.ts';
import { innerWheel } from '../rules/turn/inner-wheel.ts';
import { poleReach } from '../rules/turn/pole-reach.ts';
import { rollover } from '../rules/turn/rollover.ts';
import { sliding } from '../rules/turn/sliding.ts';
import { wheelLoad } from '../rules/turn/wheel-load.ts';
import { floorConvergence } from '../rules/floor/convergence.ts';
import { floorSag } from '../rules/floor/sag.ts';
import { floorStiffness } from '../rules/floor/stiffness.ts';
import { strapTension } from '../rules/floor/strap-tension.ts';
import { axleMember } from '../rules/member/axle.ts';
import { poleMember } from '../rules/member/pole.ts';
import { yokeMember } from '../rules/member/yoke.ts';
import { spokeMember } from '../rules/member/spoke.ts';
import { felloeMember } from '../rules/member/felloe.ts';
import { frameRailMember } from '../rules/member/frame-rail.ts';
import { bendRadius } from '../rules/bend/radius.ts';
import { lashingTension } from '../rules/lashing/tension.ts';
import { lashingSlip } from '../rules/lashing/slip.ts';
import { lashingAnchorage } from '../rules/lashing/anchorage.ts';
import { lashingMissing } from '../rules/lashing/missing.ts';
import { stockUnserved } from '../rules/stock/unserved.ts';
import { stockPlanNote } from '../rules/stock/plan.ts';
import { bentBlanks } from '../rules/stock/bent-blanks.ts';
import { sidingParts } from '../rules/stock/siding.ts';
import { crewAirborne } from '../rules/ride/crew-airborne.ts';
import { rideDecay } from '../rules/ride/decay.ts';
import { yokeUnloading } from '../rules/ride/yoke-unloading.ts';

/** Every rule, in the order findings are reported. */
export const RULES: readonly Rule[] = [
  yokeLift,
  horseLoad,
  axlePosition,
  poleReach,
  innerWheel,
  rollover,
  sliding,
  wheelLoad,
  floorConvergence,
  strapTension,
  floorSag,
  floorStiffness,
  axleMember,
  poleMember,
  yokeMember,
  spokeMember,
  felloeMember,
  frameRailMember,
  bendRadius,
  lashingMissing,
  lashingTension,
  lashingSlip,
  lashingAnchorage,
  crewAirborne,
  rideDecay,
  yokeUnloading,
  stockUnserved,
  stockPlanNote,
  bentBlanks,
  sidingParts,
];
