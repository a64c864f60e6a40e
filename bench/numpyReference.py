#!/usr/bin/env python3
# Reference implementation in numpy/scipy of the project's straight-wire solve, for the timing
# comparison in bench/numpyCompare.ts. The same computation as generator/em/ (ported, not new):
# the Galerkin impedance matrix of the mixed-potential thin-wire equation with triangle basis
# functions and the reduced kernel (Harrington, Field Computation by Moment Methods, 1968, ch. 4;
# Gibson, The Method of Moments in Electromagnetics, 2nd ed., ch. 4), with
#   far pairs:  Gauss-Legendre in both variables, 4, 3 or 2 points as the centre distance passes
#               5 and 10 segment lengths (kernel.ts);
#   near pairs (centre distance under 2.1 segment lengths): (e^{-jkR} - 1)/R by 4 x 4 points,
#               1/R with the inner integral in closed form (asinh) and a 10-point outer rule,
#               averaged over both orders of the pair;
# Gauss-Legendre nodes from numpy (Abramowitz & Stegun 25.4.29); the mesh as mesh.ts builds it
# for a straight wire fed in the middle; the feed either a unit voltage on the feed basis
# function (what bench/solver.ts solves) or the finite gap of feedSource.ts with the mesh
# solveFeed uses (feed and ends graded). Then LU with partial pivoting and one solve
# (scipy.linalg.lu_factor / lu_solve, i.e. LAPACK zgetrf / zgetrs). Perfect conductor only.
# Vectorised over segment pairs with broadcasting; no Python loop over matrix entries.
#
# Input, one JSON object as argv[1] or on stdin:
#   {"frequencyHz", "lengthM", "radiusM", "segmentsPerWavelength", "repetitions", "feed": "delta"|"gap"}
# Output, JSON: unknowns, segments, inputImpedanceOhm {re, im}, fillS and luSolveS (medians of
# time.process_time() CPU seconds over the repetitions, after one warm-up run).
import os

# one BLAS thread, like the single-threaded solver it is compared with (and CPU time stays CPU time)
for _v in ("OPENBLAS_NUM_THREADS", "OMP_NUM_THREADS", "MKL_NUM_THREADS"):
    os.environ.setdefault(_v, "1")

import json
import math
import statistics
import sys
import time

import numpy as np
import scipy
import scipy.linalg as sla

C0 = 299_792_458.0
MU0 = 1.25663706212e-6
ETA0 = MU0 * C0
NEAR_RATIO = 2.1
RATIO_TIE = 1e-9
SLACK = 1e-3
MIN_SEGMENTS_PER_PIECE = 3
END_SEGMENT_RADII = 8
FEED_GAP_WL = 1 / 50


def gauss01(n):
    x, w = np.polynomial.legendre.leggauss(n)
    return 0.5 * (x + 1), 0.5 * w


FAR_RULES = {n: gauss01(n) for n in (2, 3, 4)}
NEAR_SMOOTH = gauss01(4)
NEAR_OUTER = gauss01(10)


def tensor_weights(t, w):
    """(n*n, 4) weights for K00, K10, K01, K11 over the tensor grid (i outer on p, j on q)."""
    ti, tj = np.meshgrid(t, t, indexing="ij")
    ww = np.outer(w, w)
    return np.stack([ww, ti * ww, tj * ww, ti * tj * ww], axis=-1).reshape(-1, 4)


FAR_WEIGHTS = {n: tensor_weights(*FAR_RULES[n]) for n in FAR_RULES}
SMOOTH_WEIGHTS = tensor_weights(*NEAR_SMOOTH)


# ---- mesh (mesh.ts, one straight wire of two pieces fed at the middle vertex) ----

def piece_segment_count(length, spw, lam):
    return max(MIN_SEGMENTS_PER_PIECE, math.ceil(length * spw / lam * (1 - SLACK)))


def halvings(segment, limit):
    m = 0
    while segment / 2**m > limit * (1 + SLACK) and m < 30:
        m += 1
    return m


def piece_breaks(n, start_h, end_h):
    def graded(m):
        return [1.0] if m == 0 else [2.0**-m] + [2.0 ** (j - m) for j in range(m)]
    units = []
    for k in range(n):
        if k == 0 and start_h > 0:
            units += graded(start_h)
        elif k == n - 1 and end_h > 0:
            units += graded(end_h)[::-1]
        else:
            units.append(1.0)
    breaks, acc = [], 0.0
    for u in units:
        acc += u
        breaks.append(acc / n)
    breaks[-1] = 1.0
    return breaks


