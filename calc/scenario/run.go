package scenario

import (
	"errors"
	"math"
	"strconv"
	"strings"

	"fieldhead/calc"
)

// run reads the single pipe run, or returns nil when none is described
// (its length l is the sign of one).
func (e *eval) run() *RunResult {
	if !e.s.Has("l") {
		return nil
	}
	spec, meta, ok := e.readRun("")
	if !ok {
		return nil
	}
	e.runSpec = spec
	return meta
}

// readRun reads the parameters of a pipe run named with prefix pre ("" for
// the single run, "s2." for segment 2). The friction method and a typed
// Hazen–Williams C are shared by every run of the scenario.
func (e *eval) readRun(pre string) (calc.Run, *RunResult, bool) {
	p := func(f string) string { return pre + f }
	r := &RunResult{}
	ok := true
	positive := func(param, what string) float64 {
		v, good := e.quantity(param)
		if good && !(v > 0) {
			e.bad(param, calc.NotPositive).Got(calc.Fig(v, calc.Length))
			good = false
		}
		ok = ok && good
		return v
	}
	// A length of zero is a run of fittings alone (a valve set), as calc
	// allows.
	if l, good := e.quantity(p("l")); !good {
		ok = false
	} else if l < 0 {
		e.bad(p("l"), calc.Negative).Got(calc.Fig(l, calc.Length))
		ok = false
	} else {
		r.Length = l
	}
	switch {
	case e.s.Has(p("d")):
		r.Diameter = positive(p("d"), "the inside diameter")
	case e.s.Has(p("nps")) || e.s.Has(p("sch")):
		ps, err := calc.LookupPipe(strings.TrimSpace(e.s.Get(p("nps"))), strings.TrimSpace(e.s.Get(p("sch"))))
		if err != nil {
			field := p("nps")
			var fe *calc.FieldError
			if errors.As(err, &fe) && fe.Field == "sch" {
				field = p("sch")
			}
			e.failAt(field, err)
			ok = false
		} else {
			r.Pipe = &ps
			r.Diameter = ps.ID
		}
	default:
		e.bad(p("d"), calc.Missing)
		ok = false
	}
	var mat *calc.Material
	if e.s.Has(p("mat")) {
		m, err := calc.LookupMaterial(strings.TrimSpace(e.s.Get(p("mat"))))
		if err != nil {
			e.failAt(p("mat"), err)
			ok = false
		} else {
			mat = &m
			r.Material = mat
		}
	}
	method := calc.MethodColebrook
	if e.s.Has("fm") {
		m, err := calc.ParseFrictionMethod(strings.TrimSpace(e.s.Get("fm")))
		if err != nil {
			e.failAt("fm", err)
			ok = false
		}
		method = m
	}
	switch {
	case e.s.Has(p("eps")):
		if eps, good := e.quantity(p("eps")); good {
			if eps < 0 {
				e.bad(p("eps"), calc.Negative).Got(calc.Fig(eps, calc.Length))
				ok = false
			}
			r.Roughness = eps
		} else {
			ok = false
		}
	case mat != nil:
		r.Roughness = mat.Roughness
	case method != calc.MethodHazenWilliams:
		e.bad(p("eps"), calc.Missing)
		ok = false
	}
	hc := 0.0
	switch {
	case e.s.Has("chw"):
		c, err := number("chw", e.s.Get("chw"))
		if err != nil || !(c > 0) {
			e.bad("chw", calc.NotPositive).Typed(e.s.Get("chw"))
			ok = false
		}
		hc = c
	case mat != nil:
		hc = mat.HazenC
	}
	if method == calc.MethodHazenWilliams && !(hc > 0) {
		e.bad("chw", calc.Missing).With("mat")
		ok = false
	}
	fits, err := ParseFittings(e.s.Get(p("fit")))
	if err != nil {
		e.failAt(p("fit"), err)
		ok = false
	}
	extra := 0.0
	if e.s.Has(p("k")) {
		k, err := number(p("k"), e.s.Get(p("k")))
		if err != nil || k < 0 {
			e.bad(p("k"), calc.Negative).Typed(e.s.Get(p("k")))
			ok = false
		}
		extra = k
	}
	if !ok {
		return calc.Run{}, nil, false
	}
	spec := calc.Run{Length: r.Length, Diameter: r.Diameter, Roughness: r.Roughness,
		Fittings: fits, ExtraK: extra, Method: method, HazenC: hc}
	return spec, r, true
}

// RunView is what the Run view shows: one run (the single run, or a
// segment of the line) at the flow, and the sizing table for it.
type RunView struct {
	// Segment is the segment of the line shown (1-based), 0 for the
	// single run.
	Segment int
	// Run is the run evaluated alone at the flow (no change of diameter
	// at its ends); nil when it cannot be (Result.Errors say why).
	Run *RunResult
	// Sizing is the run in each size of a pipe class; nil when it cannot
	// be worked out (Result.Errors say why, under szsch, vlo, vhi, grad).
	Sizing *Sizing
}

