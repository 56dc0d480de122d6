package scenario

import (
	"errors"
	"math"
	"strconv"
	"strings"

	"fieldhead/calc"
)

// seaLevel is the ISO 2533 standard sea-level pressure, Pa.
const seaLevel = 101325.0

// eval carries one evaluation: the scenario, its unit system and the
// result being filled.
type eval struct {
	s       Scenario
	us      bool
	res     *Result
	runSpec calc.Run      // the pipe run as read, when run() returned non-nil
	bal     *calc.Balance // the balance as read, before solving
}

// Evaluate computes every part of the scenario whose inputs are present.
// It never fails as a whole: a bad or missing input is reported under its
// parameter in Result.Errors and only the parts that need it are left nil.
func Evaluate(s Scenario) Result {
	res := Result{Errors: map[string]*calc.FieldError{}}
	e := &eval{s: s, res: &res}
	switch u := strings.TrimSpace(s.Get("units")); u {
	case "", "si":
	case "us":
		e.us = true
	default:
		e.bad("units", calc.UnknownChoice).Typed(u)
	}
	res.US = e.us
	if n := s.Get("name"); n != "" && (!printable(n) || len(n) > 200) {
		e.bad("name", calc.AboveLimit).AtMost(calc.Num(200)).Because(calc.ReasonTitle)
	}

	e.checkAll()
	e.site()
	e.liquid()
	run := e.run()
	line := e.line()
	if e.wantsBalance() {
		e.balance(run, line)
	}
	if res.Line == nil && line != nil && res.Fluid != nil && s.Has("q") {
		// The line's own losses still show when the balance cannot be solved.
		if q, ok := e.quantity("q"); ok {
			if lr, err := line.Evaluate(*res.Fluid, q); err == nil {
				res.Line = &lr
			} else {
				e.failErr("q", err)
			}
		}
	}
	if res.Run == nil && run != nil && res.Fluid != nil && s.Has("q") {
		q, ok := e.quantity("q")
		if ok {
			e.evalRun(run, q)
		}
	}
	e.runView(line)
	e.pump()
	e.npsh(line)
	e.field()
	if e.res.Fluid != nil {
		e.energy()
	}
	e.turbine()
	e.surge(run, line)
	if s.Has("cv") {
		e.convert()
	}
	return res
}

func oneOf(v string, cs []Choice) bool {
	for _, c := range cs {
		if c.Value == v {
			return true
		}
	}
	return false
}

// bad records a problem of kind k with a parameter (the first one
// recorded for it is kept) and returns it for its data to be added.
func (e *eval) bad(param string, k calc.Kind) *calc.FieldError {
	fe := calc.NewFieldError(param, k)
	e.record(fe)
	return fe
}

// recordOther records an error that is not a *calc.FieldError (none is
// expected) under param, its Go text kept as a last resort.
func (e *eval) recordOther(param string, err error) {
	e.record(&calc.FieldError{Field: param, Kind: calc.KindOther, Msg: err.Error()})
}

// atItem marks err as about the 1-based item i of a list.
func atItem(err error, i int) error {
	var fe *calc.FieldError
	if errors.As(err, &fe) {
		fe.Item = i
	}
	return err
}

// record keeps the first problem recorded for its field.
func (e *eval) record(fe *calc.FieldError) {
	if _, ok := e.res.Errors[fe.Field]; !ok {
		e.res.Errors[fe.Field] = fe
	}
}

// failErr records an error under the parameter it concerns: the one a
// *calc.FieldError names when that is a parameter of the link (a
// segment's field under that segment's parameter), else param.
func (e *eval) failErr(param string, err error) {
	var fe *calc.FieldError
	if !errors.As(err, &fe) {
		e.recordOther(param, err)
		return
	}
	c := *fe
	c.Field, c.Segment = param, 0
	if f := linkName(fe.Field); fe.Segment > 0 && f != "" {
		c.Field = SegmentParam(fe.Segment, f)
	} else if _, ok := known[fe.Field]; ok && fe.Segment == 0 {
		c.Field = fe.Field
	}
	e.record(&c)
}

