/**
 * A validated case file (SI numbers, schema.ts) to the normalised Case of types.ts that every later layer
 * reads: profiles as tagged data, tables as Float64Arrays, defaults filled in.
 *
 * Defaults: edges cooled, tip convective (local face h), emissivity 0, surroundings = ambient,
 * contactResistance 0.
 */
import { caseName } from './case-name.js';
import type { ValidatedCase } from './schema.js';
import type { Case, Conductivity, Edges, HDistribution, Material, Profile, TipCondition } from './types.js';

export function toProfile(fin: ValidatedCase['fin']): Profile {
  switch (fin.profile) {
    case 'rectangular':
      return { kind: 'rectangular', length: fin.length, thickness: fin.thickness, width: fin.width };
    case 'pin':
      return { kind: 'pin', length: fin.length, diameter: fin.diameter };
    case 'trapezoidal':
      return {
        kind: 'trapezoidal',
        length: fin.length,
        baseThickness: fin.baseThickness,
        tipThickness: fin.tipThickness,
        width: fin.width,
      };
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return { kind: fin.profile, length: fin.length, baseThickness: fin.baseThickness, width: fin.width };
    case 'conical-pin':
      return { kind: 'conical-pin', length: fin.length, baseDiameter: fin.baseDiameter, tipDiameter: fin.tipDiameter };
    case 'annular':
      return { kind: 'annular', innerRadius: fin.innerRadius, outerRadius: fin.outerRadius, thickness: fin.thickness };
    case 'tabulated': {
      const profile: Profile = {
        kind: 'tabulated',
        shape: fin.shape,
        x: Float64Array.from(fin.points, (p) => p[0]),
        size: Float64Array.from(fin.points, (p) => p[1]),
      };
      if (fin.shape === 'straight' && fin.width !== undefined) profile.width = fin.width;
      return profile;
    }
    default: {
      const never: never = fin;
      throw new Error(`unknown profile ${String(never)}`);
    }
  }
}

function toEdges(fin: ValidatedCase['fin']): Edges {
  return 'edges' in fin && fin.edges !== undefined ? fin.edges : 'cooled';
}

export function toMaterial(material: ValidatedCase['material']): Material {
  if ('source' in material) return material;
  const k: Conductivity =
    typeof material.k === 'number'
      ? { kind: 'constant', k: material.k }
      : {
          kind: 'table',
          T_degC: Float64Array.from(material.k.points, (p) => p[0]),
          k: Float64Array.from(material.k.points, (p) => p[1]),
        };
  return { name: 'custom', k, source: 'given in the case file' };
}

export function toH(h: ValidatedCase['convection']['h']): HDistribution {
  if (typeof h === 'number') return { kind: 'uniform', h };
  if ('points' in h) {
    return { kind: 'points', x: Float64Array.from(h.points, (p) => p[0]), h: Float64Array.from(h.points, (p) => p[1]) };
  }
  if ('law' in h) return { kind: 'power', base: h.base, exponent: h.exponent };
  return { kind: 'linear', base: h.base, tip: h.tip };
}

export function toTip(tip: ValidatedCase['convection']['tip']): TipCondition {
  if (tip === undefined || tip === 'convective') return { kind: 'convective', h: null };
  if (tip === 'adiabatic') return { kind: 'adiabatic' };
  if (tip === 'infinite') return { kind: 'infinite' };
  if ('convective' in tip) return { kind: 'convective', h: tip.convective };
  return { kind: 'temperature', T_degC: tip.temperature };
}

export function toCase(validated: ValidatedCase, defaultName: string): Case {
  const { fin, material, convection, base } = validated;
  return {
    name: caseName(validated.name, defaultName).name,
    fin: { profile: toProfile(fin), edges: toEdges(fin) },
    material: toMaterial(material),
    convection: {
      ambient_degC: convection.ambient,
      h: toH(convection.h),
      tip: toTip(convection.tip),
      emissivity: convection.emissivity ?? 0,
      surroundings_degC: convection.surroundings ?? convection.ambient,
    },
    base: { T_degC: base.temperature, contactResistance: base.contactResistance ?? 0 },
  };
}
