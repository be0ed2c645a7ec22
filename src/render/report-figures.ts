import type { CheckResult } from '../core/result/check-result.ts';
import { wheelDrawing } from './drawings/wheel-drawing.ts';

/**
 * Drawings in the report. Markdown links the setting-out drawing as a file
 * beside it and shows stock bars as text in a fenced block; the HTML renderer
 * puts inline SVG in their place. Only our own Markdown can carry these marks:
 * user text is escaped, so it can form neither an image nor a fence.
 */
export const SETTING_OUT_SVG_FILE = 'wheel-setting-out.svg';

/** Info string of the fenced block holding a stock group's text bars, followed by the group's index. */
export const STOCK_BARS_INFO = 'stock-bars';

/** The wheel setting-out drawing, made from the result's wheel geometry. */
export function settingOutSvg(result: CheckResult): string {
  return wheelDrawing(result.cutting.setting_out.geometry);
}
