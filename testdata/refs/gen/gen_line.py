#!/usr/bin/python3
"""Reference tables for lines of pipe segments and for PCHIP interpolation.

line.tsv, line_system.tsv (python3-mpmath, mp.dps = 40):
  Each segment of a series line carries the same flow Q.  Per segment,
  V = Q/(pi D^2/4), Re = rho V D/mu, the Darcy factor f = 64/Re when
  Re < 2300 and, when Re > 4000, the Colebrook-White equation
      1/sqrt(f) = -2 log10( (eps/D)/3.7 + 2.51/(Re sqrt(f)) )
  solved exactly through its Lambert-W closed form; the cases avoid the
  transitional band.  Major loss f (L/D) V^2/(2g), minor loss K V^2/(2g),
  and at a change of diameter from d1 to d2 the Borda-Carnot sudden
  expansion (1 - (d1/d2)^2)^2 V1^2/(2g) or the sudden contraction
  0.5 (1 - (d2/d1)^2) V2^2/(2g), charged to the downstream segment.
  g = 9.80665 m/s^2.  line_system.tsv adds the static lift and the
  velocity head at the outlet (alpha = 1 turbulent, 2 laminar) to give
  the system head  H = z2 - z1 + (p2 - p1)/(rho g) + alpha V2^2/(2g) + sum of losses.

pchip.tsv, pchip_operating.tsv (Debian python3-scipy,
  scipy.interpolate.PchipInterpolator; operating points by scipy.optimize.brentq):
  the reference implementation of the monotone piecewise cubic Hermite
  interpolant (Fritsch & Carlson 1980, slopes of Fritsch & Butland 1984),
  evaluated on a grid over each data set; values printed with repr()
  (shortest round-trip form of the float64).

Deterministic: fixed cases and order, fixed formatting, no timestamps.
Run with /usr/bin/python3 testdata/refs/gen/gen_line.py
"""

import os

import mpmath
from mpmath import mp, mpf

mp.dps = 40
G = mpf("9.80665")

# Each case: name, rho, mu, z1, z2, p1, p2 (Pa abs), d2 outlet diameter
# (0: none), flows, segments (L, D, eps, K, endZ).  Invented inputs.
CASES = [
    ("water3", "998.2", "1.0016e-3", "0", "30", "101325", "101325", "0",
     ["0.01", "0.03", "0.05", "0.08"],
     [("200", "0.2", "0.045e-3", "1.5", "5"),
      ("150", "0.15", "0.045e-3", "0.9", "12"),
      ("300", "0.25", "0.1e-3", "2", "30")]),
    ("smooth4", "1000", "1e-3", "10", "2", "150000", "101325", "0.1",
     ["0.005", "0.02", "0.06"],
     [("40", "0.1", "0", "0.5", "9"),
      ("40", "0.1", "0", "0", "8"),
      ("120", "0.3", "0", "1", "4"),
      ("60", "0.1", "1e-3", "0.3", "2")]),
    ("oil3", "880", "0.088", "0", "4", "101325", "101325", "0",
     ["1e-4", "5e-4", "1e-3"],
     [("50", "0.05", "0.045e-3", "0", "1"),
      ("30", "0.08", "0.045e-3", "0", "2"),
      ("40", "0.04", "0.045e-3", "0", "4")]),
]


def colebrook(re, rr):
    a = rr / mpf("3.7")
    b = mpf("2.51") / re
    c = 2 / mp.log(10)
    z = mp.exp(a / (b * c)) / (b * c)
    x = c * mpmath.lambertw(z).real - a / b
    assert abs((x + c * mp.log(a + b * x)) / x) < mpf("1e-34")
    return 1 / (x * x)


def friction(re, rr):
    if re < 2300:
        return 64 / re
    assert re > 4000, re
    return colebrook(re, rr)


def fmt(v):
    return mp.nstr(v, 25, min_fixed=-mp.inf, max_fixed=mp.inf)


def line_tables():
    rows = ["case\tq\tseg\trho\tmu\tl\td\teps\tk\tend_z\tre\tf\tmajor\tminor\ttransition"]
    sysrows = ["case\tq\tz1\tz2\tp1\tp2\td2\th_sys"]
    for name, rho_s, mu_s, z1, z2, p1, p2, d2, flows, segs in CASES:
        rho, mu = mpf(rho_s), mpf(mu_s)
        for qs in flows:
            q = mpf(qs)
            total = mpf(0)
            prev = None
            for i, seg in enumerate(segs):
                l, d, eps, k = [mpf(v) for v in seg[:4]]
                v = q / (mp.pi * d * d / 4)
                re = rho * v * d / mu
                f = friction(re, eps / d)
                hv = v * v / (2 * G)
                major = f * (l / d) * hv
                minor = k * hv
                trans = mpf(0)
                if prev is not None:
                    d1, v1 = prev
                    if d > d1:
                        trans = (1 - (d1 / d) ** 2) ** 2 * v1 * v1 / (2 * G)
                    elif d < d1:
                        trans = mpf("0.5") * (1 - (d / d1) ** 2) * hv
                prev = (d, v)
                total += major + minor + trans
                rows.append("\t".join([name, qs, str(i + 1), rho_s, mu_s] + list(seg) + [fmt(re), fmt(f), fmt(major), fmt(minor), fmt(trans)]))
            h = mpf(z2) - mpf(z1) + (mpf(p2) - mpf(p1)) / (rho * G) + total
            if mpf(d2) > 0:
                dd = mpf(d2)
                v2 = q / (mp.pi * dd * dd / 4)
                re2 = rho * v2 * dd / mu
                assert re2 < 2300 or re2 > 4000
                alpha = 2 if re2 < 2300 else 1
                h += alpha * v2 * v2 / (2 * G)
            sysrows.append("\t".join([name, qs, z1, z2, p1, p2, d2, fmt(h)]))
    return rows, sysrows


