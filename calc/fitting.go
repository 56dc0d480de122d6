package calc

import (
	"math"
	"sort"
	"strconv"
	"strings"
)

// KMethod names how a fitting's loss coefficient is found.
type KMethod int

// Methods for a fitting's K. The zero value is KFixed.
const (
	// KFixed is one K whatever the size and flow (entrances, the exit,
	// the strainer).
	KFixed KMethod = iota
	// KCrane is the method of Crane Technical Paper 410: K = N·f_T, f_T
	// being the fully turbulent friction factor of clean commercial
	// steel of the pipe's size (CraneFT).
	KCrane
	// KHooper is the 2-K method of Hooper (1981): K = K1/Re +
	// K∞·(1 + 1 in/D), D the inside diameter in inches.
	KHooper
	// KDarby is the 3-K method of Darby (1999, 2001): K = K1/Re +
	// Ki·(1 + Kd/Dn^0.3), Dn the nominal size in inches
	// (DarbyNominalSize). Ki is held in KInf.
	KDarby
)

// String returns the method's name: "fixed", "Crane TP-410",
// "Hooper 2-K" or "Darby 3-K".
func (m KMethod) String() string {
	switch m {
	case KFixed:
		return "fixed"
	case KCrane:
		return "Crane TP-410"
	case KHooper:
		return "Hooper 2-K"
	case KDarby:
		return "Darby 3-K"
	}
	return "unknown"
}

// Fitting is a pipe fitting or valve. Its head loss is K·V²/(2g), V the
// mean velocity in the pipe it sits in, with K found by Method from the
// fields of that method (see KAt).
type Fitting struct {
	Key    string  // short id used in share links, e.g. "elbow90lr"
	Name   string  // human label
	Method KMethod // how K is found
	K      float64 // KFixed: the loss coefficient
	N      float64 // KCrane: K = N·f_T (for the smallest size band, see Bands)
	// Bands, for KCrane kinds whose multiple changes with size (the
	// butterfly valve), lists further multiples: Bands[i].N applies
	// above inside diameter Bands[i].AboveD (m). Ordered by AboveD.
	Bands  []CraneBand
	K1     float64 // KHooper, KDarby: the laminar term's constant (K1/Re)
	KInf   float64 // KHooper: K at large Re in a 1-inch pipe is 2·KInf; KDarby: Ki
	Kd     float64 // KDarby: the size term's constant, K∞ = Ki·(1 + Kd/Dn^0.3)
	Source string  // where the figures come from
}

// CraneBand is a size band of a Crane TP-410 fitting: multiple N of f_T
// above inside diameter AboveD (m).
type CraneBand struct {
	AboveD float64 // m
	N      float64
}

// Inside diameters, m, between which the K methods are used as published.
// CraneFT is defined from 1 mm to 10 m; outside KDiameterMin…KDiameterMax
// (the inside diameters of NPS ½ schedule 160 and NPS 24 schedule 10S as
// python3-fluids tabulates them, the span of the sizes Crane TP-410
// tabulates) Run.Evaluate warns that the
// figures are extrapolated.
const (
	KDiameterMin = 0.0117 // m
	KDiameterMax = 0.598  // m
	craneDMin    = 1e-3   // m, ε/D of CraneFT stays below 0.05
	craneDMax    = 10     // m, 7.5e6·D stays below 1e8
)

// Sources of the fitting table.
const (
	srcCrane  = "Crane TP-410 (2009), K = n·f_T, n as python3-fluids fluids.fittings."
	srcHooper = "Hooper (1981), Chem. Eng. Aug. 24 p. 97, 2-K constants as python3-fluids fluids.fittings.Hooper["
	srcMemo   = "from memory (typical handbook range "
	srcDarby  = "Darby (1999, 2001), Chem. Eng. 106(7) p. 101, 3-K constants as python3-fluids fluids.fittings.Darby["
)

// butterflyBands: Crane TP-410 centric butterfly valve, 45·f_T for 2–8 in,
// 35·f_T for 10–14 in, 25·f_T for 16–24 in; python3-fluids splits the
// bands at inside diameters 0.2286 m (9 in) and 0.381 m (15 in).
var butterflyBands = []CraneBand{{0.2286, 35}, {0.381, 25}}

