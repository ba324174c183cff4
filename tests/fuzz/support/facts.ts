/** The facts the contract needs (support/cases.ts CaseFacts), read from a parsed case file. */
import type { Case } from '../../../src/case/types.js';
import type { CaseFacts, HKind, ProfileName, TipKind } from './cases.js';

export function factsOf(c: Case): CaseFacts {
  const p = c.fin.profile;
  const profile: ProfileName = p.kind === 'tabulated' ? (p.shape === 'straight' ? 'tabulated-straight' : 'tabulated-pin') : p.kind;
  const tipCondition = c.convection.tip;
  const tip: TipKind = tipCondition.kind === 'convective' ? (tipCondition.h === null ? 'convective' : 'own-h') : tipCondition.kind;
  const h: HKind = c.convection.h.kind;
  const radiates = c.convection.emissivity > 0;
  const kTable = c.material.k.kind === 'table';
  const straight =
    p.kind === 'tabulated'
      ? p.shape === 'straight'
      : ['rectangular', 'trapezoidal', 'triangular', 'parabolic-concave', 'parabolic-convex'].includes(p.kind);
  const extent = p.kind === 'annular' ? p.outerRadius - p.innerRadius : p.kind === 'tabulated' ? (p.x[p.x.length - 1] ?? 0) : p.length;
  return {
    profile,
    straight,
    tip,
    h,
    radiates,
    kTable,
    nonlinear: h === 'power' || radiates || kTable,
    baseC: c.base.T_degC,
    ambientC: c.convection.ambient_degC,
    surroundingsC: c.convection.surroundings_degC,
    extent,
    ...(tipCondition.kind === 'temperature' ? { tipC: tipCondition.T_degC } : {}),
  };
}
