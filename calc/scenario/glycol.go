package scenario

import (
	"errors"

	"fieldhead/calc"
)

// glycol builds a glycol–water mix (liq=eg or pg) from its share, by mass
// (gly) or by volume (glyv), and its temperature.
func (e *eval) glycol(liq string) problems {
	gl := calc.EthyleneGlycol
	if liq == "pg" {
		gl = calc.PropyleneGlycol
	}
	share := "gly"
	if e.in.Side("gly") == "v" {
		share = "glyv"
	}
	mix := &GlycolMix{Glycol: gl, ByVolume: share == "glyv"}
	// The share alone gives the mix (and its freezing point); the
	// temperature is needed for the liquid's properties only.
	g := e.gather()
	t := g.quantity("t")
	haveT := !g.failed()
	v := g.quantity(share)
	if !e.in.OK(share) {
		return g.problems()
	}
	var err error
	if mix.ByVolume {
		mix.VolumeFraction = v
		mix.MassFraction, err = calc.GlycolMassFraction(gl, v)
	} else {
		mix.MassFraction = v
		mix.VolumeFraction, err = calc.GlycolVolumeFraction(gl, v)
	}
	if err != nil {
		g.failAt(share, err)
		return g.problems()
	}
	mix.FreezingPoint, err = calc.GlycolFreezingPoint(gl, mix.MassFraction)
	if err != nil {
		g.failAt(share, err)
		return g.problems()
	}
	e.res.Glycol = mix
	if !haveT || !e.siteKnown() {
		return g.problems()
	}
	p := e.res.SitePressure
	fl, err := calc.GlycolMix(gl, mix.MassFraction, t, p)
	var fe *calc.FieldError
	if errors.As(err, &fe) && fe.Field == "p" {
		// boiling at the site pressure: as for water, the properties are
		// taken at the mix's vapour pressure, with a warning
		var pv calc.Fluid
		if pv, err = calc.GlycolMix(gl, mix.MassFraction, t, calc.GlycolMaxPressure); err == nil {
			e.warnCalc("liquid", calc.Warn("t", calc.CautionGlycolBoiling))
			fl, err = calc.GlycolMix(gl, mix.MassFraction, t, pv.VapourPressure)
		}
	}
	if err != nil {
		g.failAt("t", err)
		return g.problems()
	}
	e.res.Fluid, e.res.LiquidFrom = &fl, LiquidSite
	if fl.Temperature > calc.GlycolFitMaxTemperature+1e-9 {
		e.warnCalc("liquid", calc.Warn("t", calc.CautionGlycolExtrapolated, calc.Fig(fl.Temperature, calc.Temperature), calc.Fig(calc.GlycolFitMaxTemperature, calc.Temperature)))
	}
	e.warnCalc("liquid", calc.Warn("liq", calc.CautionGlycolInhibitors))
	return g.problems()
}
