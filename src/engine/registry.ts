import type { Rule } from './rule.ts';
import { axlePosition } from '../rules/balance/axle-position.ts';
import { horseLoad } from '../rules/balance/horse-load.ts';
import { yokeLift } from '../rules/balance/yoke-lift.ts';

/** Every rule, in the order findings are reported. */
export const RULES: readonly Rule[] = [yokeLift, horseLoad, axlePosition];
