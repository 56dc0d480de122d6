package scenario

import (
	"errors"
	"math"

	"fieldhead/calc"
)

// run reads the single pipe run, or returns nil when none is described
// (its length l is the sign of one).
func (e *eval) run() (*RunResult, problems) {
	if !e.has("l") {
		return nil, nil
	}
	g := e.gather()
	spec, meta := e.readRun(&g, "")
	if g.failed() {
		return nil, g.problems()
	}
	e.runSpec = spec
	return meta, nil
}

// readRun makes the pipe run named with prefix pre ("" for the single run,
// "s2." for segment 2) from its inputs, each group on the side the inputs
// use. The friction method and a typed Hazen–Williams C are shared by every
// run of the scenario. It reads every input of the run whatever g holds,
// and returns the zero Run and nil once g has failed.
func (e *eval) readRun(g *gather, pre string) (calc.Run, *RunResult) {
	p := func(f string) string { return pre + f }
	r := &RunResult{}
	// A length of zero is a run of fittings alone (a valve set), as calc
	// allows; Read refused a negative one.
	r.Length = g.quantity(p("l"))
	switch {
	case e.in.Side(p("pipe")) == "d" || !e.has(p("nps")) && !e.has(p("sch")):
		r.Diameter = g.quantity(p("d"))
	default:
		v, good := e.in.Value(p("nps"))
		if sch, ok := e.in.Value(p("sch")); ok && sch.Pipe != nil {
			v, good = sch, true
		}
		if !good || v.Pipe == nil {
			if !e.in.AnyBad(p("nps"), p("sch")) {
				g.bad(p("nps"), calc.Missing) // Read looks a size up only with both
			}
			g.fail()
			break
		}
		r.Pipe = v.Pipe
		r.Diameter = v.Pipe.ID
	}
	var mat *calc.Material
	if e.has(p("mat")) {
		mat = g.value(p("mat")).Material
		r.Material = mat
	}
	method := calc.MethodColebrook
	if e.has("fm") {
		m, err := calc.ParseFrictionMethod(e.in.Choice("fm"))
		if err != nil {
			g.fail() // Read reported it
		}
		method = m
	}
	switch {
	case e.has(p("eps")):
		r.Roughness = g.quantity(p("eps"))
	case mat != nil:
		r.Roughness = mat.Roughness
	case method != calc.MethodHazenWilliams && !e.in.Bad(p("mat")):
		g.bad(p("eps"), calc.Missing)
	}
	hc := 0.0
	switch {
	case e.has("chw"):
		hc = g.quantity("chw")
	case mat != nil:
		hc = mat.HazenC
	}
	if method == calc.MethodHazenWilliams && !(hc > 0) && !e.in.Bad("chw") {
		g.bad("chw", calc.Missing).With("mat")
	}
	fit := g.value(p("fit"))
	extra := g.optional(p("k"))
	if g.failed() {
		return calc.Run{}, nil
	}
	spec := calc.Run{Length: r.Length, Diameter: r.Diameter, Roughness: r.Roughness,
		Fittings: fit.Fittings, ExtraK: extra, Method: method, HazenC: hc}
	return spec, r
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

// runView works out Result.RunView for the Run view: the segment rseg of
// the line (segment 1 when not given), else the single run, and its
// sizing table.
func (e *eval) runView(line *calc.Line) (*RunView, problems) {
	if e.in.View != "regime" || e.res.Fluid == nil {
		return nil, nil
	}
	rv := &RunView{}
	pre := ""
	var spec calc.Run
	g := e.gather()
	switch {
	case line != nil || e.in.Segments > 0:
		rv.Segment = 1
		if e.has("rseg") {
			if e.in.Bad("rseg") {
				return rv, nil // Read reported it
			}
			rv.Segment = e.in.RunSegment()
		}
		pre = SegmentParam(rv.Segment, "")
		s, meta := e.readRun(&g, pre)
		if g.failed() {
			return rv, g.problems()
		}
		q := e.flow(&g)
		if g.failed() {
			return rv, g.problems()
		}
		rr, err := s.Evaluate(*e.res.Fluid, q)
		if err != nil {
			g.failErr("q", err)
			return rv, g.problems()
		}
		meta.RunResult, meta.Flow = rr, q
		spec, rv.Run = s, meta
		for _, w := range rr.Warnings {
			w.Segment = rv.Segment
			e.warnCalc("runview", w)
		}
	case e.has("l"):
		if e.res.Run == nil {
			return rv, nil // the run's or the flow's errors say why
		}
		rv.Run, spec = e.res.Run, e.runSpec
	default:
		return nil, nil
	}
	rv.Sizing = e.sizing(&g, rv.Run, spec, pre)
	return rv, g.problems()
}

// sizing works out the sizing table of the run shown, r: the class szsch,
// else the run's own class; the marks vlo, vhi and grad, else the
// defaults of calc.DefaultSizingLimitsFor the sheet's units (common
// practice: a US sheet's are round figures in ft/s of their own). It is
// nil when no class is known, or with a problem (recorded in g).
func (e *eval) sizing(g *gather, r *RunResult, spec calc.Run, pre string) *Sizing {
	if e.in.Bad("szsch") {
		return nil
	}
	class := e.in.Choice("szsch")
	if class == "" && r.Pipe != nil {
		class = r.Pipe.Schedule
	}
	if class == "" {
		class = classOfBore(r)
	}
	if class == "" {
		return nil // the Run view asks for a class; not an error
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
		g.bad("szsch", calc.UnknownChoice).Typed(class).Because(calc.ReasonSizingClass)
		return nil
	}
	lim := calc.DefaultSizingLimitsFor(e.in.US)
	for _, p := range []struct {
		name string
		v    *float64
	}{{"vlo", &lim.VelocityLow}, {"vhi", &lim.VelocityHigh}, {"grad", &lim.GradientMax}} {
		if e.has(p.name) {
			*p.v = g.quantity(p.name)
		}
	}
	if e.has("grad") {
		lim.GradientMax /= 100 // typed per 100 of length
	}
	if g.failed() {
		return nil
	}
	rows, err := calc.SizeRun(spec, *e.res.Fluid, r.Flow, sizes, lim)
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
		g.failAt(field, err)
		return nil
	}
	return &Sizing{Catalogue: cat, Class: class, Limits: lim, Rows: rows}
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
