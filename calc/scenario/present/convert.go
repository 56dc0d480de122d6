package present

import (
	"strconv"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// liquidCard is the liquid, its temperature and the site pressure.
func (b *builder) liquidCard() Card {
	blocks := []Block{fields(b.picker("liq", "", ""))}
	switch b.in.Choice("liq") {
	case "custom":
		blocks = append(blocks, fields(b.quantity("rho", "", ""), b.quantity("mu", "", ""), b.quantity("pv", "", "")))
	case "eg", "pg":
		share := "gly"
		if b.d.SideOf("gly") == "v" {
			share = "glyv"
		}
		blocks = append(blocks, b.toggle("gly"), fields(b.quantity(share, "", ""), b.quantity("t", "", "")))
	default:
		blocks = append(blocks, fields(b.quantity("t", "", "")), fields(b.quantity("pl", "", "")), fields(b.ref("plref")))
		if b.in.Choice("liq") == "seawater" {
			blocks = append(blocks, fields(b.plain("sal", "", "", true)))
		}
	}
	blocks = append(blocks, text("computed", "fluid", b.fluidLine()))
	if g := b.r.Glycol; g != nil {
		blocks = append(blocks, Block{Kind: BlockFacts, ID: "glycol-facts", Class: "facts", Facts: []Fact{
			{ID: "glycol-freezing", Label: "freezes at", Value: b.show(g.FreezingPoint, calc.Temperature), Key: true},
			{ID: "glycol-share", Label: "glycol share", Value: glycolShare(g)},
		}})
	}
	blocks = append(blocks, b.toggle("site"))
	if b.d.SideOf("site") == "baro" {
		blocks = append(blocks, fields(b.quantity("baro", "", "")))
	} else {
		blocks = append(blocks, fields(b.quantity("alt", "", "")))
	}
	site := ""
	if b.r.SitePressure > 0 {
		site = "site pressure " + b.absolute(b.r.SitePressure) + " — " + siteNotes[b.r.SiteFrom]
	}
	blocks = append(blocks, text("computed", "site", site), b.warnings(nil, "liquid", "site"))
	return Card{ID: "liquid", Class: "liquid", Title: "Liquid and site", Blocks: blocks}
}

// siteNotes say how the site pressure was found.
var siteNotes = []string{
	"standard sea-level pressure (no altitude or barometer given)",
	"ISO 2533 standard atmosphere at the site altitude",
	"barometer reading",
}

// fluidLine is the liquid with the properties used, "" without a liquid.
func (b *builder) fluidLine() string {
	f := b.r.Fluid
	if f == nil {
		return ""
	}
	line := b.fluidName() + ": density " + b.show(f.Density, calc.Density) + " · viscosity " +
		b.show(f.Viscosity, calc.DynamicViscosity) + " · vapour pressure " + b.absolute(f.VapourPressure)
	if b.r.Glycol != nil {
		line += " (Raoult's law)"
	}
	return line
}

// fluidName names the liquid at its temperature and the pressure its
// properties were taken at, in the sheet's units, and says where that
// pressure came from.
func (b *builder) fluidName() string {
	f := b.r.Fluid
	at := " at " + b.show(f.Temperature, calc.Temperature) + " and " + b.absolute(f.Pressure) + liquidNote(b.r.LiquidFrom)
	switch b.in.Choice("liq") {
	case "custom":
		return "liquid of the typed properties"
	case "seawater":
		return "seawater (35 g/kg)" + at
	}
	if g := b.r.Glycol; g != nil {
		return g.Glycol.String() + " " + glyPercent(g.MassFraction) + " by mass at " + b.show(f.Temperature, calc.Temperature)
	}
	return "water" + at
}

// liquidNotes say where the pressure of the liquid's properties came from,
// by scenario.LiquidSource.
var liquidNotes = []string{
	scenario.LiquidTyped:      "the line pressure",
	scenario.LiquidPoints:     "mean of the points' pressures",
	scenario.LiquidSite:       "site pressure",
	scenario.LiquidSaturation: "vapour pressure: the line would boil",
	scenario.LiquidTypedProps: "",
	scenario.LiquidLoop:       "the loop's static pressure at the vessel's connection",
}

// liquidNote is liquidNotes' words in brackets, or nothing for a source
// it has no words for.
func liquidNote(s scenario.LiquidSource) string {
	if int(s) >= len(liquidNotes) || liquidNotes[s] == "" {
		return ""
	}
	return " (" + liquidNotes[s] + ")"
}

// convertView is head ↔ pressure ↔ water column, gauge ↔ absolute.
func (b *builder) convertView() []Card {
	in := Card{ID: "convert-in", Title: "Value to convert", Blocks: []Block{
		fields(b.quantity("cv", "", "")), fields(b.ref("cvref")),
	}}
	return []Card{b.convertCard(), in, b.liquidCard()}
}

// convertCard lists the value in every form the sheet's reader needs, in
// the sheet's unit system.
func (b *builder) convertCard() Card {
	c := Card{ID: "convert-card", Class: "answer-card", Title: "The same value as"}
	cr := b.r.Convert
	if cr == nil {
		c.Blocks = []Block{{Kind: BlockAnswer, ID: "answer", Answer: &Answer{None: true, NoneID: "answer-value",
			Why: b.whyNone(scenario.PartConvert)}}}
		return c
	}
	t := &Table{ID: "answer", Class: "conv"}
	row := func(label, unit string, v float64) {
		t.Rows = append(t.Rows, Row{Head: label, Cells: []Cell{{Text: minus(calc.FormatValue(v, unit, 5))}}})
	}
	// The units of each row, SI then US; "" leaves the row out.
	units := func(si, us string) string {
		if b.us {
			return us
		}
		return si
	}
	rows := []struct {
		label, unit string
		v           float64
		liquid      bool // needs the liquid's density
	}{
		{"gauge pressure", units("kPa", "psi"), cr.Gauge, false},
		{"gauge pressure", units("bar", ""), cr.Gauge, false},
		{"absolute pressure", units("kPa", "psi"), cr.Absolute, false},
		{"head of this liquid (gauge)", units("m", "ft"), cr.Head, true},
		{"head of this liquid (absolute)", units("m", "ft"), 0, true},
		{"conventional water column", units("mH2O", "ftH2O"), cr.Gauge, false},
		{"conventional water column", units("", "inH2O"), cr.Gauge, false},
	}
	for _, r := range rows {
		switch {
		case r.unit == "", r.liquid && b.r.Fluid == nil:
			continue
		case r.label == "head of this liquid (absolute)":
			r.v = cr.AbsoluteHead
		}
		row(r.label, r.unit, r.v)
	}
	if len(t.Rows) > 0 {
		t.Rows[0].Class = "first"
	}
	c.Blocks = []Block{{Kind: BlockTable, Table: t}, b.warnings(nil, "convert", "site", "liquid")}
	return c
}

// pipePickers are the class and size pickers of a run or segment (pre ""
// or "s2."): the class first, the sizes of that class in its catalogue's
// own notation.
func (b *builder) pipePickers(pre string) Block {
	sch := b.picker(pre+"sch", "Pipe class", "choose…")
	nps := b.picker(pre+"nps", "Size", "choose…")
	class := b.in.Choice(pre + "sch")
	for _, c := range calc.Catalogues() {
		sizes, err := c.Sizes(class)
		if err != nil {
			continue
		}
		var choices []scenario.Choice
		for _, p := range sizes {
			choices = append(choices, scenario.Choice{Value: p.NPS, Label: sizeName(p)})
		}
		cur, _ := b.d.Box(pre + "nps")
		nps.Options = choiceOptions(choices, cur, "choose…")
	}
	return fields(sch, nps)
}

// sizeName writes a size in its catalogue's notation: "NPS 8 (DN 200)",
// "OD 160 mm", "DN 200", "1/2 in".
func sizeName(p calc.PipeSize) string {
	switch p.Catalogue {
	case "copper":
		return p.NPS + " in"
	case "pe":
		return "OD " + p.NPS + " mm"
	case "di":
		return "DN " + p.NPS
	}
	if p.DN > 0 {
		return "NPS " + p.NPS + " (DN " + strconv.Itoa(p.DN) + ")"
	}
	return "NPS " + p.NPS
}

// liquidFacts are the liquid's properties for the printed sheet: nil
// when the liquid could not be worked out.
func (b *builder) liquidFacts() []Fact {
	f := b.r.Fluid
	if f == nil {
		return nil
	}
	pv := b.absolute(f.VapourPressure)
	if b.r.Glycol != nil {
		pv += " (Raoult's law)"
	}
	fs := []Fact{
		{ID: "report-liquid", Label: "liquid", Value: b.fluidName(), Key: true},
		{Label: "density", Value: b.show(f.Density, calc.Density)},
		{Label: "viscosity", Value: b.show(f.Viscosity, calc.DynamicViscosity)},
		{Label: "vapour pressure", Value: pv},
	}
	if g := b.r.Glycol; g != nil {
		fs = append(fs, Fact{Label: "freezes at", Value: b.show(g.FreezingPoint, calc.Temperature)},
			Fact{Label: "glycol share", Value: glycolShare(g)})
	}
	return fs
}

// glycolShare gives a glycol mix's share both ways, the one typed first.
func glycolShare(g *scenario.GlycolMix) string {
	mass, vol := glyPercent(g.MassFraction)+" by mass", glyPercent(g.VolumeFraction)+" by volume"
	if g.ByVolume {
		return vol + " = " + mass
	}
	return mass + " = " + vol + " (glycol and water measured apart, before mixing)"
}

// glyPercent writes a share as a percentage to three figures: "29.2 %".
func glyPercent(f float64) string { return strconv.FormatFloat(f*100, 'g', 3, 64) + " %" }
