import type { Severity } from '../../core/findings/finding.ts';
import type { Block, Section } from './document.ts';

/**
 * The check report's sections: their ids, titles and whether each starts a
 * printed page. The workbook picks tables by id, never by title.
 */
export const SECTIONS = {
  verdict: { title: 'Verdict:', newPage: false },
  decisive: { title: 'What decides the verdict', newPage: false },
  cautions: { title: 'Cautions', newPage: false },
  findings: { title: 'Findings', newPage: false },
  working: { title: 'Working of flagged findings', newPage: true },
  notes: { title: 'Notes', newPage: false },
  figures: { title: 'Key figures', newPage: false },
  drawings: { title: 'Drawings of the build', newPage: false },
  plots: { title: 'Plots', newPage: false },
  massBalance: { title: 'Mass and balance', newPage: true },
  loads: { title: 'Loads', newPage: false },
  ride: { title: 'Ride', newPage: true },
  cutList: { title: 'Cut list', newPage: true },
  leather: { title: 'Leather and rawhide', newPage: false },
  settingOut: { title: 'Wheel setting-out', newPage: true },
  stockPlan: { title: 'Stock plan', newPage: true },
  spec: { title: 'Spec as checked', newPage: true },
  sources: { title: 'Sources', newPage: true },
} as const;

export type SectionId = keyof typeof SECTIONS;

export function section(id: SectionId, blocks: Block[], badge?: Severity): Section {
  return { id, ...SECTIONS[id], blocks, ...(badge ? { badge } : {}) };
}
