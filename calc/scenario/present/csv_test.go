package present

import (
	"encoding/csv"
	"math"
	"strconv"
	"strings"
	"testing"
	"time"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// readTable reads a results table back as a spreadsheet would: the UTF-8
// byte-order mark first, then RFC 4180 records (encoding/csv); the header
// row as a map of column heads.
func readTable(t *testing.T, out string) (rows [][]string, col map[string]int) {
	t.Helper()
	body, ok := strings.CutPrefix(out, "\uFEFF")
	if !ok {
		t.Fatalf("the table does not start with a UTF-8 byte-order mark: %q", out[:min(len(out), 20)])
	}
	rows, err := csv.NewReader(strings.NewReader(body)).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	col = map[string]int{}
	for i, h := range rows[0] {
		if _, dup := col[h]; dup {
			t.Errorf("two columns are headed %q", h)
		}
		col[h] = i
	}
	return rows, col
}

// cellNum is a figure of a table.
func cellNum(t *testing.T, rows [][]string, col map[string]int, row int, head string) float64 {
	t.Helper()
	i, ok := col[head]
	if !ok {
		t.Fatalf("no column %q", head)
	}
	v, err := strconv.ParseFloat(rows[row][i], 64)
	if err != nil {
		t.Fatalf("row %d, %q: %q is not a number", row, head, rows[row][i])
	}
	return v
}

func parseSheet(t *testing.T, q string) scenario.Scenario {
	t.Helper()
	s, err := scenario.Parse(q)
	if err != nil {
		t.Fatalf("%s: %v", q, err)
	}
	return s
}

// TestResultsCSV: one unit system for the whole table whatever units each
// sheet is kept in, named in the head of every figure's column; the SI and
// the US table of the same sheets agree through NIST SP 811 (2008)
// Appendix B's factors, not through the project's own unit table; the
// figures given in the demo's link (45 L/s, 18 °C) and the site pressure
// at its 210 m (ISO 2533's standard atmosphere) read back.
func TestResultsCSV(t *testing.T) {
	edited := time.Date(2026, 11, 28, 16, 2, 55, 0, time.UTC)
	sheets := []scenario.KeptSheet{{Scen: scenario.Demo(), Edited: edited}, {Scen: usDemo(t)}, {Scen: scenario.TurbineDemo()}, {}}
	si, siCol := readTable(t, ResultsCSV(sheets, false))
	us, usCol := readTable(t, ResultsCSV(sheets, true))
	if len(si) != len(sheets)+1 || len(us) != len(sheets)+1 {
		t.Fatalf("%d and %d rows for %d sheets", len(si), len(us), len(sheets))
	}
	for _, h := range []string{"title", "edited (UTC)", "sheet's own units", "flow (L/s)", "pump head (m)", "temperature (°C)",
		"site pressure, absolute (kPa)", "± measured pump head (m)", "NPSH margin (m)", "problems", "link"} {
		if _, ok := siCol[h]; !ok {
			t.Errorf("SI table: no column %q", h)
		}
	}
	for _, h := range []string{"flow (gpm)", "pump head (ft)", "temperature (°F)", "site pressure, absolute (psi)"} {
		if _, ok := usCol[h]; !ok {
			t.Errorf("US table: no column %q", h)
		}
	}
	if got := si[1][siCol["edited (UTC)"]]; got != "2026-11-28 16:02:55" {
		t.Errorf("edited %q", got)
	}
	if si[2][siCol["edited (UTC)"]] != "" {
		t.Errorf("a sheet whose edit time is not known shows %q", si[2][siCol["edited (UTC)"]])
	}
	if si[1][siCol["sheet's own units"]] != "SI" || si[2][siCol["sheet's own units"]] != "US" {
		t.Errorf("own units %q, %q", si[1][siCol["sheet's own units"]], si[2][siCol["sheet's own units"]])
	}

	// The demo kept in SI and in US units gives one row, figure for
	// figure, in either table: the table's units are its own.
	// (usDemo's values are the demo's converted, so figures agree to the
	// conversion's rounding.)
	for i := range si[1] {
		h := si[0][i]
		if h == "sheet's own units" || h == "link" || h == "problems" || h == "edited (UTC)" {
			continue
		}
		a, errA := strconv.ParseFloat(si[1][i], 64)
		b, errB := strconv.ParseFloat(si[2][i], 64)
		if errA == nil && errB == nil && math.Abs(a-b) <= 1e-4*math.Abs(a)+1e-4 {
			continue
		}
		if si[1][i] != si[2][i] {
			t.Errorf("SI table, %q: %q for the SI sheet, %q for the US one", h, si[1][i], si[2][i])
		}
	}

	// Figures given in the link, and ISO 2533's pressure at 210 m:
	// p = 101.325 kPa·(1 − 2.25577e-5·210)^5.25588 = 98.8275 kPa
	// (/usr/bin/python3, ISO 2533's troposphere formula).
	near := func(what string, got, want, rel float64) {
		t.Helper()
		if math.Abs(got-want) > rel*math.Abs(want) {
			t.Errorf("%s: %v, want %v", what, got, want)
		}
	}
	near("flow", cellNum(t, si, siCol, 1, "flow (L/s)"), 45, 1e-6)
	near("temperature", cellNum(t, si, siCol, 1, "temperature (°C)"), 18, 1e-6)
	near("site pressure", cellNum(t, si, siCol, 1, "site pressure, absolute (kPa)"), 101.325*math.Pow(1-2.25577e-5*210, 5.25588), 2e-5)

	// NIST SP 811 (2008) Appendix B: ft = 3.048E−01 m, gal (US) =
	// 3.785412E−03 m³, psi = 6.894757E+03 Pa, horsepower (550 ft·lbf/s) =
	// 7.456999E+02 W, t/°F = 1.8·t/°C + 32. Six significant digits either
	// side.
	const ft, gal, psi = 0.3048, 3.785412e-3, 6894.757
	for _, c := range []struct {
		siHead, usHead string
		toUS           func(float64) float64
	}{
		{"flow (L/s)", "flow (gpm)", func(v float64) float64 { return v * 1e-3 / gal * 60 }},
		{"pump head (m)", "pump head (ft)", func(v float64) float64 { return v / ft }},
		{"NPSH margin (m)", "NPSH margin (ft)", func(v float64) float64 { return v / ft }},
		{"± measured pump head (m)", "± measured pump head (ft)", func(v float64) float64 { return v / ft }},
		{"temperature (°C)", "temperature (°F)", func(v float64) float64 { return 1.8*v + 32 }},
		{"site pressure, absolute (kPa)", "site pressure, absolute (psi)", func(v float64) float64 { return v * 1e3 / psi }},
		{"operating flow (L/s)", "operating flow (gpm)", func(v float64) float64 { return v * 1e-3 / gal * 60 }},
		{"wire-to-water efficiency (%)", "wire-to-water efficiency (%)", func(v float64) float64 { return v }},
	} {
		for row := 1; row <= 2; row++ {
			if si[row][siCol[c.siHead]] == "" {
				if c.siHead != "± measured pump head (m)" {
					t.Errorf("row %d: %q is empty", row, c.siHead)
				}
				continue
			}
			near(c.usHead, cellNum(t, us, usCol, row, c.usHead), c.toUS(cellNum(t, si, siCol, row, c.siHead)), 1e-5)
		}
	}
	if hp, ok := usCol["turbine output (hp)"]; !ok || us[3][hp] == "" {
		t.Errorf("US table: no turbine output in hp for the turbine demo")
	} else {
		near("turbine output", cellNum(t, us, usCol, 3, "turbine output (hp)"), cellNum(t, si, siCol, 3, "turbine output (kW)")*1e3/745.6999, 1e-5)
	}

	if si[1][siCol["title"]] != scenario.Demo().Get("name") || si[1][siCol["link"]] != scenario.Demo().Sign() {
		t.Errorf("title %q link %q", si[1][siCol["title"]], si[1][siCol["link"]])
	}
	for i, h := range si[0] {
		if si[4][i] != "" && h != "sheet's own units" && h != "link" {
			t.Errorf("an empty sheet has %q under %q", si[4][i], h)
		}
	}
}

// commissioningSheets are sheets that between them hold every result
// family: the demo with a grade, accuracies, a motor efficiency, a duty
// to reach by speed, running costs, a closing valve and a flow meter on
// its line; a run sized in the Run view; the turbine demo; a line over a
// crest (a case of testdata/cases/ref-highpoint.case).
func commissioningSheets(t *testing.T) []scenario.KeptSheet {
	demo := scenario.Demo().Encode()
	return []scenario.KeptSheet{
		{Scen: parseSheet(t, demo+"&etam=92%25&gcs=1%25&gss=1000kPa&gcd=1%25&gsd=1000kPa&uqm=2%25&upin=1.5%25&grade=2B"+
			"&qsp=40L/s&nrat=1450rpm&fmains=50Hz&hours=4000&tariff=0.15&tc=5s&s2.cmp=flowmeter:20kPa@45L/s")},
		{Scen: parseSheet(t, "name=New%20main&liq=water&t=15C&view=regime&q=35L/s&l=1200m&nps=8&sch=40&mat=steel&szsch=40")},
		{Scen: scenario.TurbineDemo()},
		{Scen: scenario.PumpTestDemo()},
		{Scen: parseSheet(t, "liq=custom&rho=1000kg/m3&mu=1mPa.s&pv=2.34kPa&baro=101.325kPa&p1=0kPa&v1=0m/s&p2=0kPa&v2=0m/s&z1=100m&z2=60m&solve=q&s1.l=2000m&s1.d=200mm&s1.eps=0.05mm&s1.z=108m&s2.l=3000m&s2.d=200mm&s2.eps=0.05mm")},
		{Scen: parseSheet(t, "name=Loop&loop=1&liq=pg&gly=30%25&t=7C&q=12L/s&tsup=7C&tret=12C&pexp=150kPa&zexp=10m&zp=0m"+
			"&s1.l=120m&s1.nps=3&s1.sch=40&s1.mat=steel&s1.fit=elbow90:6,gate:2&s1.cmp=chiller:45kPa@12L/s,coil:3.2m@12L/s,valve:kv40%20fl0.9%20xfz0.4")},
	}
}

// TestResultsCSVEveryPart: every result family of scenario.Result
// (scenario.Parts) has its columns, and for sheets that hold every part,
// a sheet holding a part fills one of its columns at least.
func TestResultsCSVEveryPart(t *testing.T) {
	sheets := commissioningSheets(t)
	rows, _ := readTable(t, ResultsCSV(sheets, false))
	for _, p := range scenario.Parts() {
		var cols []int
		for i, c := range csvColumns {
			if c.part == p || c.or == p {
				cols = append(cols, i)
			}
		}
		if len(cols) == 0 {
			t.Errorf("no column for the %s", p)
			continue
		}
		held := false
		for k, s := range sheets {
			r := scenario.Evaluate(scenario.Read(s.Scen))
			if !r.Worked(p) {
				continue
			}
			held = true
			filled := false
			for _, i := range cols {
				j := i
				if i > 0 {
					j++ // the edit time follows the title
				}
				filled = filled || rows[k+1][j] != ""
			}
			if !filled {
				t.Errorf("sheet %d holds the %s but its columns are empty", k+1, p)
			}
		}
		if !held {
			t.Errorf("no test sheet holds the %s", p)
		}
	}
}

// TestResultsCSVFamilies: the new sheet "New main" (a run sized in the Run
// view) has its run and sizing row; the commissioning sheet its speed for
// the duty in %, rpm and Hz (the affinity laws' speed ratio times 1450 rpm
// and 50 Hz), its bands, verdict, surge and component drop; the crest
// sheet its high point and full-pipe flow.
func TestResultsCSVFamilies(t *testing.T) {
	sheets := commissioningSheets(t)
	rows, col := readTable(t, ResultsCSV(sheets, false))
	for _, c := range []struct {
		row  int
		head string
	}{
		{2, "run: velocity (m/s)"}, {2, "run: Reynolds number"}, {2, "run: friction and fittings (m)"},
		{2, "sizing: this run's size fits"}, {2, "sizing: smallest size that fits"},
		{1, "speed for the duty (%)"}, {1, "speed for the duty (rpm)"}, {1, "drive frequency for the duty (Hz)"},
		{1, "± measured pump head (m)"}, {1, "± measured hydraulic power (kW)"}, {1, "± wire-to-water efficiency (% points)"},
		{1, "± pump efficiency (% points)"}, {1, "acceptance verdict"}, {1, "surge: Joukowsky pressure rise (kPa)"},
		{1, "surge: wave speed (m/s)"}, {1, "component drops, total (m)"}, {1, "component drops, each (m)"},
		{4, "high point: segment"}, {4, "high point: column breaks"},
	} {
		i, ok := col[c.head]
		if !ok {
			t.Errorf("no column %q", c.head)
			continue
		}
		if rows[c.row][i] == "" {
			t.Errorf("sheet %d: %q is empty", c.row, c.head)
		}
	}
	if rows[2][col["title"]] != "New main" {
		t.Errorf("sheet 2 is %q", rows[2][col["title"]])
	}
	pct := cellNum(t, rows, col, 1, "speed for the duty (%)")
	if rpm := cellNum(t, rows, col, 1, "speed for the duty (rpm)"); math.Abs(rpm-pct/100*1450) > 1e-4*rpm {
		t.Errorf("%v rpm at %v %% of 1450 rpm", rpm, pct)
	}
	if hz := cellNum(t, rows, col, 1, "drive frequency for the duty (Hz)"); math.Abs(hz-pct/100*50) > 1e-4*hz {
		t.Errorf("%v Hz at %v %% of 50 Hz", hz, pct)
	}
	if got := rows[1][col["component drops, each (m)"]]; !strings.Contains(got, "segment 2 flowmeter: ") {
		t.Errorf("component drops %q", got)
	}
	// A drop rated 20 kPa at 45 L/s, at the 45 L/s of the balance, is
	// 20 kPa over ρg: 2.04 m of water near 18 °C (ρ ≈ 998.6 kg/m³,
	// IAPWS-IF97 by python3-iapws; g = 9.80665 m/s²).
	if got := cellNum(t, rows, col, 1, "component drops, total (m)"); math.Abs(got-20e3/(998.6*9.80665)) > 0.002 {
		t.Errorf("component drop %v m, want 2.042", got)
	}
}

// TestResultsCSVProblems: problems only for what a sheet's results need —
// a complete NPSH-only sheet (a case of testdata/cases/ref-npsh.case)
// lists none of the balance's missing inputs; a balance begun with its
// second point lists what it lacks; a bad value is always listed.
func TestResultsCSVProblems(t *testing.T) {
	npsh := parseSheet(t, "view=pump&liq=water&t=25C&alt=300m&p1=0kPa&z1=48.5m&zp=51m&npshr=3.2m&hs=0.35m")
	begun := parseSheet(t, "liq=water&t=20C&p1=0kPa&z1=10m&p2=0kPa&q=10L/s&hf=1m")
	bad := parseSheet(t, "view=pump&liq=water&t=hot&alt=300m&p1=0kPa&z1=48.5m&zp=51m&npshr=3.2m&hs=0.35m")
	rows, col := readTable(t, ResultsCSV([]scenario.KeptSheet{{Scen: npsh}, {Scen: begun}, {Scen: bad}}, false))
	if got := rows[1][col["problems"]]; got != "" {
		t.Errorf("the NPSH-only sheet lists problems %q", got)
	}
	if rows[1][col["NPSH available (m)"]] == "" || rows[1][col["NPSH margin (m)"]] == "" {
		t.Error("the NPSH-only sheet has no NPSH figures")
	}
	if got := rows[2][col["problems"]]; !strings.Contains(got, scenario.Label("z2")) {
		t.Errorf("the begun balance lists %q, want its missing %q", got, scenario.Label("z2"))
	}
	if got := rows[3][col["problems"]]; got != scenario.Label("t") {
		t.Errorf("the sheet with a bad temperature lists %q, want only %q", got, scenario.Label("t"))
	}
}

// TestHeadlineNPSH: the site book's headline of a complete NPSH-only sheet
// is its NPSH, not "no answer yet"; available minus required is the
// margin shown.
func TestHeadlineNPSH(t *testing.T) {
	s := parseSheet(t, "view=pump&liq=water&t=25C&alt=300m&p1=0kPa&z1=48.5m&zp=51m&npshr=3.2m&hs=0.35m")
	r := scenario.Evaluate(scenario.Read(s))
	got := Headline(s, r)
	if !strings.HasPrefix(got, "NPSH available ") || !strings.Contains(got, "margin ") {
		t.Fatalf("headline %q", got)
	}
	if want := scenario.Show(r.NPSH.Available-3.2, calc.Length, false); !strings.Contains(got, want) {
		t.Errorf("headline %q lacks the margin %s", got, want)
	}
}
