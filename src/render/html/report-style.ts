import { SEVERITIES } from '../../core/findings/finding.ts';
import { SEVERITY_COLOURS } from '../severity-palette.ts';

// Badges: the word is always printed; the border keeps a badge visible when
// printed without background colours.
const badgeRules = SEVERITIES.map((s) => {
  const { fill, text } = SEVERITY_COLOURS[s];
  return `.badge-${s} { background: ${fill}; color: ${text}; }`;
}).join('\n');

/** The report's whole style sheet, inlined so the HTML file stands alone. */
export const REPORT_CSS = `
:root { color-scheme: light; }
body {
  font-family: "Segoe UI", "Helvetica Neue", Arial, sans-serif;
  font-size: 11pt;
  line-height: 1.4;
  color: #111;
  margin: 0 auto;
  padding: 1.5em;
  max-width: 60em;
}
h1 { font-size: 1.6em; margin: 0 0 0.4em; }
h1.part { font-size: 1.4em; margin: 1.6em 0 0.4em; padding-bottom: 0.2em; border-bottom: 3px double #555; }
p.lede { font-style: italic; margin: 0 0 0.8em; }
h2 { font-size: 1.3em; margin: 1.4em 0 0.5em; border-bottom: 1px solid #999; }
h3 { font-size: 1.1em; margin: 1.2em 0 0.4em; }
h4 { font-size: 1em; margin: 1em 0 0.3em; }
h2.verdict { font-size: 1.8em; border-bottom: none; margin-top: 0.4em; }
h2.verdict .badge { font-size: 1em; padding: 0.1em 0.6em; }
ul.cautions {
  border: 2px solid #b45f06;
  background: #fff4e5;
  padding: 0.6em 0.8em 0.6em 2em;
  font-weight: 600;
}
table {
  border-collapse: collapse;
  width: 100%;
  margin: 0.5em 0 1em;
  font-size: 0.9em;
  table-layout: auto;
}
th, td {
  border: 1px solid #999;
  padding: 0.2em 0.4em;
  vertical-align: top;
  overflow-wrap: break-word;
}
/* Numbers and badges stay whole; the last column (message, basis, note) takes
   the squeeze and may break anywhere, so a table never runs off the page. */
th.num, td.num { text-align: right; }
td.num { white-space: nowrap; }
td:last-child { overflow-wrap: anywhere; }
th { background: #eee; text-align: left; }
tr.total td { font-weight: 700; }
/* A rule family's title across the findings table, above its first row. */
tr.group th { background: #dde4ea; text-align: left; font-weight: 700; padding-top: 0.3em; }
tr.muted td { color: #666; font-style: italic; }
code, ol.working { font-family: Consolas, "DejaVu Sans Mono", monospace; }
/* Working, one step a line: formula = with the numbers = result. The steps
   keep their own indentation, which lines up continued equations. */
ol.working {
  list-style: none;
  background: #f6f6f6;
  border: 1px solid #ccc;
  padding: 0.5em;
  font-size: 0.85em;
  overflow-wrap: anywhere;
}
ol.working li { white-space: pre-wrap; }
ol.working .result { font-weight: 700; }
article.finding { margin: 0 0 1.2em; }
.badge {
  display: inline-block;
  border: 1px solid #333;
  border-radius: 0.3em;
  padding: 0 0.4em;
  font-weight: 700;
  letter-spacing: 0.03em;
  white-space: nowrap;
  -webkit-print-color-adjust: exact;
  print-color-adjust: exact;
}
${badgeRules}
/* Figures: drawings and plots scale down to the page with their caption under
   them; stock bars keep their lengths to one scale per group, caption at the left. */
figure.drawing, figure.plot, figure.setting-out { margin: 0.5em 0 1em; }
figure figcaption { font-style: italic; font-size: 0.9em; }
.setting-out svg { display: block; max-width: 100%; height: auto; margin: 0.5em 0; }
.drawing svg { display: block; max-width: 100%; height: auto; margin: 0.5em 0; break-inside: avoid; -webkit-print-color-adjust: exact; print-color-adjust: exact; }
.plot svg { display: block; max-width: 100%; height: auto; margin: 0.5em 0; break-inside: avoid; }
.stock-bars { margin: 0.3em 0 1em; }
.stock-bars figure { display: flex; align-items: center; gap: 0.6em; margin: 0.15em 0; }
.stock-bars figcaption { flex: 0 0 10em; font-size: 0.85em; white-space: nowrap; }
.stock-bars svg { max-width: calc(100% - 11em); height: auto; -webkit-print-color-adjust: exact; print-color-adjust: exact; }
hr { border: none; border-top: 1px solid #999; margin: 2em 0 0.5em; }
/* The summary is read in ten minutes: tight spacing, the side elevation no taller than a third of the page. */
.part-summary h2 { margin: 0.8em 0 0.3em; }
.part-summary h2.verdict { margin-top: 0.2em; }
.part-summary table { margin: 0.3em 0 0.5em; }
.part-summary p, .part-summary ul { margin: 0.3em 0; }
.part-summary figure.drawing svg { max-height: 80mm; width: auto; margin: 0 auto; }
.part-summary figure figcaption { font-size: 0.85em; }
/* The appendix's working, finding after finding, closely set. */
.part-appendix article.finding { margin: 0 0 0.6em; }
.part-appendix article.finding h3 { font-size: 1em; margin: 0.8em 0 0.2em; }
.part-appendix article.finding p { margin: 0.15em 0; }
.part-appendix ol.working { margin: 0.2em 0; padding: 0.3em 0.5em; }

@page { size: A4; margin: 15mm 12mm; }
@media print {
  body { max-width: none; padding: 0; font-size: 9pt; }
  h2.new-page { break-before: page; }
  /* The body and the appendix each start a page: the summary prints as pages of its own. */
  .part-body, .part-appendix { break-before: page; }
  h1.part { margin-top: 0; }
  .part-summary { font-size: 9pt; }
  .part-summary table { font-size: 8pt; }
  .part-body table { font-size: 7.5pt; }
  .part-appendix { font-size: 8pt; }
  .part-appendix table { font-size: 7pt; }
  ol.working li { break-inside: avoid; }
  h2, h3, h4 { break-after: avoid; }
  table { font-size: 8pt; }
  thead { display: table-header-group; }
  tr, figure { break-inside: avoid; }
  ol.working { font-size: 7.5pt; }
}
`;
