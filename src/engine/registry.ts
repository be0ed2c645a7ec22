import type { Rule } from './rule.ts';
import { axlePosition } from '../rules/balance/axle-position.ts';
import { horseLoad } from '../rules/balance/horse-load.ts';
import { yokeLift } from '../rules/balance/yoke-lift.ts';
import { innerWheel } from '../rules/turn/inner-wheel.ts';
import { poleReach } from '../rules/turn/pole-reach.ts';
import { rollover } from '../rules/turn/rollover.ts';
import { sliding } from '../rules/turn/sliding.ts';
import { wheelLoad } from '../rules/turn/wheel-load.ts';

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
];
