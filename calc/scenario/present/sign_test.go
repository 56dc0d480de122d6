package present

import (
	"reflect"
	"regexp"
	"strings"
	"testing"

	"fieldhead/calc/scenario"
)

// hyphenMinus finds a figure written with the hyphen for its sign: at the
// start of a text or after a space, a bracket, a colon or a slash.
var hyphenMinus = regexp.MustCompile(`(^|[\s(:/])-\.?[0-9]`)

// TestMinusSign: every negative figure the sheet shows carries the minus
// sign (U+2212), as the charts' ticks and the messages already did, and
// not the hyphen, which reads as a dash at arm's length; the share link,
// the boxes and the printed inputs (as typed) and the CSV keep the hyphen
// their readers parse. Source: the Unicode Character Database as
// python3's unicodedata reads it (UCD 14.0.0): U+2212 is MINUS SIGN, a
// math symbol (Sm); U+002D is HYPHEN-MINUS, dash punctuation (Pd).
func TestMinusSign(t *testing.T) {
	demo, turbine := scenario.Demo(), scenario.TurbineDemo()
	us := usDemo(t)
	cases := []struct {
		name string
		sc   scenario.Scenario
		neg  string // a negative figure the case must show, as shown
	}{
		// The intake's surface above the delivery: the line needs no pump
		// and the pump head solved is negative.
		{"pump head below zero", with(t, demo, "z1", "300m"), "−43.37 m"},
		{"pump head below zero, US", with(t, us, "z1", "984.3ft"), "−142.3 ft"},
		// Point 2 far above what the pump reaches: below the site's pressure.
		{"gauge pressure below zero", with(t, demo, "solve", "p2", "p2", "", "hp", "40m"), "−45.31 kPa gauge"},
		// The demo's field check reads below its data sheet.
		{"field check below the data sheet", demo, "−4.853 m (−9.41 %)"},
		{"a gauge below the atmosphere", with(t, demo, "cv", "-40kPa"), ""},
		{"turbine", turbine, ""},
	}
	for _, c := range cases {
		for _, view := range []string{"balance", "convert", "regime", "line", "pump", "report"} {
			sh, _ := sheetOf(t, c.sc, view)
			var parts []any // the sheet's own words, and each card but the inputs as entered
			for _, cd := range sh.Cards {
				if cd.ID != "report-inputs-card" {
					parts = append(parts, cd)
				}
			}
			sh.Cards = nil
			shown := false
			walk(reflect.ValueOf(append(parts, sh)), "", func(name, s string) {
				switch name {
				case "Box", "Link", "Short", "Query": // typed, or the link itself
					return
				}
				if strings.HasSuffix(name, "ID") {
					return
				}
				if hyphenMinus.MatchString(s) {
					t.Errorf("%s, %s: %s %q has a hyphen for a minus sign", c.name, view, name, s)
				}
				shown = shown || (c.neg != "" && strings.Contains(s, c.neg))
			})
			if c.neg != "" && (view == "report") && !shown {
				t.Errorf("%s, %s: %q not shown", c.name, view, c.neg)
			}
		}
	}
}
