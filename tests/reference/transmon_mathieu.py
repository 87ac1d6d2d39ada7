"""Transmon energy levels from Mathieu characteristic values (reference data).

What it computes
----------------
Absolute levels E_m (GHz, E/h) of the transmon / Cooper-pair box

    H = 4 E_C (n - n_g)^2 - E_J cos(phi)

for E_J/E_C in {1, 5, 20, 50, 100}, E_C = 1 GHz, n_g in {0, 0.5}, m = 0..5,
from SciPy's Mathieu characteristic values scipy.special.mathieu_a / mathieu_b.

Mapping (Koch et al., Phys. Rev. A 76, 042319 (2007))
-----------------------------------------------------
With psi(phi) = exp(i n_g phi) y(x), phi = 2x, the Schroedinger equation
becomes Mathieu's equation  y'' + (a - 2q cos 2x) y = 0  with

    a = E / E_C,     q = -E_J / (2 E_C),     y(x + pi) = exp(-2 pi i n_g) y(x),

i.e. Koch's E_m = E_C a_{2(n_g + k(m, n_g))}(q = -E_J/(2E_C)).
At the two offsets used here the Floquet index is an integer:

* n_g = 0  : y is pi-periodic -> even orders r. For even r,
             a_r(-q) = a_r(q), b_r(-q) = b_r(q) (DLMF §28.2(vii)); with the
             ordering a0 < b2 < a2 < b4 < a4 < b6 (DLMF §28.2(v)) the levels are
             E_0..E_5 = E_C * [a0, b2, a2, b4, a4, b6](|q|).
* n_g = 0.5: y is pi-antiperiodic -> odd orders r at the NEGATIVE q.
             For odd r, a_r(-q) = b_r(q) and b_r(-q) = a_r(q) (DLMF §28.2(vii)),
             and with b1 < a1 < b3 < a3 < b5 < a5 at positive q the levels are
             E_0..E_5 = E_C * [b1, a1, b3, a3, b5, a5](|q|)
                      = E_C * [a1, b1, a3, b3, a5, b5](-|q|).

Both forms are evaluated and asserted equal. The levels are then VALIDATED
(assertion only; not written) against numpy.linalg.eigh of the charge-basis
matrix, |n| <= 40, <n|H|n> = 4E_C (n-n_g)^2, <n|H|n+1> = -E_J/2
(cos phi = (|n><n+1| + h.c.)/2), to 1e-9 relative.

A second file holds raw SciPy characteristic values a0, a1, b1, b2 at
q = 1, 5, 25 for comparison with Abramowitz & Stegun Table 20.1 / NIST DLMF
§28. Handbook values recalled from memory, a0(5) ~ -5.80004602 and
a0(25) ~ -40.25677955, are confirmed here against SciPy (assertion).

Regenerate (from the repository root):
    /usr/bin/python3 tests/reference/transmon_mathieu.py
"""
import os
import numpy as np
import scipy
from scipy.special import mathieu_a, mathieu_b

HERE = os.path.dirname(os.path.abspath(__file__))
DATA = os.path.join(HERE, "data")
VERSIONS = f"SciPy {scipy.__version__}, NumPy {np.__version__}"
RATIOS = [1, 5, 20, 50, 100]
EC = 1.0
NGS = [0.0, 0.5]
LEVELS = range(6)

# (function, order) for m = 0..5, evaluated at +|q| (see docstring).
ORDER_POS_Q = {0.0: [(mathieu_a, 0), (mathieu_b, 2), (mathieu_a, 2),
                     (mathieu_b, 4), (mathieu_a, 4), (mathieu_b, 6)],
               0.5: [(mathieu_b, 1), (mathieu_a, 1), (mathieu_b, 3),
                     (mathieu_a, 3), (mathieu_b, 5), (mathieu_a, 5)]}
