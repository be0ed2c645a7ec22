/** The files `axletree stock --out DIR` writes. */
export const STOCK_FILES = { json: 'stock-plan.json', text: 'stock-plan.txt' } as const;
