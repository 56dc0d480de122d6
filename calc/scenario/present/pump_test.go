package present

import (
	"math"
	"reflect"
	"strconv"
	"strings"
	"testing"
	"unicode"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// sheetOf builds the view model of sc opened on view, as the page does.
func sheetOf(t *testing.T, sc scenario.Scenario, view string) (Sheet, scenario.Result) {
	t.Helper()
	if err := sc.Set("view", view); err != nil {
		t.Fatal(err)
	}
	d := scenario.NewDraft(sc)
	r := scenario.Evaluate(scenario.Read(d.Scen))
	return Build(&d, r), r
}

// with returns a copy of sc with the given parameters set ("" removes).
func with(t *testing.T, sc scenario.Scenario, kv ...string) scenario.Scenario {
	t.Helper()
	out := sc.Clone()
	for i := 0; i+1 < len(kv); i += 2 {
		if err := out.Set(kv[i], kv[i+1]); err != nil {
			t.Fatal(err)
		}
	}
	return out
}

// usDemo is scenario.Demo in US customary units: units=us and every
// quantity and list rewritten in its US default unit, converted with
// calc's unit table (the demo's own values, not new ones).
func usDemo(t *testing.T) scenario.Scenario { return usOf(t, scenario.Demo()) }

// usOf is sc in US customary units (see usDemo).
func usOf(t *testing.T, sc scenario.Scenario) scenario.Scenario {
	t.Helper()
	sc = sc.Clone()
	toUS := func(p, num, unit string) string {
		if unit == "" {
			unit = scenario.DefaultUnit(p, false)
		}
		from, err := calc.LookupUnit(unit)
		if err != nil {
			t.Fatalf("%s: unit %q: %v", p, unit, err)
		}
		to, err := calc.LookupUnit(scenario.DefaultUnit(p, true))
		if err != nil {
			t.Fatalf("%s: US unit: %v", p, err)
		}
		v, err := strconv.ParseFloat(num, 64)
		if err != nil {
			t.Fatalf("%s: %q: %v", p, num, err)
		}
		return strconv.FormatFloat(to.FromSI(from.ToSI(v)), 'g', 6, 64)
	}
	for _, p := range scenario.AllParams() {
		row, _, _ := scenario.Lookup(p)
		raw := sc.Get(p)
		if raw == "" {
			continue
		}
		switch row.Kind {
		case scenario.KindQuantity:
			num, unit := scenario.Split(raw)
			_ = sc.Set(p, toUS(p, num, unit)+scenario.DefaultUnit(p, true))
		case scenario.KindList:
			cells, unit := sc.Cells(p)
			for i, c := range cells {
				cells[i] = toUS(p, c, unit)
			}
			_ = sc.Set(p, strings.Join(cells, ",")+scenario.DefaultUnit(p, true))
		}
	}
	_ = sc.Set("units", "us")
	return sc
}

// sheetCase is a named scenario of a table-driven test.
type sheetCase struct {
	name string
	sc   scenario.Scenario
}

// demos are the demo in SI and in US units, then any more cases.
func demos(t *testing.T, more ...sheetCase) []sheetCase {
	return append([]sheetCase{{"SI demo", scenario.Demo()}, {"US demo", usDemo(t)}}, more...)
}

// walk calls f with every string field of v (a view-model value) and its
// field's name, following slices and pointers.
func walk(v reflect.Value, name string, f func(name, s string)) {
	switch v.Kind() {
	case reflect.String:
		f(name, v.String())
	case reflect.Pointer, reflect.Interface:
		if !v.IsNil() {
			walk(v.Elem(), name, f)
		}
	case reflect.Slice:
		for i := 0; i < v.Len(); i++ {
			walk(v.Index(i), name, f)
		}
	case reflect.Struct:
		for i := 0; i < v.NumField(); i++ {
			walk(v.Field(i), v.Type().Field(i).Name, f)
		}
	}
}

// ids are the element ids the cards give (any field named …ID).
func ids(cards []Card) map[string]bool {
	out := map[string]bool{}
	walk(reflect.ValueOf(cards), "", func(name, s string) {
		if strings.HasSuffix(name, "ID") && s != "" {
			out[s] = true
		}
	})
	return out
}

// siTokens are SI unit symbols that must not follow a figure on a US sheet.
var siTokens = map[string]bool{"m": true, "mm": true, "kPa": true, "Pa": true, "bar": true, "L/s": true,
	"m³/s": true, "°C": true, "kg/m³": true, "mPa·s": true, "kW": true, "m/s": true}

// siAfterDigit returns the SI unit tokens written right after a number in s.
func siAfterDigit(s string) []string {
	var found []string
	rs := []rune(s)
	for i := 0; i < len(rs); i++ {
		if !unicode.IsDigit(rs[i]) || (i+1 < len(rs) && (unicode.IsDigit(rs[i+1]) || rs[i+1] == '.')) {
			continue
		}
		j := i + 1
		for j < len(rs) && (rs[j] == ' ' || rs[j] == '\u2009' || rs[j] == '\u00a0') {
			j++
		}
		k := j
		for k < len(rs) && !unicode.IsSpace(rs[k]) {
			k++
		}
		tok := strings.TrimRight(string(rs[j:k]), ",.;:)")
		if siTokens[tok] {
			found = append(found, tok)
		}
	}
	return found
}

// checkCards checks the cards' ids in order and that each of want is an
// element id in them.
func checkCards(t *testing.T, cards []Card, order, want []string) {
	t.Helper()
	var got []string
	for _, c := range cards {
		got = append(got, c.ID)
	}
	if !reflect.DeepEqual(got, order) {
		t.Errorf("cards %v, want %v", got, order)
	}
	have := ids(cards)
	for _, id := range want {
		if !have[id] {
			t.Errorf("no element id %q", id)
		}
	}
}

func card(t *testing.T, cards []Card, id string) Card {
	t.Helper()
	for _, c := range cards {
		if c.ID == id {
			return c
		}
	}
	t.Fatalf("no card %q", id)
	return Card{}
}

// figure finds the text of the fact or answer figure with id in the cards.
func figure(t *testing.T, cards []Card, id string) string {
	t.Helper()
	for _, c := range cards {
		for _, bl := range c.Blocks {
			for _, f := range bl.Facts {
				if f.ID == id {
					return f.Value
				}
			}
			if bl.Answer == nil {
				continue
			}
			for _, v := range bl.Answer.Values {
				if v.ID == id {
					return v.Text
				}
			}
		}
	}
	t.Fatalf("no figure %q", id)
	return ""
}

func TestPumpFiguresFromEvaluate(t *testing.T) {
	// Source: the figures equal scenario.Evaluate's, formatted by
	// scenario.Show and ShowParam in the sheet's units — the view model
	// must not recompute; efficiencies are written by percent.
	for _, tc := range demos(t) {
		t.Run(tc.name, func(t *testing.T) {
			sh, r := sheetOf(t, tc.sc, "pump")
			if r.Pump == nil || r.Pump.Operating == nil || r.NPSH == nil || r.Field == nil {
				t.Fatalf("the demo has no operating point, NPSH or field check: %v", r.Errors)
			}
			us, op, n, f := r.US, r.Pump.Operating, r.NPSH, r.Field
			length := func(v float64) string { return scenario.Show(v, calc.Length, us) }
			power := func(v float64) string { return scenario.Show(v, calc.Power, us) }
			for _, c := range []struct{ id, got, want string }{
				{"op-q", figure(t, sh.Cards, "op-q"), scenario.ShowParam("q", op.Q, us)},
				{"op-h", figure(t, sh.Cards, "op-h"), length(op.H)},
				{"op-eff", figure(t, sh.Cards, "op-eff"), scenario.ShowParam("peff", op.Eff, us)},
				{"op-shaft", figure(t, sh.Cards, "op-shaft"), power(op.ShaftPower)},
				{"op-hyd", figure(t, sh.Cards, "op-hyd"), power(op.HydraulicPower)},
				{"npsh-a", figure(t, sh.Cards, "npsh-a"), length(n.Available)},
				{"npsh-r", figure(t, sh.Cards, "npsh-r"), length(n.Required)},
				{"npsh-margin", figure(t, sh.Cards, "npsh-margin"), length(n.Margin)},
				{"npsh-ratio", figure(t, sh.Cards, "npsh-ratio"), calc.FormatNumber(n.Ratio, 3)},
				{"field-head", figure(t, sh.Cards, "field-head"), length(f.Head)},
				{"field-power", figure(t, sh.Cards, "field-power"), power(f.HydraulicPower)},
				{"field-eff", figure(t, sh.Cards, "field-eff"), scenario.ShowParam("peff", f.Efficiency, us)},
			} {
				if c.got != c.want {
					t.Errorf("%s = %q, want %q", c.id, c.got, c.want)
				}
			}
		})
	}
}

func TestTurbineFiguresFromEvaluate(t *testing.T) {
	// Source: scenario.TurbineDemo's turbine result from scenario.Evaluate,
	// formatted by scenario.Show.
	sh, r := sheetOf(t, scenario.TurbineDemo(), "pump")
	if r.Turbine == nil || r.BestTurbine == nil {
		t.Fatalf("the turbine demo has no turbine result: %v", r.Errors)
	}
	for _, c := range []struct{ id, got, want string }{
		{"turb-power", figure(t, sh.Cards, "turb-power"), scenario.Show(r.Turbine.Power, calc.Power, false)},
		{"turb-gross", figure(t, sh.Cards, "turb-gross"), scenario.Show(r.Turbine.GrossHead, calc.Length, false)},
		{"turb-net", figure(t, sh.Cards, "turb-net"), scenario.Show(r.Turbine.NetHead, calc.Length, false)},
		{"turb-best", figure(t, sh.Cards, "turb-best"), scenario.Show(r.BestTurbine.Power, calc.Power, false)},
	} {
		if c.got != c.want {
			t.Errorf("%s = %q, want %q", c.id, c.got, c.want)
		}
	}
}

func TestPumpViewIDs(t *testing.T) {
	// Source: the element ids the browser tests look up on the Pump view
	// (the old page's ids, kept).
	demoT := with(t, scenario.Demo(), "etat", "80%")
	for _, tc := range []struct {
		name  string
		sc    scenario.Scenario
		cards []string // in this order
		want  []string
	}{
		{"pump demo with a turbine efficiency", demoT,
			[]string{"operating", "npsh", "pump-chart-card", "datasheet-card", "pump-setup", "liquid", "field", "test", "energy", "turbine"},
			[]string{"op-q", "op-h", "op-eff", "op-shaft", "op-hyd", "answer", "npsh-level", "npsh-a", "npsh-r",
				"npsh-margin", "npsh-ratio", "npsh-note", "field-results", "field-head", "field-power", "field-eff",
				"field-dev", "field-bep", "energy-vol", "energy-head", "energy-ideal", "in-t", "in-hours", "in-tariff",
				"in-nrat", "in-fmains", "in-qsp", "to-ht", "datasheet", "row-add", "row-del-1", "in-pq-0", "pump-chart"}},
		{"pump demo without readings or pump elevation", with(t, scenario.Demo(), "zp", "", "qm", "", "ps", "", "pd", ""),
			[]string{"operating", "npsh", "pump-chart-card", "datasheet-card", "pump-setup", "liquid", "field", "test", "energy"},
			[]string{"npsh-why", "op-q"}},
		{"pump demo without a data sheet", with(t, scenario.Demo(), "pq", "", "ph", "", "peff", "", "pnpsh", ""),
			[]string{"operating", "npsh", "pump-chart-card", "datasheet-card", "pump-setup", "liquid", "field", "test", "energy"},
			[]string{"op-q", "answer"}},
		{"turbine demo", scenario.TurbineDemo(),
			[]string{"turbine", "surge", "profile-card", "pump-side"},
			[]string{"answer", "turb-power", "turb-gross", "turb-net", "turb-best", "turb-loss-share", "turb-static", "turb-best-note",
				"in-tc", "surge-caution", "to-hp"}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			sh, _ := sheetOf(t, tc.sc, "pump")
			checkCards(t, sh.Cards, tc.cards, tc.want)
		})
	}
}

