// Runs in its own file (own module instance): nothing has loaded the Bessel library here.
import { describe, expect, it } from 'vitest';
import { I0e, initBessel, isBesselReady } from '../../src/analytic/bessel.js';

describe('Bessel library loading', () => {
  it('is not loaded at import; the first call loads it (a run that needs no Bessel function never pays for it)', () => {
    expect(isBesselReady()).toBe(false);
    expect(I0e(0)).toBe(1); // e^0 I0(0) = 1 exactly
    expect(isBesselReady()).toBe(true);
  });
  it('initBessel() is idempotent and optional', async () => {
    await initBessel();
    await initBessel();
    expect(isBesselReady()).toBe(true);
    expect(I0e(0)).toBe(1);
  });
});
