/** One load the models computed, for the Loads sheet: what carries it, in which case. */
export interface LoadEntry {
  /** Family of the model: balance, turn, floor, member, lashing. */
  group: string;
  /** What carries the load, e.g. "outer wheel", "pole at the root". */
  item: string;
  /** Load case, e.g. "static", "bump", "design turn". */
  case: string;
  quantity: string;
  value: number;
  unit: string;
}
