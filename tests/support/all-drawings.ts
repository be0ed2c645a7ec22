import { readdirSync } from 'node:fs';
import { parse } from 'yaml';
import { readFileSync } from 'node:fs';
import { Analysis } from './analysis.ts';
import { prepared, rulesData } from './fixtures.ts';
import { buildScene } from '../../src/core/result/scene-of.ts';
import { wheelGeometry } from '../../src/core/cutlist/wheel-geometry.ts';
import { reportDrawings } from '../../src/render/drawings/report-drawings.ts';
import { wheelDrawing } from '../../src/render/drawings/wheel-drawing.ts';

// Every drawing of every specification the project ships (specs/ and
// specs/validation/): the report's drawings of the build and the wheel
// setting-out, drawn from the models without running a full check.

export interface SpecDrawing {
  spec: string;
  id: string;
  svg: string;
}

const ROOT = new URL('../../specs/', import.meta.url);

export function shippedSpecs(): string[] {
  const list = (dir: string) => readdirSync(new URL(dir, ROOT)).filter((f) => f.endsWith('.yaml')).sort().map((f) => `${dir}${f}`);
  return [...list(''), ...list('validation/')];
}

export function drawingsOfSpec(file: string): SpecDrawing[] {
  const a = new Analysis(prepared(parse(readFileSync(new URL(file, ROOT), 'utf8'))), rulesData, undefined, { ride: false });
  const wheel = wheelDrawing(wheelGeometry(a.spec, rulesData, a.mass.layout));
  return [...reportDrawings(buildScene(a)).map((d) => ({ spec: file, id: d.id, svg: d.svg })), { spec: file, id: 'wheel-setting-out', svg: wheel }];
}
