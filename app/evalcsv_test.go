//go:build !wasm

package main

import (
	"encoding/csv"
	"os"
	"path/filepath"
	"strings"
	"testing"

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
	if want := present.ResultsCSV([]scenario.Scenario{scenario.Demo(), scenario.TurbineDemo()}, false); out.String() != want {
		t.Errorf("the batch table differs from the site book's:\n%s\nwant\n%s", out.String(), want)
	}
	rows, err := csv.NewReader(strings.NewReader(out.String())).ReadAll()
	if err != nil || len(rows) != 3 {
		t.Errorf("%d rows (%v), want a header and two sheets", len(rows), err)
	}
	if !strings.Contains(errs.String(), `sheets.txt:4: not read: "zz": not a Fieldhead parameter`) {
		t.Errorf("the bad line is not named by its number with present's words: %q", errs.String())
	}
}
