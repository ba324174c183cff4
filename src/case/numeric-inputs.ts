/**
 * The numeric inputs of a single-fin case that its heat rate depends on, each named by the key path a user
 * writes in the case file (`convection.h`, `material.k`, `fin.thickness`, `convection.h.points[1][1]`), with
 * its nominal value and a way to scale it. `check` differentiates the reference heat rate with respect to each
 * (d ln Q / d ln x) and the `uncertainty` key of a case may name any of them.
 *
 * Scaling x -> f x keeps the rest of the case as given, with these choices (stated once, here):
 * - `convection.h` scales every face coefficient together (uniform h, both ends of a linear h, every point of
 *   an h table, the base value of a power law); a tip that takes the local face h follows it. The tip's own h
 *   (`convection.tip.convective`) is an input of its own.
 * - `base.temperature` is taken as the base temperature rise over the fluid, theta_b = T_b - T_ambient: that is
 *   what the heat rate is proportional to, and a log-derivative of a temperature in degC would mean nothing.
 * - `fin.length` moves the points of an h table with it (h given as a function of x / L), so that a table
 *   ending at the tip still ends there.
 * - `material.k` scales a conductivity table as a whole; each table point is also an input (tables of at most
 *   MAX_TABLE_POINT_INPUTS points; the same for an h table).
 * Tabulated profiles: only the width is an input (the points are a shape, not one dimension).
 * Units: SI (m, W/(m*K), W/(m^2*K), m^2*K/W); `nominal` of base.temperature is the rise in K.
 */
import type { Case, HDistribution, Profile } from './types.js';
import type { QuantityKind } from './units.js';

/**
 * A table's points are inputs of their own only up to this many points (each costs two re-solves in check's
 * sensitivities; a long measured table is one input as a whole). Common practice, no source.
 */
export const MAX_TABLE_POINT_INPUTS = 8;

export interface NumericInput<C = Case> {
  /** Key path as written in a case file, e.g. `fin.thickness`. */
  key: string;
  /** The kind of an absolute uncertainty of this input (its unit). */
  kind: QuantityKind;
  /** Nominal value, SI (base.temperature: the rise over the fluid, K). */
  nominal: number;
  /** Range of the scale factor f that keeps the case physical (f x stays in its valid range). */
  minFactor: number;
  maxFactor: number;
  /** The case with this input multiplied by `factor`. */
  scale(factor: number): C;
}

/** A numeric input (range: of the scale factor; default all positive factors). */
export function make<C>(
  key: string,
  kind: QuantityKind,
  nominal: number,
  scale: (f: number) => C,
  range: [number, number] = [0, Number.POSITIVE_INFINITY],
): NumericInput<C> {
  return {
    key,
    kind,
    nominal,
    minFactor: range[0],
    maxFactor: range[1],
    scale,
  };
}

/** Every numeric input of the case its heat rate depends on, in a fixed order (convection, material, fin, base). */
export function numericInputs(c: Case): NumericInput[] {
  return [...convectionInputs(c), ...materialInputs(c), ...finInputs(c), ...baseInputs(c)];
}

function withH(c: Case, h: HDistribution): Case {
  return { ...c, convection: { ...c.convection, h } };
}

export function scaleH(h: HDistribution, f: number): HDistribution {
  switch (h.kind) {
    case 'uniform':
      return { kind: 'uniform', h: h.h * f };
    case 'linear':
      return { kind: 'linear', base: h.base * f, tip: h.tip * f };
    case 'points':
      return { kind: 'points', x: h.x, h: h.h.map((v) => v * f) };
    case 'power':
      return { kind: 'power', base: h.base * f, exponent: h.exponent };
    default: {
      const never: never = h;
      throw new Error(`scaleH: ${JSON.stringify(never)}`);
    }
  }
}

/** A representative face h for an absolute uncertainty of `convection.h`: the uniform h or the base value; NaN for a table. */
function nominalH(h: HDistribution): number {
  switch (h.kind) {
    case 'uniform':
      return h.h;
    case 'linear':
    case 'power':
      return h.base;
    case 'points':
      return Number.NaN;
    default: {
      const never: never = h;
      throw new Error(`nominalH: ${JSON.stringify(never)}`);
    }
  }
}

function convectionInputs(c: Case): NumericInput[] {
  const h = c.convection.h;
  const out: NumericInput[] = [make('convection.h', 'heatTransferCoefficient', nominalH(h), (f) => withH(c, scaleH(h, f)))];
  if (h.kind === 'linear') {
    out.push(make('convection.h.base', 'heatTransferCoefficient', h.base, (f) => withH(c, { ...h, base: h.base * f })));
    out.push(make('convection.h.tip', 'heatTransferCoefficient', h.tip, (f) => withH(c, { ...h, tip: h.tip * f })));
  } else if (h.kind === 'points' && h.h.length <= MAX_TABLE_POINT_INPUTS) {
    for (let i = 0; i < h.h.length; i++) {
      const value = h.h[i] as number;
      if (value === 0) continue;
      const scaled = (f: number): Case => withH(c, { kind: 'points', x: h.x, h: h.h.map((v, j) => (j === i ? v * f : v)) });
      out.push(make(`convection.h.points[${i}][1]`, 'heatTransferCoefficient', value, scaled));
    }
  } else if (h.kind === 'power' && h.exponent !== 0) {
    // The exponent stays above -1 (the heat flux h theta must vanish with theta) and at most 5 (schema.ts).
    const range: [number, number] = h.exponent > 0 ? [-1 / h.exponent, 5 / h.exponent] : [5 / h.exponent, -1 / h.exponent];
    out.push(make('convection.h.exponent', 'dimensionless', h.exponent, (f) => withH(c, { ...h, exponent: h.exponent * f }), range));
  }
  const tip = c.convection.tip;
  if (tip.kind === 'convective' && tip.h !== null && tip.h > 0) {
    const tipH = tip.h;
    out.push(
      make('convection.tip.convective', 'heatTransferCoefficient', tipH, (f) => ({
        ...c,
        convection: { ...c.convection, tip: { kind: 'convective', h: tipH * f } },
      })),
    );
  }
  const e = c.convection.emissivity;
  if (e > 0)
    out.push(make('convection.emissivity', 'dimensionless', e, (f) => ({ ...c, convection: { ...c.convection, emissivity: e * f } }), [0, 1 / e]));
  return out;
}