// darby is a row of Darby's 3-K method: constants K1, Ki, Kd as
// python3-fluids' table names them under fluidsName.
func darby(key, name string, k1, ki, kd float64, fluidsName string) Fitting {
	return Fitting{Key: key, Name: name, Method: KDarby, K1: k1, KInf: ki, Kd: kd, Source: srcDarby + "'" + fluidsName + "']"}
}

// fittingTable holds the fittings.
var fittingTable = [...]Fitting{
	{Key: "gate", Name: "gate valve, fully open", Method: KCrane, N: 8,
		Source: srcCrane + "K_gate_valve_Crane (β = 1)"},
	{Key: "globe", Name: "globe valve, fully open", Method: KCrane, N: 340,
		Source: srcCrane + "K_globe_valve_Crane (β = 1)"},
	{Key: "ball", Name: "ball valve, full bore, fully open", Method: KCrane, N: 3,
		Source: srcCrane + "K_ball_valve_Crane (β = 1)"},
	{Key: "butterfly", Name: "butterfly valve, centric, fully open", Method: KCrane, N: 45, Bands: butterflyBands,
		Source: srcCrane + "K_butterfly_valve_Crane (style 0): 45, 35, 25 by size"},
	{Key: "check_swing", Name: "swing check valve", Method: KCrane, N: 100,
		Source: srcCrane + "K_swing_check_valve_Crane (angled=True gives 100·f_T)"},
	{Key: "check_lift", Name: "lift check valve, globe pattern", Method: KCrane, N: 600,
		Source: srcCrane + "K_lift_check_valve_Crane (angled=False, β = 1)"},
	{Key: "check_tilt", Name: "tilting-disc check valve, 5° seat", Method: KCrane, N: 40,
		Bands:  []CraneBand{{0.2286, 30}, {0.381, 20}},
		Source: srcCrane + "K_tilting_disk_check_valve_Crane (angle 5°): 40, 30, 20 by size"},
	{Key: "foot", Name: "foot valve with strainer, poppet disc", Method: KCrane, N: 420,
		Source: srcCrane + "K_foot_valve_Crane (style 0)"},
	{Key: "foot_hinged", Name: "foot valve with strainer, hinged disc", Method: KCrane, N: 75,
		Source: srcCrane + "K_foot_valve_Crane (style 1)"},
	{Key: "plug", Name: "plug valve, straight-way", Method: KCrane, N: 18,
		Source: srcCrane + "K_plug_valve_Crane (style 0, β = 1)"},
	{Key: "diaphragm", Name: "diaphragm valve, weir type", Method: KCrane, N: 149,
		Source: srcCrane + "K_diaphragm_valve_Crane (style 0)"},
	{Key: "angle_valve", Name: "angle valve, fully open", Method: KCrane, N: 150,
		Source: srcCrane + "K_angle_valve_Crane (style 1, β = 1)"},
	{Key: "elbow90", Name: "90° elbow, standard", Method: KCrane, N: 30,
		Source: srcCrane + "bend_rounded (method 'Crane standard', 90°)"},
	{Key: "elbow90lr", Name: "90° elbow, long radius (r/d 1.5)", Method: KCrane, N: 14,
		Source: "Crane TP-410 (2009), bends r/d = 1.5: 14·f_T (from memory; python3-fluids bend_rounded_Crane fits 14.06·f_T)"},
	{Key: "elbow45", Name: "45° elbow, standard", Method: KCrane, N: 16,
		Source: srcCrane + "bend_rounded (method 'Crane standard', 45°)"},
	{Key: "bend180", Name: "180° close return bend", Method: KCrane, N: 50,
		Source: srcCrane + "bend_rounded (method 'Crane standard', 180°)"},
	{Key: "tee_run", Name: "tee, flow through the run", Method: KCrane, N: 20,
		Source: "Crane TP-410, standard tee, flow through run 20·f_T (from memory); f_T as python3-fluids ft_Crane"},
	{Key: "tee_branch", Name: "tee, flow through the branch", Method: KCrane, N: 60,
		Source: "Crane TP-410, standard tee, flow through branch 60·f_T (from memory); f_T as python3-fluids ft_Crane"},
	{Key: "elbow90_thr", Name: "90° elbow, standard, threaded", Method: KHooper, K1: 800, KInf: 0.4,
		Source: srcHooper + "'Elbow, 90°, Standard (R/D = 1), Screwed']"},
	{Key: "mitre90", Name: "90° mitre bend, one weld", Method: KHooper, K1: 1000, KInf: 1.15,
		Source: srcHooper + "'Elbow, 90°, Mitered (R/D = 1.5), 1 weld (90° angle)']"},
	{Key: "tee_branch_thr", Name: "tee, flow through the branch, threaded", Method: KHooper, K1: 500, KInf: 0.7,
		Source: srcHooper + "'Elbow, Used as, Standard, Screwed']"},
	{Key: "tee_run_thr", Name: "tee, flow through the run, threaded", Method: KHooper, K1: 200, KInf: 0.1,
		Source: srcHooper + "'Tee, Run, Screwed']"},
	{Key: "ball_rt", Name: "ball valve, reduced trim (β 0.9)", Method: KHooper, K1: 500, KInf: 0.15,
		Source: srcHooper + "'Valve, Ball, Reduced trim, Beta = 0.9']"},
	{Key: "globe_y", Name: "globe valve, angle or Y pattern", Method: KHooper, K1: 1000, KInf: 2,
		Source: srcHooper + "'Valve, Globe, Angle or Y-type']"},
	darby("bend90_r2", "90° bend, r/d 2", 800, 0.056, 3.9, "Elbow, 90°, (r/D = 2)"),
	darby("bend90_r4", "90° bend, r/d 4", 800, 0.066, 3.9, "Elbow, 90°, (r/D = 4)"),
	darby("bend90_r6", "90° bend, r/d 6", 800, 0.075, 4.2, "Elbow, 90°, (r/D = 6)"),
	darby("mitre90_2w", "90° mitre bend, two welds (45° each)", 800, 0.068, 4.1, "Elbow, 90°, 2 welds, (45°)"),
	darby("mitre90_3w", "90° mitre bend, three welds (30° each)", 800, 0.035, 4.2, "Elbow, 90°, 3 welds, (30°)"),
	darby("elbow45lr", "45° elbow, long radius (r/d 1.5)", 500, 0.052, 4.0, "Elbow, 45°, long radius, (r/D = 1.5)"),
	darby("mitre45", "45° mitre bend, one weld", 500, 0.086, 4.0, "Elbow, 45°, mitered, 1 weld, (45°)"),
	darby("tee_branch_stub", "tee, flow through a stub-in branch", 1000, 0.34, 4.0, "Tee, Through-branch, (as elbow), stub-in branch"),
	darby("plug_branch", "plug valve, three-way, branch flow", 500, 0.41, 4.0, "Valve, Plug valve, branch flow"),
	{Key: "strainer", Name: "strainer, clean", Method: KFixed, K: 2.0, Source: srcMemo + "1–3; neither Crane TP-410 nor Hooper gives one)"},
	{Key: "entry_sharp", Name: "entrance, sharp-edged (flush)", Method: KFixed, K: 0.5,
		Source: "common practice (sharp-edged entrance 0.5; python3-fluids entrance_sharp(method='Crane') gives 0.5)"},
	{Key: "entry_round", Name: "entrance, well rounded", Method: KFixed, K: 0.04,
		Source: "Crane TP-410, rounded entrance r/d ≥ 0.15: 0.04 (python3-fluids entrance_rounded(method='Crane') gives 0.04)"},
	{Key: "entry_reentrant", Name: "entrance, re-entrant (projecting)", Method: KFixed, K: 0.78,
		Source: "Crane TP-410, inward-projecting entrance 0.78 (python3-fluids entrance_distance(method='Crane') gives 0.78)"},
	{Key: "exit", Name: "exit into a reservoir", Method: KFixed, K: 1.0,
		Source: "Borda–Carnot sudden expansion with d2 ≫ d1: the whole velocity head is lost (python3-fluids exit_normal gives 1.0)"},
}

