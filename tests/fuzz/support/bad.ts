/**
 * Bad case files: a random valid case with one thing wrong, and the key path the refusal must name
 * (README: exit 2, a message on stderr naming the key, the value given and what is accepted). Classes
 * (DEVELOPERS.md "Bad input" lists them): a unit of the wrong kind, an unknown unit, a negative or zero size,
 * a value below absolute zero or outside 0..1, a non-finite number, an unknown key, a value of the wrong type,
 * a missing key, a tip thicker than the base, radii in the wrong order, points out of order or beyond the fin,
 * an exponent <= -1, base at the fluid temperature, unknown words, an infinite tip on a tapered fin; and whole
 * files that are not a case (empty, a list, syntax errors, duplicate keys, a YAML alias bomb).
 */
import { fc } from '@fast-check/vitest';
import { formatKeyPath, type KeyPath } from '../../../src/case/key-path.js';
import { validCase, type FuzzCase } from './cases.js';
import { caseText } from './drive.js';
import { getAt, mappingPaths, quantityPaths, setAt, type Kind, type QuantityPath } from './paths.js';

export interface BadCase {
  text: string;
  format: 'yaml' | 'json';
  /** What is wrong, for the failure message. */
  what: string;
  /** A key path the message must name; undefined: any key path or file marker. */
  path?: string;
}

type Doc = Record<string, unknown>;

/** A unit of another kind for each kind of key (a length given in W, an h given as a conductivity...). */
const wrongUnit: Record<Kind, string[]> = {
  length: ['3 W', '2 degC', '5 W/(m^2*K)', '1 s'],
  size: ['3 W', '2 K', '40 W/(m*K)', '2 kg'],
  tipSize: ['1 W', '1 degF', '1 m^2'],
  temperature: ['3 m', '85 W', '20 W/(m^2*K)'],
  h: ['40 W/(m*K)', '40 W', '40 mm', '40 m^2*K/W'],
  lawBase: ['40 W/(m*K)', '12 mm'],
  k: ['205 W/(m^2*K)', '205 W', '205 mm'],
  resistance: ['1e-4 W/(m^2*K)', '1e-4 m', '1e-4 K/W'],
  emissivity: ['0.5 m', '0.9 W'],
  exponent: ['0.25 m', '1/4 K'],
};

/** Out-of-range values for each kind (schema.ts ranges). */
const outOfRange: Record<Kind, unknown[]> = {
  length: [-0.001, '-3 mm', '-0.1 in'],
  size: [0, -0.002, '0 mm', '-2 mm', '-0 m'],
  tipSize: [-0.001, '-1 mm'],
  temperature: ['-300 degC', '-1 K', '-500 degF', -274],
  h: [-5, '-40 W/(m^2*K)'],
  lawBase: [0, -3, '0 W/(m^2*K)'],
  k: [0, -205, '-205 W/(m*K)', '0 W/(m*K)'],
  resistance: [-1e-4, '-1e-4 m^2*K/W'],
  emissivity: [1.5, -0.1, 2],
  exponent: [-1, -2, '-1', -1.5],
};

const unknownUnits = ['furlongz', 'mmm', 'degX', 'W/(m^2*Q)', 'inches', 'meterz'];
const nonFiniteYaml = [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY];
const nonFiniteText = ['NaN', 'Infinity', '-Infinity', 'NaN mm', 'Infinity degC', '1e999', '1e999 mm', 'inf', '.nan'];
const wrongTypes: unknown[] = [[1, 2], { value: 3 }, true, false, '', 'forty', [], {}];

const quantityMutation = (q: QuantityPath): fc.Arbitrary<{ value: unknown; what: string }> =>
  fc.oneof(
    fc.constantFrom(...wrongUnit[q.kind]).map((value) => ({ value, what: 'a unit of the wrong kind' })),
    fc.tuple(fc.constantFrom(...unknownUnits), fc.integer({ min: 1, max: 99 })).map(([u, n]) => ({ value: `${n} ${u}`, what: 'an unknown unit' })),
    fc.constantFrom(...outOfRange[q.kind]).map((value) => ({ value, what: 'a value out of range' })),
    fc.constantFrom<unknown>(...nonFiniteYaml, ...nonFiniteText).map((value) => ({ value, what: 'a non-finite number' })),
    fc.constantFrom(...wrongTypes).map((value) => ({ value, what: 'a value of the wrong type' })),
  );

