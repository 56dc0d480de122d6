package calc

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// frHasWarning reports whether any warning contains sub.
func frHasWarning(ws []Warning, sub string) bool {
	for _, w := range ws {
		if strings.Contains(w.String(), sub) {
			return true
		}
	}
	return false
}

// frFinite reports whether every number of the result is finite.
func frFinite(r RunResult) bool {
	for _, v := range []float64{r.Velocity, r.Reynolds, r.Alpha, r.Friction, r.FrictionLow, r.FrictionHigh,
		r.MajorLoss, r.MinorLoss, r.TotalLoss, r.TotalLossLow, r.TotalLossHigh, r.SumK} {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return false
		}
	}
	return true
}

func TestRunLaminar(t *testing.T) {
	// Liquid properties are inputs only (an oil-like liquid).
	fl := Fluid{Density: 880, Viscosity: 0.088}
	r := Run{Length: 100, Diameter: 0.05, Roughness: 0.045e-3, Fittings: []FittingCount{{Key: "elbow90", Count: 2}}}
	q := 1e-3
	res, err := r.Evaluate(fl, q)
	if err != nil {
		t.Fatal(err)
	}
	v := q / (math.Pi * 0.05 * 0.05 / 4)
	// Hagen–Poiseuille law: h = 32·μ·L·V/(ρ·g·D²), the same as 64/Re in
	// Darcy–Weisbach.
	want := 32 * fl.Viscosity * r.Length * v / (fl.Density * StandardGravity * r.Diameter * r.Diameter)
	if res.Regime != Laminar || math.Abs(res.MajorLoss/want-1) > 1e-12 {
		t.Errorf("laminar run: %+v; want major loss %.15g", res, want)
	}
	// α = 2 laminar (common practice); f = 64/Re.
	if res.Alpha != 2 || math.Abs(res.Friction*res.Reynolds-64) > 1e-12 {
		t.Errorf("laminar run: α %g, f·Re %g", res.Alpha, res.Friction*res.Reynolds)
	}
	if !frHasWarning(res.Warnings, "laminar fittings") {
		t.Errorf("missing laminar fitting warning: %q", res.Warnings)
	}
}

func TestRunTurbulentReference(t *testing.T) {
	// Re = ρVD/μ = 1e5 exactly (V = 1 m/s, D = 0.1 m), ε/D = 1e-4: the
	// Darcy–Weisbach loss with f from the mpmath Colebrook table
	// (colebrook.tsv row 1e5, 1e-4: 0.0185138660774716426720453489416).
	const fRef = 0.0185138660774716426720453489416
	fl := Fluid{Density: 1000, Viscosity: 1e-3}
	fits := []FittingCount{{Key: "gate", Count: 2}, {Key: "elbow90lr", Count: 6}, {Key: "check_swing", Count: 1}, {Key: "exit", Count: 1}}
	r := Run{Length: 250, Diameter: 0.1, Roughness: 1e-5, Fittings: fits, ExtraK: 0.3}
	q := math.Pi * 0.1 * 0.1 / 4 // V = 1 m/s
	res, err := r.Evaluate(fl, q)
	if err != nil {
		t.Fatal(err)
	}
	hv := 1 / (2 * StandardGravity)
	if res.Regime != Turbulent || res.Alpha != 1 || math.Abs(res.Reynolds/1e5-1) > 1e-14 {
		t.Errorf("regime %v α %g Re %.17g", res.Regime, res.Alpha, res.Reynolds)
	}
	if math.Abs(res.Friction/fRef-1) > 1e-12 || math.Abs(res.MajorLoss/(fRef*2500*hv)-1) > 1e-12 {
		t.Errorf("f %.17g (want %.17g), major %.15g m", res.Friction, fRef, res.MajorLoss)
	}
	// ΣK = ExtraK + exit + (2·8 + 6·14 + 100)·f_T at D = 0.1 m (Crane
	// TP-410 multiples), f_T(0.1 m) = 0.0162884254312 (python3-fluids
	// 1.0.22, ft_Crane docstring: Colebrook at Re 7.5e5 with the Farshad
	// roughness, printed to 12 digits); minor loss ΣK·V²/(2g).
	sum := 0.3 + 1 + 200*0.0162884254312
	if math.Abs(res.SumK-sum) > 1e-10 || math.Abs(res.MinorLoss-sum*hv) > 1e-10 {
		t.Errorf("ΣK %g (want %g), minor %g", res.SumK, sum, res.MinorLoss)
	}
	if res.TotalLoss != res.MajorLoss+res.MinorLoss || res.TotalLossLow != res.TotalLoss || res.TotalLossHigh != res.TotalLoss {
		t.Errorf("totals inconsistent: %+v", res)
	}
	if len(res.Warnings) != 0 {
		t.Errorf("unexpected warnings %q", res.Warnings)
	}
	// The K of each kind, as used, in the run's order.
	if len(res.Fittings) != 4 || res.Fittings[1].Key != "elbow90lr" || res.Fittings[1].Count != 6 ||
		math.Abs(res.Fittings[1].K-14*0.0162884254312) > 1e-12 || res.Fittings[1].Method != "Crane TP-410" ||
		res.Fittings[1].Formula != "K = 14·f_T" || res.Fittings[3].K != 1 || res.Fittings[3].Method != "fixed" {
		t.Errorf("fitting K list %+v", res.Fittings)
	}
}

