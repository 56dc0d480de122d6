package present

import (
	"reflect"
	"strconv"
	"strings"
	"testing"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// table finds the table with id in a card.
func table(t *testing.T, cards []Card, cardID, id string) *Table {
	t.Helper()
	for _, bl := range card(t, cards, cardID).Blocks {
		if bl.Table != nil && bl.Table.ID == id {
			return bl.Table
		}
	}
	t.Fatalf("no table %q in card %q", id, cardID)
	return nil
}

// inputRows maps the inputs table's link names to their "value as
// entered" cells.
func inputRows(t *testing.T, cards []Card) map[string]Cell {
	t.Helper()
	out := map[string]Cell{}
	for _, r := range table(t, cards, "report-inputs-card", "report-inputs").Rows {
		out[r.Cells[0].Text] = r.Cells[1]
	}
	return out
}

func TestReportIDs(t *testing.T) {
	// Source: the element ids the browser tests and the page look up on
	// the Report view (the old page's ids, kept); the app fills the date
	// and the link, so their texts are empty here.
	for _, tc := range []struct {
		name  string
		sc    scenario.Scenario
		cards []string
		want  []string
	}{
		{"demo", scenario.Demo(),
			[]string{"report-head", "report-inputs-card", "report-results", "report-charts", "report-warnings", "report-methods", "report-link"},
			[]string{"report-title", "report-date", "report-inputs", "report-segments", "report-answer", "report-budget",
				"report-op", "report-url", "pump-chart", "profile-chart", "npsh-level", "field-head"}},
		{"turbine demo", scenario.TurbineDemo(),
			[]string{"report-head", "report-inputs-card", "report-results", "report-charts", "report-warnings", "report-methods", "report-link"},
			[]string{"report-title", "report-turbine", "turb-net", "profile-chart"}},
		// The test at several flows prints its table, the tested curve's
		// range and the verdict by the guarantee point (issue 22).
		{"pump-test demo", scenario.PumpTestDemo(),
			[]string{"report-head", "report-inputs-card", "report-results", "report-charts", "report-warnings", "report-methods", "report-link"},
			[]string{"report-title", "field-head", "test-table", "test-range", "guarantee-level", "guarantee-flowhead", "guarantee-cross", "guarantee-eff", "pump-chart", "report-test-marks"}},
		{"no charts", scenario.Scenario{},
			[]string{"report-head", "report-inputs-card", "report-results", "report-warnings", "report-methods", "report-link"},
			[]string{"report-title", "report-inputs", "report-url"}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			sh, _ := sheetOf(t, tc.sc, "report")
			checkCards(t, sh.Cards, tc.cards, tc.want)
			for _, bl := range card(t, sh.Cards, "report-head").Blocks {
				if bl.ID == "report-date" && bl.Text != "" {
					t.Errorf("report-date %q: the app fills it", bl.Text)
				}
			}
			for _, bl := range card(t, sh.Cards, "report-link").Blocks {
				if bl.ID == "report-url" && bl.Text != "" {
					t.Errorf("report-url %q: the app fills it", bl.Text)
				}
			}
		})
	}
}

func TestReportTitle(t *testing.T) {
	// Source: the sheet's title box (name), "Untitled sheet" when none.
	for _, tc := range []struct{ name, want string }{
		{"Pit 4 transfer", "Pit 4 transfer"},
		{"", "Untitled sheet"},
	} {
		sh, _ := sheetOf(t, with(t, scenario.Demo(), "name", tc.name), "report")
		b := card(t, sh.Cards, "report-head").Blocks[0]
		if b.ID != "report-title" || b.Class != "rtitle" || b.Text != tc.want {
			t.Errorf("name %q: title block %+v, want %q", tc.name, b, tc.want)
		}
	}
}

