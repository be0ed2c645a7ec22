import type { CheckResult } from '../core/result/check-result.ts';
import { wheelDrawing } from './drawings/wheel-drawing.ts';

/** The file beside report.md that holds the wheel setting-out drawing; report.html holds it inline. */
export const SETTING_OUT_SVG_FILE = 'wheel-setting-out.svg';

/** The wheel setting-out drawing, made from the result's wheel geometry. */
export function settingOutSvg(result: CheckResult): string {
  return wheelDrawing(result.cutting.setting_out.geometry);
}
