// Types of scripts/cached-script.mjs (plain JavaScript: scripts/build.mjs runs it without TypeScript).
import type { Script } from 'node:vm';

export function compileCachedScript(file: string, cachedData: Buffer | undefined): Script;
export function runCachedScript(script: Script, file: string): unknown;
export function loadCachedScript(url: URL): unknown;
