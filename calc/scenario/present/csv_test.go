package present

import (
	"encoding/csv"
	"strconv"
	"strings"
	"testing"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// TestResultsCSV: one row per sheet, a unit in the head of every figure's
// column, figures equal to scenario.Evaluate's in those units (RFC 4180
// CSV, read back with encoding/csv), and the sheet's signed link last.
func TestResultsCSV(t *testing.T) {
	sheets := []scenario.Scenario{scenario.Demo(), scenario.TurbineDemo(), {}}
	for _, us := range []bool{false, true} {
		out := ResultsCSV(sheets, us)
		rows, err := csv.NewReader(strings.NewReader(out)).ReadAll()
		if err != nil {
			t.Fatal(err)
		}
		if len(rows) != len(sheets)+1 {
			t.Fatalf("%d rows for %d sheets", len(rows), len(sheets))
		}
		head := rows[0]
		col := map[string]int{}
		for i, h := range head {
			col[h] = i
		}
		flow := "flow (L/s)"
		headU := "pump head (m)"
		if us {
			flow, headU = "flow (gpm)", "pump head (ft)"
		}
		for _, h := range []string{"title", flow, headU, "link"} {
			if _, ok := col[h]; !ok {
				t.Fatalf("us=%v: no column %q in %v", us, h, head)
			}
		}
		for i, c := range csvColumns {
			if !c.plain && !strings.HasSuffix(head[i], ")") {
				t.Errorf("column %q has no unit", head[i])
			}
		}
		r := scenario.Evaluate(scenario.Read(sheets[0]))
		u, _ := calc.LookupUnit(scenario.DefaultUnit("hp", us))
		got, err := strconv.ParseFloat(rows[1][col[headU]], 64)
		if want := u.FromSI(r.Balance.PumpHead); err != nil || calc.FormatNumber(got, 6) != calc.FormatNumber(want, 6) {
			t.Errorf("us=%v: demo pump head %q, Evaluate gives %v", us, rows[1][col[headU]], want)
		}
		if rows[1][col["title"]] != sheets[0].Get("name") || rows[1][col["link"]] != sheets[0].Sign() {
			t.Errorf("title %q link %q", rows[1][col["title"]], rows[1][col["link"]])
		}
		if rows[3][col[flow]] != "" {
			t.Errorf("an empty sheet has a flow %q", rows[3][col[flow]])
		}
	}
}
