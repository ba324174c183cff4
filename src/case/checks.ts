/**
 * Physical checks that relate several keys of a case whose keys are each valid (schema.ts has already checked
 * every value's own range). Each check returns issues naming the key to change and what it accepts.
 */
import type { PendingIssue } from './issues.js';
import type { KeyPath } from './key-path.js';
import type { ValidatedCase } from './schema.js';

type Fin = ValidatedCase['fin'];

/** Profiles of uniform cross-section, the only ones for which `tip: infinite` has a meaning. */
export const uniformProfiles = ['rectangular', 'pin'] as const;

/** Base and ambient closer than this (K) count as equal: far above the round-off of unit conversion (~1e-13 K). */
const equalTemperatureTolerance = 1e-9;

function mm(value: number): string {
  return `${Number((value * 1000).toPrecision(6))} mm`;
}

/** Length of the fin along x (m): tip position for straight fins and pins, outer - inner radius for annular. */
export function finExtent(fin: Fin): number {
  switch (fin.profile) {
    case 'annular':
      return fin.outerRadius - fin.innerRadius;
    case 'tabulated':
      return fin.points[fin.points.length - 1]?.[0] ?? 0;
    case 'rectangular':
    case 'pin':
    case 'trapezoidal':
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
    case 'conical-pin':
      return fin.length;
    default: {
      const never: never = fin;
      throw new Error(`unknown profile ${String(never)}`);
    }
  }
}

export function checkFin(fin: Fin): PendingIssue[] {
  const issues: PendingIssue[] = [];
  switch (fin.profile) {
    case 'trapezoidal':
      if (fin.tipThickness > fin.baseThickness) {
        issues.push({
          path: ['fin', 'tipThickness'],
          accepted: `a length from 0 to baseThickness (${mm(fin.baseThickness)}): the fin tapers from base to tip`,
        });
      }
      break;
    case 'conical-pin':
      if (fin.tipDiameter > fin.baseDiameter) {
        issues.push({
          path: ['fin', 'tipDiameter'],
          accepted: `a length from 0 to baseDiameter (${mm(fin.baseDiameter)}): the pin tapers from base to tip`,
        });
      }
      break;
    case 'annular':
      if (fin.outerRadius <= fin.innerRadius) {
        issues.push({ path: ['fin', 'outerRadius'], accepted: `a radius greater than innerRadius (${mm(fin.innerRadius)})` });
      }
      break;
    case 'tabulated':
      issues.push(...checkTabulated(fin));
      break;
    case 'rectangular':
    case 'pin':
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      break;
    default: {
      const never: never = fin;
      throw new Error(`unknown profile ${String(never)}`);
    }
  }
  return issues;
}

function checkTabulated(fin: Extract<Fin, { profile: 'tabulated' }>): PendingIssue[] {
  const issues: PendingIssue[] = [];
  const size = fin.shape === 'straight' ? 'thickness' : 'diameter';
  issues.push(
    ...checkIncreasing(
      fin.points.map((p) => p[0]),
      ['fin', 'points'],
      'x',
      true,
    ),
  );
  fin.points.forEach(([, s], i) => {
    const isTip = i === fin.points.length - 1;
    if (!isTip && s <= 0) {
      issues.push({
        path: ['fin', 'points', i, 1],
        accepted: `a ${size} > 0 (only the tip, the last point, may have ${size} 0)`,
      });
    }
  });
  if (fin.shape === 'straight' && fin.width === undefined) {
    issues.push({ path: ['fin', 'width'], accepted: 'a length > 0 such as "80 mm": a straight tabulated fin needs its width' });
  }
  if (fin.shape === 'pin') {
    if (fin.width !== undefined) issues.push({ path: ['fin', 'width'], accepted: 'no width: the points give the diameter of a pin' });
    if (fin.edges !== undefined) issues.push({ path: ['fin', 'edges'], accepted: 'no edges: a pin has no side edges' });
  }
  return issues;
}

