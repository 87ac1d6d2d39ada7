"""Transmon + fluxonium with charge-charge coupling, full product basis (reference data).

What it computes
----------------
Lowest 12 eigenvalues (absolute, GHz, E/h) of

    H = H_T (x) 1 + 1 (x) H_F + c * n_T (x) n_F,        c = 0.08 GHz,

    H_T = 4 E_C (n - n_g)^2 - E_J cos(phi)            E_C = 0.25, E_J = 12.0, n_g = 0.25
    H_F = 4 E_C n^2 + E_L phi^2/2 - E_J cos(phi - phi_ext)
                                                      E_C = 1.0, E_J = 4.0, E_L = 1.0,
                                                      phi_ext = 2 pi * 0.3  (Phi = 0.3 Phi0)
    n_T = n - n_g (transmon charge basis),  n_F = -i d/dphi (fluxonium charge).

Transmon (Koch et al., Phys. Rev. A 76, 042319 (2007)): charge basis |n| <= 20,
<n|H_T|n> = 4E_C (n-n_g)^2, <n|H_T|n+1> = -E_J/2 (cos phi = (|n><n+1| + h.c.)/2).

Fluxonium (Manucharyan et al., Science 326, 113 (2009)): harmonic-oscillator
basis of the LC part, omega = sqrt(8 E_C E_L),
    phi = phi_0 (a + a^dag)/sqrt(2),  n = i (a^dag - a)/(sqrt(2) phi_0),  phi_0 = (8E_C/E_L)^(1/4),
so [phi, n] = i and 4E_C n^2 + E_L phi^2/2 = omega (a^dag a + 1/2).
cos(phi - phi_ext) = cos(phi) cos(phi_ext) + sin(phi) sin(phi_ext), with cos(phi),
sin(phi) from scipy.linalg.cosm / sinm of the phi matrix in a larger basis
(200 states), then truncated to the 60 states kept.

n_F is purely imaginary in this basis, so H is COMPLEX HERMITIAN. The product
basis is built directly (no element is diagonalised first), ordered
transmon-major: index = i_T * N_F + i_F, and diagonalised with
scipy.linalg.eigh(subset_by_index=[0, 11]).

Checks (asserted): the product eigenvalues with (|n| <= 20, 60 HO states)
and (|n| <= 25, 80 HO states, 300 for cosm/sinm) agree to 1e-8 GHz; the
fluxonium bare levels agree with the independent sinc-DVR phase-grid method of
fluxonium_grid.py to 1e-8 GHz; the transmon bare levels agree between
|n| <= 20 and |n| <= 25 to 1e-10 GHz.

A second file lists the first 8 bare levels of each element alone.

Regenerate (from the repository root):
    /usr/bin/python3 tests/reference/transmon_fluxonium_product.py
"""
import os
import numpy as np
import scipy
import scipy.linalg

from fluxonium_grid import fluxonium_levels

HERE = os.path.dirname(os.path.abspath(__file__))
DATA = os.path.join(HERE, "data")
VERSIONS = f"SciPy {scipy.__version__}, NumPy {np.__version__}"
T_EC, T_EJ, T_NG = 0.25, 12.0, 0.25
F_EC, F_EJ, F_EL, F_FLUX = 1.0, 4.0, 1.0, 0.3
COUPLING = 0.08
SIZES = (20, 60, 200)           # production: transmon |n| <= 20, fluxonium 60 of 200 HO states
SIZES_CHECK = (25, 80, 300)     # convergence check
NLEV, NBARE = 12, 8


def transmon_ops(nmax):
    n = np.arange(-nmax, nmax + 1) - T_NG
    off = np.full(2 * nmax, -T_EJ / 2.0)
    h = np.diag(4.0 * T_EC * n ** 2) + np.diag(off, 1) + np.diag(off, -1)
    return h, np.diag(n)


