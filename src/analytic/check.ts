/** Argument checks shared by the closed forms: a bad input is a programming error here, so throw. */

export function requirePositive(where: string, name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${where}: ${name} must be finite and > 0, got ${value}`);
}

export function requireNonNegative(where: string, name: string, value: number): void {
  if (!(value >= 0) || !Number.isFinite(value)) throw new RangeError(`${where}: ${name} must be finite and >= 0, got ${value}`);
}

export function requireFinite(where: string, name: string, value: number): void {
  if (!Number.isFinite(value)) throw new RangeError(`${where}: ${name} must be finite, got ${value}`);
}
