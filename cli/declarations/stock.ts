import { command } from '../args.ts';
import { STOCK_FILES } from './stock-files.ts';

export const stock = command({
  name: 'stock',
  summary: 'plan the cutting of stock lengths into pieces, with saw kerf: least cost, or fewest stock pieces where no price is given',
  positionals: [{ name: 'instance', what: 'instance file', help: 'the cutting instance: a JSON (or YAML) file, described below' }],
  options: {
    out: { type: 'string', value: 'DIR', help: `also write the plan into DIR as ${STOCK_FILES.json} and ${STOCK_FILES.text} (each file is written whole or not at all)` },
    json: { type: 'boolean', default: false, help: 'print the plan as JSON instead of a table' },
  },
  about: `input: one mapping (lengths in mm):
  kerf_mm      the width of wood one saw cut turns to dust (0 or more)
  stock        the stock lengths that can be bought, each length once:
    length_mm    its length (more than 0)
    cost         the price of one piece (optional; give it for every stock
                 length or for none: without prices the count of stock
                 pieces is minimised)
    available    how many pieces can be had (optional, a whole number;
                 unlimited when absent)
  pieces       the pieces to cut:
    length_mm    its length (more than 0)
    quantity     how many (a whole number, 1 to 100000)
    label        a name for it in the plan (optional, 1 to 80 characters)
for example:
  { "kerf_mm": 3,
    "stock": [ { "length_mm": 3000, "cost": 12.5, "available": 10 },
               { "length_mm": 2400, "cost": 9 } ],
    "pieces": [ { "length_mm": 742, "quantity": 14, "label": "spoke" },
                { "length_mm": 1210, "quantity": 3, "label": "felloe blank" } ] }`,
  example: 'axletree stock cuts.json --out build/cuts',
  async run({ positionals: [file], values }, con) {
    const { stockCommand } = await import('../commands/stock.ts');
    return stockCommand(file, values, con);
  },
});
