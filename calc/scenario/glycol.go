package scenario

import (
	"errors"

	"fieldhead/calc"
)

// glycol builds a glycol–water mix (liq=eg or pg) from its share, by mass
// (gly) or by volume (glyv), and its temperature.
func (e *eval) glycol(liq string) {
	g := calc.EthyleneGlycol
	if liq == "pg" {
		g = calc.PropyleneGlycol
	}
	share := "gly"
	if e.in.Side("gly") == "v" {
		share = "glyv"
	}
	mix := &GlycolMix{Glycol: g, ByVolume: share == "glyv"}
	v, okShare := e.quantity(share)
	t, okT := e.quantity("t")
	if !okShare {
		return
	}
	var err error
	if mix.ByVolume {
		mix.VolumeFraction = v
		mix.MassFraction, err = calc.GlycolMassFraction(g, v)
	} else {
		mix.MassFraction = v
		mix.VolumeFraction, err = calc.GlycolVolumeFraction(g, v)
	}
	if err != nil {
		e.failAt(share, err)
		return
	}
	mix.FreezingPoint, err = calc.GlycolFreezingPoint(g, mix.MassFraction)
	if err != nil {
		e.failAt(share, err)
		return
	}
	e.res.Glycol = mix
	if !okT || !e.siteKnown() {
		return
	}
	p := e.res.SitePressure
	fl, err := calc.GlycolMix(g, mix.MassFraction, t, p)
	var fe *calc.FieldError
	if errors.As(err, &fe) && fe.Field == "p" {
		// boiling at the site pressure: as for water, the properties are
		// taken at the mix's vapour pressure, with a warning
		var pv calc.Fluid
		if pv, err = calc.GlycolMix(g, mix.MassFraction, t, calc.GlycolMaxPressure); err == nil {
			e.warnCalc("liquid", calc.Warn("t", calc.CautionGlycolBoiling))
			fl, err = calc.GlycolMix(g, mix.MassFraction, t, pv.VapourPressure)
		}
	}
	if err != nil {
		e.failAt("t", err)
		return
	}
	e.res.Fluid, e.res.LiquidFrom = &fl, LiquidSite
	if fl.Temperature > calc.GlycolFitMaxTemperature+1e-9 {
		e.warnCalc("liquid", calc.Warn("t", calc.CautionGlycolExtrapolated, calc.Fig(fl.Temperature, calc.Temperature), calc.Fig(calc.GlycolFitMaxTemperature, calc.Temperature)))
	}
	e.warnCalc("liquid", calc.Warn("liq", calc.CautionGlycolInhibitors))
}
