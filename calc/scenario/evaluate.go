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

// eval carries one evaluation: the inputs, and the result being filled.
type eval struct {
	in      *Inputs
	us      bool
	res     *Result
	runSpec calc.Run      // the pipe run as read, when run() returned non-nil
	bal     *calc.Balance // the balance as read, before solving
}

// Evaluate computes every part of the scenario whose inputs are present
// and usable. It never fails as a whole: a bad or missing input is
// reported under its parameter in Result.Errors, and every part that
// reads it (Uses) is left nil. in is what Read made of a scenario.
func Evaluate(in Inputs) Result {
	res := Result{Errors: make(map[string]*calc.FieldError, len(in.Problems)), Inputs: in, US: in.US}
	for k, fe := range in.Problems {
		res.Errors[k] = fe
	}
	e := &eval{in: &res.Inputs, us: in.US, res: &res}
	// Each evaluator returns the problems it found; they are added here,
	// in order, so the first recorded for a parameter is the one kept.
	var ps problems
	res.SitePressure, res.SiteFrom, ps = e.site()
	e.report(ps)
	e.report(e.liquid())
	if e.flowFromLoad() {
		res.Heat, ps = e.heatFromLoad()
		e.report(ps)
	}
	run, ps := e.run()
	e.report(ps)
	line, ps := e.line()
	e.report(ps)
	if e.wantsBalance() && !e.in.Bad("loop") {
		e.report(e.balance(run, line))
	}
	if res.Line == nil && line != nil && res.Fluid != nil && e.hasFlow() {
		// The line's own losses still show when the balance cannot be solved.
		res.Line, ps = e.lineAlone(line)
		e.report(ps)
	}
	if res.Run == nil && run != nil && res.Fluid != nil && e.hasFlow() {
		e.report(e.runAlone(run))
	}
	if !e.flowFromLoad() {
		res.Heat, ps = e.heatOfFlow()
		e.report(ps)
	}
	res.Valves, ps = e.valves()
	e.report(ps)
	res.RunView, ps = e.runView(line)
	e.report(ps)
	res.Pump, ps = e.pump()
	e.report(ps)
	e.report(e.npsh(line))
	res.Field, ps = e.field()
	e.report(ps)
	if res.Field != nil {
		res.FieldBands, ps = e.bands(*res.Field)
		e.report(ps)
		res.Acceptance = e.accept(*res.Field)
	}
	res.Test, ps = e.test()
	e.report(ps)
	res.Guarantee, ps = e.guarantee()
	e.report(ps)
	if e.res.Fluid != nil {
		res.Energy, ps = e.energy()
		e.report(ps)
	}
	e.report(e.turbine())
	res.Surge, ps = e.surge(run, line)
	e.report(ps)
	if e.has("cv") {
		res.Convert = e.convert()
	}
	// The table of what each part reads has the last word: a part that
	// reads an input in error is left out, whatever path computed it
	// (TestUsesExactly keeps the evaluators and the table in step).
	if res.Inputs.anyBad {
		for _, p := range Parts() {
			if res.Worked(p) && res.Inputs.AnyBad(res.Inputs.Uses(p)...) {
				res.drop(p)
			}
		}
	}
	return res
}

// has reports whether param is given (usable or not).
func (e *eval) has(param string) bool { return e.in.Given(param) }

func oneOf(v string, cs []Choice) bool {
	for _, c := range cs {
		if c.Value == v {
			return true
		}
	}
	return false
}

// problems holds the problems of one evaluation or one reading, keyed by
// parameter; the first recorded for a parameter is kept.
type problems map[string]*calc.FieldError

// bad records a problem of kind k with param and returns it for its data
// to be added.
func (ps problems) bad(param string, k calc.Kind) *calc.FieldError {
	fe := calc.NewFieldError(param, k)
	ps.record(fe)
	return fe
}

// record keeps the first problem recorded for its field.
func (ps problems) record(fe *calc.FieldError) {
	if _, ok := ps[fe.Field]; !ok {
		ps[fe.Field] = fe
	}
}

// failAt records err under param (see problemAt).
func (ps problems) failAt(param string, err error) { ps.record(problemAt(param, err)) }

