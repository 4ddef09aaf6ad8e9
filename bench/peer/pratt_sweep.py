#!/usr/bin/python3
"""The benchmark study, scripted by hand in plain NumPy: the peer Panelpoint is measured against.

For each variant of a flat-Pratt study (bench/studies/sweep-bench.json by default) it builds the
joints and members in Python loops, assembles the equilibrium matrix, takes numpy.linalg.matrix_rank
(mechanisms k = 2j - rank, self-stress s = m + r - rank), and for a stable variant assembles the
stiffness matrix, applies the supports, solves the three combinations with numpy.linalg.solve and
keeps the peaks. Units: m, kN, kN/m2. Tension positive.

Geometry, numbering-free topology, supports and tributary loads follow the 'pratt' family
(shared/families/flat-pratt.ts, flat-common.ts, builder.ts, loads.ts); the section is
shared/families/to-model.ts DEFAULT_SECTION. bench/sweep.bench.ts checks the agreement.

  /usr/bin/python3 bench/peer/pratt_sweep.py [--study FILE] [--limit N] [--stride S] --out FILE.csv

Variants are taken in Panelpoint's index order (the dimensions of `vary` in file order, the last
changing fastest): indices 0, S, 2S, ... , at most N of them. The last line printed is JSON.
"""
import argparse
import json
import math
import sys
import time

import numpy as np

A_M2 = 0.005   # member area, m2 (DEFAULT_SECTION)
E_KPA = 2.0e8  # Young's modulus, kN/m2
SHOW = 5       # variants whose peaks are printed


def range_values(r):
    """Values of a `vary` range: `count` values with both ends exact, rounded to 15 digits."""
    a, b, n = r["from"], r["to"], r["count"] - 1
    return [a if n == 0 else b if k == n else float("%.15g" % (a + (b - a) * k / n)) for k in range(n + 1)]


def dimensions(study):
    dims = []
    for name, v in study["vary"].items():
        if isinstance(v, list):
            dims.append((name, v))
        elif "count" in v:
            dims.append((name, range_values(v)))
        else:
            sys.exit("pratt_sweep.py: only lists and {from, to, count} ranges are supported")
    return dims


def variant_at(dims, base, index):
    p = dict(base)
    rest = index
    for name, values in reversed(dims):
        rest, digit = divmod(rest, len(values))
        p[name] = values[digit]
    return p


def build_truss(span, depth, n, supports):
    """Joints, members and supports of a flat Pratt truss with n panels."""
    joints = {}
    for i in range(n + 1):
        x = (i / n) * span
        joints["B%d" % i] = (x, 0.0)
        joints["T%d" % i] = (x, depth)
    members = []
    for i in range(1, n + 1):
        members.append(("T%d" % (i - 1), "T%d" % i))
    for i in range(1, n + 1):
        members.append(("B%d" % (i - 1), "B%d" % i))
    for i in range(n + 1):
        members.append(("B%d" % i, "T%d" % i))
    for i in range(n):  # diagonals slope down toward midspan
        members.append(("T%d" % i, "B%d" % (i + 1)) if i < n / 2 else ("B%d" % i, "T%d" % (i + 1)))
    left, right = supports.split("-")
    return joints, members, {"B0": left, "B%d" % n: right}


def joint_loads(study, joints, n, index_of):
    """Loads per case on the top chord by plan tributary length, kN: {case: vector of 2j}."""
    out = {}
    for load in study["loads"]:
        if load["kind"] != "area" or load["chord"] != "top" or load.get("projection", "plan") != "plan":
            sys.exit("pratt_sweep.py: only plan area loads on the top chord are supported")
        f = out.setdefault(load["case"], np.zeros(2 * len(joints)))
        w = load["value"] * load["spacing"]
        for i in range(1, n + 1):
            a, b = "T%d" % (i - 1), "T%d" % i
            half = w * abs(joints[b][0] - joints[a][0]) / 2
            f[2 * index_of[a] + 1] -= half
            f[2 * index_of[b] + 1] -= half
    return out