/** x of a table strictly increasing (and starting at 0 when `fromZero`); issues point at the offending x. */
function checkIncreasing(xs: readonly number[], at: KeyPath, name: string, fromZero: boolean): PendingIssue[] {
  const issues: PendingIssue[] = [];
  if (fromZero && xs[0] !== 0) {
    issues.push({ path: [...at, 0, 0], accepted: `${name} = 0: the first point is the base` });
  }
  for (let i = 1; i < xs.length; i++) {
    const previous = xs[i - 1] ?? -Infinity;
    if (!((xs[i] ?? NaN) > previous)) {
      issues.push({ path: [...at, i, 0], accepted: `${name} greater than the previous point's (strictly increasing)` });
    }
  }
  return issues;
}

export function checkMaterial(material: ValidatedCase['material']): PendingIssue[] {
  if ('source' in material || typeof material.k === 'number') return [];
  return checkIncreasing(
    material.k.points.map((p) => p[0]),
    ['material', 'k', 'points'],
    'a temperature',
    false,
  );
}

export function checkConvection(c: ValidatedCase): PendingIssue[] {
  const issues: PendingIssue[] = [];
  const { h, tip, emissivity } = c.convection;
  // Radiation carries heat only to surroundings at another temperature than the base: with
  // convection.surroundings at base.temperature and no convection, no heat leaves an isothermal fin.
  const surroundings = c.convection.surroundings ?? c.convection.ambient;
  const idleRadiation = Math.abs(surroundings - c.base.temperature) <= equalTemperatureTolerance;
  const radiates = (emissivity ?? 0) > 0 && !idleRadiation;
  const somewhere =
    (emissivity ?? 0) > 0 && idleRadiation
      ? `h > 0 somewhere: convection.emissivity is ${emissivity} but convection.surroundings (${Number(surroundings.toPrecision(6))} degC) equals base.temperature, so radiation carries no heat either; with no heat leaving the faces there is nothing to cool`
      : 'h > 0 somewhere (or emissivity > 0): with no heat leaving the faces the fin carries no heat';

  if (typeof h === 'number') {
    if (h === 0 && !radiates) issues.push({ path: ['convection', 'h'], accepted: somewhere });
  } else if ('points' in h) {
    const extent = finExtent(c.fin);
    issues.push(
      ...checkIncreasing(
        h.points.map((p) => p[0]),
        ['convection', 'h', 'points'],
        'x',
        false,
      ),
    );
    h.points.forEach(([x], i) => {
      if (x > extent * (1 + 1e-12)) {
        issues.push({
          path: ['convection', 'h', 'points', i, 0],
          accepted: `a position from 0 to the fin's length (${mm(extent)})`,
        });
      }
    });
    if (!radiates && h.points.every(([, value]) => value === 0)) issues.push({ path: ['convection', 'h'], accepted: somewhere });
  } else if ('law' in h) {
    // base > 0 is checked by the schema.
  } else if (h.base === 0 && h.tip === 0 && !radiates) {
    issues.push({ path: ['convection', 'h'], accepted: somewhere });
  }

  if (tip === 'infinite' && !(uniformProfiles as readonly string[]).includes(c.fin.profile)) {
    issues.push({
      path: ['convection', 'tip'],
      accepted: `adiabatic, convective, { convective: h } or { temperature: T }: an infinite tip needs a uniform profile (${uniformProfiles.join(' or ')}), not ${c.fin.profile}`,
    });
  }
  return issues;
}

export function checkBase(c: ValidatedCase): PendingIssue[] {
  if (Math.abs(c.base.temperature - c.convection.ambient) <= equalTemperatureTolerance) {
    return [
      {
        path: ['base', 'temperature'],
        accepted: `a temperature different from convection.ambient (${Number(c.convection.ambient.toPrecision(6))} degC): with no excess temperature the fin carries no heat`,
      },
    ];
  }
  return [];
}

/** All cross-key checks of a case that passed the schema. */
export function checkCase(c: ValidatedCase): PendingIssue[] {
  return [...checkFin(c.fin), ...checkMaterial(c.material), ...checkConvection(c), ...checkBase(c)];
}
