/** What every variable-profile closed form returns (straight fins, spines, annular fins). */
export interface ProfileFinResult {
  /** Fin efficiency eta = q / (h * area * thetaBase), referred to `area`. */
  efficiency: number;
  /** Heat through the base, W (W per metre of width for a straight fin given without a width). */
  heatRate: number;
  /** Surface the efficiency refers to, m^2 (m^2 per metre of width for a straight fin without width). */
  area: number;
  /** Fin parameter m, 1/m, from the base thickness or diameter as stated by each formula. */
  m: number;
  /** m times the fin height (L for straight fins and spines, r2 - r1 for annular fins). */
  mL: number;
}
