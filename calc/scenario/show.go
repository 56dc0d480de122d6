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