// failAt records err under param whatever field calc named: used where one
// calc field ("fit", "d") stands for several parameters ("s2.fit").
func (e *eval) failAt(param string, err error) {
	var fe *calc.FieldError
	if errors.As(err, &fe) {
		c := *fe
		c.Field, c.Segment = param, 0
		e.record(&c)
		return
	}
	e.recordOther(param, err)
}

// linkName is the link's name of a field calc names in a run ("length"
// is l, "method" fm), "" for one that is not a run's own.
func linkName(calcField string) string {
	switch calcField {
	case "length":
		return "l"
	case "method":
		return "fm"
	case "d", "eps", "fit", "k", "chw", "z", "cmp":
		return calcField
	}
	return ""
}

// warnCalc records a warning from calc, under its segment's parameter
// when it names a segment.
func (e *eval) warnCalc(topic string, w calc.Warning) {
	p := w.Field
	if f := linkName(w.Field); w.Segment > 0 && f != "" {
		p = SegmentParam(w.Segment, f)
	}
	e.res.Warnings = append(e.res.Warnings, Warning{Param: p, Topic: topic, Segment: w.Segment, Code: w.Code, Text: w.Text, Figures: w.Figures})
}

// quantity parses a dimensioned parameter into SI. A missing value is an
// error that asks for it.
func (e *eval) quantity(param string) (float64, bool) {
	p, _, _ := Lookup(param)
	text := e.s.Get(param)
	if strings.TrimSpace(text) == "" {
		e.bad(param, calc.Missing)
		return 0, false
	}
	v, err := calc.Parse(param, text, p.Dim, DefaultUnit(param, e.us))
	if err != nil {
		e.failErr(param, err)
		return 0, false
	}
	return v, true
}

// missingMsg says what to enter for a needed parameter that is absent.
func missingMsg(param string) string {
	p, _, _ := Lookup(param)
	return p.Missing
}

// site finds the site's barometric pressure: typed, from altitude, or the
// standard sea level with a warning.
func (e *eval) site() {
	switch {
	case e.s.Has("baro"):
		if p, ok := e.quantity("baro"); ok {
			if !(p > 0) {
				e.bad("baro", calc.NotPositive).Got(calc.Fig(p, calc.Pressure)).Because(calc.ReasonAbsolutePressure)
				return
			}
			e.res.SitePressure, e.res.SiteFrom = p, SiteBarometer
		}
	case e.s.Has("alt"):
		if z, ok := e.quantity("alt"); ok {
			p, err := calc.StandardAtmosphere(z)
			if err != nil {
				e.failErr("alt", err)
				return
			}
			e.res.SitePressure, e.res.SiteFrom = p, SiteAltitude
		}
	default:
		e.res.SitePressure, e.res.SiteFrom = seaLevel, SiteStandard
		e.warnCalc("site", calc.Warn("alt", calc.CautionStandardAtmosphere, calc.Fig(seaLevel, calc.Pressure)))
	}
}