// FittingTable returns every fitting, sorted by key. The slice is a
// fresh copy.
func FittingTable() []Fitting {
	out := make([]Fitting, len(fittingTable))
	for i := range fittingTable {
		out[i] = fittingTable[i].clone()
	}
	sort.Slice(out, func(i, j int) bool { return out[i].Key < out[j].Key })
	return out
}

// clone returns a copy of f that shares no memory with it.
func (f *Fitting) clone() Fitting {
	c := *f
	c.Bands = append([]CraneBand(nil), f.Bands...)
	return c
}

// LookupFitting returns the fitting with the given key (case
// insensitive). An unknown key gives a *FieldError for field "fit" that
// lists the known keys.
func LookupFitting(key string) (Fitting, error) {
	if f := frFitting(key); f != nil {
		return f.clone(), nil
	}
	keys := make([]string, 0, len(fittingTable))
	for _, f := range FittingTable() {
		keys = append(keys, f.Key)
	}
	return Fitting{}, NewFieldError("fit", UnknownChoice).Typed(key).OneOf(keys...)
}

// frFitting returns the table row of key, or nil. Keys as stored (lower
// case, no spaces) are found without allocating.
func frFitting(key string) *Fitting {
	for i := range fittingTable {
		if fittingTable[i].Key == key {
			return &fittingTable[i]
		}
	}
	k := strings.ToLower(strings.TrimSpace(key))
	for i := range fittingTable {
		if fittingTable[i].Key == k {
			return &fittingTable[i]
		}
	}
	return nil
}

