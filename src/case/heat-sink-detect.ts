/** A case with an `array` key at its top level is a heat sink (heat-sink.md); any other is a single fin. */
export function isHeatSinkObject(raw: unknown): boolean {
  return typeof raw === 'object' && raw !== null && !Array.isArray(raw) && Object.hasOwn(raw, 'array');
}
