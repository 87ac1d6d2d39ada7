#!/usr/bin/python3
"""Independent reference for the coupler flux where ZZ(qa, qb) = 0 (SciPy 1.10.1, NumPy 1.24.2).

Reads the JSON written by `leveldesign describe --json` for a device and rebuilds the composite Hamiltonian
with its own numpy code (no LevelDesign code): charge-basis transmons, Fock resonators, products of the
elements' lowest bare levels pruned by total excitations, couplers c*(opA x opB) (+h.c. when not Hermitian)
or, for the exchange form, c*(a_A^dag a_B + a_A a_B^dag). Labels: the bare product state of largest overlap.
ZZ = E11 - E10 - E01 + E00. Every sign change of ZZ on a scan is refined with scipy.optimize.brentq.

describe-JSON shape read here (checked against `leveldesign describe devices/pair.toml --json`):
  {"elements": [{"id": "qa", "kind": "tunable_transmon", "parameters": {"ec":..,"ej_sum":..,"asymmetry":..,"flux":..,"ng":..}}, ...],
   "couplers": [{"id": "qa_qc", "elements": ["qa", "qc"], "operators": ["n", "n"], "form": "full"|"exchange",
                 "coefficient_ghz": .., "given_as": {"g_ghz": ..} | {"coefficient_ghz": ..} | {"capacitance_f": ..},
                 "adds_conjugate": bool}, ...],
   "truncation": {"levels": {"qa": 5, ...}, "max_excitations": 6, "max_bare_energy_ghz": null}}
A coupler given as "g_ghz" is converted here as c = g / |<0|opA|1><0|opB|1>| with this script's own bare matrix
elements at each flux (so c follows the coupler flux); every describe in the input file is used to check that
conversion against the coefficient_ghz LevelDesign reports at that bias (relative 1e-6).
A pair_describe.json file (tests/reference/make_pair_describe.sh) wraps several describes:
  {"bias": {"name", "target", "period", "offset"}, "describes": [{"control_a": .., "describe": {...}}, ...]}

usage: zz_zero_pair.py pair_describe.json COUPLER_ID QA QB [flux_lo flux_hi points]   (writes data/zz_zero_pair.csv)
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


def coefficient(c, oa, ob):
    """The coefficient of c*(opA x opB): a given g is converted through this script's bare matrix elements, taken
    at the reference point (oa, ob are the operators there), so the coefficient is fixed hardware along a sweep."""
    given = c.get("given_as", {})
    if "g_ghz" in given:
        return given["g_ghz"] / abs(oa[0, 1] * ob[0, 1])
    if "coefficient_ghz" in given:
        return given["coefficient_ghz"]
    raise SystemExit(f"coupler '{c['id']}': given as {given}; not handled by this reference script")


def check_conversions(dev, reference):
    """Every g-given coupler's coefficient, converted here at the reference point, must equal the one LevelDesign
    reports at this bias (relative 1e-6): the coefficient is fixed hardware."""
    lv = dev["truncation"]["levels"]
    bare = {e["id"]: element(e, lv[e["id"]]) for e in reference["elements"]}
    worst = 0.0
    for c in dev["couplers"]:
        a, b = c["elements"]
        mine = coefficient(c, bare[a][1][c["operators"][0]], bare[b][1][c["operators"][1]])
        rel = abs(mine - c["coefficient_ghz"]) / abs(c["coefficient_ghz"])
        assert rel < 1e-6, f"coupler {c['id']}: coefficient {mine} here, {c['coefficient_ghz']} in describe"
        worst = max(worst, rel)
    return worst


def spectrum(dev, reference=None):
    """Dressed energies of dev; couplers given as g are converted with the bare operators of `reference`
    (the device at its reference point; default dev itself)."""
    t = dev["truncation"]
    if t.get("max_bare_energy_ghz") is not None:
        raise SystemExit("a bare-energy window is not handled by this reference script")
    ids = [e["id"] for e in dev["elements"]]
    lv = [t["levels"][i] for i in ids]
    bare = [element(e, l) for e, l in zip(dev["elements"], lv)]
    ref_bare = bare if reference is None else [element(e, l) for e, l in zip(reference["elements"], lv)]
    mx = t.get("max_excitations")
    states = [s for s in itertools.product(*[range(l) for l in lv]) if mx is None or sum(s) <= mx]
    index = {s: i for i, s in enumerate(states)}
    dim = len(states)
    h = np.zeros((dim, dim), dtype=complex)
    for i, s in enumerate(states):
        h[i, i] = sum(b[0][l] - b[0][0] for b, l in zip(bare, s))
    for c in dev["couplers"]:
        ia, ib = ids.index(c["elements"][0]), ids.index(c["elements"][1])
        oa, ob = bare[ia][1][c["operators"][0]], bare[ib][1][c["operators"][1]]
        coef = coefficient(c, ref_bare[ia][1][c["operators"][0]], ref_bare[ib][1][c["operators"][1]])
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


def zz(dev, qa, qb, reference=None):
    e, w, states, ids = spectrum(dev, reference)

    def energy(levels):
        s = tuple(levels.get(i, 0) for i in ids)
        return e[np.argmax(w[states.index(s), :])]  # the dressed state with most of this bare state
    return energy({qa: 1, qb: 1}) - energy({qa: 1}) - energy({qb: 1}) + energy({})


def zz_at(dev, coupler, qa, qb, flux):
    d = json.loads(json.dumps(dev))
    next(x for x in d["elements"] if x["id"] == coupler)["parameters"]["flux"] = flux
    return zz(d, qa, qb, reference=dev)  # dev is at the reference point: g converted there, once


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
            {"id": "g1", "elements": ["qa", "c"], "operators": ["n", "n"], "form": "full", "given_as": {"coefficient_ghz": 0.06}},
            {"id": "g2", "elements": ["qb", "c"], "operators": ["n", "n"], "form": "full", "given_as": {"coefficient_ghz": 0.06}},
            {"id": "g3", "elements": ["qa", "qb"], "operators": ["n", "n"], "form": "full", "given_as": {"coefficient_ghz": 0.004}}],
        "truncation": {"levels": {"qa": 4, "c": 4, "qb": 4}, "max_excitations": 3}}
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


def pair_reference(path, coupler, qa, qb, lo, hi, points):
    import os
    import scipy
    with open(path) as f:
        wrapped = json.load(f)
    bias = wrapped["bias"]
    reference = wrapped["describes"][0]["describe"]  # the file's own bias value: the reference point
    worst = max(check_conversions(d["describe"], reference) for d in wrapped["describes"])
    for d in wrapped["describes"]:  # the bias mapping of the file is the one LevelDesign applied
        flux = next(e for e in d["describe"]["elements"] if e["id"] == coupler)["parameters"]["flux"]
        assert abs(flux - (d["control_a"] - bias["offset"]) / bias["period"]) < 1e-12
    dev = wrapped["describes"][0]["describe"]
    found = roots(dev, coupler, qa, qb, lo, hi, points)
    out = os.path.join(os.path.dirname(os.path.abspath(__file__)), "data", "zz_zero_pair.csv")
    with open(out, "w") as f:
        f.write(f"# zz_zero_pair.py data/pair_describe.json {coupler} {qa} {qb} {lo} {hi} {points}  SciPy {scipy.__version__}, NumPy {np.__version__}\n")
        f.write(f"# model: describe --json of devices/pair.toml (truncation as there: levels {dev['truncation']['levels']}, max_excitations {dev['truncation']['max_excitations']}); |n| <= {N_CHARGE}\n")
        f.write(f"# g-given couplers converted once at the reference point (the file's bias values) and held fixed; checked against LevelDesign's coefficients at {len(wrapped['describes'])} biases (worst relative difference {worst:.1e})\n")
        f.write(f"# ZZ = E11 - E10 - E01 + E00 (largest-overlap labels); roots of ZZ({coupler}.flux) on [{lo}, {hi}] Phi0 by brentq; control = flux*period + offset (A)\n")
        f.write("root,flux_phi0,control_a\n")
        for i, x in enumerate(found):
            f.write(f"{i},{x:.13f},{x * bias['period'] + bias['offset']:.15e}\n")
    for x in found:
        print(f"{x:.12f} Phi0  {x * bias['period'] + bias['offset']:.12e} A")


if __name__ == "__main__":
    if sys.argv[1:] == ["--self-test"]:
        self_test()
        sys.exit(0)
    path, coupler, qa, qb = sys.argv[1:5]
    lo, hi, pts = (float(sys.argv[5]), float(sys.argv[6]), int(sys.argv[7])) if len(sys.argv) > 7 else (0.0, 0.375, 76)
    pair_reference(path, coupler, qa, qb, lo, hi, pts)