// liquid builds the fluid at its temperature.
func (e *eval) liquid() {
	switch liq := strings.TrimSpace(e.s.Get("liq")); liq {
	case "", "water", "seawater":
		t, ok := e.quantity("t")
		if !ok {
			return
		}
		p, from, ok := e.linePressure()
		if !ok {
			return
		}
		psat, err := calc.SaturationPressure(t)
		if err != nil {
			e.failErr("t", err)
			return
		}
		if p < psat {
			if from == LiquidTyped {
				e.bad("pl", calc.BelowLimit).Got(calc.Fig(p, calc.Pressure)).AtLeast(calc.Fig(psat, calc.Pressure)).Because(calc.ReasonBoils, calc.Fig(t, calc.Temperature))
				return
			}
			e.warnCalc("liquid", calc.Warn("t", calc.CautionBoilingAtLine, calc.Fig(p, calc.Pressure), calc.Fig(psat, calc.Pressure)))
			p, from = psat, LiquidSaturation
		}
		props := calc.Water
		if liq == "seawater" {
			props = calc.Seawater
		}
		fl, err := props(t, p)
		if err != nil {
			var fe *calc.FieldError
			if errors.As(err, &fe) && fe.Field == "p" {
				c := *fe
				c.Field = "pl"
				if from != LiquidTyped && c.Reason == calc.ReasonBoils {
					c.Reason = calc.ReasonPointsMean
				}
				e.record(&c)
				return
			}
			e.failErr("t", err)
			return
		}
		e.res.Fluid, e.res.LiquidFrom = &fl, from
	case "eg", "pg":
		e.glycol(liq)
	case "custom":
		rho, ok1 := e.quantity("rho")
		mu, ok2 := e.quantity("mu")
		pv, ok3 := e.quantity("pv")
		if !ok1 || !ok2 || !ok3 {
			return
		}
		fl, err := calc.CustomLiquid(rho, mu, pv)
		if err != nil {
			e.failErr("rho", err)
			return
		}
		e.res.Fluid, e.res.LiquidFrom = &fl, LiquidTypedProps
	default:
		e.bad("liq", calc.UnknownChoice).Typed(liq)
	}
}

// linePressure is the absolute pressure water's and seawater's properties
// are taken at: pl when given, else the mean of the points' typed
// pressures, else the site pressure (doc.go). A bad pl is an error on pl;
// a point's bad pressure is left to the balance to report, and the mean is
// then of the others.
func (e *eval) linePressure() (float64, LiquidSource, bool) {
	site := e.res.SitePressure
	if site == 0 {
		site = seaLevel
	}
	if e.s.Has("pl") {
		p, ref, err := calc.ParsePressure("pl", e.s.Get("pl"), DefaultUnit("pl", e.us))
		if err != nil {
			e.failErr("pl", err)
			return 0, 0, false
		}
		abs, good := e.absolute("plref", ref)
		if !good {
			return 0, 0, false
		}
		if !abs {
			p += site
		}
		if !(p > 0) {
			e.bad("pl", calc.NotPositive).Got(calc.Fig(p, calc.Pressure)).Because(calc.ReasonAbsolutePressure)
			return 0, 0, false
		}
		return p, LiquidTyped, true
	}
	solve := strings.TrimSpace(e.s.Get("solve"))
	sum, n := 0.0, 0
	for _, pt := range []string{"p1", "p2"} {
		if solve == pt || strings.TrimSpace(e.s.Get(pt)) == "" {
			continue
		}
		p, ref, err := calc.ParsePressure(pt, e.s.Get(pt), DefaultUnit(pt, e.us))
		if err != nil {
			continue
		}
		abs, good := isAbsolute(e.s.Get(pt+"ref"), ref) // a bad ref is the balance's to report
		if !good {
			continue
		}
		if !abs {
			p += site
		}
		sum += p
		n++
	}
	if n > 0 {
		return sum / float64(n), LiquidPoints, true
	}
	return site, LiquidSite, true
}

// evalRun evaluates the pipe run at flow q for the Run view.
func (e *eval) evalRun(r *RunResult, q float64) {
	rr, err := e.runSpec.Evaluate(*e.res.Fluid, q)
	if err != nil {
		e.failErr("q", err)
		return
	}
	r.RunResult, r.Flow = rr, q
	e.res.Run = r
	for _, w := range rr.Warnings {
		if w.Field == "" {
			w.Field = "l"
		}
		e.warnCalc("run", w)
	}
}

// number reads a plain number (no unit), comma or point decimal.
func number(param, text string) (float64, error) {
	t := strings.ReplaceAll(strings.TrimSpace(text), ",", ".")
	v, err := strconv.ParseFloat(t, 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, calc.NewFieldError(param, calc.NotANumber).Typed(text)
	}
	return v, nil
}
