import { SEVERITIES } from '../core/findings/severity.ts';
import { SEVERITY_COLOURS } from '../render/severity-palette.ts';

// The workbench's look: our own, from the report's severity colours (word
// and mark always printed beside them). Two columns on a wide screen, one on
// a narrow one; printing gives the answer only (the feasibility summary).
const badges = SEVERITIES.map((s) => `.sev-${s} { background: ${SEVERITY_COLOURS[s].fill}; color: ${SEVERITY_COLOURS[s].text}; }`).join('\n');

export const WORKBENCH_CSS = `
:root { color-scheme: light; --ink: #1d1f24; --muted: #555a63; --line: #c9ccd2; --focus: #1f5fa8; --panel: #fbfaf7; }
* { box-sizing: border-box; }
body { margin: 0; font: 15px/1.45 "Segoe UI", "Helvetica Neue", Arial, sans-serif; color: var(--ink); background: #fff; }
header { padding: 0.6rem 1rem; border-bottom: 2px solid var(--ink); }
header h1 { margin: 0; font-size: 1.3rem; letter-spacing: 0.02em; }
header .caution { margin: 0.2rem 0 0.5rem; color: var(--muted); font-size: 0.9rem; }
nav { display: flex; flex-wrap: wrap; gap: 0.4rem; }
button, .button { font: inherit; padding: 0.3rem 0.7rem; border: 1px solid var(--ink); background: var(--panel); color: var(--ink); border-radius: 3px; cursor: pointer; }
button:disabled { opacity: 0.5; cursor: default; }
:focus-visible { outline: 3px solid var(--focus); outline-offset: 2px; }
.visually-hidden { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0); }
#status { min-height: 1.4em; margin: 0.4rem 0 0; color: var(--muted); }
main { display: grid; grid-template-columns: minmax(22rem, 2fr) 3fr; gap: 1rem; padding: 1rem; }
@media (max-width: 60rem) { main { grid-template-columns: 1fr; } }
#build { max-height: calc(100vh - 9rem); overflow: auto; padding-right: 0.5rem; }
details.section { border: 1px solid var(--line); border-radius: 4px; margin-bottom: 0.5rem; padding: 0.3rem 0.6rem; background: var(--panel); }
details.section > summary { font-weight: 600; cursor: pointer; }
.count { color: #97312D; font-weight: 600; }
.field { display: grid; grid-template-columns: 13rem 1fr; gap: 0.1rem 0.6rem; margin: 0.45rem 0; }
.field label { font-weight: 500; }
.field input[type=text], .field select { font: inherit; padding: 0.2rem 0.35rem; border: 1px solid #8c9099; border-radius: 2px; min-width: 0; }
.field .help { grid-column: 2; color: var(--muted); font-size: 0.82rem; }
.msg:not(:empty) { grid-column: 2; color: #7d1f1b; font-weight: 600; }
.msg:not(:empty)::before { content: "\\2716  "; }
[aria-invalid=true] { border: 2px solid #7d1f1b !important; background: #fff4f2; }
fieldset.entry { border: 1px dashed var(--line); margin: 0.4rem 0; }
.sev { display: inline-block; padding: 0 0.4rem; border-radius: 3px; border: 1px solid #333; font-weight: 600; white-space: nowrap; }
${badges}
#verdict h2 { margin: 0 0 0.2rem; }
#verdict .stale { border-left: 4px solid #97312D; padding-left: 0.5rem; }
table { border-collapse: collapse; width: 100%; }
th, td { border-bottom: 1px solid var(--line); padding: 0.25rem 0.4rem; text-align: left; vertical-align: top; }
td.num { text-align: right; font-variant-numeric: tabular-nums; }
pre { white-space: pre-wrap; font-size: 0.8rem; background: var(--panel); padding: 0.4rem; }
figure { margin: 0.6rem 0; }
figure svg { max-width: 100%; height: auto; }
figcaption { color: var(--muted); font-size: 0.85rem; }
.crew-plan svg { max-width: 22rem; }
.crew-plan .floor-outline { fill: #efe6d4; stroke: var(--ink); stroke-width: 4; }
.crew-plan .person circle { fill: #2f4858; stroke: #fff; stroke-width: 6; cursor: grab; }
.crew-plan .person text { fill: #fff; font-size: 40px; pointer-events: none; }
.crew-plan .person:focus circle { stroke: var(--focus); stroke-width: 12; }
.crew-plan .plan-label { font-size: 30px; fill: var(--muted); }
@media print {
  header nav, #build, #status, .crew-plan, #decisive, details.working { display: none !important; }
  main { display: block; padding: 0; }
  details { display: block; }
  .sev { border: 1px solid #000; }
}
`;
