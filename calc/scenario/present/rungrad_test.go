package present

import (
	"testing"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// TestRunGradientPerHundred: pipe friction per 100 of pipe is the same
// number in m per 100 m and in ft per 100 ft (a gradient is a ratio of
// lengths); it was once 100 m's head written in ft, 3.28 times too much
// (1 ft = 0.3048 m, NIST SP 811 (2008) Appendix B).
func TestRunGradientPerHundred(t *testing.T) {
	for _, us := range []bool{false, true} {
		q := "liq=water&t=15C&view=regime&q=35L/s&l=1200m&nps=8&sch=40&mat=steel"
		if us {
			q += "&units=us"
		}
		s, err := scenario.Parse(q)
		if err != nil {
			t.Fatal(err)
		}
		d := scenario.NewDraft(s)
		r := scenario.Evaluate(scenario.Read(s))
		if r.RunView == nil || r.RunView.Run == nil {
			t.Fatalf("us=%v: no run", us)
		}
		unit := "m"
		if us {
			unit = "ft"
		}
		want := calc.FormatNumber(r.RunView.Run.Gradient*100, 4) + " " + unit
		found := false
		for _, c := range Build(&d, r).Cards {
			for _, b := range c.Blocks {
				for _, f := range b.Facts {
					if f.ID == "run-grad" {
						found = true
						if f.Value != want {
							t.Errorf("us=%v: %s %q, want %q", us, f.Label, f.Value, want)
						}
					}
				}
			}
		}
		if !found {
			t.Errorf("us=%v: no pipe friction per 100 of pipe", us)
		}
	}
}
