import type { MessageSpec } from '../../pipeline/define-rule.ts';

// The member rules' message templates, shared so one meaning keeps one code
// and one wording across the family. Every number is a param.

/** A stress against the design strength left in the governing case. */
export const STRESS_MESSAGES = {
  within: { code: 2301, text: '{part}, {mode}: {value:MPa}, within the design capacity {limit:MPa}; governing case "{case}" ({duration} load, k_mod {kMod:1}).' },
  over: { code: 2302, text: '{part}, {mode}: {value:MPa} exceeds the design capacity {limit:MPa} in "{case}" ({duration} load, k_mod {kMod:1}).' },
} as const satisfies Record<string, MessageSpec>;

/** A compressive force against a buckling resistance that follows k_mod. */
export const BUCKLING_MESSAGES = {
  bucklingWithin: { code: 2304, text: '{part}, {mode}: {value:N}, within the buckling resistance {limit:N}; governing case "{case}" ({duration} load, k_mod {kMod:1}).' },
  bucklingOver: { code: 2305, text: '{part}, {mode}: {value:N} exceeds the buckling resistance {limit:N} in "{case}" ({duration} load, k_mod {kMod:1}).' },
} as const satisfies Record<string, MessageSpec>;

/** A member the rule could not check, and why. */
export const NOT_CHECKED_MESSAGE = {
  notChecked: { code: 2303, text: '{part}: not checked: {reason}.' },
} as const satisfies Record<string, MessageSpec>;
