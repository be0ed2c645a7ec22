// Regenerates templates/specification.xlsx, the blank fill-in workbook, from
// the schema and the rules data; a test fails while the copy is stale.
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { writeFileAtomic } from '../src/node/atomic-write.ts';
import { defaultRulesDir, loadRulesData } from '../src/node/load-rules-data.ts';
import { TEMPLATE_FILE, templateBytes } from '../src/render/spec-workbook/template.ts';

const root = fileURLToPath(new URL('..', import.meta.url));
await writeFileAtomic(join(root, TEMPLATE_FILE), await templateBytes(loadRulesData(defaultRulesDir())));
console.log(`wrote ${TEMPLATE_FILE}`);
