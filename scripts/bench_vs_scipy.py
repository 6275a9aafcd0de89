#!/usr/bin/env python3
"""The ladderkin sweep done with SciPy, for scripts/bench-vs-scipy.

The 31-state (or larger) exciton ladder of `ladderkin bench`: radiative rate N²/τ_rad (τ_rad = 20 ns), Auger rate
N²(N−1)/4/τ₂ (τ₂ = 50 ps), decays N → N−1; a Poisson pulse whose overflow above Nmax is lumped into Nmax; the
periodic steady state of the train (fixed point of exp(QT)·E); bleach min(N, 2)/2 and PL N²/τ_rad after the pulse
on a log-spaced delay grid.

    bench_vs_scipy.py eig  NMAX T_END_S NS   whole sweep by eigenvectors, CSV to stdout (like ladderkin simulate)
    bench_vs_scipy.py bdf  NMAX T_END_S NS   the same by the BDF integrator
    bench_vs_scipy.py inprocess NMAX T_END_S NS REPEATS   median ms of the eigenvector sweep inside Python
NS is the comma list of ⟨N⟩ as given to ladderkin.
"""
import sys
import time

import numpy as np
import scipy.linalg
from scipy.integrate import solve_ivp
from scipy.stats import poisson

TAU_RAD_S = 20e-9
TAU_AUGER2_S = 50e-12
DEGENERACY = 2
PERIOD_S = 1 / 80e6


def generator(nmax):
    n = np.arange(nmax + 1)
    k = n ** 2 / TAU_RAD_S + np.where(n >= 2, n ** 2 * (n - 1) / 4.0, 0) / TAU_AUGER2_S
    q = np.diag(-k)
    q[n[:-1], n[1:]] = k[1:]
    return q


def pulse(nmax, mean):
    e = np.zeros((nmax + 1, nmax + 1))
    d = poisson.pmf(np.arange(nmax + 1), mean)
    for start in range(nmax + 1):
        room = nmax - start
        e[start:nmax, start] = d[:room]
        e[nmax, start] = 1 - d[:room].sum()
    return e


def fixed_point(m):
    a = m - np.eye(len(m))
    a[0, :] = 1
    b = np.zeros(len(m))
    b[0] = 1
    return np.linalg.solve(a, b)


def observables(nmax):
    n = np.arange(nmax + 1)
    return np.minimum(n, DEGENERACY) / DEGENERACY, n ** 2 / TAU_RAD_S


def sweep_eig(nmax, delays, means):
    q = generator(nmax)
    w, v = scipy.linalg.eig(q)
    vinv = scipy.linalg.inv(v)
    phi = np.real(v @ np.diag(np.exp(w * PERIOD_S)) @ vinv)
    bleach, pl = observables(nmax)
    modes = np.exp(np.outer(delays, w))
    ob, op = bleach @ v, pl @ v
    out = []
    for mean in means:
        e = pulse(nmax, mean)
        after = e @ fixed_point(phi @ e)
        c = vinv @ after
        out.append((np.real(modes @ (ob * c)), np.real(modes @ (op * c))))
    return out


def sweep_bdf(nmax, delays, means):
    q = generator(nmax)
    size = nmax + 1

    def rhs(_t, p):
        return q @ p

    cols = [solve_ivp(rhs, (0, PERIOD_S), np.eye(size)[j], method="BDF", jac=q, rtol=1e-10, atol=1e-14).y[:, -1]
            for j in range(size)]
    phi = np.array(cols).T
    bleach, pl = observables(nmax)
    out = []
    for mean in means:
        e = pulse(nmax, mean)
        after = e @ fixed_point(phi @ e)
        sol = solve_ivp(rhs, (0, delays[-1]), after, method="BDF", jac=q, t_eval=delays, rtol=1e-10, atol=1e-14)
        out.append((bleach @ sol.y, pl @ sol.y))
    return out


def write_csv(delays, labels, traces):
    rows = ["delay_ps," + ",".join("bleach@N=%s,pl@N=%s" % (lab, lab) for lab in labels)]
    for j, t in enumerate(delays):
        cells = ["%.15g" % (t * 1e12)]
        for b, p in traces:
            cells.append("%.15g" % b[j])
            cells.append("%.15g" % p[j])
        rows.append(",".join(cells))
    sys.stdout.write("\n".join(rows) + "\n")


def main():
    mode, nmax, t_end = sys.argv[1], int(sys.argv[2]), float(sys.argv[3])
    labels = [s.strip() for s in sys.argv[4].split(",")]
    means = [float(s) for s in labels]
    delays = np.logspace(np.log10(1e-13), np.log10(t_end), 1000)
    delays[0], delays[-1] = 1e-13, t_end
    if mode == "eig":
        write_csv(delays, labels, sweep_eig(nmax, delays, means))
    elif mode == "bdf":
        write_csv(delays, labels, sweep_bdf(nmax, delays, means))
    elif mode == "inprocess":
        repeats = int(sys.argv[5])
        sweep_eig(nmax, delays, means)
        times = []
        for _ in range(repeats):
            t0 = time.perf_counter()
            sweep_eig(nmax, delays, means)
            times.append((time.perf_counter() - t0) * 1e3)
        print("%.3f" % float(np.median(times)))
    else:
        sys.exit("unknown mode " + mode)


if __name__ == "__main__":
    main()
