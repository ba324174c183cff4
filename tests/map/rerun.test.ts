/**
 * A map re-run into the same folder: the files an earlier map wrote (listed in its map.json, key `files`) and the
 * new one does not write are removed, so map.json never sits beside another map's images; files fincheck did not
 * list (the user's) stay, even with names a map could have. Inputs are invented.
 */
import { existsSync, mkdirSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from '../cli/run.js';
import { caseFile, tmp } from './support.js';

const file = caseFile(
  'rerun-plate.yaml',
  `name: rerun plate
fin: { profile: rectangular, length: 40 mm, thickness: 2 mm, width: 80 mm }
material: aluminium-6063
convection: { ambient: 35 degC, h: 45 W/(m^2*K), tip: convective }
base: { temperature: 85 degC }
`,
);
const grid = ['--x', 'fin.thickness=1:4 mm', '--y', 'convection.h=20:400', '--steps', '3x3', '--reference', '1d', '--jobs', '1'];

describe('fincheck map into a folder an earlier map wrote', () => {
  it('fewer --models and another --format: only the new set and the user’s files remain', async () => {
    const out = join(tmp, 'rerun');
    mkdirSync(out, { recursive: true });
    writeFileSync(join(out, 'notes.txt'), 'mine');
    writeFileSync(join(out, 'map-mine.png'), 'mine too');
    const first = await cli('map', file, ...grid, '--out', out);
    expect(first.code, first.stderr).toBe(0);
    expect(readdirSync(out)).toContain('map-tanh-Lc-thin.png');
    const second = await cli('map', file, ...grid, '--models', 'tanh-L,convective-tip', '--format', 'svg', '--out', out);
    expect(second.code, second.stderr).toBe(0);
    expect(readdirSync(out).sort()).toEqual([
      'map-convective-tip.svg',
      'map-mine.png',
      'map-tanh-L.svg',
      'map.csv',
      'map.json',
      'notes.txt',
      'overview.svg',
    ]);
    const json = JSON.parse(readFileSync(join(out, 'map.json'), 'utf8')) as { files: string[] };
    expect(json.files.sort()).toEqual(['map-convective-tip.svg', 'map-tanh-L.svg', 'map.csv', 'map.json', 'overview.svg']);
  });

  it('--json prints the same document as map.json, with its file list', async () => {
    const out = join(tmp, 'rerun-json');
    const r = await cli('map', file, ...grid, '--models', 'tanh-L', '--json', '--out', out);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toBe(readFileSync(join(out, 'map.json'), 'utf8'));
  });

  it('a map.json fincheck did not write (no file list, or names a map never writes) removes nothing', async () => {
    const out = join(tmp, 'rerun-foreign');
    mkdirSync(out, { recursive: true });
    writeFileSync(join(out, 'map-tanh-Lc.png'), 'an old picture');
    writeFileSync(join(out, 'report.html'), 'keep');
    writeFileSync(join(out, 'map.json'), JSON.stringify({ files: ['report.html', '../rerun-plate.yaml', 'map-tanh-Lc.png/../report.html'] }));
    const r = await cli('map', file, ...grid, '--models', 'tanh-L', '--out', out);
    expect(r.code, r.stderr).toBe(0);
    expect(existsSync(join(out, 'report.html'))).toBe(true);
    expect(existsSync(join(out, 'map-tanh-Lc.png'))).toBe(true);
    expect(existsSync(file)).toBe(true);
  });
});
