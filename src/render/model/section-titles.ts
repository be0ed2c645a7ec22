import type { Severity } from '../../core/findings/finding.ts';
import type { Block, Section } from './document.ts';

/**
 * The check report's sections: their ids, titles, whether each starts a
 * printed page, and the part it stands in: the summary a reviewer reads
 * first, the body, or the appendix of rarely read material (the teaching
 * view, a document of its own, is one part with its cautions). The workbook
 * picks tables by id, never by title.
 */
export const SECTIONS = {
  verdict: { title: 'Verdict:', newPage: false, part: 'summary' },
  cautions: { title: 'Cautions', newPage: false, part: 'summary' },
  utilisation: { title: 'Nearest to their limits', newPage: false, part: 'summary' },
  decisiveBrief: { title: 'What decides the verdict', newPage: false, part: 'summary' },
  openQuestions: { title: 'Open questions for the builder', newPage: false, part: 'summary' },
  build: { title: 'The build', newPage: false, part: 'summary' },
  costs: { title: 'Timber and cost', newPage: false, part: 'summary' },
  findings: { title: 'Findings by rule family', newPage: false },
  decisive: { title: 'Decisive inputs', newPage: false },
  figures: { title: 'Key figures', newPage: false },
  drawings: { title: 'Drawings of the build', newPage: false },
  plots: { title: 'Plots', newPage: false },
  massBalance: { title: 'Mass and balance', newPage: false },
  ride: { title: 'Ride', newPage: false },
  cutList: { title: 'Cut list', newPage: false },
  leather: { title: 'Leather and rawhide', newPage: false },
  settingOut: { title: 'Wheel setting-out', newPage: false },
  stockPlan: { title: 'Stock plan', newPage: false },
  working: { title: 'Working of every check', newPage: false, part: 'appendix' },
  notes: { title: 'Notes and their working', newPage: false, part: 'appendix' },
  loadWorking: { title: 'Working of the load cases', newPage: false, part: 'appendix' },
  loads: { title: 'Loads', newPage: false, part: 'appendix' },
  ridePlots: { title: 'Ride plots', newPage: false, part: 'appendix' },
  cutListBasis: { title: 'Cut list in full: grain, volume, mass and the working of each size', newPage: false, part: 'appendix' },
  spec: { title: 'Spec as checked', newPage: false, part: 'appendix' },
  sources: { title: 'Sources', newPage: false, part: 'appendix' },
  teach: { title: 'How each rule family works', newPage: false, part: 'summary' },
} as const satisfies Record<string, { title: string; newPage: boolean; part?: 'summary' | 'appendix' }>;

export type SectionId = keyof typeof SECTIONS;

export function section(id: SectionId, blocks: Block[], badge?: Severity): Section {
  return { id, ...SECTIONS[id], blocks, ...(badge ? { badge } : {}) };
}
