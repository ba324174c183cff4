/**
 * AssemblyScript: the reads and writes every kernel makes of linear memory, by byte offset `base` and element index
 * `q` (imported by the kernel files; not an entry of its own, so it exports nothing from the module).
 */

/** Word k (i32) of a descriptor at d. */
export function word(d: usize, k: i32): i32 {
  return load<i32>(d + ((<usize>k) << 2));
}

export function f64At(base: usize, q: i32): f64 {
  return load<f64>(base + ((<usize>q) << 3));
}

export function setF64(base: usize, q: i32, v: f64): void {
  store<f64>(base + ((<usize>q) << 3), v);
}

export function i32At(base: usize, q: i32): i32 {
  return load<i32>(base + ((<usize>q) << 2));
}

/** base[q], base[q + 1] as f64x2. */
export function ld(base: usize, q: i32): v128 {
  return v128.load(base + ((<usize>q) << 3));
}
