# Writes coincident-clusters-scipy.csv: p(t) = expm(Q t) p0 by SciPy (double precision) and by mpmath (50 digits)
# for the ladders of CoincidentClusterTest (clusters of 2, 3 and 5 coincident or nearly coincident rates), on a log
# grid.
# Run: python3 coincident-clusters-scipy.py > coincident-clusters-scipy.csv
import numpy as np
import mpmath
import scipy
from scipy.linalg import expm


def generator(m, eps):
    n = m + 4
    rates = [0.0, 1e9] + [3e10 * (1 + eps * i) for i in range(m)] + [2e11, 4e11]
    q = np.zeros((n, n))
    for i in range(1, n):
        k = rates[i]
        q[i, i] = -k
        if i >= 2:
            q[i - 1, i] = 0.8 * k
            q[i - 2, i] = 0.2 * k
        else:
            q[0, 1] = k
    return q


times = np.logspace(-13, np.log10(3e-8), 40)
mpmath.mp.dps = 50
print("# SciPy %s scipy.linalg.expm and mpmath %s mpmath.expm (50 digits); columns: cluster size m, relative spread"
      " eps, time (s), state, p by SciPy, p by mpmath" % (scipy.__version__, mpmath.__version__))
for m in (2, 3, 5):
    for eps in (0.0, 1e-9, 1e-4):
        q = generator(m, eps)
        n = q.shape[0]
        p0 = np.zeros(n)
        p0[-1] = 1.0
        for t in times:
            p = expm(q * t) @ p0
            exact = mpmath.expm(mpmath.matrix(q.tolist()) * mpmath.mpf(float(t)))
            for i in range(n):
                print("%d,%r,%r,%d,%r,%r" % (m, float(eps), float(t), i, float(p[i]), float(exact[i, n - 1])))