func TestPumpButtonsAct(t *testing.T) {
	// Source: the brief's actions — buttons carry what they do to the
	// sheet (Draft.Choose, AddRow, RemoveRow with a 0-based row).
	find := func(cards []Card, id string) (Button, bool) {
		var out Button
		ok := false
		var look func(v reflect.Value)
		look = func(v reflect.Value) {
			switch v.Kind() {
			case reflect.Pointer:
				if !v.IsNil() {
					look(v.Elem())
				}
			case reflect.Slice:
				for i := 0; i < v.Len(); i++ {
					look(v.Index(i))
				}
			case reflect.Struct:
				if bt, is := v.Interface().(Button); is {
					if bt.ID == id {
						out, ok = bt, true
					}
					return
				}
				for i := 0; i < v.NumField(); i++ {
					look(v.Field(i))
				}
			}
		}
		look(reflect.ValueOf(cards))
		return out, ok
	}
	pump, _ := sheetOf(t, with(t, scenario.Demo(), "etat", "80%"), "pump")
	turb, _ := sheetOf(t, scenario.TurbineDemo(), "pump")
	for _, c := range []struct {
		cards []Card
		id    string
		want  Action
	}{
		{turb.Cards, "to-hp", Action{Do: "choose", Param: "solve", Value: "hp"}},
		{pump.Cards, "to-ht", Action{Do: "choose", Param: "solve", Value: "ht"}},
		{pump.Cards, "row-add", Action{Do: "row-add"}},
		{pump.Cards, "row-del-1", Action{Do: "row-remove", N: 0}},
		{pump.Cards, "row-del-3", Action{Do: "row-remove", N: 2}},
	} {
		bt, ok := find(c.cards, c.id)
		if !ok {
			t.Errorf("no button %q", c.id)
			continue
		}
		if bt.Act != c.want {
			t.Errorf("%s acts %+v, want %+v", c.id, bt.Act, c.want)
		}
	}
}

