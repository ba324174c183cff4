// Prints the test counts of the last vitest run as one plain line ("tests: N passed, N failed, N skipped"),
// read from vitest's JSON report, so CI logs state how many tests ran whatever the reporter's layout.
import { existsSync, readFileSync } from 'node:fs';

const file = '.vitest-results.json';
if (!existsSync(file)) {
  console.log('tests: 0 passed, 1 failed (no vitest report was written)');
  process.exit(1);
}
const r = JSON.parse(readFileSync(file, 'utf8'));
const skipped = (r.numPendingTests ?? 0) + (r.numTodoTests ?? 0);
console.log(`tests: ${r.numPassedTests} passed, ${r.numFailedTests} failed, ${skipped} skipped`);
