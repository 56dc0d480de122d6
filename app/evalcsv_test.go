//go:build !wasm

package main

import (
	"encoding/csv"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
	"time"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"
)

// TestEvalCSV: the office's batch run writes the same results table as
// the site book (present.ResultsCSV) for the sheets of a file, and names
// the lines it could not read by their number.
func TestEvalCSV(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "sheets.txt")
	text := scenario.WriteSheets("two sheets", []scenario.Scenario{scenario.Demo(), scenario.TurbineDemo()}) + "Broken\tzz=1\n"
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	var out, errs strings.Builder
	if err := evalCSV(path, false, &out, &errs); err != nil {
		t.Fatal(err)
	}
	if want := present.ResultsCSV([]scenario.KeptSheet{{Scen: scenario.Demo()}, {Scen: scenario.TurbineDemo()}}, false); out.String() != want {
		t.Errorf("the batch table differs from the site book's:\n%s\nwant\n%s", out.String(), want)
	}
	rows, err := csv.NewReader(strings.NewReader(strings.TrimPrefix(out.String(), "\uFEFF"))).ReadAll()
	if err != nil || len(rows) != 3 {
		t.Errorf("%d rows (%v), want a header and two sheets", len(rows), err)
	}
	if !strings.Contains(errs.String(), `sheets.txt:4: not read: "zz": not a Fieldhead parameter`) {
		t.Errorf("the bad line is not named by its number with present's words: %q", errs.String())
	}
}

// mixedBook is a site book of sheets kept in SI and in US units, three
// with their edit times and one imported from an older sheets file (its
// edit time not known): the demo, the turbine demo in US units, an NPSH
// check alone in US units (a case of testdata/cases/ref-npsh.case) and a
// new main sized in the Run view.
func mixedBook(t *testing.T) (*book, []time.Time) {
	t.Helper()
	parse := func(q string) scenario.Scenario {
		s, err := scenario.Parse(q)
		if err != nil {
			t.Fatal(err)
		}
		return s
	}
	turbine := scenario.TurbineDemo()
	if err := turbine.Set("units", "us"); err != nil {
		t.Fatal(err)
	}
	sheets := []scenario.Scenario{
		scenario.Demo(),
		turbine,
		parse("view=pump&units=us&name=Pit%204%20NPSH&liq=water&t=77F&alt=984ft&p1=0psi&z1=159.1ft&zp=167.3ft&npshr=10.5ft&hs=1.15ft"),
		parse("name=New%20main&liq=water&t=15C&view=regime&q=35L/s&l=1200m&nps=8&sch=40&mat=steel&szsch=40"),
	}
	when := []time.Time{
		time.Date(2026, 12, 1, 9, 40, 12, 0, time.UTC),
		time.Date(2026, 11, 28, 16, 2, 55, 0, time.UTC),
		time.Date(2026, 11, 3, 7, 15, 0, 0, time.UTC),
		{},
	}
	bk := &book{}
	for i, s := range sheets {
		var ms float64
		if !when[i].IsZero() {
			ms = float64(when[i].UnixMilli())
		}
		bk.kept = append(bk.kept, record{ID: strconv.Itoa(i), Title: s.Get("name"), Link: s.Sign(), Created: 1, Edited: ms})
	}
	sortKept(bk.kept)
	return bk, when
}