function materialInputs(c: Case): NumericInput[] {
  const k = c.material.k;
  const withK = (next: Case['material']['k']): Case => ({ ...c, material: { ...c.material, k: next } });
  if (k.kind === 'constant') return [make('material.k', 'conductivity', k.k, (f) => withK({ kind: 'constant', k: k.k * f }))];
  const out = [make('material.k', 'conductivity', Number.NaN, (f) => withK({ kind: 'table', T_degC: k.T_degC, k: k.k.map((v) => v * f) }))];
  for (let i = 0; i < (k.k.length <= MAX_TABLE_POINT_INPUTS ? k.k.length : 0); i++) {
    const scaled = (f: number): Case => withK({ kind: 'table', T_degC: k.T_degC, k: k.k.map((v, j) => (j === i ? v * f : v)) });
    out.push(make(`material.k.points[${i}][1]`, 'conductivity', k.k[i] as number, scaled));
  }
  return out;
}

/** The profile's dimensions by their case-file keys (a zero tip size is no input: scaling 0 changes nothing). */
export function dimensions(p: Profile): [string, number][] {
  switch (p.kind) {
    case 'rectangular':
      return [
        ['length', p.length],
        ['thickness', p.thickness],
        ['width', p.width],
      ];
    case 'pin':
      return [
        ['length', p.length],
        ['diameter', p.diameter],
      ];
    case 'trapezoidal':
      return [
        ['length', p.length],
        ['baseThickness', p.baseThickness],
        ['tipThickness', p.tipThickness],
        ['width', p.width],
      ];
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return [
        ['length', p.length],
        ['baseThickness', p.baseThickness],
        ['width', p.width],
      ];
    case 'conical-pin':
      return [
        ['length', p.length],
        ['baseDiameter', p.baseDiameter],
        ['tipDiameter', p.tipDiameter],
      ];
    case 'annular':
      return [
        ['innerRadius', p.innerRadius],
        ['outerRadius', p.outerRadius],
        ['thickness', p.thickness],
      ];
    case 'tabulated':
      return p.width === undefined ? [] : [['width', p.width]];
    default: {
      const never: never = p;
      throw new Error(`dimensions: ${JSON.stringify(never)}`);
    }
  }
}

/** The factor range that keeps a tapered profile's tip no thicker than its base, and an annulus's radii in order. */
export function dimensionRange(p: Profile, name: string): [number, number] {
  const ordered = (small: number, large: number, isSmall: boolean): [number, number] =>
    isSmall ? [0, large / small] : [small / large, Number.POSITIVE_INFINITY];
  if (p.kind === 'trapezoidal' && (name === 'tipThickness' || name === 'baseThickness'))
    return ordered(p.tipThickness, p.baseThickness, name === 'tipThickness');
  if (p.kind === 'conical-pin' && (name === 'tipDiameter' || name === 'baseDiameter'))
    return ordered(p.tipDiameter, p.baseDiameter, name === 'tipDiameter');
  if (p.kind === 'annular' && (name === 'innerRadius' || name === 'outerRadius')) return ordered(p.innerRadius, p.outerRadius, name === 'innerRadius');
  return [0, Number.POSITIVE_INFINITY];
}

function finInputs(c: Case): NumericInput[] {
  const p = c.fin.profile;
  const out: NumericInput[] = [];
  for (const [name, value] of dimensions(p)) {
    if (!(value > 0)) continue;
    const scaled = (f: number): Case => {
      const profile = { ...p, [name]: value * f } as Profile;
      const h = c.convection.h;
      // An h table moves with the length (module header).
      const movesH = name === 'length' && h.kind === 'points';
      const next: Case = { ...c, fin: { ...c.fin, profile } };
      return movesH ? withH(next, { kind: 'points', x: h.x.map((x) => x * f), h: h.h }) : next;
    };
    out.push(make(`fin.${name}`, 'length', value, scaled, dimensionRange(p, name)));
  }
  return out;
}

function baseInputs(c: Case): NumericInput[] {
  const rise = c.base.T_degC - c.convection.ambient_degC;
  const out: NumericInput[] = [];
  if (rise !== 0) {
    out.push(
      make('base.temperature', 'temperatureDifference', rise, (f) => ({
        ...c,
        base: { ...c.base, T_degC: c.convection.ambient_degC + rise * f },
      })),
    );
  }
  const rc = c.base.contactResistance;
  if (rc > 0) out.push(make('base.contactResistance', 'contactResistance', rc, (f) => ({ ...c, base: { ...c.base, contactResistance: rc * f } })));
  return out;
}
