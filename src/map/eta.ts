/**
 * The "s left" of the map's progress bar. The first points of a run are no guide to the rest: workers load their
 * modules and warm up, and a 2-D reference's first grids cost more than later ones (a 28 s map once showed
 * "2237 s left" after its first point). So no estimate is given until `minPoints` points are done and `minSeconds`
 * have passed since the first one; the rate is then measured from the first finished point on (leaving the
 * warm-up out) and smoothed from draw to draw, so the number settles instead of jumping.
 */
export interface EtaOptions {
  /** Points done since the first one before an estimate is shown (default: 3, or 2 % of the map). */
  minPoints?: number;
  /** Seconds since the first finished point before an estimate is shown. */
  minSeconds?: number;
  /** Weight of the newest rate in the running rate (exponential smoothing), 0..1. */
  smoothing?: number;
}

export class EtaEstimator {
  private start: { seconds: number; done: number } | null = null;
  private rate: number | null = null;
  private readonly minPoints: number;
  private readonly minSeconds: number;
  private readonly smoothing: number;

  constructor(
    private readonly total: number,
    options: EtaOptions = {},
  ) {
    this.minPoints = options.minPoints ?? Math.max(3, Math.ceil(0.02 * total));
    this.minSeconds = options.minSeconds ?? 2;
    this.smoothing = options.smoothing ?? 0.3;
  }

  /** Seconds left after `done` points at `seconds` since the start, or null while there is no fair estimate. */
  observe(done: number, seconds: number): number | null {
    if (done <= 0) return null;
    if (this.start === null) {
      this.start = { seconds, done };
      return null;
    }
    const elapsed = seconds - this.start.seconds;
    const points = done - this.start.done;
    if (points < this.minPoints || elapsed < this.minSeconds || elapsed <= 0) return null;
    const measured = points / elapsed;
    this.rate = this.rate === null ? measured : this.rate + this.smoothing * (measured - this.rate);
    return done >= this.total ? 0 : (this.total - done) / this.rate;
  }
}
