#!/usr/bin/python3
"""Write testdata/cases/ref-pump-test.case: the pump test's speed for a duty
and its uncertainty bands, from Debian's reference libraries rather than
Fieldhead's code:

  python3-scipy          scipy.interpolate.PchipInterpolator (the
                         Fritsch-Carlson monotone cubic) for the data sheet,
                         scipy.optimize.brentq for the speed at which the
                         affinity-scaled curve meets the system curve
  python3-mpmath         Colebrook-White (Lambert-W form) for the system curve
  python3-uncertainties  first-order propagation of the instruments' limits
                         (ufloat; the GUM's law of propagation for
                         independent inputs) to head, hydraulic power and
                         the efficiencies

The scenarios are invented. Output is deterministic (fixed order, fixed
digits, no timestamps).
"""
import math
import os
import sys

import mpmath as mp
from scipy.interpolate import PchipInterpolator
from scipy.optimize import brentq
from uncertainties import ufloat

sys.dont_write_bytecode = True  # no __pycache__ beside the generators
sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from gen_cases import Writer, darcy_loss, sig  # noqa: E402

G = 9.80665


def speed_cases(w):
    qs = [0.0, 0.010, 0.020, 0.030, 0.040]
    hs = [48.0, 46.5, 42.0, 35.0, 25.0]
    base = ("liq=custom&rho=1000kg/m3&mu=1mPa.s&pv=2kPa&baro=101.325kPa&p1=0kPa&z1=10m&v1=0m/s"
            "&p2=0kPa&z2=30m&v2=0m/s&q=25L/s&solve=hp&l=500m&d=125mm&eps=0.05mm&k=4"
            "&pq=0,10,20,30,40L/s&ph=48,46.5,42,35,25m")
    rho, mu = mp.mpf(1000), mp.mpf("0.001")
    h0 = PchipInterpolator(qs, hs)

    def system(q):
        hf, _ = darcy_loss(rho, mu, mp.mpf(q), mp.mpf("0.125"), mp.mpf(500), mp.mpf("0.05e-3"), mp.mpf(4))
        return float(20 + hf)

    for name, qsp, n, parallel, arr in [
            ("speed for 18 L/s, one pump", 0.018, 1, False, ""),
            ("speed for 27 L/s, one pump", 0.027, 1, False, ""),
            ("speed for 34 L/s, one pump (overspeed)", 0.034, 1, False, ""),
            ("speed for 36 L/s, two in parallel", 0.036, 2, True, "&pumps=2p"),
            ("speed for 22 L/s, two in series", 0.022, 2, False, "&pumps=2s")]:
        p = n if parallel else 1
        s = 1 if parallel else n
        need = system(qsp)

        def f(r):
            return s * r * r * float(h0(qsp / (p * r))) - need
        lo = max(0.1, qsp / (p * qs[-1]))
        r = brentq(f, lo, 2.0, xtol=1e-15, rtol=1e-15)
        w.case(name, base + arr + "&qsp=%gL/s" % (qsp * 1000), [
            "speedfor.ratio = %s ± 1e-9 rel" % sig(r),
            "speedfor.h = %s m ± 1e-9 rel" % sig(need),
        ])

    # A head to reach: the flow where the system curve needs it (brentq on
    # the mpmath system curve), then the speed for that duty.
    for name, hsp in [("speed for a head of 30 m, one pump", 30.0),
                      ("speed for a head of 45 m, one pump", 45.0)]:
        q = brentq(lambda qq: system(qq) - hsp, 1e-9, 0.2, xtol=1e-16, rtol=1e-15)

        def g(r):
            return r * r * float(h0(q / r)) - hsp
        r = brentq(g, max(0.1, q / qs[-1]), 2.0, xtol=1e-15, rtol=1e-15)
        w.case(name, base + "&hsp=%gm" % hsp, [
            "speedfor.ratio = %s ± 1e-9 rel" % sig(r),
            "speedfor.q = %s m3/s ± 1e-9 rel" % sig(q),
        ])


