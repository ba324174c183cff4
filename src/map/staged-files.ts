/**
 * Writing a set of output files all or nothing: each file is first written under a temporary name in the target
 * folder (".map.csv.<pid>.tmp"), and only when every one is complete are they renamed to their names (a rename in
 * one folder replaces the file atomically). `discard` removes the temporary files (Ctrl-C, an error), and the
 * folder too when this run created it and left it empty. A reader never sees a half-written map.
 */
import { mkdirSync, readdirSync, renameSync, rmdirSync, unlinkSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';

export class StagedFiles {
  private readonly staged: { temp: string; final: string }[] = [];
  private createdDir: string | undefined;

  constructor(readonly dir: string) {}

  /** Writes `data` to a temporary file; the folder is created when missing. */
  stage(name: string, data: string | Uint8Array): void {
    if (this.staged.length === 0 && this.createdDir === undefined) {
      this.createdDir = mkdirSync(this.dir, { recursive: true }) ?? undefined;
    }
    const final = join(this.dir, name);
    const temp = join(this.dir, `.${name}.${process.pid}.tmp`);
    this.staged.push({ temp, final });
    writeFileSync(temp, data);
  }

  /** Renames every staged file to its name; returns the final paths. */
  commit(): string[] {
    const finals = this.staged.map(({ temp, final }) => {
      renameSync(temp, final);
      return final;
    });
    this.staged.length = 0;
    this.createdDir = undefined;
    return finals;
  }

  /** Removes what was staged (and the folder, when created here and now empty). Never throws. */
  discard(): void {
    for (const { temp } of this.staged) {
      try {
        unlinkSync(temp);
      } catch {
        // Already gone or never fully created: nothing to remove.
      }
    }
    this.staged.length = 0;
    if (this.createdDir !== undefined) {
      try {
        if (readdirSync(this.dir).length === 0) rmdirSync(resolve(this.dir));
      } catch {
        // The folder is not ours to remove any more (someone wrote into it).
      }
      this.createdDir = undefined;
    }
  }
}
