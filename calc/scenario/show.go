package scenario

import "fieldhead/calc"

// Show formats an SI value in the default display unit of its kind for the
// chosen unit system, with four significant digits.
func Show(si float64, dim calc.Dimension, us bool) string {
	return calc.FormatValue(si, calc.DefaultUnit(dim, us).Symbol, 4)
}

// ShowParam formats an SI value of a parameter in that parameter's default
// unit (mm or in for diameters, kPa or psi for pressures…).
func ShowParam(param string, si float64, us bool) string {
	u := DefaultUnit(param, us)
	if u == "" {
		return calc.FormatValue(si, "", 4)
	}
	return calc.FormatValue(si, u, 4)
}

// ShowSolved formats the solved unknown of a balance for display: main is
// the answer as the scenario asks for it (a pressure gauge or absolute as
// its pNref says), alt is the other form of a pressure ("" otherwise).
func ShowSolved(s Scenario, r Result) (main, alt string) {
	if r.Balance == nil {
		return "", ""
	}
	return ShowSolvedValue(s, r, r.Balance.Value)
}

// ShowSolvedValue is ShowSolved for another value of the unknown, such as
// a bound of a transitional range (ValueLow, ValueHigh).
func ShowSolvedValue(s Scenario, r Result, v float64) (main, alt string) {
	b := r.Balance
	if b == nil {
		return "", ""
	}
	p := b.Solve.String()
	us := r.US
	switch p {
	case "p1", "p2":
		abs := ShowParam(p, v, us) + " absolute"
		gauge := ShowParam(p, v-r.SitePressure, us) + " gauge"
		if s.Get(p+"ref") == "a" {
			return abs, gauge
		}
		return gauge, abs
	}
	return ShowParam(p, v, us), ""
}
