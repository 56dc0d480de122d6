package calc

import (
	"bufio"
	"math"
	"os"
	"strconv"
	"strings"
	"testing"
)

// gnuSI is how testdata/refs/gen/gen_units.sh writes the SI unit of each
// dimension for GNU units.
var gnuSI = map[Dimension]string{
	Dimensionless: "1", Length: "m", Pressure: "Pa", Velocity: "m/s", Flow: "m^3/s",
	Temperature: "K", Density: "kg/m^3", DynamicViscosity: "Pa s", KinematicViscosity: "m^2/s",
	Power: "W", Area: "m^2", Mass: "kg", Duration: "s",
	SpecificEnergy: "J/m^3", SpecificEnergyHead: "J/m^4", Frequency: "Hz",
}

// TestUnitGNU checks every factor and offset against GNU units (Debian
// package "units"), through the table testdata/refs/units.tsv written by
// testdata/refs/gen/gen_units.sh: within 1e-9 relative (GNU units prints 15
// significant digits).
func TestUnitGNU(t *testing.T) {
	f, err := os.Open("../testdata/refs/units.tsv")
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	seen := map[string]bool{}
	sc := bufio.NewScanner(f)
	header := true
	for sc.Scan() {
		line := sc.Text()
		if strings.HasPrefix(line, "#") || line == "" {
			continue
		}
		if header {
			if line != "symbol\tsi\tfactor\toffset" {
				t.Fatalf("unexpected header %q", line)
			}
			header = false
			continue
		}
		c := strings.Split(line, "\t")
		if len(c) != 4 {
			t.Fatalf("bad row %q", line)
		}
		factor, err1 := strconv.ParseFloat(c[2], 64)
		offset, err2 := strconv.ParseFloat(c[3], 64)
		if err1 != nil || err2 != nil {
			t.Fatalf("bad row %q", line)
		}
		u, err := LookupUnit(c[0])
		if err != nil || u.Symbol != c[0] {
			t.Errorf("%q: %v (found %q)", c[0], err, u.Symbol)
			continue
		}
		seen[c[0]] = true
		if gnuSI[u.Dim] != c[1] {
			t.Errorf("%s: GNU units SI unit %q, ours is a %v (%q)", c[0], c[1], u.Dim, gnuSI[u.Dim])
		}
		if rel := math.Abs(u.Factor-factor) / factor; rel > 1e-9 {
			t.Errorf("%s: factor %.17g, GNU units %s (rel %.2g)", c[0], u.Factor, c[2], rel)
		}
		if d := math.Abs(u.Offset - offset); d > 1e-9*math.Abs(offset) {
			t.Errorf("%s: offset %.17g, GNU units %s", c[0], u.Offset, c[3])
		}
	}
	if err := sc.Err(); err != nil {
		t.Fatal(err)
	}
	for _, e := range unitTable {
		if e.Symbol != "" && !seen[e.Symbol] { // the plain number has no GNU units row
			t.Errorf("unit %q missing from units.tsv; add it to gen_units.sh", e.Symbol)
		}
	}
}
