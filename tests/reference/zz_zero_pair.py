#!/usr/bin/python3
"""Independent reference for the coupler flux where ZZ(qa, qb) = 0 (SciPy 1.10.1, NumPy 1.24.2).

Reads the JSON written by `leveldesign describe --json` for a device and rebuilds the composite Hamiltonian
with its own numpy code (no LevelDesign code): charge-basis transmons, Fock resonators, products of the
elements' lowest bare levels pruned by total excitations, couplers c*(opA x opB) (+h.c. when not Hermitian)
or, for the exchange form, c*(a_A^dag a_B + a_A a_B^dag). Labels: the bare product state of largest overlap.
ZZ = E11 - E10 - E01 + E00. Every sign change of ZZ on a scan is refined with scipy.optimize.brentq.

Assumed describe-JSON shape (to be checked against the files work when devices/pair.toml lands):
  {"elements": [{"id": "qa", "kind": "tunable_transmon", "parameters": {"ec":..,"ej_sum":..,"asymmetry":..,"flux":..,"ng":..}}, ...],
   "couplers": [{"id": "g", "element_a": "qa", "operator_a": "n", "element_b": "c", "operator_b": "n",
                 "form": "full"|"exchange", "coefficient_ghz": ..  (or "g_ghz": ..)}, ...],
   "truncation": {"levels": {"qa": 4, ...}, "default_levels": 4, "max_excitations": 3}}
A "g_ghz" coupler is converted as c = g / |<0|opA|1><0|opB|1>| with the bare matrix elements at each flux.

usage: zz_zero_pair.py describe.json COUPLER_ID QA QB [flux_lo flux_hi points]
       zz_zero_pair.py --self-test
"""
import itertools
import json
import sys

import numpy as np
from scipy.linalg import eigh
from scipy.optimize import brentq

N_CHARGE = 30  # |n| <= 30: far beyond convergence for E_J/E_C <= 300 at these level counts


def charge_element(ec, ej, ng, levels):
    n = np.arange(-N_CHARGE, N_CHARGE + 1) - ng
    hop = np.eye(len(n), k=1) + np.eye(len(n), k=-1)
    e, v = eigh(np.diag(4 * ec * n**2) - ej / 2 * hop)
    v = v[:, :levels]
    v = v * np.sign(v[np.argmax(np.abs(v), axis=0), range(levels)])
    ops = {"n": v.T @ np.diag(n) @ v, "cos_phi": v.T @ (0.5 * hop) @ v,
           "a": np.diag(np.sqrt(np.arange(1, levels)), k=1)}  # ladder on the element's own levels
    return e[:levels], ops


def element(spec, levels):
    p, kind = spec["parameters"], spec["kind"]
    if kind == "transmon":
        return charge_element(p["ec"], p["ej"], p.get("ng", 0), levels)
    if kind == "tunable_transmon":
        f = np.pi * p["flux"]
        ej = p["ej_sum"] * np.sqrt(np.cos(f) ** 2 + p["asymmetry"] ** 2 * np.sin(f) ** 2)
        return charge_element(p["ec"], ej, p.get("ng", 0), levels)
    if kind in ("resonator", "kerr"):
        k = np.arange(levels)
        e = p["frequency"] * k + p.get("anharmonicity", 0) / 2 * k * (k - 1)
        a = np.diag(np.sqrt(np.arange(1, levels)), k=1)
        nz = np.sqrt(p["frequency"] / (16 * p["ec"])) if p.get("ec") else 1 / np.sqrt(2)
        pz = 1 / (2 * nz) if p.get("ec") else 1 / np.sqrt(2)
        return e, {"a": a, "n": 1j * nz * (a.T - a), "phi": pz * (a.T + a)}
    raise SystemExit(f"element '{spec['id']}': kind '{kind}' not handled by this reference script")


def spectrum(dev):
    t = dev["truncation"]
    ids = [e["id"] for e in dev["elements"]]
    lv = [t.get("levels", {}).get(i, t.get("default_levels", 4)) for i in ids]
    bare = [element(e, l) for e, l in zip(dev["elements"], lv)]
    mx = t.get("max_excitations")
    states = [s for s in itertools.product(*[range(l) for l in lv]) if mx is None or sum(s) <= mx]
    index = {s: i for i, s in enumerate(states)}
    dim = len(states)
    h = np.zeros((dim, dim), dtype=complex)
    for i, s in enumerate(states):
        h[i, i] = sum(b[0][l] - b[0][0] for b, l in zip(bare, s))
    for c in dev["couplers"]:
        ia, ib = ids.index(c["element_a"]), ids.index(c["element_b"])
        oa, ob = bare[ia][1][c["operator_a"]], bare[ib][1][c["operator_b"]]
        coef = c.get("coefficient_ghz")
        if coef is None:
            coef = c["g_ghz"] / abs(oa[0, 1] * ob[0, 1])
        exchange = c.get("form") == "exchange"
        x = oa.conj().T if exchange else oa
        term = np.zeros((dim, dim), dtype=complex)
        for i, s in enumerate(states):
            for ka in range(lv[ia]):
                for kb in range(lv[ib]):
                    val = x[ka, s[ia]] * ob[kb, s[ib]]
                    tgt = list(s)
                    tgt[ia], tgt[ib] = ka, kb
                    j = index.get(tuple(tgt))
                    if val != 0 and j is not None:
                        term[j, i] += coef * val
        hermitian_ops = np.allclose(oa, oa.conj().T) and np.allclose(ob, ob.conj().T)
        h += term + term.conj().T if (exchange or not hermitian_ops) else term
    e, v = eigh(h)
    return e - e[0], np.abs(v) ** 2, states, ids