# PCHIP data sets: name, x, y (invented shapes: falling, single peak, flat
# parts and extrema, three points, end-slope limits).
PCHIP_SETS = [
    ("falling", [0, 1, 2.5, 3, 4.5, 6], [50, 49, 45, 42, 30, 11]),
    ("peak", [0.5, 1, 2, 3, 4, 5.5], [0.2, 0.45, 0.7, 0.78, 0.74, 0.5]),
    ("wiggly", [0, 1, 2, 3, 4, 5, 6, 7], [1, 2, 2, 3, 1, 1.5, 4, 3]),
    ("three", [0, 2, 3], [10, 9, 3]),
    ("edgezero", [0, 1, 2, 3], [0, 1, 10, 11]),
    ("edgelimit", [0, 1, 2, 3], [0, 1, -5, -6]),
]


def pchip_table():
    import numpy as np
    from scipy.interpolate import PchipInterpolator

    rows = ["set\tx\ty"]
    for name, x, y in PCHIP_SETS:
        p = PchipInterpolator(np.array(x, dtype=float), np.array(y, dtype=float), extrapolate=False)
        grid = sorted(set([float(v) for v in np.linspace(x[0], x[-1], 41)] + [float(v) for v in x]))
        for t in grid:
            rows.append("%s\t%r\t%r" % (name, t, float(p(t))))
    return rows


# Operating points: pump data sets (Q m^3/s, H m; invented) against the
# system curve of a line of fittings only, H = dz + K V^2/(2g) with
# V = Q/(pi D^2/4): the root of pchip(Q) - H(Q) by scipy.optimize.brentq.
OPERATING = [
    ("steep", [0, 0.01, 0.02, 0.03, 0.04], [40, 38.5, 34, 26, 15], "12", "25", "0.1"),
    ("flat", [0, 0.02, 0.05, 0.08], [22, 21.6, 20, 16], "15", "8", "0.15"),
    ("nozero", [0.005, 0.01, 0.015, 0.02, 0.03, 0.035], [30, 29, 27.5, 25, 18, 13], "5", "60", "0.08"),
]


def operating_table():
    import numpy as np
    from scipy.interpolate import PchipInterpolator
    from scipy.optimize import brentq

    g = 9.80665
    rows = ["set\tdz\tk\td\tq\th"]
    for name, x, y, dz_s, k_s, d_s in OPERATING:
        p = PchipInterpolator(np.array(x, dtype=float), np.array(y, dtype=float), extrapolate=False)
        dz, k, d = float(dz_s), float(k_s), float(d_s)
        area = np.pi * d * d / 4

        def sys(q):
            v = q / area
            return dz + k * v * v / (2 * g)

        q = brentq(lambda q: float(p(q)) - sys(q), x[0], x[-1], xtol=1e-16, rtol=1e-15, maxiter=500)
        rows.append("%s\t%s\t%s\t%s\t%r\t%r" % (name, dz_s, k_s, d_s, q, float(p(q))))
    return rows


def write(path, header, rows):
    with open(path, "w", encoding="ascii", newline="\n") as fh:
        fh.write("\n".join(header + rows) + "\n")


def main():
    here = os.path.dirname(os.path.abspath(__file__))
    refs = os.path.join(here, "..")
    gen = "# Generated by testdata/refs/gen/gen_line.py; do not edit by hand."
    rows, sysrows = line_tables()
    write(os.path.join(refs, "line.tsv"), [
        "# Series pipe segments: Reynolds number, Darcy f (64/Re laminar, Colebrook-White",
        "# exact via Lambert W), major, minor and diameter-change losses in m, python3-mpmath",
        "# mp.dps = 40, 25 significant digits.", gen], rows)
    write(os.path.join(refs, "line_system.tsv"), [
        "# System head of the same lines: lift + pressure difference + outlet velocity head",
        "# + all losses, m, python3-mpmath mp.dps = 40, 25 significant digits.", gen], sysrows)
    write(os.path.join(refs, "pchip.tsv"), [
        "# scipy.interpolate.PchipInterpolator (Debian python3-scipy) on fixed data sets,",
        "# float64 values printed with repr().", gen], pchip_table())
    write(os.path.join(refs, "pchip_operating.tsv"), [
        "# Pump curve (scipy PchipInterpolator, Debian python3-scipy) against a fittings-only",
        "# system curve dz + K V^2/(2g), crossing by scipy.optimize.brentq; repr() values.", gen],
        operating_table())


if __name__ == "__main__":
    main()