def straight_wire_mesh(length, radius, spw, lam, feed_segment=math.inf, grade_ends=False):
    h = length / 2
    points = [(-h, 0.0, 0.0), (0.0, 0.0, 0.0), (h, 0.0, 0.0)]
    lens = [math.hypot(*(b[c] - a[c] for c in range(3))) for a, b in zip(points, points[1:])]
    counts = [piece_segment_count(L, spw, lam) for L in lens]
    feed_h = max(halvings(lens[0] / counts[0], feed_segment), halvings(lens[1] / counts[1], feed_segment)) if math.isfinite(feed_segment) else 0
    end_h = [halvings(lens[i] / counts[i], END_SEGMENT_RADII * radius) if grade_ends else 0 for i in range(2)]
    breaks = [piece_breaks(counts[0], end_h[0], feed_h), piece_breaks(counts[1], feed_h, end_h[1])]
    start, direction, seg_len = [], [], []
    for i, (a, b) in enumerate(zip(points, points[1:])):
        t0 = 0.0
        for t1 in breaks[i]:
            start.append([a[c] + (b[c] - a[c]) * t0 for c in range(3)])
            direction.append([(b[c] - a[c]) / lens[i] for c in range(3)])
            seg_len.append(lens[i] * (t1 - t0))
            t0 = t1
    ns = len(seg_len)
    basis_start = np.full(ns, -1, dtype=np.int64)
    basis_end = np.full(ns, -1, dtype=np.int64)
    basis_end[:-1] = np.arange(ns - 1)
    basis_start[1:] = np.arange(ns - 1)
    return {
        "start": np.array(start), "dir": np.array(direction), "len": np.array(seg_len),
        "radius": np.full(ns, radius), "basisStart": basis_start, "basisEnd": basis_end,
        "unknowns": ns - 1, "feedBasis": len(breaks[0]) - 1,
    }


# ---- excitation (feedSource.ts) ----

def delta_excitation(mesh):
    b = np.zeros(mesh["unknowns"])
    b[mesh["feedBasis"]] = 1.0
    return b


def gap_excitation(mesh, gap):
    seg_len = mesh["len"]
    arc = np.concatenate([[0.0], np.cumsum(seg_len)])
    feed_arc = arc[mesh["feedBasis"] + 1]  # end of the segment whose rising half is the feed basis
    lo, hi = feed_arc - gap / 2, feed_arc + gap / 2
    t1 = np.maximum(0.0, (lo - arc[:-1]) / seg_len)
    t2 = np.minimum(1.0, (hi - arc[:-1]) / seg_len)
    on = t2 > t1
    rising = np.where(on, seg_len * (t2 * t2 - t1 * t1) / 2, 0.0)
    falling = np.where(on, seg_len * (t2 - t1) - rising, 0.0)
    b = np.zeros(mesh["unknowns"])
    a, e = mesh["basisStart"], mesh["basisEnd"]
    np.add.at(b, a[a >= 0], falling[a >= 0] * (1 / gap))
    np.add.at(b, e[e >= 0], rising[e >= 0] * (1 / gap))
    return b


# ---- impedance matrix (kernel.ts, impedance.ts) ----

def tensor_integrals(P, Up, Q, Uq, a2, k, t, weights, subtract_static):
    """[K00, K10, K01, K11] (pairs, 4) over t, t' in [0, 1] of e^{-jkR}/R (or (e^{-jkR} - 1)/R), unscaled."""
    rp = P[:, None, :] + t[None, :, None] * Up[:, None, :]
    rq = Q[:, None, :] + t[None, :, None] * Uq[:, None, :]
    d = rp[:, :, None, :] - rq[:, None, :, :]
    r = np.sqrt(np.einsum("pijc,pijc->pij", d, d) + a2[:, None, None])
    kr = k * r
    if subtract_static:  # cos kR - 1 = -2 sin^2(kR/2), no cancellation
        g = (-2 * np.sin(0.5 * kr) ** 2 - 1j * np.sin(kr)) / r
    else:
        g = np.exp(-1j * kr) / r
    return g.reshape(len(P), -1) @ weights


def near_integrals(P, Up, Lp, Q, Uq, Lq, a2, k):
    """Near pairs in the order (p, q): smooth part by 4 x 4 points, 1/R closed-form inner over q."""
    K = tensor_integrals(P, Up, Q, Uq, a2, k, NEAR_SMOOTH[0], SMOOTH_WEIGHTS, True)
    t, w = NEAR_OUTER
    e = Uq / Lq[:, None]
    d = P[:, None, :] + t[None, :, None] * Up[:, None, :] - Q[:, None, :]
    s0 = np.einsum("pic,pc->pi", d, e)
    rho2 = np.sum(np.cross(d, e[:, None, :]) ** 2, axis=-1) + a2[:, None]
    rho = np.sqrt(rho2)
    L = Lq[:, None]
    f0 = np.arcsinh((L - s0) / rho) + np.arcsinh(s0 / rho)
    f1 = np.sqrt((L - s0) ** 2 + rho2) - np.sqrt(s0 * s0 + rho2) + s0 * f0
    g0, g1 = f0 / L, f1 / (L * L)
    K = K + np.stack([g0 @ w, g0 @ (t * w), g1 @ w, g1 @ (t * w)], axis=-1)
    return K * (Lp * Lq)[:, None]


