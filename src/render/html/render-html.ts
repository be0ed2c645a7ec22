import type { WorkingStep } from '../../core/findings/finding.ts';
import type { Block, ReportDocument, Section } from '../model/document.ts';
import { stepParts } from '../model/cell-text.ts';
import { findingParts } from '../model/finding-parts.ts';
import { PART_TITLES, sectionsByPart } from '../model/parts.ts';
import type { ReportPlots } from '../report-plots.ts';
import { escapeHtml } from './html-escape.ts';
import { figureHtml } from './html-figure.ts';
import { badgeHtml, runsHtml } from './html-runs.ts';
import { tableHtml } from './html-table.ts';
import { REPORT_CSS } from './report-style.ts';
import { htmlPage } from './html-page.ts';

// The report model as one self-contained HTML file, written directly from the
// model: every text escaped, the style sheet inline, figures as inline SVG, no
// script and nothing fetched (the Content-Security-Policy forbids both).

function workingHtml(steps: readonly WorkingStep[]): string {
  const items = steps.map((s) => {
    const parts = stepParts(s).map((p, i, all) => `<span${s.result !== null && i === all.length - 1 ? ' class="result"' : ''}>${escapeHtml(p)}</span>`);
    return `<li>${parts.join(' = ')}</li>`;
  });
  return `<ol class="working">\n${items.join('\n')}\n</ol>`;
}

function blockHtml(b: Block, plots: ReportPlots): string {
  switch (b.kind) {
    case 'heading':
      return `<h${b.level}>${escapeHtml(b.text)}</h${b.level}>`;
    case 'paragraph':
      return `<p>${runsHtml(b.runs)}</p>`;
    case 'list':
      return `<ul>\n${b.items.map((runs) => `<li>${runsHtml(runs)}</li>`).join('\n')}\n</ul>`;
    case 'cautions':
      return `<ul class="cautions">\n${b.items.map((c) => `<li>${escapeHtml(c)}</li>`).join('\n')}\n</ul>`;
    case 'table':
      return b.only === 'sheet' ? '' : tableHtml(b);
    case 'figure':
      return figureHtml(b, plots);
    case 'working':
      return workingHtml(b.steps);
    case 'finding': {
      const { title, body } = findingParts(b);
      return `<article class="finding">\n<h3>${runsHtml(title)}</h3>\n${body.map((x) => blockHtml(x, plots)).join('\n')}\n</article>`;
    }
  }
}

/** Classes of a section's heading: the verdict and the cautions stand out; big sections start a printed page (a part's first section starts one with its part). */
function headingClass(s: Section): string {
  const classes = [s.id === 'verdict' || s.id === 'cautions' ? s.id : '', s.newPage ? 'new-page' : ''].filter(Boolean);
  return classes.length ? ` class="${classes.join(' ')}"` : '';
}

function sectionHtml(s: Section, plots: ReportPlots): string {
  const heading = s.title ? `<h2${headingClass(s)}>${escapeHtml(s.title)}${s.badge ? ` ${badgeHtml(s.badge)}` : ''}</h2>\n` : '';
  return `<section>\n${heading}${s.blocks.map((b) => blockHtml(b, plots)).join('\n')}\n</section>`;
}

/** Each part of the document in a block of its own: after the first, each starts a printed page under its title. */
function partsHtml(doc: ReportDocument, plots: ReportPlots): string {
  return sectionsByPart(doc.sections)
    .map(({ part, sections }, i) => {
      const title = PART_TITLES[part];
      const heading = i > 0 && title ? `<h1 class="part">${escapeHtml(title)}</h1>\n` : '';
      return `<div class="part part-${part}">\n${heading}${sections.map((s) => sectionHtml(s, plots)).join('\n')}\n</div>`;
    })
    .join('\n');
}

/** The document as HTML; `plots` holds the SVG drawn for each plot file the model names (drawReportPlots). */
export function renderHtml(doc: ReportDocument, plots: ReportPlots): string {
  const closing = doc.closing ? `<hr>\n<p><em>${escapeHtml(doc.closing)}</em></p>\n` : '';
  const lede = doc.lede ? `<p class="lede">${escapeHtml(doc.lede)}</p>\n` : '';
  return htmlPage(doc.title, REPORT_CSS, `${lede}${partsHtml(doc, plots)}\n${closing}`);
}