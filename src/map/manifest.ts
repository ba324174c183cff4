/**
 * Which files in a map's folder fincheck wrote: map.json lists them (its key `files`), written with the map's
 * files. A re-run into the same folder removes the files the earlier run listed and this one does not write (a shortcut
 * left out of the models mapped, PNGs after a switch to SVG), so map.json never sits beside images of another map.
 * Only names a map can have (map.csv, map.json, map-<model>.png|svg, overview.png|svg) are ever removed, and only
 * when listed: a user's own file in the folder, or a name slipped into the list, is never touched.
 */
import { existsSync, readFileSync, statSync, unlinkSync } from 'node:fs';
import { join } from 'node:path';

/** The file that lists the set. */
export const MANIFEST_NAME = 'map.json';

/**
 * A map.json larger than this is not read (a 1000 x 1000 map's is about 500 MB): it then owns nothing and the old
 * files stay, which is safe.
 */
const MAX_MANIFEST_BYTES = 256 * 1024 * 1024;

/** The names a map writes; nothing else is ever removed. */
const MAP_FILE = /^(map\.(csv|json)|map-[A-Za-z0-9-]+\.(png|svg)|overview\.(png|svg))$/;

/** Names listed by the folder's manifest (none when it has no readable manifest). */
export function manifestFiles(dir: string): string[] {
  const path = join(dir, MANIFEST_NAME);
  if (!existsSync(path) || !statSync(path).isFile() || statSync(path).size > MAX_MANIFEST_BYTES) return [];
  let parsed: unknown;
  try {
    parsed = JSON.parse(readFileSync(path, 'utf8'));
  } catch {
    // A damaged map.json (or one a user wrote) owns nothing: the files it may have listed stay (they may be the user's now).
    return [];
  }
  const files = typeof parsed === 'object' && parsed !== null && 'files' in parsed ? (parsed as { files: unknown }).files : [];
  return Array.isArray(files) ? files.filter((f): f is string => typeof f === 'string' && MAP_FILE.test(f)) : [];
}

/** Files an earlier map wrote into `dir` that a map writing `owned` does not replace. */
export function staleFiles(dir: string, owned: readonly string[]): string[] {
  const keep = new Set(owned);
  return manifestFiles(dir).filter((f) => !keep.has(f) && existsSync(join(dir, f)));
}

/** Removes `names` from `dir` (already gone: fine). */
export function removeFiles(dir: string, names: readonly string[]): void {
  for (const name of names) {
    try {
      unlinkSync(join(dir, name));
    } catch {
      // Removed meanwhile, or not removable: the new map is complete either way.
    }
  }
}