// CraneFT returns f_T, the fully turbulent Darcy friction factor of clean
// commercial steel pipe of inside diameter d (m) that Crane TP-410 uses
// in K = n·f_T. It follows python3-fluids' ft_Crane: the Colebrook–White
// factor at Re = 7.5·10⁶·D (D in m) with the diameter-dependent roughness
// ε = 3.4126825352925·10⁻⁵·D^(−0.0112) m (Farshad & Rieke 2006, bare
// carbon steel), a form fitted there to reproduce Crane's rounded table
// (0.027 at NPS ½ falling to 0.012 at NPS 24). d must be within 1 mm and
// 10 m (field "d").
func CraneFT(d float64) (float64, error) {
	if math.IsNaN(d) || d < craneDMin || d > craneDMax {
		return 0, NewFieldError("d", OutsideValidity).Got(Fig(d, Length)).Within(Fig(craneDMin, Length), Fig(float64(craneDMax), Length)).Because(ReasonCraneFT)
	}
	return clamond(7.5e6*d, 3.4126825352925e-5*math.Pow(d, -1.0112)), nil
}

// ReDependent reports whether the fitting's K changes with the Reynolds
// number (Hooper's 2-K and Darby's 3-K kinds).
func (f Fitting) ReDependent() bool { return f.Method == KHooper || f.Method == KDarby }

// crane returns the multiple of f_T for inside diameter d.
func (f Fitting) crane(d float64) float64 {
	n := f.N
	for _, b := range f.Bands {
		if d > b.AboveD {
			n = b.N
		}
	}
	return n
}

// KAt returns the fitting's loss coefficient in a pipe of inside
// diameter d (m) at Reynolds number re:
//
//   - KFixed: K, whatever d and re;
//   - KCrane: N·CraneFT(d), N from the size band of d; turbulent-flow
//     figures, independent of re;
//   - KHooper: K1/re + KInf·(1 + 0.0254/d);
//   - KDarby: K1/re + KInf·(1 + Kd/Dn^0.3), Dn = DarbyNominalSize(d).
//
// re = +Inf asks for the fully turbulent value (the K1 term vanishes).
// d must be finite and positive, within 1 mm–10 m for Crane and at least
// 6.84 mm for Darby (field "d"); re must be positive (field "re").
func (f Fitting) KAt(d, re float64) (float64, error) {
	if err := frCheckKInputs(d, re); err != nil {
		return 0, err
	}
	return f.kAt(d, re, 0)
}

// frCheckKInputs validates the diameter and Reynolds number of KAt.
func frCheckKInputs(d, re float64) error {
	if math.IsNaN(d) || math.IsInf(d, 0) || d <= 0 {
		return NewFieldError("d", NotPositive).Got(Fig(d, Length))
	}
	if math.IsNaN(re) || re <= 0 {
		return NewFieldError("re", NotPositive).Got(Num(re))
	}
	return nil
}