func TestDataSheetCells(t *testing.T) {
	// Source: every data-sheet cell is drawn from the scenario:
	// scenario.Cells of its column, padded to Draft.RowCount rows.
	for _, tc := range demos(t, sheetCase{"ragged lists", with(t, scenario.Demo(), "peff", "10,20%", "pq", "0;12,5;30L/s")}) {
		t.Run(tc.name, func(t *testing.T) {
			sh, _ := sheetOf(t, tc.sc, "pump")
			d := scenario.NewDraft(tc.sc)
			var ds *DataSheet
			for _, bl := range card(t, sh.Cards, "datasheet-card").Blocks {
				if bl.Kind == BlockDataSheet {
					ds = bl.DataSheet
				}
			}
			if ds == nil {
				t.Fatal("no data sheet")
			}
			if len(ds.Rows) != d.RowCount() {
				t.Fatalf("%d rows, want Draft.RowCount %d", len(ds.Rows), d.RowCount())
			}
			for ci, col := range ds.Columns {
				cells, _ := tc.sc.Cells(col.Param)
				if col.Param != scenario.ListColumns[ci] {
					t.Errorf("column %d is %s, want %s", ci, col.Param, scenario.ListColumns[ci])
				}
				for i, row := range ds.Rows {
					want := ""
					if i < len(cells) {
						want = cells[i]
					}
					c := row.Cells[ci]
					if c.Text != want || c.Param != col.Param || c.Row != i || c.ID != "in-"+col.Param+"-"+strconv.Itoa(i) {
						t.Errorf("cell %s row %d = %+v, want text %q", col.Param, i, c, want)
					}
				}
			}
		})
	}
}