/** Required keys whose absence must be named (case-format.md). */
function requiredPaths(doc: Doc): KeyPath[] {
  const out: KeyPath[] = [
    ['fin'],
    ['material'],
    ['convection'],
    ['base'],
    ['convection', 'ambient'],
    ['convection', 'h'],
    ['base', 'temperature'],
    ['fin', 'profile'],
  ];
  const fin = doc['fin'] as Doc;
  for (const key of [
    'length',
    'thickness',
    'width',
    'diameter',
    'baseThickness',
    'tipThickness',
    'baseDiameter',
    'tipDiameter',
    'innerRadius',
    'outerRadius',
    'points',
    'shape',
  ]) {
    if (key in fin) out.push(['fin', key]);
  }
  return out;
}

const typos = ['lenght', 'thikness', 'widht', 'ambiant', 'temprature', 'emisivity', 'contact', 'foo', 'h2', 'Profile', 'units2'];

/** Cross-key mistakes that only make sense for some cases; [] when none applies. */
function crossKeyMutations(c: FuzzCase): { doc: Doc; path: string; what: string }[] {
  const doc = c.doc;
  const fin = doc['fin'] as Doc;
  const out: { doc: Doc; path: string; what: string }[] = [];
  if (fin['profile'] === 'trapezoidal')
    out.push({
      doc: setAt(setAt(doc, ['fin', 'baseThickness'], '2 mm'), ['fin', 'tipThickness'], '3 mm'),
      path: 'fin.tipThickness',
      what: 'a tip thicker than the base',
    });
  if (fin['profile'] === 'conical-pin')
    out.push({
      doc: setAt(setAt(doc, ['fin', 'baseDiameter'], '4 mm'), ['fin', 'tipDiameter'], '6 mm'),
      path: 'fin.tipDiameter',
      what: 'a tip wider than the base',
    });
  if (fin['profile'] === 'annular')
    out.push({
      doc: setAt(setAt(doc, ['fin', 'innerRadius'], '20 mm'), ['fin', 'outerRadius'], '15 mm'),
      path: 'fin.outerRadius',
      what: 'outer radius inside the inner',
    });
  if (fin['profile'] === 'tabulated') {
    const points = fin['points'] as unknown[][];
    if (points.length >= 3) {
      const swapped = structuredClone(points);
      const a = swapped[1] as unknown[];
      const b = swapped[2] as unknown[];
      [a[0], b[0]] = [b[0], a[0]];
      out.push({ doc: setAt(doc, ['fin', 'points'], swapped), path: 'fin.points[2][0]', what: 'points out of order' });
    }
    out.push({ doc: setAt(doc, ['fin', 'points', 0, 0], '1 mm'), path: 'fin.points[0][0]', what: 'a profile that does not start at the base' });
    out.push({ doc: setAt(doc, ['fin', 'points'], [[0, '2 mm']]), path: 'fin.points', what: 'a single point' });
  }
  if (fin['profile'] !== 'rectangular' && fin['profile'] !== 'pin') {
    out.push({ doc: setAt(doc, ['convection', 'tip'], 'infinite'), path: 'convection.tip', what: 'an infinite tip on a profile that is not uniform' });
  }
  const h = (doc['convection'] as Doc)['h'];
  if (typeof h === 'object' && h !== null && 'points' in h) {
    const points = (h as { points: unknown[][] }).points;
    out.push({
      doc: setAt(doc, ['convection', 'h', 'points', points.length - 1, 0], '10 m'),
      path: `convection.h.points[${points.length - 1}][0]`,
      what: 'h given beyond the tip',
    });
  }
  const convection = doc['convection'] as Doc;
  out.push({ doc: setAt(doc, ['base', 'temperature'], convection['ambient']), path: 'base.temperature', what: 'base at the fluid temperature' });
  out.push({
    doc: setAt(setAt(setAt(doc, ['convection', 'h'], 0), ['convection', 'emissivity'], undefined), ['convection', 'surroundings'], undefined),
    path: 'convection.h',
    what: 'no h and no radiation',
  });
  out.push({ doc: setAt(doc, ['fin', 'profile'], 'rectangle'), path: 'fin', what: 'an unknown profile' });
  out.push({ doc: setAt(doc, ['convection', 'tip'], 'convection'), path: 'convection.tip', what: 'an unknown tip word' });
  out.push({ doc: setAt(doc, ['material'], 'unobtainium-7075'), path: 'material', what: 'an unknown material' });
  if (fin['profile'] === 'tabulated' && fin['shape'] === 'pin')
    out.push({ doc: setAt(doc, ['fin', 'width'], '10 mm'), path: 'fin.width', what: 'a width on a tabulated pin' });
  return out;
}