// Sizing is a sizing table: the run's length, fittings, roughness and
// friction method, at the flow, in every size of one pipe class.
type Sizing struct {
	Catalogue calc.Catalogue
	Class     string // as LookupPipe takes it ("SDR11", "40")
	Limits    calc.SizingLimits
	Rows      []calc.SizingRow
}

// runView fills Result.RunView for the Run view: the segment rseg of the
// line (segment 1 when not given), else the single run, and its sizing
// table.
func (e *eval) runView(line *calc.Line) {
	if e.s.Get("view") != "regime" || e.res.Fluid == nil {
		return
	}
	rv := &RunView{}
	pre := ""
	var spec calc.Run
	switch {
	case line != nil || e.s.SegmentCount() > 0:
		n := e.s.SegmentCount()
		rv.Segment = 1
		if t := strings.TrimSpace(e.s.Get("rseg")); t != "" {
			k, err := strconv.Atoi(t)
			if err != nil || k < 1 || k > n {
				e.bad("rseg", calc.OutOfRange).Typed(t).Within(calc.Num(1), calc.Num(float64(n))).Because(calc.ReasonRunSegment)
				e.res.RunView = rv
				return
			}
			rv.Segment = k
		}
		pre = SegmentParam(rv.Segment, "")
		e.res.RunView = rv
		s, meta, ok := e.readRun(pre)
		if !ok {
			return
		}
		q, ok := e.quantity("q")
		if !ok {
			return
		}
		rr, err := s.Evaluate(*e.res.Fluid, q)
		if err != nil {
			e.failErr("q", err)
			return
		}
		meta.RunResult, meta.Flow = rr, q
		spec, rv.Run = s, meta
		for _, w := range rr.Warnings {
			w.Segment = rv.Segment
			e.warnCalc("runview", w)
		}
	case e.s.Has("l"):
		e.res.RunView = rv
		if e.res.Run == nil {
			return // the run's or the flow's errors say why
		}
		rv.Run, spec = e.res.Run, e.runSpec
	default:
		return
	}
	e.sizing(rv, spec, pre, rv.Run.Flow)
}

// sizing works out the sizing table of the run shown: the class szsch,
// else the run's own class; the marks vlo, vhi and grad, else the
// defaults of calc.DefaultSizingLimits (common practice).
func (e *eval) sizing(rv *RunView, spec calc.Run, pre string, q float64) {
	class := strings.TrimSpace(e.s.Get("szsch"))
	if class == "" && rv.Run.Pipe != nil {
		class = rv.Run.Pipe.Schedule
	}
	if class == "" {
		class = classOfBore(rv.Run)
	}
	if class == "" {
		return // the Run view asks for a class; not an error
	}
	var cat calc.Catalogue
	var sizes []calc.PipeSize
	for _, c := range calc.Catalogues() {
		if s, err := c.Sizes(class); err == nil {
			cat, sizes = c, s
			break
		}
	}
	if sizes == nil {
		e.bad("szsch", calc.UnknownChoice).Typed(class).Because(calc.ReasonSizingClass)
		return
	}
	lim := calc.DefaultSizingLimits()
	ok := true
	for _, p := range []struct {
		name string
		v    *float64
	}{{"vlo", &lim.VelocityLow}, {"vhi", &lim.VelocityHigh}} {
		if e.s.Has(p.name) {
			v, good := e.quantity(p.name)
			ok = ok && good
			*p.v = v
		}
	}
	if e.s.Has("grad") {
		g, err := number("grad", e.s.Get("grad"))
		if err != nil || !(g > 0) {
			e.bad("grad", calc.NotPositive).Typed(e.s.Get("grad"))
			ok = false
		}
		lim.GradientMax = g / 100
	}
	if !ok {
		return
	}
	rows, err := calc.SizeRun(spec, *e.res.Fluid, q, sizes, lim)
	if err != nil {
		var fe *calc.FieldError
		field := "q"
		if errors.As(err, &fe) {
			switch fe.Field {
			case "vlo", "vhi", "grad":
				field = fe.Field
			case "sch":
				field = "szsch"
			default:
				if f := linkName(fe.Field); f != "" {
					field = pre + f
				}
			}
		}
		e.failAt(field, err)
		return
	}
	rv.Sizing = &Sizing{Catalogue: cat, Class: class, Limits: lim, Rows: rows}
}

// classOfBore is the class of the first catalogue size whose bore is the
// run's inside diameter (within 0.05 mm) and, when the run names a
// material, whose catalogue is of that material; "" when none is.
func classOfBore(r *RunResult) string {
	cats := map[string]string{}
	for _, c := range calc.Catalogues() {
		cats[c.Key] = c.Material
	}
	for _, p := range calc.PipeSizes() {
		if math.Abs(p.ID-r.Diameter) <= 0.05e-3 && (r.Material == nil || cats[p.Catalogue] == r.Material.Key) {
			return p.Schedule
		}
	}
	return ""
}
