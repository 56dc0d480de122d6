package scenario

import "fieldhead/calc"

// convert reads cv as a pressure (any unit, water columns included) or as a
// head of the liquid (a length), and shows it every way.
func (e *eval) convert() *ConvertResult {
	v, ok := e.in.Value("cv")
	if !ok {
		return nil
	}
	if !e.siteKnown() {
		return nil // the site's own error says why
	}
	var gauge, abs, head float64
	p := v.SI
	isHead := v.Dim == calc.Length
	if isHead {
		head = v.SI
	}
	fl := e.res.Fluid
	if fl == nil {
		if isHead {
			return nil // a head needs the liquid: t's own message says why
		}
	}
	site := e.res.SitePressure
	rhog := 0.0
	if fl != nil {
		rhog = fl.Density * calc.StandardGravity
	}
	if isHead {
		gauge = head * rhog
		abs = gauge + site
		if e.in.Choice("cvref") == "a" {
			abs, gauge = gauge, gauge-site
		}
	} else {
		if v.Abs {
			abs, gauge = p, p-site
		} else {
			gauge, abs = p, p+site
		}
		if rhog > 0 {
			head = gauge / rhog
		}
	}
	cr := &ConvertResult{Gauge: gauge, Absolute: abs, Head: head}
	if rhog > 0 {
		cr.AbsoluteHead = abs / rhog
	}
	row := func(label, unit string, v float64) {
		cr.Rows = append(cr.Rows, ConvertRow{Label: label, Text: calc.FormatValue(v, unit, 5)})
	}
	row("gauge pressure", "kPa", gauge)
	row("gauge pressure", "bar", gauge)
	row("gauge pressure", "psi", gauge)
	row("absolute pressure", "kPa", abs)
	row("absolute pressure", "psi", abs)
	if fl != nil {
		row("head of this liquid (gauge)", "m", head)
		row("head of this liquid (gauge)", "ft", head)
		row("head of this liquid (absolute)", "m", abs/rhog)
	}
	row("conventional water column", "mH2O", gauge)
	row("conventional water column", "ftH2O", gauge)
	row("conventional water column", "inH2O", gauge)
	if abs <= 0 {
		e.warnCalc("convert", calc.Warn("cv", calc.CautionConvertBelowZero))
	}
	return cr
}
