package scenario

import (
	"strings"

	"fieldhead/calc"
)

// checkAll reads every parameter present in the scenario on its own, before
// any computation, so that every value that cannot be read (a wrong unit,
// a word where a number belongs, a choice that does not exist) is reported
// at once, not only once the inputs the computation reads first are fixed.
// Values needed but absent, and values out of a formulation's range, are
// found by the computation itself.
func (e *eval) checkAll() {
	for _, name := range AllParams() {
		text := strings.TrimSpace(e.s.Get(name))
		if text == "" {
			continue
		}
		p, _, _ := Lookup(name)
		switch p.Kind {
		case KindQuantity:
			e.checkQuantity(name, text, p)
		case KindList:
			e.list(name)
		case KindChoice:
			if cs := Choices(name); len(cs) > 0 && !oneOf(text, cs) {
				e.bad(name, calc.UnknownChoice).Typed(text)
			}
		case KindNumber:
			if _, err := number(name, text); err != nil {
				e.failErr(name, err)
			}
		case KindFittings:
			if _, err := ParseFittings(text); err != nil {
				e.failAt(name, err)
			}
		}
	}
}

// checkQuantity reads one dimensioned value; a pressure may carry a gauge
// or absolute suffix, and the Convert value may be a head of the liquid.
func (e *eval) checkQuantity(name, text string, p Param) {
	var err error
	if p.Dim == calc.Pressure {
		_, _, err = calc.ParsePressure(name, text, DefaultUnit(name, e.us))
		if err != nil && name == "cv" {
			if _, herr := calc.Parse(name, text, calc.Length, ""); herr == nil {
				return
			}
		}
	} else if _, u := Split(text); name == "spd" && isFrequency(u) {
		_, err = calc.Parse(name, text, calc.Frequency, "")
	} else {
		_, err = calc.Parse(name, text, p.Dim, DefaultUnit(name, e.us))
	}
	if err != nil {
		e.failErr(name, err)
	}
}

// choiceList writes the values of a short list of choices for a message;
// long lists (fittings, sizes) are not spelled out.
func choiceList(cs []Choice) string {
	if len(cs) > 8 {
		return "pick one from the list"
	}
	vs := make([]string, len(cs))
	for i, c := range cs {
		vs[i] = c.Value
		if !strings.EqualFold(c.Label, c.Value) {
			vs[i] += " (" + c.Label + ")"
		}
	}
	return "use " + strings.Join(vs, ", ")
}
