"""Reference values for ring-cell.test.ts: axial field of a ring of rectangular section carrying a
uniform current density (1 A in total), at points inside, on the edge of and beside its section.

Independent route: scipy.integrate.dblquad (adaptive Gauss–Kronrod) over the section of the
closed-form filament field, with scipy.special.ellipk/ellipe (parameter m = k^2).
Run: python3 cell_field.py   (scipy 1.17)
"""
import numpy as np
from scipy.special import ellipk, ellipe
from scipy.integrate import dblquad


def hz(a, z0, r, z):
    zeta = z - z0
    S = (a + r) ** 2 + zeta ** 2
    D = (a - r) ** 2 + zeta ** 2
    m = 4 * a * r / S
    return (ellipk(m) + (a * a - r * r - zeta * zeta) / D * ellipe(m)) / (2 * np.pi * np.sqrt(S))


cell = (0.0103, 0.0106, 0.0, 0.005)  # r1, r2, z1, z2 in metres
area = (cell[1] - cell[0]) * (cell[3] - cell[2])
for (r, z) in [(0.0104, 0.0025), (0.0106, 0.0025), (0.0101, 0.001), (0.012, 0.003)]:
    v, err = dblquad(lambda zz, aa: hz(aa, zz, r, z), cell[0], cell[1], cell[2], cell[3], epsabs=1e-10, epsrel=1e-10)
    print(f"r={r} z={z} Hz={v / area:.9g} (A/m)/A  est.err={err / area:.2g}")
