"""
The work of the grid-residual-200x200 bench case written as a numpy-vectorised script (the
comparison the sweep issue names): Peng-Robinson methane (Peng & Robinson, Ind. Eng. Chem.
Fundam. 15 (1976) 59), residual h and s at the same T and P on a 200 x 200 grid, 100-600 K,
0.01-30 MPa, the stable root (lowest g_r/RT among mechanically stable roots). The cubic in Z is
solved in closed form for all points at once (trigonometric form for three real roots, Cardano
otherwise). Prints the CPU time per grid (median of repeats) and a few values to compare with
fluid.sweep. Run: python3 kernel-lib/bench/reference/grid_residual_numpy.py
Critical constants of methane as in the component table (kernel-lib/src/components/data).
"""
import time
import numpy as np

R = 8.314462618
Tc, Pc, omega = 190.56, 4.599e6, 0.011
N = 200
d1, d2 = 1 + np.sqrt(2), 1 - np.sqrt(2)


def grid():
    T = np.linspace(100.0, 600.0, N)[:, None] * np.ones((1, N))
    P = np.ones((N, 1)) * np.linspace(1e4, 30e6, N)[None, :]
    return T, P


def residual_hs(T, P):
    m = 0.37464 + 1.54226 * omega - 0.26992 * omega**2
    ac = 0.45723553 * R**2 * Tc**2 / Pc
    b = 0.07779607 * R * Tc / Pc
    sq = np.sqrt(T / Tc)
    alpha = (1 + m * (1 - sq)) ** 2
    a = ac * alpha
    Tda = -ac * m * sq * (1 + m * (1 - sq))  # T da/dT
    A = a * P / (R * T) ** 2
    B = b * P / (R * T)
    c2 = -(1 - B)
    c1 = A - 3 * B**2 - 2 * B
    c0 = -(A * B - B**2 - B**3)
    # depressed cubic Z = y - c2/3
    p = c1 - c2**2 / 3
    q = 2 * c2**3 / 27 - c2 * c1 / 3 + c0
    disc = (q / 2) ** 2 + (p / 3) ** 3
    shift = -c2 / 3
    one = disc > 0
    sd = np.sqrt(np.where(one, disc, 0.0))
    y1 = np.cbrt(-q / 2 + sd) + np.cbrt(-q / 2 - sd)
    r = np.sqrt(np.where(one, 1.0, -p / 3))
    phi = np.arccos(np.clip(np.where(one, 0.0, -q / (2 * r**3)), -1, 1))
    roots = [np.where(one, y1, 2 * r * np.cos((phi - 2 * np.pi * k) / 3)) + shift for k in range(3)]
    best_g = np.full(T.shape, np.inf)
    h = np.full(T.shape, np.nan)
    s = np.full(T.shape, np.nan)
    for Z in roots:
        ok = Z > B
        Zs = np.where(ok, Z, 1.0)
        lnD = np.log((Zs + d1 * B) / (Zs + d2 * B)) / (d1 - d2)
        lnZB = np.log(np.where(ok, Zs - B, 1.0))
        g = Zs - 1 - lnZB - A / B * lnD  # g_r/RT
        # mechanically stable: dP/dV < 0, i.e. the root is not the middle one of three
        stable = ok & (np.where(one, True, (Z != roots[1])))
        take = stable & (g < best_g)
        hr = R * T * (Zs - 1) + (Tda - a) / b * lnD
        sr = R * lnZB + Tda / T / b * lnD
        h = np.where(take, hr, h)
        s = np.where(take, sr, s)
        best_g = np.where(take, g, best_g)
    return h, s


T, P = grid()
residual_hs(T, P)
times = []
for _ in range(15):
    c = time.process_time()
    h, s = residual_hs(T, P)
    times.append(time.process_time() - c)
times.sort()
print({"case": "grid-residual-200x200-numpy", "secondsPerCall": times[len(times) // 2]})
for Ti, Pi in [(300.0, 5e6), (150.0, 1e6), (120.0, 2e7)]:
    hh, ss = residual_hs(np.array([[Ti]]), np.array([[Pi]]))
    print(Ti, Pi, float(hh[0, 0]), float(ss[0, 0]))
