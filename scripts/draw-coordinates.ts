// Redraws docs/coordinates.svg, the diagram of the axes a specification's
// positions are measured on; a test fails while the committed copy is stale.
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { writeFileAtomic } from '../src/node/atomic-write.ts';
import { COORDINATES_FILE, coordinatesSvgFile } from '../src/render/drawings/coordinate-diagram.ts';

const root = fileURLToPath(new URL('..', import.meta.url));
await writeFileAtomic(join(root, COORDINATES_FILE), coordinatesSvgFile());
console.log(`wrote ${COORDINATES_FILE}`);