func TestReportInputsAsEntered(t *testing.T) {
	// Source: the report lists every input as entered — the number as
	// typed with its unit, the default unit named when none was typed
	// (scenario.DefaultUnit), choices in their words from the parameter
	// table (scenario.Choices) — each with its problem beside it.
	fm := scenario.Choices("fm")[2]
	sc := with(t, scenario.Demo(), "q", "45", "fm", fm.Value, "zp", "abc")
	sh, r := sheetOf(t, sc, "report")
	rows := inputRows(t, sh.Cards)
	for _, c := range []struct{ param, want string }{
		{"q", "45 " + scenario.DefaultUnit("q", false) + " (default unit)"},
		{"z1", "212 m"},
		{"fm", fm.Label + " (" + fm.Value + ")"},
		{"pq", "0, 20, 40, 55, 70 L/s"},
		{"pafter", "after segment 1"},
	} {
		if got := rows[c.param].Text; got != c.want {
			t.Errorf("%s shown %q, want %q", c.param, got, c.want)
		}
	}
	for _, p := range scenario.Params {
		if p == "view" || p == "name" || !sc.Has(p) {
			continue
		}
		if _, ok := rows[p]; !ok {
			t.Errorf("input %s missing from the report", p)
		}
	}
	if r.Errors["zp"] == nil {
		t.Fatal("zp=abc gives no error")
	}
	if got := rows["zp"]; got.Error == "" || got.ErrorID != "err-zp" {
		t.Errorf("zp's problem not beside it: %+v", got)
	}
	if got := rows["q"]; got.Error != "" || got.ErrorID != "" {
		t.Errorf("q has a problem %+v", got)
	}
	if len(sh.Others) != 0 {
		t.Errorf("problems left for the page to list: %v", sh.Others)
	}
}

func TestReportSegments(t *testing.T) {
	// Source: the demo's segments as entered (scenario.Demo): one row per
	// segment, fittings named from the fitting table.
	sh, _ := sheetOf(t, scenario.Demo(), "report")
	tbl := table(t, sh.Cards, "report-inputs-card", "report-segments")
	if len(tbl.Rows) != scenario.Demo().SegmentCount() {
		t.Fatalf("%d rows, want %d", len(tbl.Rows), scenario.Demo().SegmentCount())
	}
	if got := tbl.Rows[0].Cells[0].Text; got != "8 m" {
		t.Errorf("segment 1 length %q, want %q", got, "8 m")
	}
	if got, want := tbl.Rows[0].Cells[3].Text, "1 × "+fittingName("entry_sharp"); !strings.HasPrefix(got, want) {
		t.Errorf("segment 1 fittings %q, want it to start %q", got, want)
	}
}

func TestReportResultsFromEvaluate(t *testing.T) {
	// Source: scenario.Evaluate's balance, operating point and turbine,
	// formatted by scenario.ShowSolved, ShowParam and Show — not
	// recomputed.
	for _, tc := range demos(t) {
		t.Run(tc.name, func(t *testing.T) {
			sh, r := sheetOf(t, tc.sc, "report")
			main, _ := scenario.ShowSolved(tc.sc, r)
			if got := figure(t, sh.Cards, "report-answer"); got != main {
				t.Errorf("report-answer %q, want %q", got, main)
			}
			op := r.Pump.Operating
			want := scenario.ShowParam("q", op.Q, r.US) + " at " + scenario.Show(op.H, calc.Length, r.US)
			if got := figure(t, sh.Cards, "report-op"); got != want {
				t.Errorf("report-op %q, want %q", got, want)
			}
			budget := table(t, sh.Cards, "report-results", "report-budget")
			var heads []string
			for _, it := range r.Balance.Budget {
				if it.Head != 0 {
					heads = append(heads, scenario.Show(it.Head, calc.Length, r.US))
				}
			}
			var got []string
			for _, row := range budget.Rows {
				got = append(got, row.Cells[1].Text)
			}
			if !reflect.DeepEqual(got, heads) {
				t.Errorf("budget heads %v, want %v", got, heads)
			}
		})
	}
	sh, r := sheetOf(t, scenario.TurbineDemo(), "report")
	if want := scenario.Show(r.Turbine.Power, calc.Power, false); figure(t, sh.Cards, "report-turbine") != want {
		t.Errorf("report-turbine %q, want %q", figure(t, sh.Cards, "report-turbine"), want)
	}
}