func TestRunMethods(t *testing.T) {
	fl := Fluid{Density: 1000, Viscosity: 1e-3}
	q := 0.02
	base := Run{Length: 100, Diameter: 0.15, Roughness: 0.15e-3}
	re := Reynolds(1000, q/(math.Pi*0.15*0.15/4), 0.15, 1e-3)
	for _, c := range []struct {
		m  FrictionMethod
		fn func(re, rr float64) (float64, error)
	}{{MethodColebrook, Colebrook}, {MethodSwameeJain, SwameeJain}, {MethodHaaland, Haaland}} {
		r := base
		r.Method = c.m
		res, err := r.Evaluate(fl, q)
		want, _ := c.fn(re, 1e-3)
		// Each method's f is the function of the same name (the run adds
		// nothing of its own).
		if err != nil || math.Abs(res.Friction/want-1) > 1e-13 {
			t.Errorf("%v: f %.15g, want %.15g, %v", c.m, res.Friction, want, err)
		}
	}
}

func TestRunTransitional(t *testing.T) {
	// Re = 3000 (V = 0.03 m/s, D = 0.1 m): transitional (common practice),
	// bounds 64/Re and Colebrook; the design value is the larger loss.
	fl := Fluid{Density: 1000, Viscosity: 1e-3}
	r := Run{Length: 50, Diameter: 0.1, Roughness: 1e-5, ExtraK: 1}
	q := 0.03 * math.Pi * 0.1 * 0.1 / 4
	res, err := r.Evaluate(fl, q)
	if err != nil {
		t.Fatal(err)
	}
	fc, _ := Colebrook(res.Reynolds, 1e-4)
	if res.Regime != Transitional || math.Abs(res.FrictionLow*res.Reynolds-64) > 1e-9 || res.FrictionHigh != fc {
		t.Errorf("transitional: %+v (Colebrook %g)", res, fc)
	}
	if res.Friction != res.FrictionHigh || res.TotalLoss != res.TotalLossHigh || !(res.TotalLossLow < res.TotalLossHigh) || res.Alpha != 1 {
		t.Errorf("transitional design values: %+v", res)
	}
	if !frHasWarning(res.Warnings, "transitional") || !frHasWarning(res.Warnings, "velocity low") {
		t.Errorf("warnings %q", res.Warnings)
	}
}

func TestRunZeroFlow(t *testing.T) {
	// q = 0: no flow, no loss, and no NaN (house rule).
	fl := Fluid{Density: 1000, Viscosity: 1e-3}
	for _, m := range []FrictionMethod{MethodColebrook, MethodSwameeJain, MethodHaaland, MethodHazenWilliams} {
		r := Run{Length: 100, Diameter: 0.1, Roughness: 1e-5, Fittings: []FittingCount{{Key: "globe", Count: 1}}, Method: m, HazenC: 130}
		res, err := r.Evaluate(fl, 0)
		if err != nil {
			t.Fatalf("%v: %v", m, err)
		}
		if !frFinite(res) || res.TotalLoss != 0 || res.MajorLoss != 0 || res.MinorLoss != 0 || res.TotalLossHigh != 0 || res.Velocity != 0 {
			t.Errorf("%v at zero flow: %+v", m, res)
		}
		if !frHasWarning(res.Warnings, "no flow") {
			t.Errorf("%v: warnings %q", m, res.Warnings)
		}
	}
}

