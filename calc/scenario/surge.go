package scenario

import (
	"errors"
	"math"
	"slices"

	"fieldhead/calc"
)

// SurgeResult is the screening estimate of a fast closure at point 2 with
// what it was worked out from.
type SurgeResult struct {
	calc.SurgeResult
	ClosureTime float64 // s
	BulkModulus float64 // K of the liquid used, Pa
	// BulkFrom says where K comes from: "if97" (water, ρ·w² of IAPWS-IF97),
	// "mackenzie" (seawater, ρ·c² with Mackenzie's sound speed) or "typed".
	BulkFrom string
	Pipes    []SurgePipe // from point 1 to the valve at point 2
	// Static is the gauge pressure at point 2 with the flow stopped: the
	// higher of point 1's level and pressure held on the closed valve,
	// p1 + ρ·g·(z1 − z2), and point 2's own pressure. On a closed loop it
	// is the loop's static pressure at the valve's elevation (zv; blank:
	// the pump's). StaticKnown is false without a solved balance, and on a
	// loop without its static pressure (pexp): the figures are then rises
	// only.
	Static      float64
	StaticKnown bool
	// Peak is Static + the rise, Pa gauge; StaticHead and PeakHead are
	// Static and Peak as heads of the liquid, m. All 0 unless StaticKnown.
	Peak, StaticHead, PeakHead float64
}

// SurgePipe is one pipe of the surge estimate with where its wall figures
// come from.
type SurgePipe struct {
	calc.SurgePipe
	WallFrom    string // "catalogue" (the pipe size picked) or "typed"
	ModulusFrom string // "material" (its key in Material) or "typed"
	Material    string // the material's name, "" when typed
}

// surge works out the surge of a closure at point 2 when a closure time
// is given: the liquid's bulk modulus, each pipe's wall and modulus, then
// calc.Surge.
func (e *eval) surge(run *RunResult, line *calc.Line) (*SurgeResult, problems) {
	if !e.has("tc") || e.res.Fluid == nil || !e.siteKnown() {
		return nil, nil
	}
	g := e.gather()
	tc := g.quantity("tc")
	k, from := e.bulkModulus(&g)
	dv := g.optional("dv")
	c := 1.0
	if e.has("cr") {
		c = g.quantity("cr")
	}
	pipes := e.surgePipes(&g, run, line, c)
	loop, zv := e.isLoop(), 0.0
	if loop && e.has("zv") {
		zv = g.quantity("zv")
	}
	if g.failed() {
		return nil, g.problems()
	}
	// The flow stopped: the balance's, else the flow typed; none (the
	// velocity change typed instead) leaves calc to ask for one.
	q := 0.0
	switch {
	case e.res.Balance != nil:
		q = e.res.Balance.Q
	case e.hasFlow():
		var ok bool
		if q, ok = e.knownFlow(); !ok {
			return nil, nil // Read reported it: no surge from a flow in error
		}
	}
	for i := range pipes {
		d := pipes[i].Diameter
		pipes[i].Velocity = q / (math.Pi * d * d / 4)
	}
	fl := e.res.Fluid
	in := calc.Surge{Density: fl.Density, BulkModulus: k, ClosureTime: tc, DeltaV: dv,
		Static: e.res.SitePressure, VapourPressure: fl.VapourPressure}
	out := &SurgeResult{ClosureTime: tc, BulkModulus: k, BulkFrom: from, Pipes: pipes}
	switch br := e.res.Balance; {
	case br == nil:
	case loop && !e.has("pexp"):
		// The loop's level is not given: its balance stands the site's
		// pressure in at the pump, which says nothing of the valve's.
	case loop:
		// At rest the loop's pressure is its static pressure carried by
		// elevation (hydrostatics): at the pump's inlet, br.In, and at
		// the valve, ρ·g higher per metre below it.
		if !e.has("zv") {
			zv = br.In.Z
		}
		in.Static = br.In.P + fl.Density*calc.StandardGravity*(br.In.Z-zv)
		out.StaticKnown = true
	default:
		rhog := fl.Density * calc.StandardGravity
		in.Static = math.Max(br.In.P+rhog*(br.In.Z-br.Out.Z), br.Out.P)
		out.StaticKnown = true
	}
	for _, p := range pipes {
		in.Pipes = append(in.Pipes, p.SurgePipe)
	}
	r, err := in.Evaluate()
	if err != nil {
		var fe *calc.FieldError
		if errors.As(err, &fe) && isKnown(fe.Field) {
			g.failAt(fe.Field, err) // a surge input, whichever segment
			return nil, g.problems()
		}
		g.failErr("tc", err)
		return nil, g.problems()
	}
	out.SurgeResult = r
	if out.StaticKnown {
		rhog := fl.Density * calc.StandardGravity
		out.Static = in.Static - e.res.SitePressure
		out.Peak = out.Static + r.DeltaP
		out.StaticHead, out.PeakHead = out.Static/rhog, out.Peak/rhog
	} else {
		out.Static = in.Static - e.res.SitePressure
		// calc took the site's pressure for the static: whether the
		// column parts is not known, only the static it would take.
		out.ColumnParts = false
		out.Warnings = slices.DeleteFunc(out.Warnings, func(w calc.Warning) bool { return w.Code == calc.CautionSurgeColumnParts })
		out.Warnings = append(out.Warnings, calc.Warn("tc", calc.CautionSurgeColumnUnknown,
			calc.Fig(r.DeltaP+fl.VapourPressure-e.res.SitePressure, calc.Pressure)))
	}
	for _, w := range out.Warnings {
		e.warnCalc("surge", w)
	}
	return out, nil
}