def band_cases(w):
    rho = 1000.0
    for name, r in [
            ("class 1.0 gauges of 0-10 bar at about 40 m, flow 2 %, power 1.5 %",
             dict(ps=0, pd=392, zs=0, zd=0, ds=150, dd=150, qm=30, pin=18, etam=0.92,
                  gcs=1.0, gss=1000, gcd=1.0, gsd=1000, uqm=2, upin=1.5, uz=0)),
            ("class 1.6 gauges of 0-16 bar, heights to 20 mm, unequal pipes",
             dict(ps=-20, pd=410, zs=0.2, zd=1.1, ds=200, dd=125, qm=38, pin=25, etam=0.93,
                  gcs=1.6, gss=160, gcd=1.6, gsd=1600, uqm=1, upin=1, uz=20)),
            ("a good suction gauge, a poor flow meter",
             dict(ps=35, pd=520, zs=0, zd=0.5, ds=150, dd=100, qm=25, pin=19, etam=0.9,
                  gcs=0.6, gss=250, gcd=0.6, gsd=1000, uqm=5, upin=0.5, uz=5))]:
        ps = ufloat(r["ps"] * 1e3, r["gcs"] / 100 * r["gss"] * 1e3)
        pd = ufloat(r["pd"] * 1e3, r["gcd"] / 100 * r["gsd"] * 1e3)
        zs = ufloat(r["zs"], r["uz"] / 1000)
        zd = ufloat(r["zd"], r["uz"] / 1000)
        q = ufloat(r["qm"] / 1000, r["uqm"] / 100 * r["qm"] / 1000)
        pin = ufloat(r["pin"] * 1e3, r["upin"] / 100 * r["pin"] * 1e3)
        vs = q / (math.pi * (r["ds"] / 1000) ** 2 / 4)
        vd = q / (math.pi * (r["dd"] / 1000) ** 2 / 4)
        h = (pd - ps) / (rho * G) + (zd - zs) + (vd ** 2 - vs ** 2) / (2 * G)
        p = rho * G * q * h
        wire = p / pin
        pump = p / (pin * r["etam"])
        query = ("liq=custom&rho=1000kg/m3&mu=1mPa.s&pv=2kPa&baro=101.325kPa"
                 "&ps=%(ps)gkPa&pd=%(pd)gkPa&zs=%(zs)gm&zd=%(zd)gm&ds=%(ds)gmm&dd=%(dd)gmm"
                 "&qm=%(qm)gL/s&pin=%(pin)gkW&etam=%(etam_pct)g%%"
                 "&gcs=%(gcs)g%%&gss=%(gss)gkPa&gcd=%(gcd)g%%&gsd=%(gsd)gkPa"
                 "&uqm=%(uqm)g%%&upin=%(upin)g%%&uz=%(uz)gmm") % dict(r, etam_pct=r["etam"] * 100)
        w.case(name, query, [
            "field.head = %s m ± 1e-9 rel" % sig(h.nominal_value),
            "field.uhead = %s m ± 1e-9 rel" % sig(h.std_dev),
            "field.upower = %s W ± 1e-9 rel" % sig(p.std_dev),
            "field.uwire = %s ± 1e-9 rel" % sig(wire.std_dev),
            "field.upump = %s ± 1e-9 rel" % sig(pump.std_dev),
        ])


if __name__ == "__main__":
    w = Writer("ref-pump-test.case",
               "the pump test: the speed that meets a flow on the line, and the bands of a field check",
               "python3-scipy (PchipInterpolator, brentq) with python3-mpmath Colebrook-White for the speeds; "
               "python3-uncertainties (ufloat, first-order propagation) for the bands")
    w.lines[1] = "# generated by testdata/refs/gen/gen_pumptest.py; edit the generator, not this file"
    speed_cases(w)
    band_cases(w)
    w.close()
