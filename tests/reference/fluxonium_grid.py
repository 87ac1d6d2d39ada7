"""Fluxonium energy levels on a phase grid (reference data).

What it computes
----------------
Absolute levels E_0..E_5 (GHz, E/h) of the fluxonium (Manucharyan et al.,
Science 326, 113 (2009))

    H = 4 E_C n^2 + (1/2) E_L phi^2 - E_J cos(phi - 2 pi Phi/Phi0),   n = -i d/dphi,

for (E_C, E_J, E_L) = (1.0, 4.0, 1.0) and (0.84, 3.0, 1.0) GHz at
Phi/Phi0 in {0, 0.1, 0.25, 0.3, 0.5, 0.75, 1.0}.

Method (independent of any harmonic-oscillator basis)
-----------------------------------------------------
Sinc discrete-variable representation on the uniform grid
phi_j = j*d, |phi_j| <= L (d = grid spacing). The potential is diagonal,
V_jj = E_L phi_j^2 / 2 - E_J cos(phi_j - phi_ext); the kinetic term
4E_C (-d^2/dphi^2) is the sinc-DVR second-derivative matrix

    T_jj = 4E_C pi^2 / (3 d^2),   T_jk = 4E_C * 2 (-1)^(j-k) / ((j-k)^2 d^2)  (j != k),

(D. T. Colbert and W. H. Miller, J. Chem. Phys. 96, 1982 (1992)).
The real symmetric matrix is diagonalised with scipy.linalg.eigh.
Convergence (asserted): the production grid (d = 0.1, L = 25) and a finer,
wider grid (d = 0.075, L = 30) agree to 1e-8 GHz for every level written.
Check (asserted): with E_J = 0 the levels equal sqrt(8 E_L E_C)(k + 1/2)
to 1e-8 GHz (the LC oscillator).

Regenerate (from the repository root):
    /usr/bin/python3 tests/reference/fluxonium_grid.py
"""
import os
import numpy as np
import scipy
import scipy.linalg

HERE = os.path.dirname(os.path.abspath(__file__))
DATA = os.path.join(HERE, "data")
VERSIONS = f"SciPy {scipy.__version__}, NumPy {np.__version__}"
PARAMS = [(1.0, 4.0, 1.0), (0.84, 3.0, 1.0)]          # (E_C, E_J, E_L) in GHz
FLUXES = [0.0, 0.1, 0.25, 0.3, 0.5, 0.75, 1.0]         # Phi / Phi0
NLEV = 6
GRID = (0.1, 25.0)          # production (d, L)
GRID_CHECK = (0.075, 30.0)  # convergence check (d, L)


def fluxonium_levels(ec, ej, el, flux, nlev=NLEV, grid=GRID):
    d, half_width = grid
    npts = int(round(half_width / d))
    phi = d * np.arange(-npts, npts + 1)
    k = np.arange(phi.size)
    diff = k[:, None] - k[None, :]
    with np.errstate(divide="ignore"):
        t = 4.0 * ec * 2.0 * (-1.0) ** diff / (diff.astype(float) ** 2 * d ** 2)
    np.fill_diagonal(t, 4.0 * ec * np.pi ** 2 / (3.0 * d ** 2))
    v = 0.5 * el * phi ** 2 - ej * np.cos(phi - 2.0 * np.pi * flux)
    h = t + np.diag(v)
    return scipy.linalg.eigh(h, eigvals_only=True, subset_by_index=[0, nlev - 1])


def main():
    rows = []
    for ec, ej, el in PARAMS:
        # E_J = 0: the LC oscillator, sqrt(8 E_L E_C)(k + 1/2).
        lc = fluxonium_levels(ec, 0.0, el, 0.0)
        exact = np.sqrt(8.0 * el * ec) * (np.arange(NLEV) + 0.5)
        assert np.max(np.abs(lc - exact)) < 1e-8, (lc, exact)
        for flux in FLUXES:
            e = fluxonium_levels(ec, ej, el, flux)
            e2 = fluxonium_levels(ec, ej, el, flux, grid=GRID_CHECK)
            diff = np.max(np.abs(e - e2))
            assert diff < 1e-8, f"grid not converged: {diff:.2e} at {ec, ej, el, flux}"
            rows += [(ec, ej, el, flux, m, e[m]) for m in range(NLEV)]

    with open(os.path.join(DATA, "fluxonium_levels.csv"), "w") as f:
        f.write("# fluxonium_grid.py  " + VERSIONS + "\n"
                "# H = 4E_C n^2 + E_L phi^2/2 - E_J cos(phi - 2 pi flux), flux = Phi/Phi0;"
                " energies E/h in GHz, absolute\n"
                f"# sinc DVR phase grid, spacing {GRID[0]}, phi in [-{GRID[1]}, {GRID[1]}];"
                f" agrees with spacing {GRID_CHECK[0]}, [-{GRID_CHECK[1]}, {GRID_CHECK[1]}] to 1e-8 GHz\n"
                "# E_J=0 check: levels = sqrt(8 E_L E_C)(k+1/2) to 1e-8 GHz\n"
                "ec_ghz,ej_ghz,el_ghz,flux_phi0,m,energy_ghz\n")
        for r in rows:
            f.write(f"{r[0]:g},{r[1]:g},{r[2]:g},{r[3]:g},{r[4]},{r[5]:.12e}\n")
    print("wrote fluxonium_levels.csv;", VERSIONS)


if __name__ == "__main__":
    main()
