"""Reference values of the standard normal distribution for tests/analytic/normal.test.ts (mpmath, 40 digits):
Phi(z) = ncdf(z) and its inverse z = sqrt(2) erfinv(2 p - 1), printed to 15 significant digits."""
import mpmath as mp

mp.mp.dps = 40
for z in [-30, -20, -10, -8, -5, -3.5, -3, -2.5, -1, -0.3, 0.3, 1, 2.5, 3, 5]:
    print(f"[{z}, {mp.nstr(mp.ncdf(z), 15)}],")
for p in ['1e-9', '0.0025', '0.1587', '0.5', '0.8413', '0.9975']:
    print(f"[{p}, {mp.nstr(mp.sqrt(2) * mp.erfinv(2 * mp.mpf(p) - 1), 15)}],")
