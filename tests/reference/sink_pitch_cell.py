#!/usr/bin/env python3
"""Independent 2-D solutions of one pitch cell of a plate-fin heat sink heated uniformly over its whole
underside (the limit where the 3-D sink reduces to 2-D: identical fins filling the plate, a source covering
the whole underside, no variation along the fins). Half a pitch cell, x from the fin's centre plane (symmetry)
to the mid-gap plane (symmetry); z up from the underside.

Data (invented): half pitch a = 3 mm, fin half thickness w = 1 mm, plate thickness tp = 3 mm, fin height L = 15 mm,
k = 200 W/(m K) (plate and fin), h = 50 W/(m^2 K) on the fin faces and on the exposed plate top, adiabatic tip,
underside flux q = 1e4 W/m^2.

(a) conjugate: the fin's cross-section resolved (2-D conduction in the plate and in the fin), cell-centred finite
    volumes on square cells of side d, convection through half cells;
(b) thin fin: the fin as the exact 1-D fin (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed.,
    Table 3.4, adiabatic tip: q = sqrt(h P k A) tanh(mL) theta_root, here per unit length P = 2, A = 2w, halved for
    the half cell), standing on an isothermal strip of the plate top (the fin's temperature uniform across its
    thickness), the plate 2-D as in (a).
Each on three grids (d = 0.125, 0.0625, 0.03125 mm) and Richardson-extrapolated with the observed order.
Prints the mean underside excess temperature (K) of each model:
conjugate: grids ['36.075201379', '36.075532325', '36.076374889'] observed order 1.348 extrapolated 36.074987302 K
thin fin: grids ['36.069911753', '36.070567456', '36.071899397'] observed order 1.022 extrapolated 36.069275959 K
(the re-entrant corners at the fin root lower the conjugate order to ~4/3; the edge of the isothermal strip,
where the thin fin's root meets the convecting plate top, the thin-fin order to ~1).
"""
import numpy as np
import scipy.sparse as sp
import scipy.sparse.linalg as spla

a, w, tp, L = 3e-3, 1e-3, 3e-3, 15e-3
k, h, q = 200.0, 50.0, 1e4


def solve(d, thin):
    nxp, nzp = round(a / d), round(tp / d)
    nxf, nzf = round(w / d), round(L / d)
    idx = {}
    for i in range(nxp):
        for j in range(nzp):
            idx[('p', i, j)] = len(idx)
    if not thin:
        for i in range(nxf):
            for j in range(nzf):
                idx[('f', i, j)] = len(idx)
    else:
        idx['root'] = len(idx)
    n = len(idx)
    rows, cols, vals = [], [], []
    b = np.zeros(n)

    def couple(p, r, g):
        rows.extend([p, r, p, r]); cols.extend([p, r, r, p]); vals.extend([g, g, -g, -g])

    def diag(p, g):
        rows.append(p); cols.append(p); vals.append(g)

    for i in range(nxp):
        for j in range(nzp):
            p = idx[('p', i, j)]
            if i + 1 < nxp: couple(p, idx[('p', i + 1, j)], k)
            if j + 1 < nzp: couple(p, idx[('p', i, j + 1)], k)
            if j == 0: b[p] += q * d
            if j == nzp - 1:
                if i >= nxf: diag(p, 1 / (1 / (h * d) + d / 2 / (k * d)))
                elif thin: couple(p, idx['root'], k * d / (d / 2))
                else: couple(p, idx[('f', i, 0)], k)
    if thin:
        m = np.sqrt(h * 2 / (k * 2 * w))
        diag(idx['root'], 0.5 * np.sqrt(h * 2 * k * 2 * w) * np.tanh(m * L))
    else:
        for i in range(nxf):
            for j in range(nzf):
                p = idx[('f', i, j)]
                if i + 1 < nxf: couple(p, idx[('f', i + 1, j)], k)
                if j + 1 < nzf: couple(p, idx[('f', i, j + 1)], k)
                if i == nxf - 1: diag(p, 1 / (1 / (h * d) + d / 2 / (k * d)))
    A = sp.csr_matrix((vals, (rows, cols)), shape=(n, n))
    theta = spla.spsolve(A.tocsc(), b)
    under = [theta[idx[('p', i, 0)]] + q * d / 2 / k for i in range(nxp)]
    return float(np.mean(under))


def richardson(v):
    f1, f2, f3 = v
    p = np.log(abs((f3 - f2) / (f2 - f1))) / np.log(2)
    return f1 + (f1 - f2) / (2 ** p - 1), p


if __name__ == '__main__':
    for name, thin in (('conjugate', False), ('thin fin', True)):
        vals = [solve(d, thin) for d in (0.03125e-3, 0.0625e-3, 0.125e-3)]
        ext, p = richardson(vals)
        print(f'{name}: grids {["%.9f" % v for v in vals]} observed order {p:.3f} extrapolated {ext:.9f} K')