func TestRunVelocityWarnings(t *testing.T) {
	// Usual liquid-line velocities 0.3–3 m/s (common practice).
	fl := Fluid{Density: 1000, Viscosity: 1e-3}
	r := Run{Length: 10, Diameter: 0.1, Roughness: 1e-5}
	a := math.Pi * 0.1 * 0.1 / 4
	for _, c := range []struct {
		v    float64
		warn string
	}{{0.2, "low"}, {1, ""}, {4, "high"}} {
		res, err := r.Evaluate(fl, c.v*a)
		if err != nil {
			t.Fatal(err)
		}
		got := frHasWarning(res.Warnings, "velocity")
		if (c.warn == "") == got || (c.warn != "" && !frHasWarning(res.Warnings, c.warn)) {
			t.Errorf("V = %g m/s: warnings %q", c.v, res.Warnings)
		}
	}
}

func TestRunHazenWilliams(t *testing.T) {
	fl := Fluid{Density: 998, Viscosity: 1.0e-3}
	r := Run{Length: 640, Diameter: 0.2027, Method: MethodHazenWilliams, HazenC: 120, Fittings: []FittingCount{{Key: "exit", Count: 1}}}
	q := 0.045
	res, err := r.Evaluate(fl, q)
	if err != nil {
		t.Fatal(err)
	}
	// The run's major loss is the Hazen–Williams formula itself, and the
	// reported Darcy f reproduces it through Darcy–Weisbach.
	want, _ := HazenWilliamsHeadLoss(q, r.Diameter, r.Length, r.HazenC)
	hv := res.Velocity * res.Velocity / (2 * StandardGravity)
	if math.Abs(res.MajorLoss/want-1) > 1e-12 || math.Abs(res.Friction*r.Length/r.Diameter*hv/want-1) > 1e-12 {
		t.Errorf("HW run: major %.15g, formula %.15g, f %g", res.MajorLoss, want, res.Friction)
	}
	// Equivalent Darcy f of clean steel pipe at this Re lies in the Moody
	// chart's turbulent band 0.008–0.08 (Moody 1944, from memory).
	if !(res.Friction > 0.008 && res.Friction < 0.08) {
		t.Errorf("equivalent f %g", res.Friction)
	}
	var fe *FieldError
	oil := Fluid{Density: 880, Viscosity: 0.02}
	if _, err := r.Evaluate(oil, q); !errors.As(err, &fe) || fe.Field != "method" {
		t.Errorf("HW with oil: %v, want *FieldError for \"method\"", err)
	}
	r.HazenC = 0
	if _, err := r.Evaluate(fl, q); !errors.As(err, &fe) || fe.Field != "chw" {
		t.Errorf("HW without C: %v, want *FieldError for \"chw\"", err)
	}
}

func TestRunSwameeJainRangeWarning(t *testing.T) {
	// Swamee & Jain (1976) fitted ε/D ≤ 0.01; at ε/D = 0.02 the run warns.
	fl := Fluid{Density: 1000, Viscosity: 1e-3}
	r := Run{Length: 10, Diameter: 0.1, Roughness: 2e-3, Method: MethodSwameeJain}
	res, err := r.Evaluate(fl, 0.01)
	if err != nil || !frHasWarning(res.Warnings, "swamee jain range") {
		t.Errorf("warnings %q, %v", res.Warnings, err)
	}
}

func TestRunFrictionMethodNames(t *testing.T) {
	for _, m := range []FrictionMethod{MethodColebrook, MethodSwameeJain, MethodHaaland, MethodHazenWilliams} {
		got, err := ParseFrictionMethod(strings.ToUpper(m.String()))
		if err != nil || got != m {
			t.Errorf("ParseFrictionMethod(%q) = %v, %v", m.String(), got, err)
		}
	}
	for s, m := range map[string]FrictionMethod{"cw": MethodColebrook, "sj": MethodSwameeJain, "hw": MethodHazenWilliams} {
		if got, err := ParseFrictionMethod(s); err != nil || got != m {
			t.Errorf("ParseFrictionMethod(%q) = %v, %v", s, got, err)
		}
	}
	var fe *FieldError
	if _, err := ParseFrictionMethod("moody"); !errors.As(err, &fe) || fe.Field != "method" {
		t.Errorf("ParseFrictionMethod(\"moody\"): %v", err)
	}
	if FrictionMethod(42).String() != "unknown" {
		t.Error("String of an unknown method")
	}
}

