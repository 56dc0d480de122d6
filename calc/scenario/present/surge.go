package present

import (
	"strconv"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// Surge on a fast closure at point 2 (the Balance view and the report),
// and the hydro figures of a line that feeds a turbine (the turbine card
// and the report).

// surgeScreening is the caution over every surge figure.
const surgeScreening = "Screening estimate only: a transient analysis and a licensed engineer decide"

// wantsSurge reports whether the sheet has a pipe between the points (or
// asks for a surge), so that the surge card is offered.
func (b *builder) wantsSurge() bool {
	return b.in.Given("tc") || b.in.Given("l") || b.in.Segments > 0
}

// surgeCard is the surge of a closure at point 2: its inputs, the
// screening caution, the Joukowsky rise and what it comes from.
func (b *builder) surgeCard() Card {
	sr := b.r.Surge
	var a *Answer
	switch {
	case sr != nil && sr.Fast:
		a = &Answer{Label: "Pressure rise on a fast closure (Joukowsky)",
			Values: []Value{{"surge-dp", b.show(sr.DeltaP, calc.Pressure)}, {"surge-dh", b.head(sr.DeltaH)}}}
	case sr != nil:
		a = &Answer{Label: "At most this rise: the closure is slower than 2L/a",
			Values: []Value{{"surge-dp", b.show(sr.DeltaP, calc.Pressure)}, {"surge-dh", b.head(sr.DeltaH)}}}
	case b.in.Given("tc"):
		a = &Answer{None: true, NoneID: "surge-dp", Label: "Pressure rise on a fast closure",
			Why: b.whyNone(scenario.PartSurge)}
	}
	liq := b.in.Choice("liq")
	facts := b.surgeFacts()
	title, tcHint := b.surgeTitle(), ""
	if b.isLoop() {
		tcHint = "(a valve in the loop; for a surge estimate)"
	}
	return Card{ID: "surge", Title: title, Blocks: []Block{
		fields(b.quantity("tc", "", tcHint), b.quantity("dv", "", "")),
		fields(b.quantity("wall", "", ""), b.quantity("epipe", "", "")),
		maybe(liq == "custom" || b.in.Given("kliq"), fields(b.quantity("kliq", "", ""))),
		fields(b.plain("cr", "", "", true)),
		maybe(b.isLoop(), fields(b.quantity("zv", "", ""))),
		{Kind: BlockLevel, ID: "surge-caution", Class: "lvl-caution", Text: surgeScreening},
		maybe(a == nil, text("muted", "", "Give the valve's closing time for a screening figure of water hammer: the wave speed, its round trip 2L/a and the Joukowsky rise.")),
		maybe(a != nil, Block{Kind: BlockAnswer, ID: "surge-answer", Answer: a}),
		maybe(facts != nil, Block{Kind: BlockFacts, Class: "facts", Facts: facts}),
		b.warnings(nil, "surge"),
	}}
}

// surgeTitle names the surge's card and report block by where the valve
// closes: at point 2 on a line, somewhere round a closed loop.
func (b *builder) surgeTitle() string {
	if b.isLoop() {
		return "Surge on a fast closure in the loop"
	}
	return "Surge on a fast closure at point 2"
}

// surgeStaticLabel names the static pressure the surge adds to: point 2's
// on a line; on a closed loop the loop's static pressure at the valve's
// elevation, else at the pump's level (a valve higher up sees less).
func (b *builder) surgeStaticLabel() string {
	switch {
	case b.isLoop() && b.in.OK("zv"):
		return "the loop's static pressure at the valve's elevation, " + minus(b.param("zv", b.in.Num("zv"))) + ", flow stopped"
	case b.isLoop():
		return "the loop's static pressure at the pump's level, flow stopped (a valve higher in the loop sees less: give its elevation)"
	}
	return "static pressure at point 2, flow stopped"
}

// surgeFacts are the surge's figures and what they come from, nil
// without a surge result.
func (b *builder) surgeFacts() []Fact {
	sr := b.r.Surge
	if sr == nil {
		return nil
	}
	closure := "fast, within 2L/a: the full Joukowsky rise"
	if !sr.Fast {
		closure = "slower than 2L/a: Joukowsky's rise is only an upper bound"
	}
	out := []Fact{
		{ID: "surge-a", Label: "wave speed at the valve (Korteweg)", Value: b.show(sr.WaveSpeed, calc.Velocity), Key: true},
		{ID: "surge-2la", Label: "round trip of the wave, 2L/a", Value: b.show(sr.Period, calc.Duration) + " over " + b.head(sr.Length), Key: true},
		{ID: "surge-tc", Label: "closing in " + b.show(sr.ClosureTime, calc.Duration), Value: closure},
		{ID: "surge-dv", Label: "velocity stopped", Value: b.show(sr.DeltaV, calc.Velocity)},
	}
	if sr.StaticKnown {
		peak := sr.Peak
		peakLabel, lowLabel := "peak: static + rise", "low swing: static − rise"
		if !sr.Fast {
			peakLabel, lowLabel = "peak, at most: static + rise", "low swing, at its lowest: static − rise"
		}
		out = append(out,
			Fact{ID: "surge-static", Label: b.surgeStaticLabel(), Value: b.gauge(sr.Static) + " (" + b.head(sr.StaticHead) + ")"},
			Fact{ID: "surge-peak", Label: peakLabel, Value: b.gauge(peak) + " (" + b.head(sr.PeakHead) + ")" + b.timesStatic(peak, sr.Static), Key: true},
		)
		low := "reaches the vapour pressure: the liquid column may part and rejoin with a blow larger than the rise above"
		if !sr.ColumnParts {
			low = b.gauge(sr.Low - b.r.SitePressure)
		}
		out = append(out, Fact{ID: "surge-low", Label: lowLabel, Value: low})
	} else {
		why := "not known: give the two points' levels and pressures for the peak"
		if b.isLoop() {
			why = "not known: give the loop's static pressure (where its expansion vessel or pressurisation unit connects) for the peak"
		}
		out = append(out, Fact{Label: "static pressure", Value: why})
	}
	k := b.param("kliq", sr.BulkModulus)
	switch sr.BulkFrom {
	case "if97":
		k += " (ρ·w², the IAPWS-IF97 speed of sound)"
	case "mackenzie":
		k += " (ρ·c², Mackenzie's speed of sound in seawater)"
	default:
		k += " (typed)"
	}
	out = append(out, Fact{ID: "surge-k", Label: "liquid's bulk modulus", Value: k})
	for i, p := range sr.Pipes {
		label := "pipe wall"
		if len(sr.Pipes) > 1 {
			label = "segment " + strconv.Itoa(i+1)
		}
		wall := b.param("wall", p.Wall) + " wall (typed)"
		if p.WallFrom == "catalogue" {
			wall = b.param("wall", p.Wall) + " wall (the size picked)"
		}
		mod := "E " + b.param("epipe", p.Modulus) + " (typed)"
		if p.ModulusFrom == "material" {
			mod = "E " + b.param("epipe", p.Modulus) + " (" + p.Material + ", from memory)"
		}
		v := wall + ", " + mod
		if len(sr.Pipes) > 1 {
			v = "a " + b.show(sr.WaveSpeeds[i], calc.Velocity) + "; " + v
		}
		out = append(out, Fact{Label: label, Value: v})
	}
	return out
}

// timesStatic says how many times the static pressure a peak is.
func (b *builder) timesStatic(peak, static float64) string {
	if !(static > 0) {
		return ""
	}
	return ", " + plainNumber(peak/static) + " × the static"
}

// hydroFacts are the hydro figures of a turbine line: losses and net
// head as shares of the gross head, the no-flow pressure at the turbine
// inlet, and the caution that the flow of most output is not a design
// flow.
func (b *builder) hydroFacts(t *calc.TurbineResult) []Fact {
	if t == nil || !(t.GrossHead > 0) {
		return nil
	}
	out := []Fact{
		{ID: "turb-loss-share", Label: "line losses as a share of the gross head", Value: percent(t.LossShare)},
		{ID: "turb-net-share", Label: "net head as a share of the gross head", Value: percent(t.NetShare)},
		{ID: "turb-static", Label: "pressure at the turbine inlet with no flow, at point 2's level: what the inlet valve and the pipe there hold at rest, before any surge",
			Value: b.gauge(t.StaticInlet) + " (" + b.head(t.StaticInletHead) + ")", Key: true},
	}
	if best := b.r.BestTurbine; best != nil {
		out = append(out, Fact{ID: "turb-best-note",
			Label: "the flow of most output is where this line's output peaks, not a design flow: the water available through the year, the turbine's own efficiency curve, the pipe's pressure class and surge decide that, with the turbine maker and a licensed engineer",
			Value: percent(best.LossShare) + " of the gross head lost there"})
	}
	return out
}

// reportSurge is the report's surge section: the caution and the
// figures, or nothing without a surge result.
func (b *builder) reportSurge() []Block {
	facts := b.surgeFacts()
	if facts == nil {
		return []Block{{Kind: BlockEmpty}, {Kind: BlockEmpty}, {Kind: BlockEmpty}}
	}
	sr := b.r.Surge
	head := Fact{ID: "report-surge", Label: "Joukowsky rise ρ·a·Δv", Value: b.show(sr.DeltaP, calc.Pressure) + " (" + b.head(sr.DeltaH) + ")", Key: true}
	if !sr.Fast {
		head.Label = "Joukowsky rise ρ·a·Δv, an upper bound (closure slower than 2L/a)"
	}
	return []Block{
		{Kind: BlockHeading, Text: b.surgeTitle()},
		{Kind: BlockLevel, ID: "report-surge-caution", Class: "lvl-caution", Text: surgeScreening},
		{Kind: BlockFacts, Class: "facts", Facts: append([]Fact{head}, facts...)},
	}
}
