"""Mean rise over an isoflux strip that spans the plate's whole length (a strip source on a flux channel):
the special case of Yovanovich, Muzychka & Culham (1999), "Spreading resistance of isoflux rectangles and
strips on compound flux channels", J. Thermophys. Heat Transfer 13(4) (authors and pages 495-500 from
memory), for one layer. With d = b
every y-term vanishes and the field depends on x and z only:

    theta_mean = A0 + sum_m A_m * 2 cos(l_m Xc) sin(l_m c/2) / (l_m c),   l_m = m pi / a,
    A0  = Q (t/k + 1/h) / (a b),
    A_m = 2 Q [sin((2Xc + c) l_m/2) - sin((2Xc - c) l_m/2)] / (a b c k l_m^2 phi(l_m)),
    phi(z) = (z tanh(z t) + h/k) / (z + (h/k) tanh(z t)).

A single series, summed here to 2e6 terms (the terms fall as 1/m^3 after averaging; the tail is below 1e-9 K),
independent of the double series of spreading_series.py. Plate a = b = 40 mm, t = 3 mm, k = 170 W/(m K),
h = 300 W/(m^2 K), Q = 10 W, strip 4 mm wide at Xc = 20 mm (the tests' invented data).
Run: python3 strip_spreading.py  -> 22.5128...
"""
import numpy as np

a = b = 0.04
t, k, h, Q = 0.003, 170.0, 300.0, 10.0
Xc, c = 0.02, 0.004

m = np.arange(1, 2_000_001, dtype=np.float64)
lam = m * np.pi / a
th = np.tanh(lam * t)
phi = (lam * th + h / k) / (lam + (h / k) * th)
Am = 2 * Q * (np.sin((2 * Xc + c) * lam / 2) - np.sin((2 * Xc - c) * lam / 2)) / (a * b * c * k * lam**2 * phi)
mean = Q * (t / k + 1 / h) / (a * b) + np.sum(Am * 2 * np.cos(lam * Xc) * np.sin(lam * c / 2) / (lam * c))
print(f"{mean:.9f}")
