// The built workbench page (npm run build:web writes it; npm ci runs that),
// and the build `axletree serve` was given placed in its slot: the YAML text
// as a JSON string, every "<" escaped, so no text can end the slot early.
import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';

export const WORKBENCH_PAGE = fileURLToPath(new URL('../../web/dist/index.html', import.meta.url));
export const INITIAL_SLOT = '<script id="axletree-initial" type="application/json"></script>';

/** The page's text, or undefined where it has not been built. */
export async function readWorkbenchPage(file = WORKBENCH_PAGE): Promise<string | undefined> {
  try {
    return await readFile(file, 'utf8');
  } catch {
    return undefined;
  }
}

export function withInitialBuild(html: string, text: string, name: string): string {
  if (!html.includes(INITIAL_SLOT)) throw new Error('the workbench page has no slot for a build: build it again (npm run build:web)');
  const json = JSON.stringify({ name, text }).replace(/</g, '\\u003c');
  return html.replace(INITIAL_SLOT, `<script id="axletree-initial" type="application/json">${json}</script>`);
}
