/** A prolongation P (fine x coarse) in CSR form: row r's coarse indices and weights. */
export interface Prolongation {
  readonly rowStart: Int32Array;
  readonly col: Int32Array;
  readonly val: Float64Array;
  /** Number of coarse unknowns. */
  readonly coarse: number;
}
