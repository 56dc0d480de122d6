package present

import (
	"reflect"
	"strings"
	"testing"

	"fieldhead/calc/scenario"
)

// glycolCard is the liquid card of the Balance view for a link.
func glycolCard(t *testing.T, query string) (Card, Sheet) {
	t.Helper()
	sc, err := scenario.Parse(query)
	if err != nil {
		t.Fatal(err)
	}
	sh, _ := sheetOf(t, sc, "balance")
	for _, c := range sh.Cards {
		if c.ID == "liquid" {
			return c, sh
		}
	}
	t.Fatal("no liquid card")
	return Card{}, sh
}

// The liquid card offers the glycol mixes (the choices come from the
// parameter table), and for one shows the switch by mass / by volume, the
// share's box, the mix named with its share in the sheet's units, its
// freezing point as a fact, and the share both ways. Source: the
// vocabulary of calc/scenario/doc.go; the freezing points are Melinder's
// (2010) sums recomputed with python3-mpmath (-12.79 °C for 30 %
// propylene glycol; 2.317 °F for 32.34 % ethylene glycol, the share by
// mass of 30 % by volume); the figures themselves are checked in calc and
// testdata/cases.
func TestGlycolLiquidCard(t *testing.T) {
	for _, c := range []struct {
		query, box, name, freeze, share string
	}{
		{"liq=pg&gly=30%&t=7C&alt=100m", "gly", "propylene glycol 30 % by mass at 7.000 °C", "−12.79 °C", "30 % by mass = 29.2 % by volume"},
		{"units=us&liq=eg&glyv=30%&t=45F&alt=300ft", "glyv", "ethylene glycol 32.3 % by mass at 45.00 °F", "2.317 °F", "30 % by volume = 32.3 % by mass"},
	} {
		card, sh := glycolCard(t, c.query)
		var boxes, choices []string
		var sw, fluid, freeze, share string
		for _, b := range card.Blocks {
			for _, f := range b.Fields {
				boxes = append(boxes, f.Param)
				if f.Param == "liq" {
					for _, o := range f.Options {
						choices = append(choices, o.Value)
					}
				}
			}
			if b.Switch != nil {
				sw += b.Switch.Group + " "
			}
			if b.ID == "fluid" {
				fluid = b.Text
			}
			for _, f := range b.Facts {
				switch f.ID {
				case "glycol-freezing":
					freeze = f.Value
				case "glycol-share":
					share = f.Value
				}
			}
		}
		if !reflect.DeepEqual(choices, []string{"water", "seawater", "eg", "pg", "custom"}) {
			t.Errorf("%s: liquid choices %v", c.query, choices)
		}
		if !strings.Contains(strings.Join(boxes, " "), c.box+" t") || !strings.HasPrefix(sw, "gly ") {
			t.Errorf("%s: boxes %v, switches %q; want the %s box and the by mass/by volume switch", c.query, boxes, sw, c.box)
		}
		if !strings.HasPrefix(fluid, c.name+": density ") || !strings.HasSuffix(fluid, "(Raoult's law)") {
			t.Errorf("%s: fluid %q, want it to start %q", c.query, fluid, c.name)
		}
		if freeze != c.freeze || !strings.HasPrefix(share, c.share) {
			t.Errorf("%s: freezes at %q, share %q", c.query, freeze, share)
		}
		caution := false
		walk(reflect.ValueOf(sh), "", func(_, s string) {
			caution = caution || strings.Contains(s, "the maker's data sheet governs")
		})
		if !caution {
			t.Errorf("%s: no caution that the maker's data sheet governs", c.query)
		}
		if sh.US {
			walk(reflect.ValueOf(sh), "", func(name, s string) {
				if bad := siAfterDigit(s); len(bad) > 0 {
					t.Errorf("%s: %s %q has SI units %v", c.query, name, s, bad)
				}
			})
		}
	}
}

// The printed sheet lists the liquid's properties, for a glycol mix with
// its freezing point (Melinder's sum, python3-mpmath: -14.576 °C for 30 %
// ethylene glycol) and its share both ways.
func TestGlycolReport(t *testing.T) {
	sc, err := scenario.Parse("liq=eg&gly=30%&t=7C&alt=100m")
	if err != nil {
		t.Fatal(err)
	}
	sh, _ := sheetOf(t, sc, "report")
	var got []string
	for _, c := range sh.Cards {
		for _, b := range c.Blocks {
			for _, f := range b.Facts {
				got = append(got, f.Label+": "+f.Value)
			}
		}
	}
	all := strings.Join(got, " | ")
	for _, want := range []string{"liquid: ethylene glycol 30 % by mass at 7.000 °C", "freezes at: −14.58 °C |",
		"glycol share: 30 % by mass = 27.8 % by volume", "vapour pressure: 0.8912 kPa absolute (Raoult's law)"} {
		if !strings.Contains(all, want) {
			t.Errorf("the report lacks %q: %s", want, all)
		}
	}
}
