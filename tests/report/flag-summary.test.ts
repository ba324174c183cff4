/** The report's one-line flag summary is exact: warnings by name and the count of notes (issue 9, item 10). */
import { describe, expect, it } from 'vitest';
import type { Flag } from '../../src/compare/types.js';
import { flagSummary } from '../../src/report/build-report.js';

const flag = (name: string, severity: Flag['severity']): Flag => ({ flag: name, severity, value: 1, message: name });

describe('flagSummary', () => {
  it('informational flags only: "No warnings; 2 notes", never "No warning flags" with flags listed below', () => {
    expect(flagSummary([flag('long-fin', 'info'), flag('low-biot', 'info')])).toBe('No warnings; 2 notes (long-fin, low-biot); see Flags.');
  });
  it('warnings and notes are counted separately', () => {
    expect(flagSummary([flag('thick-fin', 'warning'), flag('long-fin', 'info')])).toBe('1 warning (thick-fin); 1 note (long-fin); see Flags.');
  });
  it('no flags at all', () => {
    expect(flagSummary([])).toBe('No warnings; no notes.');
  });
});