def analyse(study, p):
    span, depth, n, supports = p["span"], p["depth"], p["panels"], p["supports"]
    joints, members, sup = build_truss(span, depth, n, supports)
    names = list(joints)
    index_of = {name: i for i, name in enumerate(names)}
    nj, nm = len(names), len(members)
    geo = []
    for a, b in members:
        (xa, ya), (xb, yb) = joints[a], joints[b]
        L = math.sqrt((xb - xa) ** 2 + (yb - ya) ** 2)
        geo.append((index_of[a], index_of[b], (xb - xa) / L, (yb - ya) / L, L))
    restrained = []  # one restrained dof per reaction component; rollers here react vertically
    for name, kind in sup.items():
        i = index_of[name]
        restrained += [2 * i, 2 * i + 1] if kind == "pin" else [2 * i + 1]
    nr = len(restrained)
    A = np.zeros((2 * nj, nm + nr))
    for e, (a, b, c, s, L) in enumerate(geo):
        A[2 * a, e], A[2 * a + 1, e] = c, s
        A[2 * b, e], A[2 * b + 1, e] = -c, -s
    for q, dof in enumerate(restrained):
        A[dof, nm + q] = 1.0
    rank = np.linalg.matrix_rank(A)
    k, s_ = 2 * nj - rank, nm + nr - rank
    row = {"joints": nj, "members": nm, "reactions": nr, "k": k, "s": s_}
    if k > 0:
        return dict(row, status="unstable")
    K = np.zeros((2 * nj, 2 * nj))
    for a, b, c, s, L in geo:
        ke = E_KPA * A_M2 / L * np.array([[c * c, c * s], [c * s, s * s]])
        for (i, j, sign) in ((a, a, 1), (b, b, 1), (a, b, -1), (b, a, -1)):
            K[2 * i:2 * i + 2, 2 * j:2 * j + 2] += sign * ke
    free = [d for d in range(2 * nj) if d not in restrained]
    cases = joint_loads(study, joints, n, index_of)
    F = np.zeros((2 * nj, len(study["combinations"])))
    for c, combo in enumerate(study["combinations"]):
        for case, factor in combo["factors"].items():
            F[:, c] += factor * cases[case]
    U = np.zeros_like(F)
    U[free, :] = np.linalg.solve(K[np.ix_(free, free)], F[free, :])
    t_max, c_min, u_max, v_max = 0.0, 0.0, 0.0, 0.0
    for c in range(F.shape[1]):
        for a, b, cs, sn, L in geo:
            N = E_KPA * A_M2 / L * (cs * (U[2 * b, c] - U[2 * a, c]) + sn * (U[2 * b + 1, c] - U[2 * a + 1, c]))
            t_max, c_min = max(t_max, N), min(c_min, N)
        for i in range(nj):
            u_max = max(u_max, math.hypot(U[2 * i, c], U[2 * i + 1, c]))
            v_max = max(v_max, abs(U[2 * i + 1, c]))
    status = "indeterminate" if s_ > 0 else "determinate"
    return dict(row, status=status, peakTension=t_max, peakCompression=c_min, maxDisplacement=u_max,
                spanOverDeflection=span / v_max if v_max > 0 else float("nan"))


def main():
    ap = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    ap.add_argument("--study", default="bench/studies/sweep-bench.json")
    ap.add_argument("--limit", type=int, default=None, help="variants to do (default: all)")
    ap.add_argument("--stride", type=int, default=1, help="take every S-th variant index (default 1)")
    ap.add_argument("--out", required=True, help="CSV file to write")
    args = ap.parse_args()
    with open(args.study) as fh:
        study = json.load(fh)
    if study["family"] != "pratt":
        sys.exit("pratt_sweep.py: the study must use the 'pratt' family")
    dims = dimensions(study)
    base = {"span": 24.0, "depth": 2.4, "panels": 8, "supports": "pin-roller", **study.get("fixed", {})}
    size = math.prod(len(v) for _, v in dims)
    indices = range(0, size, max(1, args.stride))
    if args.limit is not None:
        indices = indices[:args.limit]
    cols = ["index", "depth", "panels", "supports", "status", "joints", "members", "reactions", "k", "s",
            "peakTension_kN", "peakCompression_kN", "maxDisplacement_m", "spanOverDeflection"]
    t0 = time.perf_counter()
    with open(args.out, "w") as out:
        out.write(",".join(cols) + "\n")
        for j, index in enumerate(indices):
            p = variant_at(dims, base, index)
            r = analyse(study, p)
            figs = [repr(r[c]) if c in r else "" for c in ("peakTension", "peakCompression", "maxDisplacement", "spanOverDeflection")]
            out.write(",".join([str(index), repr(p["depth"]), str(p["panels"]), p["supports"], r["status"],
                                str(r["joints"]), str(r["members"]), str(r["reactions"]), str(r["k"]), str(r["s"])] + figs) + "\n")
            if j < SHOW:
                print("  variant %d: depth %.6f m, %d panels, %s: %s k=%d s=%d, peak tension %s kN, peak compression %s kN"
                      % (index, p["depth"], p["panels"], p["supports"], r["status"], r["k"], r["s"], figs[0] or "-", figs[1] or "-"))
    seconds = time.perf_counter() - t0
    rate = len(indices) / seconds
    print("numpy peer: %d variants in %.2f s = %.0f variants/s (numpy %s, one core)" % (len(indices), seconds, rate, np.__version__))
    print(json.dumps({"bench": "numpy-peer", "variants": len(indices), "seconds": round(seconds, 3),
                      "variantsPerSecond": round(rate, 1), "numpy": np.__version__}))


if __name__ == "__main__":
    main()
