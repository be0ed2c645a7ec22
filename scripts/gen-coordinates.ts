// Regenerates docs/coordinates.png from docs/coordinates.svg (the diagram of
// where x, y and z start), rasterised once by headless Chromium, and the
// module that carries the PNG into the fill-in workbook's cover sheet; a test
// fails while either is stale. Run: npx tsx scripts/gen-coordinates.ts
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { writeFileAtomic } from '../src/node/atomic-write.ts';
import { hasChromium, launchChromium, CHROMIUM } from './headless-chromium.ts';
import { COORDINATES_MODULE, COORDINATES_PNG, COORDINATES_SVG, coordinatesModuleSource } from './coordinates-source.ts';

const root = fileURLToPath(new URL('..', import.meta.url));
if (!hasChromium()) throw new Error(`no browser at ${CHROMIUM}: install Debian's chromium to rasterise the diagram`);
const svg = readFileSync(join(root, COORDINATES_SVG), 'utf8');
const size = /<svg[^>]*\swidth="([\d.]+)(mm)?"[^>]*\sheight="([\d.]+)(mm)?"/.exec(svg);
if (!size) throw new Error(`${COORDINATES_SVG} gives no width and height`);
// A drawing sized in millimetres is rasterised at four pixels a millimetre (about 100 dpi), sharp enough for a cover sheet.
const px = (v: string, mm: string | undefined) => Math.round(Number(v) * (mm ? 4 : 1));
const [width, height] = [px(size[1], size[2]), px(size[3], size[4])];

const context = await launchChromium();
try {
  const page = await context.newPage();
  await page.setViewportSize({ width, height });
  await page.setContent(`<!doctype html><html><body style="margin:0">${svg.replace(/(<svg[^>]*\s)width="[^"]*"([^>]*\s)height="[^"]*"/, `$1width="${width}"$2height="${height}"`)}</body></html>`);
  const png = await page.locator('svg').screenshot({ type: 'png' });
  await writeFileAtomic(join(root, COORDINATES_PNG), new Uint8Array(png));
  const hash = createHash('sha256').update(svg).digest('hex');
  await writeFileAtomic(join(root, COORDINATES_MODULE), coordinatesModuleSource(png, { width, height }, hash));
  console.log(`wrote ${COORDINATES_PNG} and ${COORDINATES_MODULE} (${width} x ${height} px)`);
} finally {
  await context.close();
}