// problemAt is err as a problem of param whatever field calc named: used
// where one calc field ("fit", "d") stands for several parameters
// ("s2.fit"). An error that is not a *calc.FieldError (none is expected)
// keeps its Go text as a last resort.
func problemAt(param string, err error) *calc.FieldError {
	var fe *calc.FieldError
	if errors.As(err, &fe) {
		c := *fe
		c.Field, c.Segment = param, 0
		return &c
	}
	return &calc.FieldError{Field: param, Kind: calc.KindOther, Msg: err.Error()}
}

// atItem marks err as about the 1-based item i of a list.
func atItem(err error, i int) error {
	var fe *calc.FieldError
	if errors.As(err, &fe) {
		fe.Item = i
	}
	return err
}

// problemOf is err as a problem of the parameter it concerns: the one a
// *calc.FieldError names when that is a parameter of the link (a
// segment's field under that segment's parameter), else param.
func problemOf(param string, err error) *calc.FieldError {
	var fe *calc.FieldError
	if !errors.As(err, &fe) {
		return problemAt(param, err)
	}
	c := *fe
	c.Field, c.Segment = param, 0
	if f := linkName(fe.Field); fe.Segment > 0 && f != "" {
		c.Field = SegmentParam(fe.Segment, f)
	} else if _, ok := known[fe.Field]; ok && fe.Segment == 0 {
		c.Field = fe.Field
	}
	return &c
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

// missingMsg says what to enter for a needed parameter that is absent.
func missingMsg(param string) string {
	p, _, _ := Lookup(param)
	return p.Missing
}

// site finds the site's barometric pressure: typed, from altitude, or the
// standard sea level with a warning when neither is given. With the one
// given in error (or both given) the site pressure stays unknown (0), and
// so does everything that needs it.
func (e *eval) site() (float64, SiteSource, problems) {
	if !e.has("alt") && !e.has("baro") {
		e.warnCalc("site", calc.Warn("alt", calc.CautionStandardAtmosphere, calc.Fig(seaLevel, calc.Pressure)))
		return seaLevel, SiteStandard, nil
	}
	side := e.in.Side("site")
	v, ok := e.in.Value(side)
	if !ok {
		return 0, 0, nil
	}
	if side == "baro" {
		return v.SI, SiteBarometer, nil
	}
	p, err := calc.StandardAtmosphere(v.SI)
	if err != nil {
		g := e.gather()
		g.failErr("alt", err) // Read checked the range: not expected
		return 0, 0, g.problems()
	}
	return p, SiteAltitude, nil
}

// siteKnown reports whether the site pressure is known.
func (e *eval) siteKnown() bool { return e.res.SitePressure > 0 }

// liquid builds the fluid at its temperature.
func (e *eval) liquid() problems {
	if e.in.Bad("liq") {
		return nil
	}
	g := e.gather()
	switch liq := e.in.Choice("liq"); liq {
	case "", "water", "seawater":
		t := g.quantity("t")
		if g.failed() {
			return g.problems()
		}
		p, from := e.linePressure(&g)
		if g.failed() {
			return g.problems()
		}
		props := calc.Water
		if liq == "seawater" {
			if e.in.Bad("sal") {
				return nil // Read reported it
			}
			sal := e.salinity()
			props = func(t, p float64) (calc.Fluid, error) { return calc.SeawaterAt(t, p, sal) }
		}
		psat, err := calc.SaturationPressure(t)
		if err != nil {
			// The liquid's own range is narrower than the saturation
			// line's: quote it, as a temperature above it does.
			var fe *calc.FieldError
			if _, lerr := props(t, 1e5); errors.As(lerr, &fe) && fe.Field == "t" {
				err = lerr
			}
			g.failErr("t", err)
			return g.problems()
		}
		if p < psat {
			if from == LiquidTyped {
				g.bad("pl", calc.BelowLimit).Got(calc.Fig(p, calc.Pressure)).AtLeast(calc.Fig(psat, calc.Pressure)).Because(calc.ReasonBoils, calc.Fig(t, calc.Temperature))
				return g.problems()
			}
			e.warnCalc("liquid", calc.Warn("t", calc.CautionBoilingAtLine, calc.Fig(p, calc.Pressure), calc.Fig(psat, calc.Pressure)))
			p, from = psat, LiquidSaturation
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
				g.record(&c)
				return g.problems()
			}
			g.failErr("t", err)
			return g.problems()
		}
		e.res.Fluid, e.res.LiquidFrom = &fl, from
	case "eg", "pg":
		return e.glycol(liq)
	case "custom":
		rho, mu, pv := g.quantity("rho"), g.quantity("mu"), g.quantity("pv")
		if g.failed() {
			return g.problems()
		}
		fl, err := calc.CustomLiquid(rho, mu, pv)
		if err != nil {
			g.failErr("rho", err)
			return g.problems()
		}
		e.res.Fluid, e.res.LiquidFrom = &fl, LiquidTypedProps
	default:
		g.bad("liq", calc.UnknownChoice).Typed(liq)
	}
	return g.problems()
}

