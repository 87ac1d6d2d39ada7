#!/usr/bin/python3
"""SciPy side-by-side for a module's single point (SciPy 1.10.1, NumPy 1.24.2): the lowest eigenpairs of the same
composite matrix by scipy.sparse.linalg.eigsh (ARPACK, which='SA'), timed, and checked against LevelDesign's.

Inputs, written from the repository root by the benchmark (Release) and the tool:
    dotnet run -c Release --project src/LevelDesign.Bench -- --write-matrix devices/line4.toml /tmp/line4 83
        -> /tmp/line4.mtx (Matrix Market, lower triangle, GHz) and /tmp/line4.levels (LevelDesign's lowest 83, absolute GHz)
    leveldesign spectrum devices/line4.toml --json > /tmp/line4_spectrum.json     (optional: the whole command's levels)

usage: eigsh_side_by_side.py /tmp/line4.mtx /tmp/line4.levels [/tmp/line4_spectrum.json] [k]

Prints eigsh's time (median of 5, matrix already in memory), the largest |E(eigsh) - E(LevelDesign)| over the
lowest k levels (absolute, from --write-matrix) and over the levels the spectrum command printed (relative to the
ground), and eigsh's largest residual |Hx - Ex|. Asserts agreement within 1e-9 GHz.
"""
import json
import sys
import time

import numpy as np
import scipy
import scipy.io
import scipy.sparse.linalg


def main():
    start = time.perf_counter()
    matrix_path, levels_path = sys.argv[1], sys.argv[2]
    spectrum_path = sys.argv[3] if len(sys.argv) > 3 and sys.argv[3].endswith(".json") else None
    k = int(sys.argv[-1]) if sys.argv[-1].isdigit() else 83

    h = scipy.io.mmread(matrix_path).tocsr()   # symmetric / hermitian files are expanded to both triangles
    loaded = time.perf_counter()
    times = []
    for _ in range(5):
        t0 = time.perf_counter()
        values, vectors = scipy.sparse.linalg.eigsh(h, k=k, which="SA")
        times.append(time.perf_counter() - t0)
    order = np.argsort(values)
    values, vectors = values[order], vectors[:, order]
    residual = max(np.linalg.norm(h @ vectors[:, i] - values[i] * vectors[:, i]) for i in range(k))

    ours = np.loadtxt(levels_path)
    n = min(k, len(ours))
    worst_absolute = np.max(np.abs(values[:n] - ours[:n]))
    print(f"SciPy {scipy.__version__}, NumPy {np.__version__}; {h.shape[0]:,} states, {h.nnz:,} non-zeros (both triangles)")
    print(f"eigsh lowest {k} (which='SA'): median {sorted(times)[2]:.3f} s, fastest {min(times):.3f} s (runs: "
          + ", ".join(f"{t:.3f}" for t in times) + f"); reading the matrix {loaded - start:.3f} s")
    print(f"eigsh largest residual |Hx - Ex|: {residual:.1e} GHz")
    print(f"largest |E(eigsh) - E(LevelDesign in-process)| over the lowest {n}: {worst_absolute:.1e} GHz")
    assert worst_absolute <= 1e-9, "LevelDesign's in-process levels disagree with eigsh"

    if spectrum_path:
        with open(spectrum_path) as f:
            report = json.load(f)
        relative = np.array([s["energy_ghz"] for s in report["states"]])
        m = min(len(relative), k)
        worst_relative = np.max(np.abs((values[:m] - values[0]) - relative[:m]))
        print(f"largest |E(eigsh) - E(spectrum command)| over the {m} printed states (relative to the ground): {worst_relative:.1e} GHz")
        assert worst_relative <= 1e-9, "the spectrum command's levels disagree with eigsh"


if __name__ == "__main__":
    main()
