// Every command, in the order the overview lists them. Declarations only:
// a command's code is imported when it runs.
import type { CommandDecl } from '../args.ts';
import { check } from './check.ts';
import { compare } from './compare.ts';
import { floorTest } from './floor-test.ts';
import { newSpec } from './new.ts';
import { ride } from './ride.ts';
import { rules } from './rules.ts';
import { serve } from './serve.ts';
import { size } from './size.ts';
import { stock } from './stock.ts';
import { sweep } from './sweep.ts';

export const COMMANDS: readonly CommandDecl[] = [check, compare, sweep, size, newSpec, rules, stock, ride, floorTest, serve];