func TestReportPressureAnswer(t *testing.T) {
	// Source: a solved pressure reads as its point's gauge reads it, the
	// other reference beside it (scenario.ShowSolved's main and alt, in
	// the wording of b.gauge and b.absolute): below the site's pressure,
	// the gauge figure carries the minus sign (U+2212) every shown figure
	// does.
	sc := with(t, scenario.Demo(), "solve", "p2", "p2", "", "hp", "40m")
	sh, r := sheetOf(t, sc, "report")
	if r.Balance == nil {
		t.Fatalf("no balance: %v", r.Errors)
	}
	got := figure(t, sh.Cards, "report-answer")
	if r.Balance.Value >= r.SitePressure {
		t.Fatalf("p2 solved at %g Pa absolute, not below the site's %g Pa: the case no longer shows a negative gauge figure", r.Balance.Value, r.SitePressure)
	}
	gauge := "−" + calc.FormatValue(r.SitePressure-r.Balance.Value, "kPa", 4) + " gauge"
	abs := calc.FormatValue(r.Balance.Value, "kPa", 4) + " absolute"
	if want := gauge + " (" + abs + ")"; got != want {
		t.Errorf("report-answer %q, want %q", got, want)
	}
}

func TestReportWarningsAndMethods(t *testing.T) {
	// Source: every warning of scenario.Evaluate listed once, worded in the
	// sheet's units; the methods are the package's Methods list.
	sc := with(t, scenario.Demo(), "zp", "225m", "pin", "5kW")
	sh, r := sheetOf(t, sc, "report")
	if len(r.Warnings) == 0 {
		t.Fatal("the scenario gives no warning to list")
	}
	var items []string
	for _, bl := range card(t, sh.Cards, "report-warnings").Blocks {
		items = append(items, bl.Items...)
	}
	seen := map[string]bool{}
	for _, w := range r.Warnings {
		text := w.Words(func(f calc.Figure) string { return scenario.Show(f.Value, f.Dim, false) })
		if w.Code != calc.CautionText {
			text = WarningText(w.Code, w.Figures, false)
		}
		if w.Segment > 0 {
			text = "segment " + strconv.Itoa(w.Segment) + ": " + text
		}
		found := false
		for _, it := range items {
			found = found || it == text
		}
		if !found {
			t.Errorf("warning %q not listed", text)
		}
	}
	for _, it := range items {
		if seen[it] {
			t.Errorf("warning %q listed twice", it)
		}
		seen[it] = true
	}
	var methods []string
	for _, bl := range card(t, sh.Cards, "report-methods").Blocks {
		methods = append(methods, bl.Items...)
	}
	if len(methods) != len(Methods) {
		t.Fatalf("%d methods, want %d", len(methods), len(Methods))
	}
	for i, m := range Methods {
		if methods[i] != m.What+": "+m.How {
			t.Errorf("method %d %q, want %q", i, methods[i], m.What+": "+m.How)
		}
	}
	// A sheet without warnings says so.
	clean, r2 := sheetOf(t, with(t, scenario.Scenario{}, "alt", "100m"), "report")
	if len(r2.Warnings) != 0 {
		t.Fatalf("an empty sheet warns: %v", r2.Warnings)
	}
	var text string
	for _, bl := range card(t, clean.Cards, "report-warnings").Blocks {
		text += bl.Text
	}
	if text != "None for these inputs." {
		t.Errorf("no warnings, but the card says %q", text)
	}
}

func TestReportResultsKeepTheirPlace(t *testing.T) {
	// Source: the view model's rule that a card's blocks keep their number
	// whatever the result.
	want := -1
	for _, sc := range []scenario.Scenario{scenario.Demo(), scenario.TurbineDemo(), {}, with(t, scenario.Demo(), "zp", "")} {
		sh, _ := sheetOf(t, sc, "report")
		n := len(card(t, sh.Cards, "report-results").Blocks)
		if want < 0 {
			want = n
		}
		if n != want {
			t.Errorf("results card has %d blocks, want %d", n, want)
		}
	}
}

