import type { ReviewTable } from '../../core/review/review-table.ts';

/** The cautions every output of the review carries; a review without them must not go out. */
export function reviewCautions(review: ReviewTable): string[] {
  const cautions = review.cautions.filter((c) => c.trim() !== '');
  if (cautions.length === 0) throw new Error('the review carries no cautions; refusing to write it without them');
  return cautions;
}
