import { describe, expect, it } from 'vitest';
import { el, escapeXml, fmt, polylinePathData, svgDocument, textEl } from '../../src/images/svg.js';
import { wellFormednessError } from './helpers.js';

describe('svg writer', () => {
  it('escapes the five XML special characters (XML 1.0, section 2.4)', () => {
    expect(escapeXml(`a<b & "c" 'd'>`)).toBe('a&lt;b &amp; &quot;c&quot; &apos;d&apos;&gt;');
  });

  it('drops control characters XML 1.0 forbids (section 2.2, Char production)', () => {
    expect(escapeXml('a\u0001b\u0008c\td')).toBe('abc\td');
  });

  it('writes numbers with at most 2 decimals, without exponent or negative zero', () => {
    expect(fmt(1.23456)).toBe('1.23');
    expect(fmt(-0.001)).toBe('0');
    expect(fmt(1e-9)).toBe('0');
    expect(fmt(100)).toBe('100');
    expect(fmt(2.5)).toBe('2.5');
    expect(() => fmt(Number.NaN)).toThrow(RangeError);
  });

  it('breaks a polyline at non-finite points instead of drawing through them', () => {
    expect(polylinePathData([0, 1, Number.NaN, 3, 4], [0, 1, 2, 3, 4])).toBe('M0 0L1 1M3 3L4 4');
  });

  it('builds a well-formed document even from hostile label text', () => {
    const doc = svgDocument(100, 50, [el('g', { id: 'a"b' }, [textEl('</text><script>&', { x: 1, y: 2 })])]);
    expect(wellFormednessError(doc)).toBeNull();
    expect(doc).toContain('&lt;/text&gt;&lt;script&gt;&amp;');
  });

  it('the well-formedness check itself rejects broken XML (so the other tests can fail)', () => {
    expect(wellFormednessError('<svg><g></svg>')).not.toBeNull();
    expect(wellFormednessError('<svg a="1" a="2"/>')).not.toBeNull();
    expect(wellFormednessError('<svg><text>a & b</text></svg>')).not.toBeNull();
    expect(wellFormednessError('<svg/><svg/>')).not.toBeNull();
    expect(wellFormednessError('<svg x=1/>')).not.toBeNull();
    expect(wellFormednessError('<svg><g x="1"/><text>ok &amp; fine</text></svg>')).toBeNull();
  });
});
