// The coordinate diagram: docs/coordinates.svg, its PNG and the module that
// carries the PNG into the workbook agree (regenerate all with
// `npx tsx scripts/gen-coordinates.ts`), and the fill-in workbook's cover
// sheet shows it, with the same in words.
import { describe, expect, it } from 'vitest';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { COORDINATES_PNG_BASE64, COORDINATES_SIZE, COORDINATES_SVG_SHA256 } from '../../src/render/spec-workbook/coordinates-image.ts';
import { AXES_TEXT } from '../../src/render/spec-workbook/coordinates-figure.ts';
import { specificationWorkbook } from '../../src/render/spec-workbook/spec-sheets.ts';
import { COORDINATES_PNG, COORDINATES_SVG } from '../../scripts/coordinates-source.ts';
import { CHOICES } from '../support/spec-workbook.ts';
import { REPO } from '../support/run-cli.ts';

const svg = readFileSync(join(REPO, COORDINATES_SVG), 'utf8');
const png = readFileSync(join(REPO, COORDINATES_PNG));

describe('the coordinate diagram', () => {
  it('is fresh: the PNG and its module were made from the SVG as it stands', () => {
    expect(createHash('sha256').update(svg).digest('hex')).toBe(COORDINATES_SVG_SHA256);
    expect(Buffer.from(COORDINATES_PNG_BASE64, 'base64').equals(png)).toBe(true);
    // The PNG's own header gives its size (width and height at bytes 16 and 20 of the IHDR chunk).
    expect(png.subarray(1, 4).toString('latin1')).toBe('PNG');
    expect({ width: png.readUInt32BE(16), height: png.readUInt32BE(20) }).toEqual(COORDINATES_SIZE);
  });

  it('names the origin and all three axes, each with its direction', () => {
    for (const text of ['x forward', 'y to the left', 'z up', 'rear edge', 'ground: z = 0', 'centre line']) expect(svg, text).toContain(text);
    for (const text of ['x points forward', 'y to the chariot\u2019s left', 'z up', 'under the rear edge of the floor', 'level ground']) expect(AXES_TEXT, text).toContain(text);
  });

  it('stands on the cover sheet of the fill-in workbook, under the axes in words', async () => {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(await specificationWorkbook(undefined, CHOICES).xlsx.writeBuffer());
    const cover = wb.worksheets[0];
    const images = cover.getImages();
    expect(images).toHaveLength(1);
    const media = wb.getImage(Number(images[0].imageId));
    expect(media.extension).toBe('png');
    expect(Buffer.from(media.buffer as unknown as Uint8Array).equals(png)).toBe(true);
    let words = 0;
    cover.eachRow((row) => {
      if (row.getCell(2).value === AXES_TEXT) words = row.number;
    });
    expect(words).toBeGreaterThan(0);
    expect(images[0].range.tl.nativeRow).toBe(words); // the row below the words (0-based)
    for (const ws of wb.worksheets.slice(1)) expect(ws.getImages(), ws.name).toHaveLength(0);
  });
});