// linePressure is the absolute pressure water's and seawater's properties
// are taken at: pl when given, else the mean of the points' typed
// pressures, else the site pressure (doc.go). g fails when the one it
// needs cannot be used (in error, or a gauge pressure at an unknown site):
// the properties are never taken at another pressure than the sheet says.
func (e *eval) linePressure(g *gather) (float64, LiquidSource) {
	site := e.res.SitePressure
	absolute := func(v Value) (float64, bool) {
		if v.Abs {
			return v.SI, true
		}
		return v.SI + site, e.siteKnown()
	}
	if e.has("pl") {
		v, ok := e.in.Value("pl")
		if !ok {
			g.fail()
			return 0, 0
		}
		p, ok := absolute(v)
		if !ok {
			g.fail()
			return 0, 0
		}
		if !(p > 0) {
			g.bad("pl", calc.NotPositive).Got(calc.Fig(p, calc.Pressure)).Because(calc.ReasonAbsolutePressure)
			return 0, 0
		}
		return p, LiquidTyped
	}
	if e.isLoop() {
		// A closed loop's level is its static pressure at the connection
		// of its expansion vessel or pressurisation unit.
		if !e.has("pexp") {
			if !e.siteKnown() {
				g.fail()
			}
			return site, LiquidSite
		}
		v, ok := e.in.Value("pexp")
		if !ok {
			g.fail()
			return 0, 0
		}
		p, ok := absolute(v)
		if !ok || !(p > 0) {
			g.fail()
			return 0, 0
		}
		return p, LiquidLoop
	}
	solve := e.in.Choice("solve")
	sum, n := 0.0, 0
	for _, pt := range []string{"p1", "p2"} {
		if solve == pt || !e.has(pt) {
			continue
		}
		v, ok := e.in.Value(pt)
		if !ok {
			g.fail()
			return 0, 0
		}
		p, ok := absolute(v)
		if !ok {
			g.fail()
			return 0, 0
		}
		sum += p
		n++
	}
	if n > 0 {
		return sum / float64(n), LiquidPoints
	}
	if !e.siteKnown() {
		g.fail()
	}
	return site, LiquidSite
}

// lineAlone evaluates the line alone at the flow, for its own losses to
// show when the balance cannot be solved.
func (e *eval) lineAlone(line *calc.Line) (*calc.LineResult, problems) {
	q, ok := e.knownFlow()
	if !ok {
		return nil, nil
	}
	lr, err := line.Evaluate(*e.res.Fluid, q)
	if err != nil {
		g := e.gather()
		g.failErr("q", err)
		return nil, g.problems()
	}
	return &lr, nil
}

// runAlone evaluates the pipe run alone at the flow, for the Run view,
// when the balance did not.
func (e *eval) runAlone(r *RunResult) problems {
	q, ok := e.knownFlow()
	if !ok {
		return nil
	}
	rr, err := e.runSpec.Evaluate(*e.res.Fluid, q)
	if err != nil {
		g := e.gather()
		g.failErr("q", err)
		return g.problems()
	}
	r.RunResult, r.Flow = rr, q
	e.res.Run = r
	for _, w := range rr.Warnings {
		if w.Field == "" {
			w.Field = "l"
		}
		e.warnCalc("run", w)
	}
	return nil
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