def fill_impedance(mesh, k):
    start, direction, seg_len, radius = mesh["start"], mesh["dir"], mesh["len"], mesh["radius"]
    bs, be, n = mesh["basisStart"], mesh["basisEnd"], mesh["unknowns"]
    carries = (bs >= 0) | (be >= 0)
    p, q = np.triu_indices(len(seg_len))
    keep = carries[p] & carries[q]
    p, q = p[keep], q[keep]
    u = direction * seg_len[:, None]
    centre = start + 0.5 * u
    ratio = np.linalg.norm(centre[p] - centre[q], axis=1) / np.maximum(seg_len[p], seg_len[q])
    a2 = radius[p] * radius[q]
    lp, lq = seg_len[p], seg_len[q]
    K = np.empty((len(p), 4), dtype=complex)
    near = ratio < NEAR_RATIO
    i = np.flatnonzero(near)
    pi, qi = p[i], q[i]
    kpq = near_integrals(start[pi], u[pi], lp[i], start[qi], u[qi], lq[i], a2[i], k)
    kqp = near_integrals(start[qi], u[qi], lq[i], start[pi], u[pi], lp[i], a2[i], k)
    K[i] = 0.5 * (kpq + kqp[:, [0, 2, 1, 3]])  # K10(q, p) = K01(p, q)
    points = np.where(ratio < 5 + RATIO_TIE, 4, np.where(ratio < 10 + RATIO_TIE, 3, 2))
    for m in (4, 3, 2):
        i = np.flatnonzero(~near & (points == m))
        if len(i):
            pi, qi = p[i], q[i]
            K[i] = tensor_integrals(start[pi], u[pi], start[qi], u[qi], a2[i], k, FAR_RULES[m][0], FAR_WEIGHTS[m], False) * (lp[i] * lq[i])[:, None]
    # basis halves: (falling, falling), (falling, rising), (rising, falling), (rising, rising)
    k00, k10, k01, k11 = K.T
    v = np.stack([k00 - k10 - k01 + k11, k01 - k11, k10 - k11, k11], axis=1)
    sign = np.array([1.0, -1.0, -1.0, 1.0])
    dot = np.einsum("pc,pc->p", direction[p], direction[q])
    c = ETA0 / (4 * math.pi)
    val = 1j * c * (k * dot[:, None] * v - sign[None, :] * k00[:, None] / (k * (lp * lq)[:, None]))
    rows = np.stack([bs[p], bs[p], be[p], be[p]], axis=1)
    cols = np.stack([bs[q], be[q], bs[q], be[q]], axis=1)
    ok = (rows >= 0) & (cols >= 0)
    off = ok & (p != q)[:, None]  # a pair of different segments also adds its transpose
    idx = np.concatenate([rows[ok] * n + cols[ok], cols[off] * n + rows[off]])
    vals = np.concatenate([val[ok], val[off]])
    z = np.bincount(idx, vals.real, n * n) + 1j * np.bincount(idx, vals.imag, n * n)
    return z.reshape(n, n)


def solve(z, b):
    lu = sla.lu_factor(z, overwrite_a=True, check_finite=False)
    return sla.lu_solve(lu, b, check_finite=False)


def run(case):
    f = float(case["frequencyHz"])
    lam = C0 / f
    k = 2 * math.pi * f / C0
    radius = float(case["radiusM"])
    feed = case.get("feed", "delta")
    if feed == "delta":
        mesh = straight_wire_mesh(float(case["lengthM"]), radius, float(case["segmentsPerWavelength"]), lam)
        b = delta_excitation(mesh)
    elif feed == "gap":
        gap = float(case.get("gapM", FEED_GAP_WL * lam))
        mesh = straight_wire_mesh(float(case["lengthM"]), radius, float(case["segmentsPerWavelength"]), lam, max(gap / 4, 8 * radius), True)
        b = gap_excitation(mesh, gap)
    else:
        raise ValueError(f'feed must be "delta" or "gap", got {feed!r}')
    reps = int(case.get("repetitions", 100))
    x = solve(fill_impedance(mesh, k), b)  # warm-up
    fill_s, lu_s = [], []
    for _ in range(reps):
        t0 = time.process_time()
        z = fill_impedance(mesh, k)
        t1 = time.process_time()
        x = solve(z, b)
        t2 = time.process_time()
        fill_s.append(t1 - t0)
        lu_s.append(t2 - t1)
    current = b @ x  # gap-averaged current for V0 = 1 V (the feed current for the delta gap)
    zin = 1 / current
    return {
        "unknowns": mesh["unknowns"],
        "segments": len(mesh["len"]),
        "feed": feed,
        "inputImpedanceOhm": {"re": zin.real, "im": zin.imag},
        "fillS": statistics.median(fill_s),
        "luSolveS": statistics.median(lu_s),
        "repetitions": reps,
        "python": sys.version.split()[0],
        "numpy": np.__version__,
        "scipy": scipy.__version__,
    }


if __name__ == "__main__":
    text = sys.argv[1] if len(sys.argv) > 1 else sys.stdin.read()
    print(json.dumps(run(json.loads(text))))
