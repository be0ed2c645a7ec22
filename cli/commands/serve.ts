import { basename, extname, resolve } from 'node:path';
import { readFile } from 'node:fs/promises';
import { stringify } from 'yaml';
import { readSpec } from '../../src/node/read-spec.ts';
import { readWorkbenchPage, WORKBENCH_PAGE, withInitialBuild } from '../../src/node/workbench-page.ts';
import { serveWorkbench } from '../../src/node/serve-web.ts';
import { decodeUtf8 } from '../../src/core/input/decode-text.ts';
import type { Console } from '../console.ts';
import { EXIT } from '../exit-codes.ts';
import { formatIssues } from '../format-issues.ts';

/** The build as text the page keeps and saves: a text file as it is, a workbook written out as YAML. */
async function buildText(file: string, path: string, con: Console): Promise<string | undefined> {
  const read = await readSpec(path);
  if (!read.ok) {
    con.err(formatIssues(file, read.issues));
    return undefined;
  }
  if (extname(path).toLowerCase() === '.xlsx') return stringify(read.raw);
  const decoded = decodeUtf8(await readFile(path), path);
  return decoded.ok ? decoded.text : undefined;
}

export async function serveCommand(file: string | undefined, opts: { port: string }, con: Console): Promise<number> {
  const port = Number(opts.port);
  if (!/^\d+$/.test(opts.port) || port > 65535) {
    con.err(`axletree serve: option --port "${opts.port}" must be a whole number from 0 to 65535\n`);
    return EXIT.badInput;
  }
  let page = await readWorkbenchPage();
  if (page === undefined) {
    con.err(`axletree serve: the workbench page is not built (${WORKBENCH_PAGE}); run npm run build:web\n`);
    return EXIT.badInput;
  }
  if (file !== undefined) {
    const text = await buildText(file, resolve(con.cwd, file), con);
    if (text === undefined) return EXIT.badInput;
    page = withInitialBuild(page, text, basename(file));
  }
  let server;
  try {
    server = await serveWorkbench(page, port);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    con.err(`axletree serve: cannot serve on port ${port}: ${code === 'EADDRINUSE' ? 'it is in use; give another with --port, or 0 for a free one' : code === 'EACCES' ? 'not allowed; give a port above 1023' : String(e)}\n`);
    return EXIT.badInput;
  }
  con.out(`axletree workbench: ${server.url}${file ? ` (opening ${file})` : ''}\nOnly this machine can reach it; the checks run in the page. Ctrl-C stops it.\n`);
  con.keepPartial?.();
  await new Promise<void>((done) => {
    if (con.stop?.aborted) return done();
    con.stop?.addEventListener('abort', () => done(), { once: true });
  });
  await server.close();
  return EXIT.ok;
}
