/**
 * Drifts as the terminal prints them, in `check` and `map` alike: a signed percentage, "+2.41 %", "-1.75 %",
 * three decimals below 0.1 % ("+0.019 %"), and "0.000 %" for a drift below 0.0005 % (never "-0.000 %").
 */
export function signedPercentText(x: number): string {
  const digits = Math.abs(x) < 0.001 ? 3 : 2;
  const text = (100 * x).toFixed(digits);
  return Number(text) === 0 ? `${(0).toFixed(digits)} %` : `${x > 0 ? '+' : ''}${text} %`;
}
