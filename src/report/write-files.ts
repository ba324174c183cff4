/**
 * All-or-nothing file output: every file is written in full under a temporary name in its own folder,
 * then renamed over its final name (a rename within one file system replaces the file at once). If a
 * write fails, the temporary files are removed and no final file is touched; nothing half-written is
 * left behind.
 */
import { mkdirSync, readdirSync, renameSync, rmdirSync, rmSync, writeFileSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { UsageError } from '../errors.js';

export interface OutputFile {
  path: string;
  bytes: Buffer | string;
}

/** Temporary name beside the final one (same folder, hence same file system). */
function temporaryName(path: string, index: number): string {
  return join(dirname(path), `.${basename(path)}.${process.pid}.${index}.tmp`);
}

/** Writes every file (creating the folders given in `folders` first), or none of them. */
export function writeFilesAtomically(files: readonly OutputFile[], folders: readonly string[] = []): void {
  // The first folder each mkdir created (undefined when it existed), so a failed write leaves no empty folder.
  const created: { first: string; folder: string }[] = [];
  const removeCreated = (): void => {
    // From each folder up to the first one its mkdir made, every folder left empty goes.
    for (const { first, folder } of created.reverse()) {
      for (let dir = resolve(folder); readdirSync(dir).length === 0; dir = dirname(dir)) {
        rmdirSync(dir);
        if (dir === resolve(first)) break;
      }
    }
  };
  try {
    for (const folder of folders) {
      const first = mkdirSync(folder, { recursive: true });
      if (first !== undefined) created.push({ first, folder });
    }
  } catch (e) {
    removeCreated();
    throw asUsageError(e);
  }
  const written: string[] = [];
  try {
    files.forEach((f, k) => {
      const tmp = temporaryName(f.path, k);
      written.push(tmp);
      writeFileSync(tmp, f.bytes);
    });
  } catch (e) {
    for (const tmp of written) rmSync(tmp, { force: true });
    removeCreated();
    throw asUsageError(e);
  }
  files.forEach((f, k) => renameSync(temporaryName(f.path, k), f.path));
}

/**
 * File-system refusals (no such folder, no permission, read-only, disk full, a file where a folder should be) are
 * the user's to fix: a UsageError (exit 2) with the system's message. Anything else is returned unchanged.
 * Shared by every command that writes files (plot, report, map).
 */
export function asUsageError(e: unknown): unknown {
  const code = typeof e === 'object' && e !== null && 'code' in e ? String((e as { code: unknown }).code) : '';
  if (['ENOENT', 'ENOTDIR', 'EISDIR', 'EACCES', 'EPERM', 'EROFS', 'ENOSPC', 'EEXIST'].includes(code)) {
    return new UsageError(`cannot write the output: ${e instanceof Error ? e.message : String(e)}`);
  }
  return e;
}
