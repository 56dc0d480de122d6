package scenario

import (
	"errors"
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
