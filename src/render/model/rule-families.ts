// The rule families as a reader meets them: a rule's id before its first dot
// names its family ("member.pole" is in "member"). Each family has a title in
// words and the section of the design basis (docs/design-basis.md) its
// method is set out in, by that section's source id.

export interface RuleFamily {
  id: string;
  title: string;
  /** The design basis section's source id (rules/sources.yaml). */
  basis: string;
}

const FAMILIES: readonly RuleFamily[] = [
  { id: 'balance', title: 'Balance: the load the pole puts on the horses', basis: 'design-basis-balance' },
  { id: 'draught', title: 'Draught: the pull up the design grade', basis: 'design-basis-balance' },
  { id: 'turn', title: 'Turning: rollover, sliding and wheel loads in the planned turn', basis: 'design-basis-turning' },
  { id: 'floor', title: 'The strap floor: tension, sag and stiffness', basis: 'design-basis-floor' },
  { id: 'wheel', title: 'Wheel joints: felloe joints, spoke tenons and the nave', basis: 'design-basis-members' },
  { id: 'member', title: 'Timber members: strength and buckling', basis: 'design-basis-members' },
  { id: 'bend', title: 'Steam bends', basis: 'design-basis-members' },
  { id: 'lashing', title: 'Lashings: strength, slip and their ends', basis: 'design-basis-lashings' },
  { id: 'ride', title: 'Ride over rough ground and a stone', basis: 'design-basis-ride' },
  { id: 'stock', title: 'Cut list and stock', basis: 'design-basis-cutting' },
];

/** The family of a rule id: the part before its first dot. */
export function familyId(rule: string): string {
  const dot = rule.indexOf('.');
  return dot < 0 ? rule : rule.slice(0, dot);
}

/** The family a rule belongs to; one not listed here is named by its id, with no section claimed. */
export function familyOf(rule: string): RuleFamily | { id: string; title: string; basis?: undefined } {
  const id = familyId(rule);
  return FAMILIES.find((f) => f.id === id) ?? { id, title: id };
}
