"""Markdown tables of the uniform fin (four tips, corrected length), the power-law h fin and non-uniform h:
the reference values of tests/analytic/{uniform-fin,corrected-length,array}.test.ts. Output: out/tables2.md."""
import mpmath as mp
import uniform_fin as U, nonlinear as NL, nonuniform_h as NU
mp.mp.dps = 30
f = lambda v, n=10: mp.nstr(mp.mpf(v), n, strip_zeros=False)

cases = [("R1", 40, 180, mp.mpf('0.104'), mp.mpf('1e-4'), mp.mpf('0.030'), 60),
         ("R2", 40, 237, mp.mpf(2), mp.mpf('1e-3'), mp.mpf('0.025'), 50),
         ("P1", 100, 398, mp.pi*mp.mpf('0.005'), mp.pi*mp.mpf('0.005')**2/4, mp.mpf('0.050'), 75),
         ("P2", 25, 15, mp.pi*mp.mpf('0.005'), mp.pi*mp.mpf('0.005')**2/4, mp.mpf('0.100'), 80)]
print("| case | m (1/m) | mL | tip | q (W) | eta_f | eps_f | theta(L) (K) | theta(L/2) (K) |")
print("|---|---|---|---|---|---|---|---|---|")
for name, h, k, P, A, L, thb in cases:
    for tip in ['conv', 'adiab', 'temp', 'inf']:
        thL = mp.mpf(thb)/4 if tip == 'temp' else None
        r = U.fin(h, k, P, A, L, thb, tip, thL=thL)
        mid = U.theta(L/2, h, k, P, A, L, thb, tip, thL)
        print(f"| {name} | {f(r['m'])} | {f(r['mL'])} | {tip} | {f(r['q'])} | {f(r['eta']) if r['eta'] is not None else '-'} | {f(r['eff'])} | {f(r['thtip']) if tip != 'inf' else '0'} | {f(mid)} |")
print()
print("| case | Lc = L + A/P (m) | eta(Lc)=tanh(mLc)/(mLc) | q(Lc) (W) | exact conv-tip q (W) | rel. diff | exact Lc* = L + atanh(h/(mk))/m |")
print("|---|---|---|---|---|---|---|")
for name, h, k, P, A, L, thb in cases:
    Lc = L + A/P; m = mp.sqrt(h*P/(k*A)); rc = U.fin(h, k, P, A, Lc, thb, 'adiab'); rx = U.fin(h, k, P, A, L, thb, 'conv')
    print(f"| {name} | {f(Lc)} | {f(mp.tanh(m*Lc)/(m*Lc))} | {f(rc['q'])} | {f(rx['q'])} | {mp.nstr((rc['q']-rx['q'])/rx['q'], 3)} | {f(L + mp.atanh(h/(m*k))/m, 12)} |")
print()
print("power-law h: | n | mL | u_t = theta_tip/theta_b | Q = q/(sqrt(h_b P k A) theta_b) | eta = Q/mL |")
print("|---|---|---|---|---|")
for n in [mp.mpf(1)/4, mp.mpf(1)/3, mp.mpf(2)]:
    for mL in ['0.5', '1', '2']:
        ut, Q, eta = NL.powerlaw_adiab(n, mL)
        print(f"| {mp.nstr(n, 4)} | {mL} | {f(ut)} | {f(Q)} | {f(eta)} |")
print()
print("| B = beta theta_b | m0L | u_t | Q = q/(sqrt(h P k0 A) theta_b) |")
print("|---|---|---|---|")
for B in ['-0.2', '0.2', '0.5']:
    for mL in ['0.5', '1', '2']:
        ut, Q = NL.kvar_adiab(mp.mpf(B), mL)
        print(f"| {B} | {mL} | {f(ut)} | {f(Q)} |")
print()
print("| n | mL | NU1 Q | NU1 eta(mean h) | NU2 Q | NU2 eta(mean h) | uniform mean-h eta |")
print("|---|---|---|---|---|---|---|")
for n in [1, 2, mp.mpf(1)/2]:
    for mL in [mp.mpf('0.5'), mp.mpf(1), mp.mpf(2)]:
        Q1, e1 = NU.nu1(n, mL); Q2, e2 = NU.nu2(n, mL); mp_ = mL/mp.sqrt(n+1)
        print(f"| {mp.nstr(n,3)} | {mp.nstr(mL,3)} | {f(Q1)} | {f(e1)} | {f(Q2)} | {f(e2)} | {f(mp.tanh(mp_)/mp_)} |")
