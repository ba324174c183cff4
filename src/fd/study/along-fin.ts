/**
 * Quantities along the fin, as a model's solution gives them (one-d/along-fin.ts, two-d/along-fin.ts):
 * positions x in m from the base (annular fins: r - r1) and the values there.
 */
export interface AlongFinSeries {
  readonly x_m: Float64Array;
  readonly values: Float64Array;
}

export interface AlongFin {
  /** Temperature, degC: the 1-D section temperature; fd-2d's mid-plane (pins: the axis). */
  readonly temperature: AlongFinSeries;
  /** fd-2d only: the temperature of the cooled face, degC. */
  readonly faceTemperature: AlongFinSeries | null;
  /** Heat lost per unit length of fin (annular: of radius), W/m. */
  readonly loss: AlongFinSeries;
  /** Heat flowing along the fin toward the tip, W: the base heat rate first, the tip's loss last. */
  readonly flow: AlongFinSeries;
}
