package scenario

import (
	"errors"
	"fmt"
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
	res := Result{Errors: map[string]string{}}
	e := &eval{s: s, res: &res}
	switch u := strings.TrimSpace(s.Get("units")); u {
	case "", "si":
	case "us":
		e.us = true
	default:
		e.fail("units", fmt.Sprintf("%q is not a unit system; use si or us", u))
	}
	res.US = e.us
	if n := s.Get("name"); n != "" && (!printable(n) || len(n) > 200) {
		e.fail("name", "the title must be plain text of at most 200 characters")
	}
	if v := s.Get("view"); v != "" && !oneOf(v, Choices("view")) {
		e.fail("view", fmt.Sprintf("%q is not a view; use balance, convert or regime", v))
	}

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
	e.pump()
	e.npsh()
	e.field()
	e.turbine()
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

// fail records the first message for a parameter.
func (e *eval) fail(param, msg string) {
	if !strings.HasPrefix(msg, param+":") {
		msg = param + ": " + msg
	}
	if _, ok := e.res.Errors[param]; !ok {
		e.res.Errors[param] = msg
	}
}

// failErr records an error, under the field it names when it is a *calc.FieldError.
func (e *eval) failErr(param string, err error) {
	var fe *calc.FieldError
	if errors.As(err, &fe) && fe.Field != "" {
		if _, ok := known[fe.Field]; ok {
			e.fail(fe.Field, err.Error())
			return
		}
		// A field calc names internally ("re", "method"): report it under
		// the parameter the user typed.
		e.fail(param, param+": "+fe.Msg)
		return
	}
	e.fail(param, err.Error())
}

func (e *eval) warn(param, topic, text string) {
	e.res.Warnings = append(e.res.Warnings, Warning{Param: param, Topic: topic, Text: text})
}

// quantity parses a dimensioned parameter into SI. A missing value is an
// error that asks for it.
func (e *eval) quantity(param string) (float64, bool) {
	f := fields[baseParam(param)]
	text := e.s.Get(param)
	if strings.TrimSpace(text) == "" {
		e.fail(param, param+": "+missing[baseParam(param)])
		return 0, false
	}
	v, err := calc.Parse(param, text, f.dim, DefaultUnit(param, e.us))
	if err != nil {
		e.failErr(param, err)
		return 0, false
	}
	return v, true
}

// missing says what to enter when a needed parameter is absent.
var missing = map[string]string{
	"t":    "enter the liquid temperature",
	"rho":  "enter the liquid's density",
	"mu":   "enter the liquid's dynamic viscosity",
	"pv":   "enter the liquid's vapour pressure (absolute; 0 if negligible)",
	"p1":   "enter the pressure at point 1 (0 for a surface open to the air)",
	"p2":   "enter the pressure at point 2 (0 for a surface open to the air)",
	"z1":   "enter the elevation of point 1",
	"z2":   "enter the elevation of point 2",
	"v1":   "enter the velocity at point 1 (0 for a large tank surface), or its diameter d1",
	"v2":   "enter the velocity at point 2 (0 for a large tank surface), or its diameter d2",
	"q":    "enter the flow",
	"hp":   "enter the pump head (0 if there is no pump)",
	"ht":   "enter the turbine head (0 if there is no turbine)",
	"hf":   "enter the friction head, or describe the pipe run (length l) to compute it",
	"l":    "enter the length of the pipe run",
	"d":    "enter the inside diameter, or pick a nominal size and schedule",
	"eps":  "enter the roughness, or pick a material",
	"cv":   "enter a value to convert",
	"alt":  "enter the site altitude",
	"baro": "enter the barometer reading",
}

// site finds the site's barometric pressure: typed, from altitude, or the
// standard sea level with a warning.
func (e *eval) site() {
	switch {
	case e.s.Has("baro"):
		if p, ok := e.quantity("baro"); ok {
			if !(p > 0) {
				e.fail("baro", "baro: a barometer reading is an absolute pressure and must be above zero")
				return
			}
			e.res.SitePressure, e.res.SiteNote = p, "barometer reading"
		}
	case e.s.Has("alt"):
		if z, ok := e.quantity("alt"); ok {
			p, err := calc.StandardAtmosphere(z)
			if err != nil {
				e.failErr("alt", err)
				return
			}
			e.res.SitePressure, e.res.SiteNote = p, "ISO 2533 standard atmosphere at the site altitude"
		}
	default:
		e.res.SitePressure, e.res.SiteNote = seaLevel, "standard sea-level pressure (no altitude or barometer given)"
		e.warn("alt", "site", "no site altitude or barometer reading: the standard sea-level pressure 101.325 kPa is used for gauge ↔ absolute and the vapour-pressure check")
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
		p := e.res.SitePressure
		if p == 0 {
			p = seaLevel
		}
		psat, err := calc.SaturationPressure(t)
		if err != nil {
			e.failErr("t", err)
			return
		}
		if p < psat {
			e.warn("t", "liquid", "the water is at or above its boiling point at the site pressure; its properties are taken at the saturation pressure")
			p = psat
		}
		props := calc.Water
		if liq == "seawater" {
			props = calc.Seawater
		}
		fl, err := props(t, p)
		if err != nil {
			e.failErr("t", err)
			return
		}
		e.res.Fluid = &fl
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
		e.res.Fluid = &fl
	default:
		e.fail("liq", fmt.Sprintf("liq: %q is not a liquid Fieldhead knows; use water, seawater or custom", liq))
	}
}

// evalRun evaluates the pipe run at flow q for the Regime view.
func (e *eval) evalRun(r *RunResult, q float64) {
	rr, err := e.runSpec.Evaluate(*e.res.Fluid, q)
	if err != nil {
		e.failErr("q", err)
		return
	}
	r.RunResult, r.Flow = rr, q
	e.res.Run = r
	for _, w := range rr.Warnings {
		e.warn("l", "run", w)
	}
}

// number reads a plain number (no unit), comma or point decimal.
func number(param, text string) (float64, error) {
	t := strings.ReplaceAll(strings.TrimSpace(text), ",", ".")
	v, err := strconv.ParseFloat(t, 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, fmt.Errorf("%s: expected a plain number, got %q", param, text)
	}
	return v, nil
}
