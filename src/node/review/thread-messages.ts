import type { ProposalDone, ProposalJob, ProposalSettings } from './proposal-job.ts';

/** From the main thread: check one proposal, or finish (close the printer) and stop. */
export type ThreadRequest = { kind: 'check'; id: number; job: ProposalJob; settings: ProposalSettings } | { kind: 'close' };

/** To the main thread: the proposal's row, or the fault that stopped its check. */
export type ThreadReply = { id: number; done: ProposalDone } | { id: number; fault: string };