def zz(dev, qa, qb):
    e, w, states, ids = spectrum(dev)

    def energy(levels):
        s = tuple(levels.get(i, 0) for i in ids)
        return e[np.argmax(w[states.index(s), :])]  # the dressed state with most of this bare state
    return energy({qa: 1, qb: 1}) - energy({qa: 1}) - energy({qb: 1}) + energy({})


def zz_at(dev, coupler, qa, qb, flux):
    d = json.loads(json.dumps(dev))
    next(x for x in d["elements"] if x["id"] == coupler)["parameters"]["flux"] = flux
    return zz(d, qa, qb)


def roots(dev, coupler, qa, qb, lo, hi, points):
    xs = np.linspace(lo, hi, points)
    ys = [zz_at(dev, coupler, qa, qb, x) for x in xs]
    found = []
    for i in range(points - 1):
        if np.sign(ys[i]) != np.sign(ys[i + 1]):
            r = brentq(lambda f: zz_at(dev, coupler, qa, qb, f), xs[i], xs[i + 1], xtol=1e-13)
            if abs(zz_at(dev, coupler, qa, qb, r)) < 1e-7:  # a label jump is a sign change but not a root
                found.append(r)
    return found


def self_test():
    dev = {"elements": [
        {"id": "qa", "kind": "transmon", "parameters": {"ec": 0.2, "ej": 16.0}},
        {"id": "c", "kind": "tunable_transmon", "parameters": {"ec": 0.18, "ej_sum": 45.0, "asymmetry": 0.0, "flux": 0.0}},
        {"id": "qb", "kind": "transmon", "parameters": {"ec": 0.21, "ej": 15.0}}],
        "couplers": [
            {"id": "g1", "element_a": "qa", "operator_a": "n", "element_b": "c", "operator_b": "n", "form": "full", "coefficient_ghz": 0.06},
            {"id": "g2", "element_a": "qb", "operator_a": "n", "element_b": "c", "operator_b": "n", "form": "full", "coefficient_ghz": 0.06},
            {"id": "g3", "element_a": "qa", "operator_a": "n", "element_b": "qb", "operator_b": "n", "form": "full", "coefficient_ghz": 0.004}],
        "truncation": {"default_levels": 4, "max_excitations": 3}}
    r = roots(dev, "c", "qa", "qb", 0.0, 0.45, 31)
    print("self-test ZZ-zero coupler fluxes:", r)
    assert r, "the self-test device should have a ZZ zero in range"
    import os
    import scipy
    out = os.path.join(os.path.dirname(os.path.abspath(__file__)), "data", "zz_zero_selftest.csv")
    with open(out, "w") as f:
        f.write(f"# zz_zero_pair.py --self-test  SciPy {scipy.__version__}, NumPy {np.__version__}\n")
        f.write("# qa transmon (ec 0.2, ej 16), c tunable_transmon (ec 0.18, ej_sum 45, d 0), qb transmon (ec 0.21, ej 15)\n")
        f.write("# couplers n.n full: qa-c 0.06, qb-c 0.06, qa-qb 0.004 GHz; 4 levels each, max 3 excitations; |n| <= 30\n")
        f.write("# ZZ = E11 - E10 - E01 + E00 (largest-overlap labels); roots of ZZ(c.flux) on [0, 0.45] by brentq\n")
        f.write("root,flux_phi0\n")
        for i, x in enumerate(r):
            f.write(f"{i},{x:.13f}\n")


if __name__ == "__main__":
    if sys.argv[1:] == ["--self-test"]:
        self_test()
        sys.exit(0)
    path, coupler, qa, qb = sys.argv[1:5]
    lo, hi, pts = (float(sys.argv[5]), float(sys.argv[6]), int(sys.argv[7])) if len(sys.argv) > 7 else (0.0, 0.5, 51)
    with open(path) as f:
        device = json.load(f)
    for x in roots(device, coupler, qa, qb, lo, hi, pts):
        print(f"{x:.12f}")