func TestRunValidation(t *testing.T) {
	nan := math.NaN()
	good := Run{Length: 100, Diameter: 0.1, Roughness: 1e-5}
	water := Fluid{Density: 1000, Viscosity: 1e-3}
	cases := []struct {
		name  string
		edit  func(r *Run, fl *Fluid, q *float64)
		field string
	}{
		{"density 0", func(r *Run, fl *Fluid, q *float64) { fl.Density = 0 }, "rho"},
		{"viscosity NaN", func(r *Run, fl *Fluid, q *float64) { fl.Viscosity = nan }, "mu"},
		{"length negative", func(r *Run, fl *Fluid, q *float64) { r.Length = -1 }, "length"},
		{"length Inf", func(r *Run, fl *Fluid, q *float64) { r.Length = math.Inf(1) }, "length"},
		{"diameter 0", func(r *Run, fl *Fluid, q *float64) { r.Diameter = 0 }, "d"},
		{"diameter NaN", func(r *Run, fl *Fluid, q *float64) { r.Diameter = nan }, "d"},
		{"roughness negative", func(r *Run, fl *Fluid, q *float64) { r.Roughness = -1e-6 }, "eps"},
		{"roughness NaN", func(r *Run, fl *Fluid, q *float64) { r.Roughness = nan }, "eps"},
		{"ε/D above 0.05", func(r *Run, fl *Fluid, q *float64) { r.Roughness = 0.006 }, "eps"},
		{"unknown fitting", func(r *Run, fl *Fluid, q *float64) { r.Fittings = []FittingCount{{Key: "widget", Count: 1}} }, "fit"},
		{"negative count", func(r *Run, fl *Fluid, q *float64) { r.Fittings = []FittingCount{{Key: "gate", Count: -1}} }, "fit"},
		{"ExtraK negative", func(r *Run, fl *Fluid, q *float64) { r.ExtraK = -0.5 }, "k"},
		{"ExtraK NaN", func(r *Run, fl *Fluid, q *float64) { r.ExtraK = nan }, "k"},
		{"method unknown", func(r *Run, fl *Fluid, q *float64) { r.Method = 7 }, "method"},
		{"C out of range", func(r *Run, fl *Fluid, q *float64) { r.Method, r.HazenC = MethodHazenWilliams, 200 }, "chw"},
		{"flow negative", func(r *Run, fl *Fluid, q *float64) { *q = -0.01 }, "q"},
		{"flow NaN", func(r *Run, fl *Fluid, q *float64) { *q = nan }, "q"},
		{"Re above 1e8", func(r *Run, fl *Fluid, q *float64) { fl.Viscosity = 1e-9 }, "q"},
		// Finite values whose consequences leave IEEE 754 binary64's range
		// (about 1.8e308; the smallest normal 2.2e-308): the area
		// overflows or underflows, or the loss overflows.
		{"diameter 1.1e301 m", func(r *Run, fl *Fluid, q *float64) { r.Diameter = 1.1e301 }, "d"},
		{"diameter 1e-200 m", func(r *Run, fl *Fluid, q *float64) { r.Diameter, r.Roughness = 1e-200, 0 }, "d"},
		{"length 1e308 m", func(r *Run, fl *Fluid, q *float64) { r.Length = 1e308 }, "q"},
	}
	for _, c := range cases {
		r, fl, q := good, water, 0.01
		c.edit(&r, &fl, &q)
		var fe *FieldError
		if res, err := r.Evaluate(fl, q); !errors.As(err, &fe) || fe.Field != c.field {
			t.Errorf("%s: %+v, %v; want *FieldError for %q", c.name, res, err, c.field)
		}
	}
	if _, err := good.Evaluate(water, 0.01); err != nil {
		t.Errorf("good run: %v", err)
	}
}