/** A valid case with one quantity, key or cross-key relation wrong. */
export const badCaseFromValid: fc.Arbitrary<BadCase> = validCase.chain((c) => {
  const quantities = quantityPaths(c.doc);
  const mappings = mappingPaths(c.doc);
  const required = requiredPaths(c.doc);
  const cross = crossKeyMutations(c);
  const yamlOnly = (value: unknown) => typeof value === 'number' && !Number.isFinite(value);
  const options: fc.Arbitrary<BadCase>[] = [
    fc
      .constantFrom(...quantities)
      .chain((q) => quantityMutation(q).map((m) => ({ q, m })))
      .map(({ q, m }) => {
        const format = yamlOnly(m.value) ? 'yaml' : c.format;
        return { text: caseText(setAt(c.doc, q.path, m.value), format), format, what: `${m.what} at ${q.text}: ${String(m.value)}`, path: q.text };
      }),
    fc
      .tuple(fc.constantFrom(...mappings), fc.constantFrom(...typos))
      .filter(([path, key]) => getAt(c.doc, [...path, key]) === undefined)
      .map(([path, key]) => ({
        text: caseText(setAt(c.doc, [...path, key], 1), c.format),
        format: c.format,
        what: `an unknown key ${key}`,
        path: formatKeyPath([...path, key]),
      })),
    fc.constantFrom(...required).map((path) => ({
      text: caseText(setAt(c.doc, path, undefined), c.format),
      format: c.format,
      what: `a missing key ${formatKeyPath(path)}`,
      // Without its profile a fin cannot say which keys it needs: the refusal names the fin.
      path: formatKeyPath(path) === 'fin.profile' ? 'fin' : formatKeyPath(path),
    })),
    fc.tuple(fc.constantFrom(...mappings.filter((p) => p.length > 0)), fc.constantFrom<unknown>('text', [1, 2, 3], true)).map(([path, value]) => ({
      text: caseText(setAt(c.doc, path, value), c.format),
      format: c.format,
      what: `a mapping replaced by ${JSON.stringify(value)}`,
      path: formatKeyPath(path),
    })),
  ];
  if (cross.length > 0)
    options.push(fc.constantFrom(...cross).map((m) => ({ text: caseText(m.doc, c.format), format: c.format, what: m.what, path: m.path })));
  return fc.oneof(...options);
});

/** Files that are not a case at all. */
export const badFile: fc.Arbitrary<BadCase> = fc.oneof(
  fc.constantFrom<BadCase>(
    { text: '', format: 'yaml', what: 'an empty file' },
    { text: '[]\n', format: 'yaml', what: 'a list' },
    { text: '42\n', format: 'yaml', what: 'a number' },
    { text: 'fin: [\n', format: 'yaml', what: 'a YAML syntax error' },
    { text: '{"fin": ', format: 'json', what: 'a JSON syntax error' },
    { text: 'fin: {profile: pin}\nfin: {profile: pin}\n', format: 'yaml', what: 'a duplicate key' },
    { text: '\u0000\u0001\u0002\u00ff', format: 'yaml', what: 'binary bytes' },
    { text: 'null\n', format: 'json', what: 'null' },
    { text: '--- a\n--- b\n', format: 'yaml', what: 'two YAML documents' },
  ),
  fc.integer({ min: 6, max: 12 }).map((depth) => ({ text: aliasBomb(depth), format: 'yaml' as const, what: `a YAML alias bomb of depth ${depth}` })),
  fc.string({ maxLength: 200 }).map((text) => ({ text, format: 'yaml' as const, what: 'random text' })),
);

/** "Billion laughs": each level repeats the previous one ten times through aliases. */
function aliasBomb(depth: number): string {
  const lines = ['a0: &a0 [lol, lol, lol, lol, lol, lol, lol, lol, lol, lol]'];
  for (let i = 1; i <= depth; i++) lines.push(`a${i}: &a${i} [${Array.from({ length: 10 }, () => `*a${i - 1}`).join(', ')}]`);
  lines.push(`fin: *a${depth}`);
  return `${lines.join('\n')}\n`;
}
