/**
 * The report's small parts: the date rule (ISO 8601 calendar dates; SOURCE_DATE_EPOCH as the
 * reproducible-builds.org specification defines it: whole seconds since 1970-01-01T00:00:00Z), the
 * all-or-nothing file writer, and the escaping of HTML and Markdown text.
 */
import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { UsageError } from '../../src/errors.js';
import { escapeHtml } from '../../src/report/html.js';
import { escapeMarkdown } from '../../src/report/markdown.js';
import { reportDate } from '../../src/report/report-date.js';
import { writeFilesAtomically } from '../../src/report/write-files.js';

describe('reportDate', () => {
  it('takes --date as given when it is a real calendar date', () => {
    expect(reportDate('2024-02-29', undefined)).toBe('2024-02-29'); // 2024 is a leap year
    for (const bad of ['2023-02-29', '2025-13-01', '2025-1-1', '01/02/2025', 'today']) {
      expect(() => reportDate(bad, undefined)).toThrow(UsageError);
    }
  });

  it('reads SOURCE_DATE_EPOCH as UTC seconds; --date wins over it', () => {
    expect(reportDate(undefined, '0')).toBe('1970-01-01');
    expect(reportDate(undefined, '1735689599')).toBe('2024-12-31'); // one second before 2025-01-01T00:00:00Z
    expect(reportDate(undefined, '1735689600')).toBe('2025-01-01');
    expect(reportDate('2020-06-15', '1735689600')).toBe('2020-06-15');
    expect(() => reportDate(undefined, '-5')).toThrow(UsageError);
    expect(() => reportDate(undefined, '1.5e9')).toThrow(UsageError);
  });

  it('otherwise uses the local calendar date of now', () => {
    expect(reportDate(undefined, undefined, new Date(2031, 6, 9, 23, 59))).toBe('2031-07-09');
    expect(reportDate(undefined, '', new Date(2031, 0, 2))).toBe('2031-01-02');
  });
});

describe('writeFilesAtomically', () => {
  it('writes every file, creating the folder', () => {
    const dir = join(mkdtempSync(join(tmpdir(), 'fincheck-write-')), 'new', 'deeper');
    writeFilesAtomically(
      [
        { path: join(dir, 'a.txt'), bytes: 'a' },
        { path: join(dir, 'b.bin'), bytes: Buffer.from([1, 2, 3]) },
      ],
      [dir],
    );
    expect(readFileSync(join(dir, 'a.txt'), 'utf8')).toBe('a');
    expect([...readFileSync(join(dir, 'b.bin'))]).toEqual([1, 2, 3]);
    expect(readdirSync(dir).sort()).toEqual(['a.txt', 'b.bin']);
  });

  it('writes none when one fails: the old files stay, no temporary file is left', () => {
    const dir = mkdtempSync(join(tmpdir(), 'fincheck-write-'));
    writeFileSync(join(dir, 'a.txt'), 'old');
    const files = [
      { path: join(dir, 'a.txt'), bytes: 'new' },
      { path: join(dir, 'missing-folder', 'b.txt'), bytes: 'b' },
    ];
    expect(() => writeFilesAtomically(files)).toThrow(UsageError);
    expect(readFileSync(join(dir, 'a.txt'), 'utf8')).toBe('old');
    expect(readdirSync(dir)).toEqual(['a.txt']);
    expect(existsSync(join(dir, 'missing-folder'))).toBe(false);
  });
});

describe('escaping', () => {
  it('HTML: the five characters that could open markup or end an attribute', () => {
    expect(escapeHtml('<b> & "q" 5 < 6 > 4')).toBe('&lt;b&gt; &amp; &quot;q&quot; 5 &lt; 6 &gt; 4');
  });

  it('Markdown: emphasis, code, links, tables and headings stay text', () => {
    expect(escapeMarkdown('Q_ref | *x* [a](b) `c` # <d>')).toBe('Q\\_ref \\| \\*x\\* \\[a\\](b) \\`c\\` \\# \\<d\\>');
  });
});