func TestReportFittingK(t *testing.T) {
	// Source: the result's own loss coefficients (calc.FittingK, which
	// calc's tests and testdata/cases/ref-fluids-fittings.case check
	// against Crane TP-410 and Hooper's 2-K via python3-fluids): the report
	// lists each fitting of each segment with the K used and its method,
	// and the single run's fittings when there are no segments.
	for _, q := range []string{
		scenario.Demo().Encode(),
		"liq=water&t=15C&alt=0m&q=5L/s&l=20m&nps=2&sch=40&mat=steel&fit=elbow90_thr:3,gate:1,bend90_r2:2,exit:1@0.9",
	} {
		sc, err := scenario.Parse(q)
		if err != nil {
			t.Fatal(err)
		}
		sh, r := sheetOf(t, sc, "report")
		var want []calc.FittingK
		var where []string
		if r.Balance != nil && r.Balance.Line != nil {
			for i, sg := range r.Balance.Line.Segments {
				for _, k := range sg.Fittings {
					want = append(want, k)
					where = append(where, "segment "+strconv.Itoa(i+1))
				}
			}
		} else if r.Run != nil {
			for _, k := range r.Run.Fittings {
				want = append(want, k)
				where = append(where, "pipe run")
			}
		}
		if len(want) < 3 {
			t.Fatalf("%s: only %d fittings in the result", q, len(want))
		}
		tb := table(t, sh.Cards, "report-results", "report-fitting-k")
		if len(tb.Rows) != len(want) {
			t.Fatalf("%s: %d rows, want %d", q, len(tb.Rows), len(want))
		}
		methods := map[string]bool{}
		for i, row := range tb.Rows {
			k := want[i]
			if row.Head != where[i] || row.Cells[0].Text != fittingName(k.Key) || row.Cells[1].Text != strconv.Itoa(k.Count) ||
				row.Cells[2].Text != calc.FormatNumber(k.K, 3) || !strings.HasPrefix(row.Cells[3].Text, k.Method) {
				t.Errorf("%s row %d: %s %+v, want %s %+v", q, i, row.Head, row.Cells, where[i], k)
			}
			methods[k.Method] = true
		}
		t.Logf("%d fittings, methods %v", len(want), methods)
	}
}

func TestReportLiquidPressure(t *testing.T) {
	// Source: the rule of calc/scenario/doc.go (pl): the report and the
	// liquid card say which pressure the water's properties were taken
	// at — the stated line pressure, the points' mean, else the site's.
	for _, tc := range []struct{ q, want string }{
		{"liq=water&t=20C&baro=101.325kPa&pl=1.8MPa&plref=a&l=10m&d=50mm&q=2L/s", "water at 20.00 °C and 1800 kPa absolute (the line pressure)"},
		{"liq=water&t=20C&baro=100kPa&p1=0kPa&p2=300kPa&z1=0m&z2=0m&v1=0m/s&v2=0m/s&q=1L/s&hf=1m", "water at 20.00 °C and 250.0 kPa absolute (mean of the points' pressures)"},
		{"liq=seawater&t=15C&baro=98kPa&l=10m&d=50mm&q=2L/s", "seawater (35 g/kg) at 15.00 °C and 98.00 kPa absolute (site pressure)"},
	} {
		sc, err := scenario.Parse(tc.q)
		if err != nil {
			t.Fatal(err)
		}
		sh, _ := sheetOf(t, sc, "report")
		var got string
		for _, bl := range card(t, sh.Cards, "report-results").Blocks {
			for _, f := range bl.Facts {
				if f.ID == "report-liquid" {
					got = f.Value
				}
			}
		}
		if !strings.HasPrefix(got, tc.want) {
			t.Errorf("%s: report says %q, want it to start %q", tc.q, got, tc.want)
		}
	}
}