# The same levels written at the physical q = -E_J/(2E_C) (Koch's form).
ORDER_NEG_Q = {0.0: ORDER_POS_Q[0.0],
               0.5: [(mathieu_a, 1), (mathieu_b, 1), (mathieu_a, 3),
                     (mathieu_b, 3), (mathieu_a, 5), (mathieu_b, 5)]}


def mathieu_levels(ej, ec, ng):
    q = -ej / (2.0 * ec)
    pos = np.array([ec * f(r, -q) for f, r in ORDER_POS_Q[ng]])
    neg = np.array([ec * f(r, q) for f, r in ORDER_NEG_Q[ng]])
    assert np.allclose(pos, neg, rtol=1e-13, atol=0), (pos, neg)
    return pos


def charge_basis_levels(ej, ec, ng, nmax=40):
    n = np.arange(-nmax, nmax + 1)
    h = np.diag(4.0 * ec * (n - ng) ** 2)
    h += np.diag(np.full(2 * nmax, -ej / 2.0), 1) + np.diag(np.full(2 * nmax, -ej / 2.0), -1)
    return np.linalg.eigh(h)[0]


def main():
    rows = []
    for ratio in RATIOS:
        ej = ratio * EC
        for ng in NGS:
            e = mathieu_levels(ej, EC, ng)
            ref = charge_basis_levels(ej, EC, ng)[: len(e)]
            rel = np.max(np.abs(e - ref) / np.abs(ref))
            assert rel < 1e-9, f"E_J/E_C={ratio}, n_g={ng}: rel diff {rel:.2e}"
            rows += [(ratio, EC, ej, ng, m, e[m]) for m in LEVELS]

    with open(os.path.join(DATA, "transmon_mathieu.csv"), "w") as f:
        f.write("# transmon_mathieu.py  " + VERSIONS + "\n"
                "# H = 4E_C(n-n_g)^2 - E_J cos(phi); energies E/h in GHz, absolute (not shifted)\n"
                "# E_m = E_C * Mathieu characteristic value at q = -E_J/(2E_C) (Koch et al. PRA 76 042319 (2007))\n"
                "# n_g=0: [a0,b2,a2,b4,a4,b6](|q|); n_g=0.5: [b1,a1,b3,a3,b5,a5](|q|) via DLMF 28.2(vii)\n"
                "# validated against numpy.linalg.eigh, charge basis |n|<=40, to 1e-9 relative\n"
                "ej_over_ec,ec_ghz,ej_ghz,ng,m,energy_ghz\n")
        for r in rows:
            f.write(f"{r[0]:g},{r[1]:g},{r[2]:g},{r[3]:g},{r[4]},{r[5]:.12e}\n")

    # Raw handbook values (A&S Table 20.1 / DLMF 28).
    assert abs(mathieu_a(0, 5.0) - (-5.80004602)) < 1e-8
    assert abs(mathieu_a(0, 25.0) - (-40.25677955)) < 1e-8
    with open(os.path.join(DATA, "mathieu_handbook.csv"), "w") as f:
        f.write("# transmon_mathieu.py  " + VERSIONS + "\n"
                "# raw Mathieu characteristic values from scipy.special.mathieu_a / mathieu_b\n"
                "# equation y'' + (a - 2q cos 2x) y = 0 (Abramowitz & Stegun Table 20.1, NIST DLMF 28)\n"
                "# handbook values recalled from memory, a0(5)=-5.80004602, a0(25)=-40.25677955,\n"
                "# confirmed against SciPy to 1e-8\n"
                "q,a0,a1,b1,b2\n")
        for q in [1.0, 5.0, 25.0]:
            f.write(f"{q:g},{mathieu_a(0, q):.12e},{mathieu_a(1, q):.12e},"
                    f"{mathieu_b(1, q):.12e},{mathieu_b(2, q):.12e}\n")
    print("wrote transmon_mathieu.csv and mathieu_handbook.csv;", VERSIONS)


if __name__ == "__main__":
    main()