def fluxonium_ops(nkeep, nbig):
    phi0 = (8.0 * F_EC / F_EL) ** 0.25
    a = np.diag(np.sqrt(np.arange(1.0, nbig)), 1)
    phi = phi0 * (a + a.T) / np.sqrt(2.0)
    cos_phi = scipy.linalg.cosm(phi)[:nkeep, :nkeep]
    sin_phi = scipy.linalg.sinm(phi)[:nkeep, :nkeep]
    pe = 2.0 * np.pi * F_FLUX
    omega = np.sqrt(8.0 * F_EC * F_EL)
    h = np.diag(omega * (np.arange(nkeep) + 0.5)) - F_EJ * (cos_phi * np.cos(pe) + sin_phi * np.sin(pe))
    n = 1j * (a.T - a)[:nkeep, :nkeep] / (np.sqrt(2.0) * phi0)
    return h, n


def solve(sizes):
    nmax, nkeep, nbig = sizes
    ht, nt = transmon_ops(nmax)
    hf, nf = fluxonium_ops(nkeep, nbig)
    h = (np.kron(ht, np.eye(nkeep)) + np.kron(np.eye(ht.shape[0]), hf)
         + COUPLING * np.kron(nt, nf))
    assert np.allclose(h, h.conj().T, atol=1e-12, rtol=0) and np.abs(h.imag).max() > 0
    e = scipy.linalg.eigh(h, eigvals_only=True, subset_by_index=[0, NLEV - 1])
    bare_t = scipy.linalg.eigvalsh(ht)[:NBARE]
    bare_f = scipy.linalg.eigvalsh(hf)[:NBARE]
    return e, bare_t, bare_f


def main():
    e, bare_t, bare_f = solve(SIZES)
    e2, bare_t2, _ = solve(SIZES_CHECK)
    assert np.max(np.abs(e - e2)) < 1e-8, np.abs(e - e2)
    assert np.max(np.abs(bare_t - bare_t2)) < 1e-10
    grid = fluxonium_levels(F_EC, F_EJ, F_EL, F_FLUX, nlev=NBARE)
    assert np.max(np.abs(bare_f - grid)) < 1e-8, np.abs(bare_f - grid)

    common = ("# transmon: E_C=0.25, E_J=12.0, n_g=0.25, charge basis |n|<=20\n"
              "# fluxonium: E_C=1.0, E_J=4.0, E_L=1.0, Phi=0.3 Phi0, 60 LC-oscillator states"
              " (cos/sin phi via scipy.linalg.cosm/sinm in 200 states, truncated)\n")
    with open(os.path.join(DATA, "transmon_fluxonium_product.csv"), "w") as f:
        f.write("# transmon_fluxonium_product.py  " + VERSIONS + "\n" + common +
                "# H = H_T x 1 + 1 x H_F + c n_T x n_F, c=0.08 GHz, n_T = n - n_g, n_F = -i d/dphi\n"
                "# full product basis built directly (transmon-major); COMPLEX HERMITIAN"
                " (n_F imaginary in the oscillator basis); scipy.linalg.eigh, lowest 12\n"
                "# energies E/h in GHz, absolute; agree with (|n|<=25, 80 of 300 states) to 1e-8 GHz\n"
                "level,energy_ghz\n")
        for k, v in enumerate(e):
            f.write(f"{k},{v:.12e}\n")
    with open(os.path.join(DATA, "transmon_fluxonium_bare.csv"), "w") as f:
        f.write("# transmon_fluxonium_product.py  " + VERSIONS + "\n" + common +
                "# bare levels of each element alone (no coupling), E/h in GHz, absolute\n"
                "# fluxonium bare levels agree with the sinc-DVR phase grid (fluxonium_grid.py) to 1e-8 GHz\n"
                "element,level,energy_ghz\n")
        for name, levels in (("transmon", bare_t), ("fluxonium", bare_f)):
            for k, v in enumerate(levels):
                f.write(f"{name},{k},{v:.12e}\n")
    print("wrote transmon_fluxonium_product.csv and transmon_fluxonium_bare.csv;", VERSIONS)


if __name__ == "__main__":
    main()
