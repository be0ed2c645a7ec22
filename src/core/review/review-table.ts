import pkg from '../../../package.json' with { type: 'json' };
import { CAUTIONS } from '../cautions.ts';
import { WORK_LIMIT } from '../decisive/decisive-inputs.ts';
import { WORST_SHOWN } from './worst-findings.ts';
import { DECISIVE_SHOWN, type ReviewRow } from './review-row.ts';

// The review of a batch: a row per proposal finished, what was left when
// the run was stopped, and the notes a reader needs to weigh the rows (the
// work limit the decisive search was held to, what cost and loads are).

export interface ReviewTable {
  tool: { name: string; version: string };
  /** How many proposals were given (files, and the specifications found in folders). */
  given: number;
  /** One per proposal finished, in the order given. */
  rows: ReviewRow[];
  /** True where Ctrl-C stopped the run: `not_checked` lists what was left. */
  stopped: boolean;
  not_checked: string[];
  /** The decisive search's work limit in each proposal's check; null where it was not run. */
  decisive_work_limit: number | null;
  notes: string[];
  cautions: string[];
}

export interface ReviewTableArgs {
  given: number;
  rows: ReviewRow[];
  notChecked: string[];
  decisiveWorkLimit: number | null;
}

export function reviewTable(a: ReviewTableArgs): ReviewTable {
  return {
    tool: { name: pkg.name, version: pkg.version },
    given: a.given,
    rows: a.rows,
    stopped: a.notChecked.length > 0,
    not_checked: a.notChecked,
    decisive_work_limit: a.decisiveWorkLimit,
    notes: reviewNotes(a),
    cautions: [...CAUTIONS],
  };
}

const count = (n: number, what: string) => `${n} ${what}${n === 1 ? '' : 's'}`;

function reviewNotes(a: ReviewTableArgs): string[] {
  const by = (s: ReviewRow['status']) => a.rows.filter((r) => r.status === s).length;
  const unchecked = [by('refused') ? `${by('refused')} refused` : '', by('fault') ? `${by('fault')} not checked for a fault of the tool` : ''].filter(Boolean);
  return [
    `${count(a.given, 'proposal')} given; ${by('checked')} checked${unchecked.length ? `, ${unchecked.join(', ')}` : ''}.`,
    ...(a.notChecked.length ? [`Stopped at Ctrl-C: this table holds the proposals finished; not checked: ${a.notChecked.join(', ')}.`] : []),
    a.decisiveWorkLimit === null
      ? 'Decisive inputs: not searched (--no-decisive).'
      : `Decisive inputs: each proposal's search was held to a work limit of ${a.decisiveWorkLimit} (in re-runs that do not reach the ride model; a single check's limit is ${WORK_LIMIT}), so some break-even values a single check finds may be left unsearched; each report says which. Shown: the first ${DECISIVE_SHOWN} of each proposal, in its report's order.`,
    `Worst findings: the ${WORST_SHOWN} worst of each proposal by severity, then by utilisation (the share of its limit used).`,
    'Cost: the stock plan’s, in the currency of the stock list’s prices; none where the stock list is not priced. Load per horse: the static pole load each horse carries at the yoke; axle load: the static load on the axle.',
    'Each proposal’s full outputs are in the folder of its name beside this table; the report column links its report.',
  ];
}
