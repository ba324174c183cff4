/** A length in mm with four significant digits, for messages and notes. */
export function fmtMm(x: number): string {
  return `${Number((x * 1000).toPrecision(4))} mm`;
}