// TestBookCSVIsEvalCSV: the results table the site book saves and the one
// `go run ./app -eval` writes from the book's sheets file are the same,
// byte for byte, in SI and in US units, for a book that mixes SI and US
// sheets; the file added to a fresh book keeps each sheet's edit time, so
// that book's table is the same again. Read back with encoding/csv, the
// table has a row per sheet, newest first, each with its edit time, and
// every figure in the table's one unit system whatever the sheet's own.
func TestBookCSVIsEvalCSV(t *testing.T) {
	bk, when := mixedBook(t)
	file := bk.sheetsFile(time.Date(2026, 12, 2, 14, 5, 0, 0, time.UTC))
	path := filepath.Join(t.TempDir(), "sheets.txt")
	if err := os.WriteFile(path, []byte(file), 0o644); err != nil {
		t.Fatal(err)
	}
	fresh := &book{}
	fresh.importSheets(file)
	if len(fresh.kept) != len(bk.kept) {
		t.Fatalf("the fresh book added %d sheets of %d: %s", len(fresh.kept), len(bk.kept), fresh.state.Notice)
	}
	tables := map[bool]string{}
	for _, us := range []bool{false, true} {
		var out, errs strings.Builder
		if err := evalCSV(path, us, &out, &errs); err != nil || errs.Len() > 0 {
			t.Fatalf("-eval: %v %s", err, errs.String())
		}
		page := bk.resultsTable(us)
		if out.String() != page {
			t.Errorf("us=%v: -eval's table differs from the page's:\n%s\nwant\n%s", us, out.String(), page)
		}
		if again := fresh.resultsTable(us); again != page {
			t.Errorf("us=%v: the book that added the file saves another table:\n%s\nwant\n%s", us, again, page)
		}
		tables[us] = page
	}

	read := func(us bool) ([][]string, map[string]int) {
		body, ok := strings.CutPrefix(tables[us], "\uFEFF")
		if !ok {
			t.Fatal("no UTF-8 byte-order mark")
		}
		rows, err := csv.NewReader(strings.NewReader(body)).ReadAll()
		if err != nil {
			t.Fatal(err)
		}
		col := map[string]int{}
		for i, h := range rows[0] {
			col[h] = i
		}
		return rows, col
	}
	si, siCol := read(false)
	us, usCol := read(true)
	if len(si) != 5 {
		t.Fatalf("%d rows, want a header and 4 sheets", len(si))
	}
	wantTitles := []string{scenario.Demo().Get("name"), scenario.TurbineDemo().Get("name"), "Pit 4 NPSH", "New main"}
	for i, title := range wantTitles {
		row := si[i+1]
		if row[siCol["title"]] != title {
			t.Errorf("row %d is %q, want %q (newest first)", i+1, row[siCol["title"]], title)
		}
		want := ""
		if !when[i].IsZero() {
			want = when[i].Format("2006-01-02 15:04:05")
		}
		if got := row[siCol["edited (UTC)"]]; got != want {
			t.Errorf("%q: edited %q, want %q", title, got, want)
		}
	}
	// The NPSH check, kept in US units, in the SI table: its figures are
	// in m, and agree with the US table's ft through NIST SP 811 (2008)
	// Appendix B (ft = 3.048E−01 m). Its temperature, typed as 77 °F, is
	// 25 °C (t/°C = (t/°F − 32)/1.8, NIST SP 811 B.8). It lists no
	// problem: the balance's missing inputs are not its results'.
	npshM, err1 := strconv.ParseFloat(si[3][siCol["NPSH available (m)"]], 64)
	npshFt, err2 := strconv.ParseFloat(us[3][usCol["NPSH available (ft)"]], 64)
	if err1 != nil || err2 != nil || math.Abs(npshM/0.3048-npshFt) > 1e-5*npshFt {
		t.Errorf("NPSH available %q m against %q ft", si[3][siCol["NPSH available (m)"]], us[3][usCol["NPSH available (ft)"]])
	}
	if tc, err := strconv.ParseFloat(si[3][siCol["temperature (°C)"]], 64); err != nil || math.Abs(tc-25) > 1e-9 {
		t.Errorf("temperature %q °C, want 25", si[3][siCol["temperature (°C)"]])
	}
	if p := si[3][siCol["problems"]]; p != "" {
		t.Errorf("the NPSH check lists problems %q", p)
	}
	if si[4][siCol["run: friction and fittings (m)"]] == "" || si[4][siCol["sizing: smallest size that fits"]] == "" {
		t.Error("the new main's row has no run or sizing")
	}
}
