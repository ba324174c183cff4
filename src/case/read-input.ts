/**
 * Reading case text from a file or a stream, never more than `maxCaseBytes`: a case is a few hundred bytes, and
 * without a cap `/dev/zero`, a device or a huge file would be read until memory runs out. The cap is enforced
 * while reading (at most maxCaseBytes + 1 bytes are read), so an endless source stops too.
 * A missing, unreadable or oversized input is an InputError (exit 2) naming it.
 */
import { closeSync, openSync, readSync } from 'node:fs';
import { InputError } from '../errors.js';
import { quoted } from './clip-text.js';

/** 10 MiB: ten thousand times a large case file, small enough to parse in well under a second. */
export const maxCaseBytes = 10 * 1024 * 1024;

function tooLarge(name: string): InputError {
  return new InputError([
    {
      path: '(file)',
      value: quoted(name),
      accepted: `a case file of at most ${maxCaseBytes / (1024 * 1024)} MB (this input is larger; a case is usually under 1 kB)`,
    },
  ]);
}

function unreadable(name: string, err: unknown): InputError {
  const code = (err as NodeJS.ErrnoException).code;
  const reason = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : (err as Error).message;
  return new InputError([{ path: '(file)', value: quoted(name), accepted: `a readable case file (${reason})` }]);
}

/** The text of a case file (UTF-8), read in chunks and refused past the cap. */
export function readCaseFile(path: string): string {
  let fd: number;
  try {
    fd = openSync(path, 'r');
  } catch (err) {
    throw unreadable(path, err);
  }
  const chunks: Buffer[] = [];
  let total = 0;
  try {
    const chunk = Buffer.allocUnsafe(1 << 16);
    for (;;) {
      const n = readSync(fd, chunk, 0, chunk.length, null);
      if (n === 0) break;
      total += n;
      if (total > maxCaseBytes) throw tooLarge(path);
      chunks.push(Buffer.from(chunk.subarray(0, n)));
    }
  } catch (err) {
    if (err instanceof InputError) throw err;
    throw unreadable(path, err);
  } finally {
    closeSync(fd);
  }
  return Buffer.concat(chunks, total).toString('utf8');
}

/** The text of a stream (standard input), refused as soon as it passes the cap. */
export async function readCaseStream(chunks: AsyncIterable<Uint8Array | string>, name: string): Promise<string> {
  const parts: Buffer[] = [];
  let total = 0;
  for await (const chunk of chunks) {
    const bytes = typeof chunk === 'string' ? Buffer.from(chunk, 'utf8') : Buffer.from(chunk);
    total += bytes.length;
    if (total > maxCaseBytes) throw tooLarge(name);
    parts.push(bytes);
  }
  return Buffer.concat(parts, total).toString('utf8');
}
