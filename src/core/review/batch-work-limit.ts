/**
 * The decisive search's work limit in each proposal of a batch: a tenth of a
 * single check's, so that a batch of the nine specifications shipped runs in
 * seconds (bench/batch.ts). Counted in work, not time, so each proposal's
 * answer does not depend on the machine or on what else the batch runs.
 */
export const BATCH_WORK_LIMIT = 100;