func TestRunFittingKs(t *testing.T) {
	// A given K replaces the table's method; Hooper 2-K kinds take the
	// run's Reynolds number: K = K1/Re + K∞(1 + 1 in/D) (Hooper 1981,
	// constants as python3-fluids' Hooper table: threaded tee run
	// 200/0.1). Liquid properties are inputs only.
	fl := Fluid{Density: 1000, Viscosity: 1e-3}
	d := 0.0508 // 2 in
	q := 1e4 * 1e-3 / (1000 * d) * math.Pi * d * d / 4
	r := Run{Length: 10, Diameter: d, Roughness: 0, Fittings: []FittingCount{
		{Key: "gate", Count: 2, K: 0.12, Override: true}, {Key: "tee_run_thr", Count: 3}}}
	res, err := r.Evaluate(fl, q)
	if err != nil {
		t.Fatal(err)
	}
	kTee := 200/res.Reynolds + 0.1*1.5 // 1 in/D = 0.5
	want := 2*0.12 + 3*kTee
	if math.Abs(res.SumK-want) > 1e-14 || len(res.Fittings) != 2 {
		t.Fatalf("ΣK %.15g, want %.15g; list %+v", res.SumK, want, res.Fittings)
	}
	g, h := res.Fittings[0], res.Fittings[1]
	if g.K != 0.12 || g.Method != "given" || g.Formula != "K = 0.12" || g.Source != "" {
		t.Errorf("given K reported as %+v", g)
	}
	if math.Abs(h.K-kTee) > 1e-15 || h.Method != "Hooper 2-K" || h.Count != 3 || h.Formula != "K = 200/Re + 0.1·(1 + 1 in/D)" {
		t.Errorf("Hooper K reported as %+v", h)
	}
	// Fully turbulent ΣK (SumK) leaves the K1/Re term out.
	if s, err := r.SumK(); err != nil || math.Abs(s-(0.24+3*0.15)) > 1e-15 {
		t.Errorf("SumK() = %g, %v; want 0.69", s, err)
	}
	if !r.ReDependent() {
		t.Error("a Hooper fitting should make the run Re-dependent")
	}
	// At zero flow the list is the fully turbulent one.
	if z, err := r.Evaluate(fl, 0); err != nil || math.Abs(z.Fittings[1].K-0.15) > 1e-15 {
		t.Errorf("zero flow: %+v, %v", z.Fittings, err)
	}
	// A bad given K is an error on "fit".
	bad := r
	bad.Fittings = []FittingCount{{Key: "gate", Count: 1, K: math.Inf(1), Override: true}}
	var fe *FieldError
	if _, err := bad.Evaluate(fl, q); !errors.As(err, &fe) || fe.Field != "fit" {
		t.Errorf("infinite K: %v", err)
	}
	// Laminar flow: the warning about turbulent-only K values goes when
	// every fitting has a Reynolds term or a given K.
	lam := Run{Length: 10, Diameter: d, Fittings: []FittingCount{{Key: "tee_run_thr", Count: 1}}}
	qLam := 1e3 * 1e-3 / (1000 * d) * math.Pi * d * d / 4
	if res, err := lam.Evaluate(fl, qLam); err != nil || frHasWarning(res.Warnings, "laminar fittings") {
		t.Errorf("laminar with Hooper only: %q, %v", res.Warnings, err)
	}
	lam.Fittings = append(lam.Fittings, FittingCount{Key: "gate", Count: 1})
	if res, err := lam.Evaluate(fl, qLam); err != nil || !frHasWarning(res.Warnings, "laminar fittings") {
		t.Errorf("laminar with a Crane valve: %q, %v", res.Warnings, err)
	}
	// Sizes beyond the published ones draw a warning.
	big := Run{Length: 10, Diameter: 1.2, Fittings: []FittingCount{{Key: "gate", Count: 1}}}
	if res, err := big.Evaluate(fl, 1); err != nil || !frHasWarning(res.Warnings, "fitting sizes") {
		t.Errorf("1.2 m gate valve: %q, %v", res.Warnings, err)
	}
}

func TestSystemCurveHooper(t *testing.T) {
	// With a Re-dependent fitting the lumped system curve (K1 terms summed
	// apart) equals Solve at every flow to rounding.
	run := &Run{Length: 80, Diameter: 0.0525, Roughness: 0.045e-3,
		Fittings: []FittingCount{{Key: "elbow90_thr", Count: 4}, {Key: "globe_y", Count: 1}, {Key: "exit", Count: 1}}}
	b := Balance{Fluid: testLiquid, SitePressure: 101325, Alpha: AlphaProfile,
		In: Point{P: 101325, Z: 0}, Out: Point{P: 101325, Z: 6, D: 0.0525}, Run: run}
	frCurveMatchesSolve(t, b, Flows(0.006, 6), 1e-12)
}