func TestNoSIUnitsOnUSSheet(t *testing.T) {
	// Source: a US sheet words every figure in US customary units
	// (scenario.DefaultUnit with us); the demo converted with calc's unit
	// table, and the turbine demo likewise, must show no SI unit after a
	// figure on any view, in any part of the sheet.
	for _, demo := range []sheetCase{{"demo", usDemo(t)}, {"turbine demo", usOf(t, scenario.TurbineDemo())}} {
		for _, v := range Views {
			t.Run(demo.name+"/"+v.Key, func(t *testing.T) {
				sh, r := sheetOf(t, demo.sc, v.Key)
				if len(r.Errors) > 0 {
					t.Fatalf("the US %s has errors: %v", demo.name, r.Errors)
				}
				n := 0
				entered := enteredInSI(sh)
				walk(reflect.ValueOf(sh), "", func(name, s string) {
					n++
					if bad := siAfterDigit(s); len(bad) > 0 && !entered[s] {
						t.Errorf("%s %q has SI units %v", name, s, bad)
					}
				})
				if n < 50 {
					t.Errorf("only %d strings in the %s view", n, v.Key)
				}
			})
		}
	}
	// The check itself: an SI sheet does show SI units after figures.
	sh, _ := sheetOf(t, scenario.Demo(), "pump")
	found := false
	walk(reflect.ValueOf(sh.Cards), "", func(_, s string) { found = found || len(siAfterDigit(s)) > 0 })
	if !found {
		t.Error("the SI demo shows no SI unit after a figure: the check finds nothing")
	}
}

