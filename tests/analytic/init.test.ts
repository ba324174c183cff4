// Runs in its own file (own module instance): nothing has called initBessel() here.
import { describe, expect, it } from 'vitest';
import { I0e, initBessel, isBesselReady } from '../../src/analytic/bessel.js';

describe('initBessel', () => {
  it('the sync functions throw a clear error before initialisation, and work after it', async () => {
    expect(isBesselReady()).toBe(false);
    expect(() => I0e(1)).toThrow(/initBessel/);
    await initBessel();
    await initBessel(); // idempotent
    expect(isBesselReady()).toBe(true);
    expect(I0e(0)).toBe(1); // e^0 I0(0) = 1 exactly
  });
});
