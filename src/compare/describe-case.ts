/** One-line, unit-bearing descriptions of a case's inputs, for terminal output and reports. */
import {
  defaultDisplayUnits,
  inUnit,
  type Case,
  type DisplayUnit,
  type DisplayUnits,
  type HDistribution,
  type Profile,
  type TipCondition,
} from '../case/index.js';

const num = (x: number): string => `${+x.toPrecision(4)}`;
/** A value in SI shown in `unit`, 4 significant figures, without its unit. */
const shown = (unit: DisplayUnit, si: number): string => num(inUnit(unit, si));

export function describeProfile(p: Profile, u: DisplayUnits = defaultDisplayUnits): string {
  const mm = (m: number): string => `${shown(u.length, m)} ${u.length.ascii}`;
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
export function describeH(h: HDistribution, u: DisplayUnits = defaultDisplayUnits, reference = 'theta_base'): string {
  const H = u.h;
  switch (h.kind) {
    case 'uniform':
      return `h = ${shown(H, h.h)} ${H.ascii} uniform`;
    case 'linear':
      return `h = ${shown(H, h.base)} ${H.ascii} at the base to ${shown(H, h.tip)} at the tip (linear)`;
    case 'points':
      return `h tabulated at ${h.x.length} points, ${shown(H, Math.min(...h.h))} to ${shown(H, Math.max(...h.h))} ${H.ascii}`;
    case 'power':
      return `h = ${shown(H, h.base)} ${H.ascii} x (theta/${reference})^${num(h.exponent)}`;
    default: {
      const never: never = h;
      return never;
    }
  }
}

export function describeTip(t: TipCondition, u: DisplayUnits = defaultDisplayUnits): string {
  switch (t.kind) {
    case 'adiabatic':
      return 'adiabatic tip';
    case 'convective':
      return t.h === null ? 'convective tip (local h)' : `convective tip, h = ${shown(u.h, t.h)} ${u.h.ascii}`;
    case 'temperature':
      return `tip held at ${shown(u.temperature, t.T_degC)} ${u.temperature.ascii}`;
    case 'infinite':
      return 'infinitely long fin';
    default: {
      const never: never = t;
      return never;
    }
  }
}

/** Grey radiation of a radiating fin: emissivity and the surroundings' temperature (none when emissivity is 0). */
function describeRadiation(c: Case, u: DisplayUnits): string {
  const { emissivity, surroundings_degC, ambient_degC } = c.convection;
  if (!(emissivity > 0)) return '';
  const same = surroundings_degC === ambient_degC ? ' (the ambient)' : '';
  return `; radiation, emissivity ${num(emissivity)}, surroundings ${shown(u.temperature, surroundings_degC)} ${u.temperature.ascii}${same}`;
}

export function describeCase(c: Case, u: DisplayUnits = defaultDisplayUnits): string[] {
  const k = c.material.k;
  const kText = k.kind === 'constant' ? `k = ${shown(u.k, k.k)} ${u.k.ascii}` : `k tabulated over temperature`;
  const T = (t: number): string => `${shown(u.temperature, t)} ${u.temperature.ascii}`;
  const p = c.fin.profile;
  const straight = !(p.kind === 'pin' || p.kind === 'conical-pin' || p.kind === 'annular' || (p.kind === 'tabulated' && p.shape === 'pin'));
  const edges = straight ? `, ${c.fin.edges} edges` : '';
  const contact = c.base.contactResistance > 0 ? `, contact resistance ${c.base.contactResistance.toExponential(2)} m^2*K/W` : '';
  return [
    `${describeProfile(c.fin.profile, u)}${edges}`,
    `${c.material.name}, ${kText} (${c.material.source})`,
    `${describeH(c.convection.h, u)}${describeRadiation(c, u)}; ${describeTip(c.convection.tip, u)}`,
    `base ${T(c.base.T_degC)}${contact}; ambient ${T(c.convection.ambient_degC)}`,
  ];
}
