// A place the outputs cannot be written: the user's to fix (another --out,
// permissions, space), so it is bad input (exit 2), never a fault of the tool.

const WHY: Record<string, string> = {
  ENOTDIR: 'a part of the path is a file, not a folder',
  EISDIR: 'it is a folder, not a file',
  EACCES: 'permission denied',
  EPERM: 'the operation is not permitted',
  EROFS: 'the file system is read-only',
  ENOSPC: 'no space left on the device',
  EEXIST: 'something of that name is already there',
  ENAMETOOLONG: 'the name is too long',
};

export class OutputError extends Error {
  constructor(
    readonly path: string,
    readonly code: string,
  ) {
    super(`cannot write ${path}: ${WHY[code] ?? code}; choose another output place`);
    this.name = 'OutputError';
  }
}

/** The error as an OutputError where it is one of the file system's refusals, else unchanged. */
export function asOutputError(e: unknown, path: string): unknown {
  const code = typeof e === 'object' && e !== null ? (e as { code?: unknown }).code : undefined;
  return typeof code === 'string' && Object.hasOwn(WHY, code) ? new OutputError(path, code) : e;
}
