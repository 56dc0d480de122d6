//go:build !wasm

package main

import (
	"fmt"
	"io"
	"os"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"
)

// evalCSV reads a sheets file (or any file of links, one per line) and
// writes the results table the site book saves (present.ResultsCSV): one
// row per sheet in the file's order, each with the edit time its line
// gives, every figure in SI units, or US customary units with -us, named
// in the header. Lines that hold no sheet are reported on stderr by their
// number; the others are written. It is the office's batch run:
//
//	go run ./app -eval sheets.txt [-us] > results.csv
func evalCSV(path string, us bool, out, errs io.Writer) error {
	data, err := os.ReadFile(path)
	if err != nil {
		return err
	}
	lines, bad := scenario.ReadSheets(string(data))
	for _, b := range bad {
		fmt.Fprintf(errs, "%s:%d: not read: %s\n", path, b.Line, present.LinkErrorText(b.Err))
	}
	var sheets []scenario.KeptSheet
	for _, l := range lines {
		if l.Err != nil {
			fmt.Fprintf(errs, "%s:%d: read in part: %s\n", path, l.Line, present.LinkErrorText(l.Err))
		}
		sheets = append(sheets, scenario.KeptSheet{Scen: l.Scen, Edited: l.Edited})
	}
	_, err = io.WriteString(out, present.ResultsCSV(sheets, us))
	return err
}
