/**
 * The case's inputs as table rows (quantity, value with its unit, note): what the report states before
 * any result, in the units engineers read (mm, °C, W/(m²·K), W/(m·K), m²·K/W).
 */
import { defaultDisplayUnits, inUnit, type Case, type DisplayUnits, type Profile } from '../case/index.js';
import { describeH, describeTip } from '../compare/index.js';
import type { TableRow } from './document.js';

const num = (x: number): string => `${+x.toPrecision(4)}`;
/** Units written for people: W/(m^2*K) becomes W/(m²·K). */
export const prettyUnits = (s: string): string =>
  s
    .replace(/\^2\b/g, '²')
    .replace(/([\w)²])\*(?=[\w(])/g, '$1·')
    .replace(/\bdegC\b/g, '°C')
    .replace(/\bdegF\b/g, '°F');

function geometryRows(p: Profile, u: DisplayUnits): [string, string][] {
  const mm = (m: number): string => `${+inUnit(u.length, m).toPrecision(4)} ${u.length.pretty}`;
  switch (p.kind) {
    case 'rectangular':
      return [
        ['Length', mm(p.length)],
        ['Thickness', mm(p.thickness)],
        ['Width', mm(p.width)],
      ];
    case 'pin':
      return [
        ['Length', mm(p.length)],
        ['Diameter', mm(p.diameter)],
      ];
    case 'trapezoidal':
      return [
        ['Length', mm(p.length)],
        ['Thickness at the base', mm(p.baseThickness)],
        ['Thickness at the tip', mm(p.tipThickness)],
        ['Width', mm(p.width)],
      ];
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return [
        ['Length', mm(p.length)],
        ['Thickness at the base', mm(p.baseThickness)],
        ['Width', mm(p.width)],
      ];
    case 'conical-pin':
      return [
        ['Length', mm(p.length)],
        ['Diameter at the base', mm(p.baseDiameter)],
        ['Diameter at the tip', mm(p.tipDiameter)],
      ];
    case 'annular':
      return [
        ['Inner radius (tube)', mm(p.innerRadius)],
        ['Outer radius', mm(p.outerRadius)],
        ['Thickness', mm(p.thickness)],
      ];
    case 'tabulated': {
      const what = p.shape === 'pin' ? 'diameter' : 'thickness';
      const points = Array.from(p.x, (x, k) => `${mm(x)}: ${mm(p.size[k] as number)}`);
      const shown = points.length > 12 ? [...points.slice(0, 6), '…', ...points.slice(-5)] : points;
      const rows: [string, string][] = [
        ['Length', mm(p.x[p.x.length - 1] as number)],
        [`Points (x: ${what})`, shown.join('; ')],
      ];
      if (p.width !== undefined) rows.push(['Width', mm(p.width)]);
      return rows;
    }
    default: {
      const never: never = p;
      return never;
    }
  }
}

function hasEdges(p: Profile): boolean {
  return p.kind !== 'pin' && p.kind !== 'conical-pin' && p.kind !== 'annular' && !(p.kind === 'tabulated' && p.shape === 'pin');
}

/** Rows: quantity | value (with unit) | note. */
export function caseInputRows(c: Case): TableRow[] {
  const p = c.fin.profile;
  const u = c.display ?? defaultDisplayUnits;
  const T = (t: number): string => `${num(inUnit(u.temperature, t))} ${u.temperature.pretty}`;
  const k_ = (k: number): string => num(inUnit(u.k, k));
  const rows: [string, string, string][] = [['Profile', p.kind, p.kind === 'tabulated' ? `${p.shape}, linear between points` : '']];
  for (const [q, v] of geometryRows(p, u)) rows.push([q, v, '']);
  if (hasEdges(p))
    rows.push(['Side edges', c.fin.edges, c.fin.edges === 'cooled' ? 'the two narrow edges lose heat' : 'the two narrow edges lose no heat']);
  const k = c.material.k;
  rows.push(['Material', c.material.name, prettyUnits(c.material.source)]);
  rows.push([
    'Conductivity k',
    k.kind === 'constant' ? `${k_(k.k)} ${u.k.pretty}` : `table of ${k.k.length} points, ${k_(Math.min(...k.k))} to ${k_(Math.max(...k.k))} ${u.k.pretty}`,
    '',
  ]);
  rows.push(['Convection h', prettyUnits(describeH(c.convection.h, u)), '']);
  rows.push(['Tip', prettyUnits(describeTip(c.convection.tip, u)), '']);
  rows.push(['Ambient (fluid) temperature', T(c.convection.ambient_degC), '']);
  if (c.convection.emissivity > 0) rows.push(['Emissivity', num(c.convection.emissivity), `surroundings at ${T(c.convection.surroundings_degC)}`]);
  rows.push(['Base temperature', T(c.base.T_degC), c.base.contactResistance > 0 ? 'of the wall, behind the contact resistance' : '']);
  rows.push([
    'Contact resistance at the base',
    c.base.contactResistance > 0 ? `${c.base.contactResistance.toExponential(2)} m²·K/W` : 'none',
    c.base.contactResistance > 0 ? 'per unit of base area' : '',
  ]);
  return rows.map((cells) => ({ cells }));
}