// enteredInSI are the report's "as entered" texts of the inputs whose US
// default unit is an SI one by design: the motor's electrical input,
// read off power meters in kW in both unit systems (issue 11). Their
// value as entered may show kW on a US sheet; every figure worked out
// from them is still worded in US units.
func enteredInSI(sh Sheet) map[string]bool {
	out := map[string]bool{}
	labels := map[string]bool{}
	for _, p := range scenario.Params {
		if siTokens[scenario.DefaultUnit(p, true)] {
			labels[scenario.Label(p)] = true
		}
	}
	for _, c := range sh.Cards {
		for _, bl := range c.Blocks {
			if bl.Table == nil {
				continue
			}
			for _, r := range bl.Table.Rows {
				if labels[r.Head] {
					for _, cell := range r.Cells {
						out[cell.Text] = true
					}
				}
			}
		}
	}
	return out
}

func TestNPSHVerdictBeforeFacts(t *testing.T) {
	// Source: the NPSH verdict is a badge (BlockLevel) before the facts,
	// its class from calc's NPSHLevel, and the note is calc's NPSH note
	// worded with the sheet's figures.
	for _, tc := range []struct {
		name, class string
		sc          scenario.Scenario
	}{
		{"demo", "", scenario.Demo()},
		{"pump high above the well", "lvl-danger", with(t, scenario.Demo(), "zp", "225m")},
		{"typed NPSH required not given", "lvl-none", with(t, scenario.Demo(), "pnpsh", "")},
	} {
		t.Run(tc.name, func(t *testing.T) {
			sh, r := sheetOf(t, tc.sc, "pump")
			if r.NPSH == nil {
				t.Fatalf("no NPSH result: %v", r.Errors)
			}
			want, class := npshLevel(r.NPSH.Level)
			if tc.class != "" && class != tc.class {
				t.Fatalf("level class %s, want %s", class, tc.class)
			}
			level, facts := -1, -1
			var note string
			for i, bl := range card(t, sh.Cards, "npsh").Blocks {
				switch {
				case bl.Kind == BlockLevel:
					level = i
					if bl.ID != "npsh-level" || bl.Text != want || bl.Class != class {
						t.Errorf("verdict %+v, want %q %s", bl, want, class)
					}
				case bl.Kind == BlockFacts:
					facts = i
				case bl.ID == "npsh-note":
					note = bl.Text
				}
			}
			if level < 0 || facts < 0 || level > facts {
				t.Errorf("verdict at block %d, facts at %d", level, facts)
			}
			wantNote := WarningText(r.NPSH.Note.Code, r.NPSH.Note.Figures, r.US)
			if note != wantNote {
				t.Errorf("note %q, want %q", note, wantNote)
			}
		})
	}
}

