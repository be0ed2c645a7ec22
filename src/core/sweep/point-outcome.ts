import type { Verdict } from '../findings/severity.ts';

/** What a sweep keeps of one point's check. */
export interface PointCheck {
  /** The check's verdict, or `refused` where the point's spec is refused (reason says why). */
  verdict: Verdict | 'refused';
  /** The highest utilisation of any finding (demand over capacity); null where none has one. */
  worst_utilisation: number | null;
  /** The finding that utilisation is of. */
  worst: { rule: string; subject: string } | null;
  /** The chosen figures in their order; null where one does not apply (or the point is refused). */
  figures: (number | null)[];
  /** Why the spec is refused at this point. */
  reason?: string;
}

export interface PointOutcome extends PointCheck {
  index: number;
  values: number[];
  /** On the envelope's line of this varied value; absent on the sweep itself. */
  line?: number;
  /** The design point itself. */
  design?: true;
}

/** Passes: a verdict short of fail (pass, advice or warning). A refused point, a failing one and one a rule could not finish do not. */
export const passes = (verdict: PointCheck['verdict']): boolean => verdict === 'pass' || verdict === 'advice' || verdict === 'warning';
