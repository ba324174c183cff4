/**
 * The normalised case: what every layer after parsing sees.
 *
 * All quantities are SI (m, W/(m*K), W/(m^2*K), m^2*K/W). Absolute temperatures are degrees
 * Celsius and carry the suffix `_degC`; temperature differences are kelvin. The parser
 * (src/case/parse.ts) is the only place that knows about units and file formats.
 */
import type { DisplayUnits } from './display-units.js';

/** Fin shapes of the case-file contract (`fin.profile`). Lengths in m. */
export type Profile =
  | { kind: 'rectangular'; length: number; thickness: number; width: number }
  | { kind: 'pin'; length: number; diameter: number }
  | { kind: 'trapezoidal'; length: number; baseThickness: number; tipThickness: number; width: number }
  | { kind: 'triangular'; length: number; baseThickness: number; width: number }
  | { kind: 'parabolic-concave'; length: number; baseThickness: number; width: number }
  | { kind: 'parabolic-convex'; length: number; baseThickness: number; width: number }
  | { kind: 'conical-pin'; length: number; baseDiameter: number; tipDiameter: number }
  | { kind: 'annular'; innerRadius: number; outerRadius: number; thickness: number }
  | TabulatedProfile;

/** A measured or drawn profile, linear between points; x from the base (0) to the tip (last x). */
export interface TabulatedProfile {
  kind: 'tabulated';
  shape: 'straight' | 'pin';
  /** Positions along the fin, m, strictly increasing, first = 0. */
  x: Float64Array;
  /** Thickness (straight) or diameter (pin) at each x, m. */
  size: Float64Array;
  /** Width of a straight fin, m (absent for pins). */
  width?: number;
}

export type ProfileKind = Profile['kind'];

/** Whether the two narrow side edges of a straight fin lose heat. Pins and annular fins ignore it. */
export type Edges = 'cooled' | 'insulated';

export interface FinSpec {
  profile: Profile;
  edges: Edges;
}

/**
 * Convection coefficient over the faces, W/(m^2*K), as a function of the position x along the fin
 * (m from the base; for annular fins x = r - innerRadius).
 */
export type HDistribution =
  | { kind: 'uniform'; h: number }
  | { kind: 'linear'; base: number; tip: number }
  | { kind: 'points'; x: Float64Array; h: Float64Array }
  /** h = base * (theta / theta_base)^exponent (natural convection, boiling); nonlinear. */
  | { kind: 'power'; base: number; exponent: number };

/** Tip condition. `convective` with h = null uses the local face h at the tip. */
export type TipCondition =
  { kind: 'adiabatic' } | { kind: 'convective'; h: number | null } | { kind: 'temperature'; T_degC: number } | { kind: 'infinite' };

/** Thermal conductivity, W/(m*K): constant or tabulated over temperature (linear between points). */
export type Conductivity = { kind: 'constant'; k: number } | { kind: 'table'; T_degC: Float64Array; k: Float64Array };

export interface Material {
  /** Built-in name, or 'custom' for `{ k: ... }`. */
  name: string;
  k: Conductivity;
  /** Published source of the value (built-ins), or 'given in the case file'. */
  source: string;
}

export interface Convection {
  ambient_degC: number;
  h: HDistribution;
  tip: TipCondition;
  /** Grey-body emissivity of the faces, 0..1 (0 = no radiation). */
  emissivity: number;
  /** Temperature of the radiating surroundings, degC (defaults to ambient). */
  surroundings_degC: number;
}

export interface BaseSpec {
  T_degC: number;
  /** Contact resistance per unit of base area, m^2*K/W; 0 when absent. */
  contactResistance: number;
}

/**
 * Something in a case that is valid but probably not what was meant (a bare `length: 40` is 40 m): shown beside
 * every output, never a reason to refuse. `value` is the value as given; `message` says what it is taken as and
 * what was probably meant.
 */
export interface CaseWarning {
  /** Key path, e.g. `fin.length`. */
  path: string;
  value: string;
  message: string;
}

/** One input's standard uncertainty, relative to its nominal value (uncertainty.ts reads it). */
export interface InputUncertainty {
  /** Key path of the input, e.g. `fin.thickness`. */
  key: string;
  relative: number;
  /** As written in the case (`25 %`, `0.05 mm`), or `default`. */
  given: string;
}

export interface Case {
  /** One line of at most 120 characters, without control characters (src/case/clip-text.ts). */
  name: string;
  fin: FinSpec;
  material: Material;
  convection: Convection;
  base: BaseSpec;
  /** Warnings found while reading the case (a parsed case always has the list; cases built in code may omit it). */
  warnings?: readonly CaseWarning[];
  /**
   * Standard uncertainties of inputs, relative to their nominal values (uncertainty.ts); a parsed case always
   * has the list (with the default for h); cases built in code may omit it (the default then applies).
   */
  uncertainty?: readonly InputUncertainty[];
  /** The units to show numbers in: the case's `display` key over what its inputs suggest (absent: the default, mm and SI). */
  display?: DisplayUnits;
}