func TestBlocksKeepTheirPlace(t *testing.T) {
	// Source: the view model's rule that a card's blocks keep their number
	// and order whatever the result, so that a box being typed in is never
	// drawn anew.
	base := with(t, scenario.Demo(), "etat", "80%")
	variants := []scenario.Scenario{
		with(t, base, "q", ""),
		with(t, base, "zp", ""),
		with(t, base, "ph", "1,2"),
		with(t, base, "qm", "", "ps", ""),
		with(t, base, "pq", "", "ph", "", "peff", "", "pnpsh", ""),
		with(t, base, "pin", "abc", "t", "400C"),
	}
	shape := func(sh Sheet) map[string][]BlockKind {
		out := map[string][]BlockKind{}
		for _, c := range sh.Cards {
			for _, bl := range c.Blocks {
				k := bl.Kind
				if k != BlockFields && k != BlockSwitch && k != BlockDataSheet {
					k = BlockEmpty // parts without inputs may come and go
				}
				out[c.ID] = append(out[c.ID], k)
			}
		}
		return out
	}
	ref, _ := sheetOf(t, base, "pump")
	want := shape(ref)
	for i, v := range variants {
		sh, _ := sheetOf(t, v, "pump")
		got := shape(sh)
		for id, kinds := range want {
			if !reflect.DeepEqual(got[id], kinds) {
				t.Errorf("variant %d: card %s blocks %v, want %v", i, id, got[id], kinds)
			}
		}
	}
}

