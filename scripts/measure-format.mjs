/**
 * How much of the tree each candidate prettier setting would change: files that differ and changed lines (lines
 * of a file that no longer appear in its formatted text). Used to choose .prettierrc.json: the setting that
 * changes the fewest files is the one closest to the style the code was written in.
 *
 *   node scripts/measure-format.mjs '[{"printWidth":120,"singleQuote":true},{"printWidth":155,"singleQuote":true}]'
 */
import * as prettier from 'prettier';
import { readFileSync } from 'node:fs';
import { execSync } from 'node:child_process';

const files = execSync("git ls-files '*.ts' '*.js' '*.mjs' '*.json'", { encoding: 'utf8' })
  .split('\n')
  .filter((f) => f && f !== 'package-lock.json');
const texts = files.map((f) => [f, readFileSync(f, 'utf8')]);

function changedLines(before, after) {
  const left = new Map();
  for (const line of after.split('\n')) left.set(line, (left.get(line) ?? 0) + 1);
  let changed = 0;
  for (const line of before.split('\n')) {
    const n = left.get(line);
    if (n) left.set(line, n - 1);
    else changed++;
  }
  return changed;
}

for (const options of JSON.parse(process.argv[2] ?? '[{}]')) {
  let filesChanged = 0;
  let linesChanged = 0;
  for (const [file, text] of texts) {
    const formatted = await prettier.format(text, { ...options, filepath: file });
    if (formatted !== text) {
      filesChanged++;
      linesChanged += changedLines(text, formatted);
    }
  }
  console.log(`${JSON.stringify(options)}: ${filesChanged} of ${files.length} files, ${linesChanged} lines`);
}
