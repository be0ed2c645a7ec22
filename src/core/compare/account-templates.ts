// The sentences of the account of why two builds' verdicts differ, in one
// table with stable codes (41xx). As with the rules' messages, a template
// holds no number of its own: every number comes from a param, formatted
// when the line is written (see account-text.ts).

export const ACCOUNT_TEMPLATES = {
  // The verdicts.
  verdictsDiffer: { code: 4101, text: '{other} ({otherName}) is {otherVerdict} where the baseline {base} ({baseName}) is {baseVerdict}.' },
  verdictsSame: { code: 4102, text: '{other} ({otherName}) and the baseline {base} ({baseName}) are both {verdict}, but findings differ in severity between them.' },
  noDifference: { code: 4103, text: '{other} ({otherName}) and the baseline {base} ({baseName}) are both {verdict}, and no graded finding differs in severity between them.' },
  // The finding that decides the difference.
  deciding: { code: 4104, text: 'Deciding finding: {title} ({rule}) for {subject}: {baseSeverity} in {base}, {otherSeverity} in {other}; its value is {baseValue} in {base} and {otherValue} in {other}.' },
  decidingNoValue: { code: 4105, text: 'Deciding finding: {title} ({rule}) for {subject}: {baseSeverity} in {base}, {otherSeverity} in {other}.' },
  inputsRead: { code: 4106, text: 'Of the {differing:1} values that differ between the two specifications, this rule reads {read:1}; each was set on its own in {base} to its value in {other} and the check re-run:' },
  moreDeciding: { code: 4107, text: 'A further {count:1} findings differ at the same severity; the table of findings that differ lists them.' },
  notRead: { code: 4108, text: 'This rule reads none of the values that differ between the two specifications, so no single change explains it.' },
  // One change of the specification, in words.
  changeMore: { code: 4120, text: '{thing} {amount} {direction} ({path} {from} -> {to})' },
  changeOther: { code: 4121, text: '{thing} set otherwise ({path} {from} -> {to})' },
  changeAdded: { code: 4122, text: '{thing} added ({path})' },
  changeRemoved: { code: 4123, text: '{thing} left out ({path})' },
  // What one change does to the deciding finding, on its own.
  effectFigure: { code: 4130, text: '{change} on its own moves the figure {figure} from {figureBase} to {figureTrial} and the finding\'s value from {valueBase} to {valueTrial}' },
  effectValue: { code: 4131, text: '{change} on its own moves the finding\'s value from {valueBase} to {valueTrial}' },
  effectSeverity: { code: 4132, text: '{change} on its own' },
  refused: { code: 4133, text: '{change} is refused on its own by the cross-field checks of the specification: it fits only with other changes.' },
  effectLine: { code: 4134, text: '{effect}, {outcome}.' },
  reaches: { code: 4140, text: 'which gives {severity} on {title} ({rule}), as in {other}' },
  partway: { code: 4141, text: '{share:%} of the difference between the builds; alone it leaves the finding {severity}' },
  against: { code: 4143, text: 'away from the value in {other}; alone it leaves the finding {severity}' },
  noMove: { code: 4142, text: 'which leaves the finding {severity}' },
  // The changes that matter, together.
  together: { code: 4160, text: 'Together, the {count:1} changes that move it most ({paths}) take the baseline\'s finding to {severity}, as in {other}: they are why it differs.' },
  noneReach: { code: 4162, text: 'No single change the rule reads takes the baseline\'s finding to {severity}, and no others move it to try together.' },
  togetherShort: { code: 4161, text: 'Even together, the {count:1} changes that move it most ({paths}) leave the baseline\'s finding {severity}: the rest of the difference comes from the other changes it reads, acting together.' },
} as const;

export type AccountKey = keyof typeof ACCOUNT_TEMPLATES;

/** Words for a change of a number, by what the value measures: [more, less]. */
export const DIRECTION_WORDS = {
  x_mm: ['further forward', 'further back'],
  y_mm: ['further to the left', 'further to the right'],
  z_mm: ['higher', 'lower'],
  height_mm: ['higher', 'lower'],
  mass_kg: ['heavier', 'lighter'],
  other: ['larger', 'smaller'],
} as const;

/** How each severity is named in the account. */
export const SEVERITY_WORD = { info: 'INFO', pass: 'PASS', advice: 'ADVICE', warning: 'WARNING', fail: 'FAIL', error: 'ERROR' } as const;

/** Said where a build has no such finding. */
export const ABSENT_WORD = 'not reported';
