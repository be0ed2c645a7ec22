// The browser the report's browser test and its screenshot use: the same
// launcher as `check --pdf` (src/node/headless-chromium.ts).
export { A4_VIEWPORT, CHROMIUM, CHROMIUM_FLAGS, hasChromium, launchChromium } from '../src/node/headless-chromium.ts';
