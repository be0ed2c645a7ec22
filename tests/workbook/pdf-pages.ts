// Pages of a PDF, counted two ways that must agree: the page objects
// (`/Type /Page`, never the `/Type /Pages` tree nodes) and the `/Count` of the
// page tree's root (the `/Pages` node with no parent). A PDF whose objects are
// packed into compressed streams shows neither; it is refused rather than
// counted as empty.

const PAGE_OBJECT = /\/Type\s*\/Page(?![a-zA-Z])/g;
const PAGES_NODE = /<<((?:(?!<<|>>)[\s\S])*?\/Type\s*\/Pages(?![a-zA-Z])(?:(?!<<|>>)[\s\S])*?)>>/g;

export function pdfPageCount(bytes: Uint8Array): number {
  const text = Buffer.from(bytes).toString('latin1');
  if (!text.startsWith('%PDF-')) throw new Error('not a PDF: no %PDF- header');
  const objects = (text.match(PAGE_OBJECT) ?? []).length;
  const roots = [...text.matchAll(PAGES_NODE)].map((m) => m[1]).filter((body) => !/\/Parent\s/.test(body));
  const counts = roots.map((body) => Number(/\/Count\s+(\d+)/.exec(body)?.[1]));
  if (objects === 0 || counts.length !== 1 || !Number.isInteger(counts[0])) {
    throw new Error(`cannot count the pages: ${objects} page objects, page-tree roots with counts [${counts.join(', ')}] (compressed object streams?)`);
  }
  if (counts[0] !== objects) throw new Error(`the page tree says ${counts[0]} pages but ${objects} page objects were found`);
  return objects;
}
