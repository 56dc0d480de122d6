package present

import (
	"reflect"
	"regexp"
	"strings"
	"testing"

	"fieldhead/calc/scenario"
)

// ridge is a gravity main over a crest 8 m above its supply: its column
// breaks (the case "crest 8 m above the supply" of ref-highpoint.case,
// whose full-pipe flow python3-mpmath gives as 13.99 L/s, the pressure taken at the pipe crown).
const ridge = "liq=custom&rho=1000kg/m3&mu=1mPa.s&pv=2.34kPa&baro=101.325kPa&p1=0kPa&v1=0m/s&p2=0kPa&v2=0m/s" +
	"&z1=100m&z2=60m&solve=q&s1.l=2000m&s1.d=200mm&s1.eps=0.05mm&s1.z=108m&s2.l=3000m&s2.d=200mm&s2.eps=0.05mm"

// sheetText is every string of a built sheet, one a line.
func sheetText(sh Sheet) string {
	var b strings.Builder
	walk(reflect.ValueOf(sh), "", func(_, s string) { b.WriteString(s + "\n") })
	return b.String()
}

// TestHighPointOnTheSheet: the Balance view headlines the largest flow the
// line carries full, not the full-pipe flow of the balance; no view shows
// an absolute pressure below zero; the warning comes once.
func TestHighPointOnTheSheet(t *testing.T) {
	sc, err := scenario.Parse(ridge)
	if err != nil {
		t.Fatal(err)
	}
	negAbs := regexp.MustCompile(`[−-]\d[\d.]* ?(kPa|Pa|bar|psi)\S* absolute`)
	for _, v := range []string{"balance", "line", "report"} {
		sh, _ := sheetOf(t, sc.Clone(), v)
		text := sheetText(sh)
		if m := negAbs.FindString(text); m != "" {
			t.Errorf("%s view shows %q", v, m)
		}
		if n := strings.Count(text, "high point at the end of segment 1"); n != 1 {
			t.Errorf("%s view: the high-point warning %d times", v, n)
		}
		if v == "balance" {
			a := sh.Cards[0].Blocks[2].Answer
			if a == nil || a.Values[0].Text != "13.99 L/s" || !strings.Contains(a.Label, "the most the line carries full") ||
				!strings.Contains(strings.Join(a.Subs, " "), "below vapour pressure — column breaks") {
				t.Errorf("answer %+v", a)
			}
		}
		if v == "line" && !strings.Contains(text, "largest flow the line carries full\n13.99 L/s") {
			t.Errorf("line view lacks the full-pipe flow fact")
		}
	}
}

// TestComponentsOnTheSheet: components are shown by name in the budget,
// the loss table and their segment's card, in the sheet's units (a US
// sheet in ft and psi: 4.5888 m / 0.3048 = 15.05 ft, 45 kPa / 6.894757 kPa
// = 6.527 psi, NIST SP 811); a line without any has no components' column.
func TestComponentsOnTheSheet(t *testing.T) {
	const q = "liq=custom&rho=1000kg/m3&mu=1mPa.s&pv=2kPa&baro=101.325kPa&p1=0kPa&v1=0m/s&p2=0kPa&v2=0m/s&z1=10m&z2=10m" +
		"&q=12L/s&solve=hp&s1.l=100m&s1.d=100mm&s1.eps=0.05mm&s1.cmp=chiller:45kPa@12L/s,valve:kv43.2"
	sc, _ := scenario.Parse(q)
	sh, _ := sheetOf(t, sc.Clone(), "balance")
	text := sheetText(sh)
	// 45 kPa / (1000 kg/m³ · 9.80665 m/s²) = 4.589 m; the valve passes
	// 43.2 m³/h = 12 L/s at 1 bar (its Kv) of water at 15 °C (IEC
	// 60534-2-1), so 1000 kg/m³ drops 1 bar × 1000/999.1011 (ρ0 by
	// python3-iapws IAPWS97(T=288.15 K, P=0.101325 MPa)) = 100.09 kPa, 10.21 m.
	for _, w := range []string{"chiller (segment 1)\n4.589 m\n45.00 kPa", "valve (segment 1)\n10.21 m\n100.1 kPa"} {
		if !strings.Contains(text, w) {
			t.Errorf("budget lacks %q", w)
		}
	}
	sh, _ = sheetOf(t, sc.Clone(), "line")
	text = sheetText(sh)
	if !strings.Contains(text, "segment 1 component chiller: 4.589 m (45.00 kPa)") || !strings.Contains(text, "components: chiller 4.589 m (45.00 kPa); valve 10.21 m (100.1 kPa)") {
		t.Errorf("line view lacks the components:\n%s", text)
	}
	us := sc.Clone()
	_ = us.Set("units", "us")
	sh, _ = sheetOf(t, us, "line")
	if text = sheetText(sh); !strings.Contains(text, "chiller 15.05 ft (6.527 psi)") {
		t.Errorf("US line view lacks the chiller in ft and psi")
	}
	// Components take rows, not columns; the change-of-diameter column is
	// there only when the line changes bore (the demo's does not).
	reducer, _ := scenario.Parse(q + "&s2.l=50m&s2.d=80mm&s2.eps=0.05mm")
	for _, tt := range []struct {
		name string
		sc   scenario.Scenario
		cols int
	}{{"the demo", scenario.Demo(), 7}, {"a line with a reducer", reducer, 8}} {
		sh, _ = sheetOf(t, tt.sc, "line")
		for _, c := range sh.Cards {
			for _, b := range c.Blocks {
				if b.Table != nil && b.Table.ID == "seg-table" && len(b.Table.Head) != tt.cols {
					t.Errorf("%s: the loss table has %d columns, want %d", tt.name, len(b.Table.Head), tt.cols)
				}
			}
		}
	}
}

// TestSurveyBox: the Line view has the survey box; after a paste with a
// bad row it holds the pasted text and says which line was not used.
func TestSurveyBox(t *testing.T) {
	sc := scenario.Demo()
	_ = sc.Set("view", "line")
	d := scenario.NewDraft(sc)
	d.PasteProfile("0\t212\nx\t213\n640\t251\n")
	sh := Build(&d, scenario.Evaluate(scenario.Read(d.Scen)))
	var s *Survey
	for _, c := range sh.Cards {
		for _, b := range c.Blocks {
			if b.Kind == BlockSurvey {
				s = b.Survey
			}
		}
	}
	if s == nil || !s.Open || s.Text != "0\t212\nx\t213\n640\t251\n" || !strings.Contains(strings.Join(s.Notes, "|"), `line 2: the chainage "x" is not a number`) ||
		!strings.Contains(s.Label, "(m, m)") {
		t.Errorf("survey box %+v", s)
	}
}
