/**
 * Section headings of the report. The HTML renderer recognises them to start
 * big sections on a new printed page; only our own headings can match, as user
 * text is escaped and can never form a heading.
 */
export const SECTIONS = {
  cautions: { title: 'Cautions', newPage: false },
  findings: { title: 'Findings', newPage: false },
  working: { title: 'Working of flagged findings', newPage: true },
  figures: { title: 'Key figures', newPage: false },
  massBalance: { title: 'Mass and balance', newPage: true },
  ride: { title: 'Ride', newPage: true },
  cutList: { title: 'Cut list', newPage: true },
  leather: { title: 'Leather and rawhide', newPage: false },
  settingOut: { title: 'Wheel setting-out', newPage: true },
  stockPlan: { title: 'Stock plan', newPage: true },
  spec: { title: 'Spec as checked', newPage: true },
  sources: { title: 'Sources', newPage: true },
} as const;

export const VERDICT_PREFIX = 'Verdict: ';

export function startsNewPage(headingText: string): boolean {
  return Object.values(SECTIONS).some((s) => s.newPage && s.title === headingText);
}
