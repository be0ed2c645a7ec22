import type { ReviewTable } from '../../core/review/review-table.ts';
import { reviewCsv } from './review-csv.ts';
import { reviewHtml } from './review-html.ts';
import { reviewWorkbook } from './review-workbook.ts';

export const REVIEW_FILES = { html: 'review.html', workbook: 'review.xlsx', csv: 'review.csv' } as const;

/** The review's three files, rendered (nothing written): HTML, workbook, CSV. */
export async function reviewFiles(review: ReviewTable): Promise<[string, string | Uint8Array][]> {
  return [
    [REVIEW_FILES.html, reviewHtml(review)],
    [REVIEW_FILES.workbook, await reviewWorkbook(review)],
    [REVIEW_FILES.csv, reviewCsv(review)],
  ];
}
