import markdownit from 'markdown-it';
import type { MarkdownIt, StateCore, Token } from 'markdown-it';
import type { CheckResult } from '../core/result/check-result.ts';
import { renderMarkdown } from './report-md.ts';
import { REPORT_CSS } from './report-style.ts';
import { severityOfMarkText } from './severity-mark.ts';
import { SECTIONS, startsNewPage, VERDICT_PREFIX } from './report-sections.ts';
import { SETTING_OUT_SVG_FILE, settingOutSvg, STOCK_BARS_INFO } from './report-figures.ts';
import { inlineSvg } from './inline-svg.ts';
import { stockBarSvg } from './stock-bar-svg.ts';
import { partLabels } from './stock-bar.ts';
import type { ReportPlots } from './report-plots.ts';
import { drawingHtml, drawingOfFile } from './report-drawings.ts';

/** The check report as one self-contained HTML file: inline CSS, no external assets; `plots` from drawReportPlots. */
export function renderHtml(result: CheckResult, plots: ReportPlots): string {
  const md = reportMarkdownIt(result, plots);
  const body = md.render(renderMarkdown(result));
  const title = md.utils.escapeHtml(`Design-rule check: ${result.spec_name}`);
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'">
<title>${title}</title>
<style>${REPORT_CSS}</style>
</head>
<body>
<main>
${body}</main>
</body>
</html>
`;
}

function reportMarkdownIt(result: CheckResult, plots: ReportPlots): MarkdownIt {
  // html: false turns any raw HTML in the text into visible, escaped text.
  const md = markdownit('default', { html: false, linkify: false, typographer: false });
  drawFigures(md, result, plots);
  md.core.ruler.push('axletree_report_classes', (state: StateCore) => {
    markHeadings(state.tokens);
    for (const token of state.tokens) {
      if (token.type === 'inline' && token.children) markBadges(token.children);
    }
  });
  return md;
}

/**
 * Our own drawings go inline: the setting-out, drawing and plot image links
 * become their SVG, and each stock group's text bars become one SVG bar per
 * pattern. The SVG comes from the result and its drawn plots, never from the
 * Markdown text.
 */
function drawFigures(md: MarkdownIt, result: CheckResult, plots: ReportPlots): void {
  const image = md.renderer.rules.image!;
  md.renderer.rules.image = (tokens, idx, options, env, self) => {
    const src = String(tokens[idx].attrGet('src') ?? '');
    const plot = plots.get(src);
    if (plot !== undefined) return plotHtml(plot, src);
    const drawing = drawingOfFile(result, src);
    if (drawing) return drawingHtml(drawing);
    if (src !== SETTING_OUT_SVG_FILE) return image(tokens, idx, options, env, self);
    const svg = inlineSvg(settingOutSvg(result));
    return svg === null
      ? `<em>The drawing could not be placed inline; see ${SETTING_OUT_SVG_FILE} beside report.md.</em>`
      : `<span class="setting-out">${svg}</span>`;
  };
  const fence = md.renderer.rules.fence!;
  const labels = partLabels(result.cutting.stock_plan);
  md.renderer.rules.fence = (tokens, idx, options, env, self) => {
    const m = new RegExp(`^${STOCK_BARS_INFO} (\\d+)$`).exec(tokens[idx].info.trim());
    const group = m ? result.cutting.stock_plan.groups[Number(m[1])] : undefined;
    if (!group) return fence(tokens, idx, options, env, self);
    const longest = Math.max(...group.plan.patterns.map((p) => p.stock_length_mm));
    const bars = group.plan.patterns.map((p, k) => {
      const caption = `${Number(m![1]) + 1}.${k + 1}: ${p.stock_length_mm} mm x ${p.count}`;
      return `<figure><figcaption>${md.utils.escapeHtml(caption)}</figcaption>${stockBarSvg(p, longest, labels, caption)}</figure>`;
    });
    return `<div class="stock-bars">\n${bars.join('\n')}\n</div>\n`;
  };
}

/** A drawn plot inline, or a pointer to its file where it cannot be inlined. */
function plotHtml(svg: string, file: string): string {
  const inline = inlineSvg(svg);
  return inline === null ? `<em>The plot could not be placed inline; see ${file} beside report.md.</em>` : `<span class="plot">${inline}</span>`;
}

/** Classes on our own h2 headings: the verdict, the cautions, and sections that start a printed page. */
function markHeadings(tokens: Token[]): void {
  tokens.forEach((token, i) => {
    if (token.type !== 'heading_open' || token.tag !== 'h2') return;
    const text = tokens[i + 1]?.content ?? '';
    if (text.startsWith(VERDICT_PREFIX)) token.attrJoin('class', 'verdict');
    if (text === SECTIONS.cautions.title) token.attrJoin('class', 'cautions');
    if (startsNewPage(text)) token.attrJoin('class', 'new-page');
  });
}

/** A bold severity word becomes a badge that keeps the word. */
function markBadges(children: Token[]): void {
  children.forEach((token, i) => {
    const text = children[i + 1];
    const close = children[i + 2];
    if (token.type !== 'strong_open' || text?.type !== 'text' || close?.type !== 'strong_close') return;
    const severity = severityOfMarkText(text.content);
    if (severity) token.attrJoin('class', `badge badge-${severity}`);
  });
}
