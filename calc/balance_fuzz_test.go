package calc

import (
	"errors"
	"fmt"
	"math"
	"testing"
)

// FuzzBalance drives Balance.Solve with fuzzed numbers for every input of
// the balance (points, flow, heads, liquid, site pressure, unknown, α mode
// and an optional pipe run). The properties are the house rules for the
// calculation core (common practice for this code base, see calc/doc.go):
// no panic; an error is a *FieldError naming a field; a result returned
// without an error holds no NaN or Inf.
func FuzzBalance(f *testing.F) {
	// Seeds: the demo station (booster BS-3, invented), a turbine-side
	// line, each unknown, and edges (zeros, negatives, huge and tiny values).
	type seed struct {
		p1, z1, v1, d1, p2, z2, v2, d2 float64
		q, hp, ht, hf, site            float64
		rho, mu, pv                    float64
		unknown, alpha                 int
		run                            bool
		l, d, eps, k                   float64
		method                         int
		c                              float64
	}
	demo := seed{98.8e3, 212, 0, 0, 98.8e3, 251, 0, 0, 0.045, 0, 0, 0, 98.8e3,
		998.6, 1.05e-3, 2.06e3, int(SolvePumpHead), int(AlphaFromRegime), true, 640, 0.2027, 0.045e-3, 3.1, 0, 0}
	seeds := []seed{demo}
	for u := SolvePumpHead; u <= SolveFlow; u++ {
		s := demo
		s.unknown = int(u)
		seeds = append(seeds, s)
		s.run = false
		s.d1, s.d2 = 0.1541, 0.1282
		seeds = append(seeds, s)
	}
	turbine := seed{101e3, 1020, 0, 0, 101e3, 905, 0, 0.1308, 0.022, 0, 0, 0, 101e3,
		999.1, 1.14e-3, 1.7e3, int(SolveTurbineHead), int(AlphaProfile), true, 1400, 0.1308, 7e-6, 0, 0, 0}
	seeds = append(seeds, turbine)
	hw := demo
	hw.method, hw.c = int(MethodHazenWilliams), 130
	seeds = append(seeds, hw)
	edges := []seed{
		{},
		{p1: -1, z1: -1, v1: -1, d1: -1, q: -1, rho: -1, mu: -1},
		{p1: 1e308, p2: -1e308, site: 1e308, rho: 1e-300, mu: 1e-300, q: 1e300, d1: 1e-300, unknown: int(SolveP2)},
		{p1: 1e5, p2: 1e5, site: 1e5, rho: 1000, mu: 1e-3, d1: 1e-9, d2: 1e9, unknown: int(SolveFlow), run: true, l: 1e12, d: 1e-9},
		{rho: 1000, mu: 1e-3, q: 3e-3, run: true, l: 10, d: 0.05, eps: 0.1, unknown: 99, alpha: -3},
		{rho: 1000, mu: math.Inf(1), q: math.NaN(), hp: math.Inf(-1), site: math.NaN()},
	}
	seeds = append(seeds, edges...)
	for _, s := range seeds {
		f.Add(s.p1, s.z1, s.v1, s.d1, s.p2, s.z2, s.v2, s.d2, s.q, s.hp, s.ht, s.hf, s.site,
			s.rho, s.mu, s.pv, s.unknown, s.alpha, s.run, s.l, s.d, s.eps, s.k, s.method, s.c)
	}
	f.Fuzz(func(t *testing.T, p1, z1, v1, d1, p2, z2, v2, d2, q, hp, ht, hf, site, rho, mu, pv float64,
		unknown, alpha int, withRun bool, l, d, eps, k float64, method int, c float64) {
		b := Balance{
			Fluid:        Fluid{Name: "fuzzed", Density: rho, Viscosity: mu, VapourPressure: pv},
			SitePressure: site,
			In:           Point{P: p1, Z: z1, V: v1, D: d1},
			Out:          Point{P: p2, Z: z2, V: v2, D: d2},
			Q:            q, PumpHead: hp, TurbineHead: ht, FrictionHead: hf,
			Alpha: AlphaMode(alpha), Unknown: Unknown(unknown),
		}
		if withRun {
			b.Run = &Run{Length: l, Diameter: d, Roughness: eps, ExtraK: k, Method: FrictionMethod(method), HazenC: c,
				Fittings: []FittingCount{{Key: "gate", Count: 2}, {Key: "elbow90lr", Count: 6}}}
		}
		what := fmt.Sprintf("%+v run=%+v", b, b.Run)
		r, err := b.Solve()
		if err != nil {
			var fe *FieldError
			if !errors.As(err, &fe) || fe.Field == "" || fe.Kind == KindOther {
				t.Fatalf("%s: error %#v is not a *FieldError naming a field", what, err)
			}
			return
		}
		checkBalanceFinite(t, what, r)
	})
}

// checkBalanceFinite fails on a NaN or an Inf anywhere in a result that
// Solve returned without an error.
func checkBalanceFinite(t *testing.T, what string, r BalanceResult) {
	t.Helper()
	bad := func(name string, v float64) {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			t.Fatalf("%s: %s = %v in a result returned without an error", what, name, v)
		}
	}
	for name, v := range map[string]float64{
		"Value": r.Value, "ValueLow": r.ValueLow, "ValueHigh": r.ValueHigh, "Q": r.Q,
		"PumpHead": r.PumpHead, "TurbineHead": r.TurbineHead, "FrictionHead": r.FrictionHead,
		"PumpPower": r.PumpPower, "TurbinePower": r.TurbinePower,
	} {
		bad(name, v)
	}
	for i, ps := range []PointState{r.In, r.Out} {
		n := fmt.Sprint("point ", i+1, " ")
		for name, v := range map[string]float64{
			"P": ps.P, "Z": ps.Z, "Velocity": ps.Velocity, "Reynolds": ps.Reynolds, "Alpha": ps.Alpha,
			"PressureHead": ps.PressureHead, "VelocityHead": ps.VelocityHead, "TotalHead": ps.TotalHead,
		} {
			bad(n+name, v)
		}
	}
	if rr := r.Run; rr != nil {
		for name, v := range map[string]float64{
			"Velocity": rr.Velocity, "Reynolds": rr.Reynolds, "Alpha": rr.Alpha, "Friction": rr.Friction,
			"FrictionLow": rr.FrictionLow, "FrictionHigh": rr.FrictionHigh, "MajorLoss": rr.MajorLoss,
			"MinorLoss": rr.MinorLoss, "TotalLoss": rr.TotalLoss, "TotalLossLow": rr.TotalLossLow,
			"TotalLossHigh": rr.TotalLossHigh, "SumK": rr.SumK,
		} {
			bad("run "+name, v)
		}
	}
	for _, it := range r.Budget {
		bad("budget "+it.Key+" head", it.Head)
		bad("budget "+it.Key+" pressure", it.Pressure)
	}
}
