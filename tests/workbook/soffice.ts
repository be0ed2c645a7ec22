// LibreOffice, headless, for printing a workbook to PDF as a reader's office
// program would. A fresh profile each run, so that a desktop session or a
// parallel test holding the default profile cannot make it exit silently.
import { execFile } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, extname, join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { promisify } from 'node:util';

const run = promisify(execFile);

/** Where Debian's libreoffice-calc-nogui (or libreoffice-calc) puts the command, if it is installed. */
export function findSoffice(): string | undefined {
  const path = (process.env.PATH ?? '').split(':').filter(Boolean);
  return [...path, '/usr/bin', '/usr/lib/libreoffice/program'].map((d) => join(d, 'soffice')).find((f) => existsSync(f));
}

/** The workbook file printed to PDF by LibreOffice, as bytes. */
export async function printToPdf(soffice: string, xlsx: string): Promise<Uint8Array> {
  const out = mkdtempSync(join(tmpdir(), 'axletree-print-'));
  const profile = pathToFileURL(mkdtempSync(join(tmpdir(), 'axletree-soffice-profile-'))).href;
  await run(soffice, [`-env:UserInstallation=${profile}`, '--headless', '--convert-to', 'pdf', '--outdir', out, xlsx], { timeout: 180_000 });
  const pdf = join(out, `${basename(xlsx, extname(xlsx))}.pdf`);
  if (!existsSync(pdf)) throw new Error(`LibreOffice wrote no ${pdf}`);
  return new Uint8Array(readFileSync(pdf));
}
