package calc

import (
	"bufio"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
)

// The tables of this package checked row by row against python3-fluids
// (Debian), through the files testdata/refs/gen/gen_fluids.py writes.

// frReadTSV returns the data rows of a reference table (comments and the
// header line skipped).
func frReadTSV(t *testing.T, name string) [][]string {
	t.Helper()
	fh, err := os.Open(filepath.Join("..", "testdata", "refs", name))
	if err != nil {
		t.Fatal(err)
	}
	defer fh.Close()
	var rows [][]string
	header := true
	sc := bufio.NewScanner(fh)
	for sc.Scan() {
		line := sc.Text()
		if strings.HasPrefix(line, "#") || line == "" {
			continue
		}
		if header {
			header = false
			continue
		}
		rows = append(rows, strings.Split(line, "\t"))
	}
	if err := sc.Err(); err != nil {
		t.Fatal(err)
	}
	return rows
}

// frNum reads a number of a reference row ("inf" included).
func frNum(t *testing.T, s string) float64 {
	t.Helper()
	v, err := strconv.ParseFloat(s, 64)
	if err != nil {
		t.Fatal(err)
	}
	return v
}

func TestPipeTablesAgainstFluids(t *testing.T) {
	// ASME B36.10M, B36.19M, ASTM D1785 and D2241 as python3-fluids 1.0.22
	// tabulates them (fluids.piping.schedule_lookup). Every size fluids
	// lists for a class in NPS 1/2–24 is in ours and the other way round;
	// OD and wall agree to 0.0005 mm (fluids gives the ASTM inch figures
	// converted to mm and rounded to 0.0001 mm), ID to 0.006 mm (the steel
	// tables' ID is printed to 0.01 mm).
	rows := frReadTSV(t, "pipes.tsv")
	listed := map[string]bool{}
	var worstOD, worstID float64
	cts := 0
	for _, r := range rows {
		if r[0] == "CTS" {
			// Copper tube sizes (ASTM D2241 CTS): the ASTM B88 outside
			// diameters.
			p, err := LookupPipe(r[1], "L")
			if err != nil {
				t.Errorf("copper %s in: %v", r[1], err)
				continue
			}
			d := math.Abs(p.OD*1e3 - frNum(t, r[2]))
			worstOD = math.Max(worstOD, d)
			if d > 0.0005 {
				t.Errorf("copper %s in: OD %.4f mm, fluids CTS %s mm", r[1], p.OD*1e3, r[2])
			}
			cts++
			continue
		}
		p, err := LookupPipe(r[1], r[0])
		if err != nil {
			t.Errorf("fluids lists NPS %s %s: %v", r[1], r[0], err)
			continue
		}
		listed[r[0]+"/"+p.NPS] = true
		dOD := math.Abs(p.OD*1e3 - frNum(t, r[2]))
		dWall := math.Abs(p.Wall*1e3 - frNum(t, r[3]))
		dID := math.Abs(p.ID*1e3 - frNum(t, r[4]))
		worstOD = math.Max(worstOD, math.Max(dOD, dWall))
		worstID = math.Max(worstID, dID)
		if dOD > 0.0005 || dWall > 0.0005 || dID > 0.006 {
			t.Errorf("NPS %s %s: OD %.4f wall %.4f ID %.4f mm; fluids %s %s %s", r[1], r[0], p.OD*1e3, p.Wall*1e3, p.ID*1e3, r[2], r[3], r[4])
		}
	}
	for _, p := range PipeSizes() {
		if (p.Catalogue == "steel" || p.Catalogue == "ss" || p.Catalogue == "pvc") && !listed[p.Schedule+"/"+p.NPS] {
			t.Errorf("NPS %s %s is not in fluids' table", p.NPS, p.Schedule)
		}
	}
	if len(listed) < 200 || cts < 4 {
		t.Errorf("only %d sizes and %d copper ODs compared", len(listed), cts)
	}
	t.Logf("pipes: %d sizes and %d copper ODs; largest difference %.4g mm (OD, wall), %.4g mm (ID)", len(listed), cts, worstOD, worstID)
}

func TestFittingsAgainstFluids(t *testing.T) {
	// K by size from python3-fluids 1.0.22 fluids.fittings (Crane TP-410
	// functions with f_T from Colebrook as ft_Crane's docstring writes it;
	// Hooper2K; entrances and exit). The long-radius elbow uses Crane's
	// table value 14·f_T where fluids fits 14.06·f_T: 0.5 % allowed.
	var worst, worstLib, worstLR float64
	for _, r := range frReadTSV(t, "fittings.tsv") {
		f, err := LookupFitting(r[0])
		if err != nil {
			t.Fatal(err)
		}
		d, re, want, lib := frNum(t, r[1]), frNum(t, r[2]), frNum(t, r[3]), frNum(t, r[4])
		k, err := f.KAt(d, re)
		if err != nil {
			t.Fatal(err)
		}
		rel := math.Abs(k/want - 1)
		if f.Key == "elbow90lr" {
			worstLR = math.Max(worstLR, rel)
			if rel > 0.005 {
				t.Errorf("elbow90lr at %g m: K %.6g, fluids %.6g", d, k, want)
			}
			continue
		}
		worst = math.Max(worst, rel)
		worstLib = math.Max(worstLib, math.Abs(k/lib-1))
		if rel > 1e-12 {
			t.Errorf("%s at %g m, Re %g: K %.15g, fluids %.15g", f.Key, d, re, k, want)
		}
	}
	t.Logf("fittings: largest relative difference %.3g (f_T by Colebrook), %.3g (fluids' fast ft_Crane), %.3g (long-radius elbow, 14 against 14.06·f_T)", worst, worstLib, worstLR)
}

func TestMaterialsAgainstFluids(t *testing.T) {
	// Roughness equal to an entry of python3-fluids' tables
	// (fluids.friction._roughness, _Farshad_roughness), or inside a range
	// of Idelchik's Handbook of Hydraulic Resistance (HHR_roughness).
	var worst float64
	for _, r := range frReadTSV(t, "roughness.tsv") {
		m, err := LookupMaterial(r[0])
		if err != nil {
			t.Fatal(err)
		}
		v := frNum(t, r[2])
		switch r[1] {
		case "value":
			rel := math.Abs(m.Roughness/v - 1)
			worst = math.Max(worst, rel)
			if rel > 1e-12 || !strings.Contains(m.Source, strings.SplitN(r[3], "[", 2)[0]) {
				t.Errorf("%s: ε %g m (source %q), fluids %s = %g m", m.Key, m.Roughness, m.Source, r[3], v)
			}
		case "min":
			if m.Roughness < v*(1-1e-12) {
				t.Errorf("%s: ε %g m below %s minimum %g m", m.Key, m.Roughness, r[3], v)
			}
		case "max":
			if m.Roughness > v*(1+1e-12) {
				t.Errorf("%s: ε %g m above %s maximum %g m", m.Key, m.Roughness, r[3], v)
			}
		}
	}
	t.Logf("roughness: largest relative difference from fluids' values %.3g", worst)
}
