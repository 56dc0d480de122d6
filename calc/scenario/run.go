package scenario

import (
	"errors"
	"math"

	"fieldhead/calc"
)

// run reads the single pipe run, or returns nil when none is described
// (its length l is the sign of one).
func (e *eval) run() *RunResult {
	if !e.has("l") {
		return nil
	}
	spec, meta, ok := e.readRun("")
	if !ok {
		return nil
	}
	e.runSpec = spec
	return meta
}

// readRun makes the pipe run named with prefix pre ("" for the single run,
// "s2." for segment 2) from its inputs, each group on the side the inputs
// use. The friction method and a typed Hazen–Williams C are shared by every
// run of the scenario.
func (e *eval) readRun(pre string) (calc.Run, *RunResult, bool) {
	p := func(f string) string { return pre + f }
	r := &RunResult{}
	ok := true
	// A length of zero is a run of fittings alone (a valve set), as calc
	// allows; Read refused a negative one.
	l, good := e.quantity(p("l"))
	ok = ok && good
	r.Length = l
	switch {
	case e.in.Side(p("pipe")) == "d" || !e.has(p("nps")) && !e.has(p("sch")):
		d, good := e.quantity(p("d"))
		ok = ok && good
		r.Diameter = d
	default:
		v, good := e.in.Value(p("nps"))
		if sch, g := e.in.Value(p("sch")); g && sch.Pipe != nil {
			v, good = sch, true
		}
		if !good || v.Pipe == nil {
			if !e.in.AnyBad(p("nps"), p("sch")) {
				e.bad(p("nps"), calc.Missing) // Read looks a size up only with both
			}
			ok = false
			break
		}
		r.Pipe = v.Pipe
		r.Diameter = v.Pipe.ID
	}
	var mat *calc.Material
	if e.has(p("mat")) {
		v, good := e.in.Value(p("mat"))
		ok = ok && good
		mat = v.Material
		r.Material = mat
	}
	method := calc.MethodColebrook
	if e.has("fm") {
		m, err := calc.ParseFrictionMethod(e.in.Choice("fm"))
		if err != nil {
			ok = false // Read reported it
		}
		method = m
	}
	switch {
	case e.has(p("eps")):
		eps, good := e.quantity(p("eps"))
		ok = ok && good
		r.Roughness = eps
	case mat != nil:
		r.Roughness = mat.Roughness
	case method != calc.MethodHazenWilliams && !e.in.Bad(p("mat")):
		e.bad(p("eps"), calc.Missing)
		ok = false
	}
	hc := 0.0
	switch {
	case e.has("chw"):
		c, good := e.quantity("chw")
		ok = ok && good
		hc = c
	case mat != nil:
		hc = mat.HazenC
	}
	if method == calc.MethodHazenWilliams && !(hc > 0) && !e.in.Bad("chw") {
		e.bad("chw", calc.Missing).With("mat")
		ok = false
	}
	fit, good := e.optionalValue(p("fit"))
	ok = ok && good
	extra, good := e.optional(p("k"))
	ok = ok && good
	if !ok {
		return calc.Run{}, nil, false
	}
	spec := calc.Run{Length: r.Length, Diameter: r.Diameter, Roughness: r.Roughness,
		Fittings: fit.Fittings, ExtraK: extra, Method: method, HazenC: hc}
	return spec, r, true
}

// optionalValue is an optional parameter as read: the zero Value and true
// when absent, false when Bad.
func (e *eval) optionalValue(param string) (Value, bool) {
	v, ok := e.in.vals[param]
	return v, !ok || !v.Bad
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
	if e.in.View != "regime" || e.res.Fluid == nil {
		return
	}
	rv := &RunView{}
	pre := ""
	var spec calc.Run
	switch {
	case line != nil || e.in.Segments > 0:
		rv.Segment = 1
		if e.has("rseg") {
			if e.in.Bad("rseg") {
				e.res.RunView = rv // Read reported it
				return
			}
			rv.Segment = e.in.RunSegment()
		}
		pre = SegmentParam(rv.Segment, "")
		e.res.RunView = rv
		s, meta, ok := e.readRun(pre)
		if !ok {
			return
		}
		q, ok := e.flow()
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
	case e.has("l"):
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
// defaults of calc.DefaultSizingLimitsFor the sheet's units (common
// practice: a US sheet's are round figures in ft/s of their own).
func (e *eval) sizing(rv *RunView, spec calc.Run, pre string, q float64) {
	if e.in.Bad("szsch") {
		return
	}
	class := e.in.Choice("szsch")
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
	lim := calc.DefaultSizingLimitsFor(e.in.US)
	ok := true
	for _, p := range []struct {
		name string
		v    *float64
	}{{"vlo", &lim.VelocityLow}, {"vhi", &lim.VelocityHigh}, {"grad", &lim.GradientMax}} {
		if e.has(p.name) {
			v, good := e.quantity(p.name)
			ok = ok && good
			*p.v = v
		}
	}
	if e.has("grad") {
		lim.GradientMax /= 100 // typed per 100 of length
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
