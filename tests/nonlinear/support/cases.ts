/**
 * The uniform fins of the nonlinear fd-1d tests' first-integral oracles (computed reference values,
 * nonlinear.py; closed forms of Sen & Trinh 1986, Aziz & Enamul-Huq 1975; the cases themselves come from
 * tests/support/fin-case.ts): a straight fin per metre of width with insulated edges (A = t * 1 m, P = 2 m)
 * and a pin. Inputs are invented; the oracles are dimensionless.
 */
import type { Profile } from '../../../src/case/index.js';

export const KELVIN = 273.15;

/** A uniform fin of the §6 oracles: its A (m^2) and P (m), and the profile that has them. */
export interface UniformFin {
  id: string;
  A: number;
  P: number;
  profile: (length: number) => Profile;
}

/** Straight fin 2 mm thick per metre of width, insulated edges: A = 0.002 m^2, P = 2 m. */
export const plateFin: UniformFin = {
  id: 'plate 2 mm x 1 m',
  A: 0.002,
  P: 2,
  profile: (length) => ({ kind: 'rectangular', length, thickness: 0.002, width: 1 }),
};

/** Pin of 5 mm diameter: A = pi D^2/4, P = pi D. */
export const pinFin: UniformFin = {
  id: 'pin 5 mm',
  A: (Math.PI * 0.005 ** 2) / 4,
  P: Math.PI * 0.005,
  profile: (length) => ({ kind: 'pin', length, diameter: 0.005 }),
};