func TestPumpChart(t *testing.T) {
	// Source: the chart is the scenario's pump result in display units
	// (calc.LookupUnit(scenario.DefaultUnit(param, us)).FromSI); the
	// data-sheet points are the data sheet's; no value is NaN.
	for _, tc := range demos(t, sheetCase{"two in parallel at 90 %", with(t, scenario.Demo(), "pumps", "2p", "spd", "90%")}) {
		t.Run(tc.name, func(t *testing.T) {
			d := scenario.NewDraft(with(t, tc.sc, "view", "pump"))
			r := scenario.Evaluate(scenario.Read(d.Scen))
			b := &builder{d: &d, in: &r.Inputs, r: r, us: r.US, shown: map[string]bool{}, warned: map[string]bool{}}
			bl := b.pumpChart("pump-chart", "caption")
			if bl.Kind != BlockChart || bl.Chart == nil || bl.Chart.Kind != "pump" {
				t.Fatalf("no pump chart: %+v", bl)
			}
			qu, _ := calc.LookupUnit(scenario.DefaultUnit("q", r.US))
			hu, _ := calc.LookupUnit(scenario.DefaultUnit("hp", r.US))
			roles := map[CurveRole]Curve{}
			for _, c := range bl.Chart.Curves {
				roles[c.Role] = c
				if len(c.X) != len(c.Y) || len(c.X) == 0 || len(c.X) > chartSamples+len(r.Pump.System) {
					t.Errorf("%s: %d x, %d y", c.Name, len(c.X), len(c.Y))
				}
				for i := range c.X {
					if math.IsNaN(c.X[i]) || math.IsNaN(c.Y[i]) || math.IsInf(c.Y[i], 0) {
						t.Errorf("%s: point %d is (%v, %v)", c.Name, i, c.X[i], c.Y[i])
					}
				}
			}
			for _, role := range []CurveRole{RolePump, RoleDataPoints, RoleSystem, RoleEfficiency, RoleNPSHRequired, RoleNPSHAvailable} {
				if _, ok := roles[role]; !ok {
					t.Errorf("no curve of role %d", role)
				}
			}
			_, base := roles[RolePumpBase]
			if want := r.Pump.Speed != 1 || r.Pump.Count > 1; base != want {
				t.Errorf("data-sheet curve drawn %v, want %v", base, want)
			}
			pts := roles[RoleDataPoints]
			for i, p := range r.Pump.Base.Points() {
				if pts.X[i] != qu.FromSI(p.Q) || pts.Y[i] != hu.FromSI(p.H) {
					t.Errorf("data point %d (%v, %v), want (%v, %v)", i, pts.X[i], pts.Y[i], qu.FromSI(p.Q), hu.FromSI(p.H))
				}
			}
			// Markers: the operating point first, then the best-efficiency
			// point (calc.BEP, on the curve as drawn) and the measured
			// point (the field check's flow and head).
			op, bep, f := r.Pump.Operating, r.Pump.BEP, r.Field
			ms := bl.Chart.Markers
			if len(ms) != 3 || ms[0].X != qu.FromSI(op.Q) || ms[0].Y != hu.FromSI(op.H) ||
				ms[1].X != qu.FromSI(bep.Q) || ms[1].Y != hu.FromSI(bep.H) || !strings.HasPrefix(ms[1].Label, "best efficiency") ||
				ms[2].X != qu.FromSI(f.Q) || ms[2].Y != hu.FromSI(f.Head) || !strings.HasPrefix(ms[2].Label, "measured") {
				t.Errorf("markers %+v, want the operating, best-efficiency and measured points", ms)
			}
			// Bands: beyond the data sheet (to the right edge) when the
			// system curve runs past it, and the preferred region, 70–120 %
			// of the best-efficiency flow (ANSI/HI 9.6.3, from memory).
			sys := r.Pump.System
			beyond := sys[len(sys)-1].Q > r.Pump.Curve.MaxFlow()
			lo, hi := bep.Region()
			region := 0
			for _, band := range bl.Chart.Bands {
				switch {
				case band.X1 < band.X0:
					if !beyond || band.X0 != qu.FromSI(r.Pump.Curve.MaxFlow()) {
						t.Errorf("band %+v, want from the last data-sheet flow to the right edge", band)
					}
				case band.X0 == qu.FromSI(lo) && band.X1 == qu.FromSI(hi):
					region++
				default:
					t.Errorf("band %+v is neither", band)
				}
			}
			if region != 1 || len(bl.Chart.Bands) != 1+map[bool]int{true: 1}[beyond] {
				t.Errorf("bands %+v (system beyond the sheet %v), want the region once", bl.Chart.Bands, beyond)
			}
			if !strings.Contains(bl.Chart.XLabel, qu.Symbol) || !strings.Contains(bl.Chart.YLabel, hu.Symbol) {
				t.Errorf("axes %q, %q lack %s, %s", bl.Chart.XLabel, bl.Chart.YLabel, qu.Symbol, hu.Symbol)
			}
		})
	}
	// Without a pump curve there is no chart.
	d := scenario.NewDraft(with(t, scenario.Demo(), "pq", "", "ph", "", "peff", "", "pnpsh", ""))
	r := scenario.Evaluate(scenario.Read(d.Scen))
	b := &builder{d: &d, in: &r.Inputs, r: r, us: r.US, shown: map[string]bool{}, warned: map[string]bool{}}
	if bl := b.pumpChart("pump-chart", ""); bl.Kind != BlockEmpty {
		t.Errorf("chart without a data sheet: %+v", bl)
	}
}

// TestSuctionCautionPointsHere: the demo's pump draws from a wet well below
// it (suction below atmospheric at the inlet, a caution of this project's);
// the caution points to the cavitation check on the Pump view from other
// views, and to the one beside it on the Pump view itself.
func TestSuctionCautionPointsHere(t *testing.T) {
	for view, want := range map[string]string{"pump": "the cavitation check (NPSH) on this view", "line": "check the NPSH on the Pump view"} {
		s := scenario.Demo()
		_ = s.Set("view", view)
		d := scenario.NewDraft(s)
		sh := Build(&d, scenario.Evaluate(scenario.Read(s)))
		found := false
		for _, c := range sh.Cards {
			for _, b := range c.Blocks {
				if b.Kind == BlockWarnings {
					for _, it := range b.Items {
						if strings.Contains(it, "below atmospheric pressure") {
							found = true
							if !strings.Contains(it, want) {
								t.Errorf("%s view: %q lacks %q", view, it, want)
							}
						}
					}
				}
			}
		}
		if !found {
			t.Errorf("%s view: no suction caution", view)
		}
	}
}