// bulkModulus is the liquid's bulk modulus: typed (kliq), else from the
// speed of sound of water or seawater; another liquid needs it typed.
func (e *eval) bulkModulus(g *gather) (float64, string) {
	if e.has("kliq") {
		return g.quantity("kliq"), "typed"
	}
	// At the pressure the density was taken at: the wave speed is
	// √(K/ρ), both of one state of the liquid.
	fl := e.res.Fluid
	p := math.Max(fl.Pressure, fl.VapourPressure)
	switch e.in.Choice("liq") {
	case "", "water":
		k, err := calc.WaterBulkModulus(fl.Temperature, p)
		if err != nil {
			g.failErr("t", err)
			return 0, ""
		}
		return k, "if97"
	case "seawater":
		if sal := e.salinity(); sal != calc.SeawaterSalinity {
			// Mackenzie's sound speed is taken at 35 g/kg only.
			g.bad("kliq", calc.Missing).Got(calc.Num(sal)).Because(calc.ReasonBulkSalinity, calc.Num(calc.SeawaterSalinity))
			return 0, ""
		}
		k, err := calc.SeawaterBulkModulus(fl.Temperature, p)
		if err != nil {
			g.failErr("t", err)
			return 0, ""
		}
		return k, "mackenzie"
	}
	g.bad("kliq", calc.Missing).Because(calc.ReasonBulkUnknown)
	return 0, ""
}

// surgePipes are the pipes between the points, each with its wall
// thickness (from the size picked, else the typed wall) and its wall's
// modulus (typed epipe, else the material's), restraint factor c. g
// fails when one cannot be worked out.
func (e *eval) surgePipes(g *gather, run *RunResult, line *calc.Line, c float64) []SurgePipe {
	type spec struct {
		pre    string
		length float64
		d      float64
	}
	var specs []spec
	switch {
	case line != nil:
		for i, sg := range line.Segments {
			specs = append(specs, spec{SegmentParam(i+1, ""), sg.Length, sg.Diameter})
		}
	case run != nil && e.runSpec.Diameter > 0:
		specs = append(specs, spec{"", e.runSpec.Length, e.runSpec.Diameter})
	default:
		if !e.has("l") && e.in.Segments == 0 {
			g.bad("tc", calc.Missing).Because(calc.ReasonSurgePipe)
		}
		g.fail()
		return nil
	}
	// typed is an optional figure typed for every pipe, and whether it
	// can be used.
	typed := func(param string) (float64, bool) {
		if !e.has(param) {
			return 0, false
		}
		return g.quantity(param), e.in.OK(param)
	}
	wall, typedWall := typed("wall")
	mod, typedMod := typed("epipe")
	var out []SurgePipe
	for _, sp := range specs {
		p := SurgePipe{SurgePipe: calc.SurgePipe{Length: sp.length, Diameter: sp.d, Restraint: c}}
		switch {
		case typedWall:
			p.Wall, p.WallFrom = wall, "typed"
		default:
			ps := e.in.vals[sp.pre+"nps"].Pipe
			if ps == nil || e.in.Side(sp.pre+"pipe") == "d" {
				if !e.has("wall") {
					g.bad("wall", calc.Missing).Because(calc.ReasonSurgeWall)
				}
				g.fail()
				continue
			}
			// A ductile iron pipe's wall leaves out its mortar lining,
			// which carries little of the hoop load.
			p.Wall, p.WallFrom = ps.Wall, "catalogue"
		}
		switch {
		case typedMod:
			p.Modulus, p.ModulusFrom = mod, "typed"
		default:
			m := e.in.vals[sp.pre+"mat"].Material
			if m == nil || m.Modulus == 0 {
				if !e.has("epipe") {
					g.bad("epipe", calc.Missing).Because(calc.ReasonSurgeModulus)
				}
				g.fail()
				continue
			}
			p.Modulus, p.ModulusFrom, p.Material = m.Modulus, "material", m.Name
		}
		out = append(out, p)
	}
	return out
}

// isKnown reports whether name is a parameter of the link.
func isKnown(name string) bool { _, ok := known[name]; return ok }
