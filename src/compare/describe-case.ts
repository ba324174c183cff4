/** One-line, unit-bearing descriptions of a case's inputs, for terminal output and reports. */
import type { Case, HDistribution, Profile, TipCondition } from '../case/index.js';

const mm = (m: number): string => `${+(m * 1000).toPrecision(4)} mm`;
const num = (x: number): string => `${+x.toPrecision(4)}`;

export function describeProfile(p: Profile): string {
  switch (p.kind) {
    case 'rectangular':
      return `rectangular fin, length ${mm(p.length)}, thickness ${mm(p.thickness)}, width ${mm(p.width)}`;
    case 'pin':
      return `pin, length ${mm(p.length)}, diameter ${mm(p.diameter)}`;
    case 'trapezoidal':
      return `trapezoidal fin, length ${mm(p.length)}, thickness ${mm(p.baseThickness)} to ${mm(p.tipThickness)}, width ${mm(p.width)}`;
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return `${p.kind} fin, length ${mm(p.length)}, base thickness ${mm(p.baseThickness)}, width ${mm(p.width)}`;
    case 'conical-pin':
      return `conical pin, length ${mm(p.length)}, diameter ${mm(p.baseDiameter)} to ${mm(p.tipDiameter)}`;
    case 'annular':
      return `annular fin, radius ${mm(p.innerRadius)} to ${mm(p.outerRadius)}, thickness ${mm(p.thickness)}`;
    case 'tabulated':
      return `tabulated ${p.shape === 'pin' ? 'pin' : 'straight fin'}, ${p.x.length} points, length ${mm(p.x[p.x.length - 1] as number)}${p.width !== undefined ? `, width ${mm(p.width)}` : ''}`;
    default: {
      const never: never = p;
      return never;
    }
  }
}

/** h as a sentence; `reference` names the power law's reference excess (a single fin's base, a sink's fin roots). */
export function describeH(h: HDistribution, reference = 'theta_base'): string {
  switch (h.kind) {
    case 'uniform':
      return `h = ${num(h.h)} W/(m^2*K) uniform`;
    case 'linear':
      return `h = ${num(h.base)} W/(m^2*K) at the base to ${num(h.tip)} at the tip (linear)`;
    case 'points':
      return `h tabulated at ${h.x.length} points, ${num(Math.min(...h.h))} to ${num(Math.max(...h.h))} W/(m^2*K)`;
    case 'power':
      return `h = ${num(h.base)} W/(m^2*K) x (theta/${reference})^${num(h.exponent)}`;
    default: {
      const never: never = h;
      return never;
    }
  }
}

export function describeTip(t: TipCondition): string {
  switch (t.kind) {
    case 'adiabatic':
      return 'adiabatic tip';
    case 'convective':
      return t.h === null ? 'convective tip (local h)' : `convective tip, h = ${num(t.h)} W/(m^2*K)`;
    case 'temperature':
      return `tip held at ${num(t.T_degC)} degC`;
    case 'infinite':
      return 'infinitely long fin';
    default: {
      const never: never = t;
      return never;
    }
  }
}

/** Grey radiation of a radiating fin: emissivity and the surroundings' temperature (none when emissivity is 0). */
function describeRadiation(c: Case): string {
  const { emissivity, surroundings_degC, ambient_degC } = c.convection;
  if (!(emissivity > 0)) return '';
  const same = surroundings_degC === ambient_degC ? ' (the ambient)' : '';
  return `; radiation, emissivity ${num(emissivity)}, surroundings ${num(surroundings_degC)} degC${same}`;
}

export function describeCase(c: Case): string[] {
  const k = c.material.k;
  const kText = k.kind === 'constant' ? `k = ${num(k.k)} W/(m*K)` : `k tabulated over temperature`;
  const p = c.fin.profile;
  const straight = !(p.kind === 'pin' || p.kind === 'conical-pin' || p.kind === 'annular' || (p.kind === 'tabulated' && p.shape === 'pin'));
  const edges = straight ? `, ${c.fin.edges} edges` : '';
  const contact = c.base.contactResistance > 0 ? `, contact resistance ${c.base.contactResistance.toExponential(2)} m^2*K/W` : '';
  return [
    `${describeProfile(c.fin.profile)}${edges}`,
    `${c.material.name}, ${kText} (${c.material.source})`,
    `${describeH(c.convection.h)}${describeRadiation(c)}; ${describeTip(c.convection.tip)}`,
    `base ${num(c.base.T_degC)} degC${contact}; ambient ${num(c.convection.ambient_degC)} degC`,
  ];
}
