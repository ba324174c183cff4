import * as prettier from 'prettier';
import { readFileSync } from 'node:fs';
import { execSync } from 'node:child_process';
const files = execSync("git ls-files '*.ts' '*.mjs' '*.js' '*.json'", { encoding: 'utf8' }).split('\n').filter((f) => f && !f.includes('package-lock'));
const texts = files.map((f) => [f, readFileSync(f, 'utf8')]);
function lineDiff(a, b) { // count lines of a not in b (multiset) as a rough changed-line count
  const m = new Map(); for (const l of b.split('\n')) m.set(l, (m.get(l) ?? 0) + 1);
  let d = 0; for (const l of a.split('\n')) { const c = m.get(l); if (c) m.set(l, c - 1); else d++; } return d;
}
const combos = JSON.parse(process.argv[2]);
for (const opts of combos) {
  let nf = 0, nl = 0;
  for (const [f, t] of texts) {
    const out = await prettier.format(t, { ...opts, filepath: f });
    if (out !== t) { nf++; nl += lineDiff(t, out); }
  }
  console.log(JSON.stringify(opts), 'files', nf, 'lines', nl);
}