// kAt is KAt for valid d and re, with Crane's f_T at d already known when
// ft > 0.
func (f *Fitting) kAt(d, re, ft float64) (float64, error) {
	switch f.Method {
	case KFixed:
		return f.K, nil
	case KCrane:
		if ft == 0 {
			var err error
			if ft, err = CraneFT(d); err != nil {
				return 0, err
			}
		}
		return f.crane(d) * ft, nil
	case KHooper:
		return f.K1/re + f.KInf*(1+0.0254/d), nil
	case KDarby:
		return f.darbyK(d, re)
	}
	return 0, NewFieldError("fit", UnknownChoice).Typed(f.Key).Because(ReasonFittingMethod)
}

// Formula returns the fitting's K formula at inside diameter d (m), as
// "K = 8·f_T", "K = 800/Re + 0.4·(1 + 1 in/D)",
// "K = 800/Re + 0.056·(1 + 3.9/Dn^0.3), Dn 4.02 in" or "K = 0.5".
func (f Fitting) Formula(d float64) string {
	switch f.Method {
	case KCrane:
		return "K = " + frG(f.crane(d)) + "·f_T"
	case KHooper:
		return "K = " + frG(f.K1) + "/Re + " + frG(f.KInf) + "·(1 + 1 in/D)"
	case KDarby:
		out := "K = " + frG(f.K1) + "/Re + " + frG(f.KInf) + "·(1 + " + frG(f.Kd) + "/Dn^0.3)"
		if dn, err := DarbyNominalSize(d); err == nil {
			out += ", Dn " + strconv.FormatFloat(dn, 'f', 2, 64) + " in"
		}
		return out
	}
	return "K = " + frG(f.K)
}

// frCheckDiameters validates a pair of diameters for the area-change
// losses: both finite and positive.
func frCheckDiameters(d1, d2 float64) error {
	if math.IsNaN(d1) || math.IsInf(d1, 0) || d1 <= 0 {
		return NewFieldError("d1", NotPositive).Got(Fig(d1, Length))
	}
	if math.IsNaN(d2) || math.IsInf(d2, 0) || d2 <= 0 {
		return NewFieldError("d2", NotPositive).Got(Fig(d2, Length))
	}
	return nil
}

// SuddenExpansionK returns the loss coefficient of a sudden expansion from
// diameter d1 to a larger d2, referred to the upstream velocity V1
// (Borda–Carnot, from momentum and continuity):
//
//	K = (1 − (d1/d2)²)²,  h = K·V1²/(2g)
//
// K tends to 1 (the exit loss) as d2 grows. d2 must be at least d1
// (field "d2").
func SuddenExpansionK(d1, d2 float64) (float64, error) {
	if err := frCheckDiameters(d1, d2); err != nil {
		return 0, err
	}
	if d2 < d1 {
		return 0, NewFieldError("d2", BelowLimit).Got(Fig(d2, Length)).AtLeast(Fig(d1, Length)).Because(ReasonExpansion)
	}
	r := d1 / d2
	k := 1 - r*r
	return k * k, nil
}

// SuddenContractionK returns the loss coefficient of a sudden contraction
// from diameter d1 to a smaller d2, referred to the downstream velocity V2,
// by the common textbook approximation (from memory)
//
//	K = 0.5·(1 − (d2/d1)²)
//
// which tends to the sharp-edged entrance value 0.5 as d1 grows and to 0
// when the diameters are equal. d2 must not exceed d1 (field "d2").
func SuddenContractionK(d1, d2 float64) (float64, error) {
	if err := frCheckDiameters(d1, d2); err != nil {
		return 0, err
	}
	if d2 > d1 {
		return 0, NewFieldError("d2", AboveLimit).Got(Fig(d2, Length)).AtMost(Fig(d1, Length)).Because(ReasonContraction)
	}
	r := d2 / d1
	return 0.5 * (1 - r*r), nil
}

// frG writes x in the shortest form that reads back exactly.
func frG(x float64) string { return strconv.FormatFloat(x, 'g', -1, 64) }
