package scenario

import (
	"bufio"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"fieldhead/calc"
)

// The case files in testdata/cases are the project's main checks: each case
// is a share-link query, the source of its expected values, and the values.
// The format is described in testdata/cases/README.md.

type expectation struct {
	line     int
	key      string
	op       string // "=" numeric, "is" text equal, "~" text contains
	want     float64
	text     string
	tol      float64
	relative bool
}

type testCase struct {
	file, name, source, query string
	line                      int
	expects                   []expectation
}

// observable returns the SI value (or text) a case key names.
func observable(r Result, key string) (float64, string, error) {
	if strings.HasPrefix(key, "error.") {
		p := strings.TrimPrefix(key, "error.")
		m, ok := r.Errors[p]
		if !ok {
			return 0, "", fmt.Errorf("no error on %s (errors: %v)", p, r.Errors)
		}
		return 0, worded(m, r.US), nil
	}
	if strings.HasPrefix(key, "warning.") {
		p := strings.TrimPrefix(key, "warning.")
		var all []string
		for _, w := range r.Warnings {
			if w.Param == p {
				all = append(all, warningWords(w, r.US))
			}
		}
		if len(all) == 0 {
			return 0, "", fmt.Errorf("no warning on %s", p)
		}
		return 0, strings.Join(all, " | "), nil
	}
	part, name, _ := strings.Cut(key, ".")
	miss := func() (float64, string, error) {
		return 0, "", fmt.Errorf("%s was not computed (errors: %v)", part, r.Errors)
	}
	switch part {
	case "fluid":
		if r.Fluid == nil {
			return miss()
		}
		switch name {
		case "rho":
			return r.Fluid.Density, "", nil
		case "mu":
			return r.Fluid.Viscosity, "", nil
		case "pv":
			return r.Fluid.VapourPressure, "", nil
		case "p":
			return r.Fluid.Pressure, "", nil
		}
	case "glycol":
		if r.Glycol == nil {
			return miss()
		}
		switch name {
		case "tf":
			return r.Glycol.FreezingPoint, "", nil
		case "w":
			return r.Glycol.MassFraction, "", nil
		case "phi":
			return r.Glycol.VolumeFraction, "", nil
		}
	case "site":
		if name == "p" && r.SitePressure > 0 {
			return r.SitePressure, "", nil
		}
	case "run":
		if r.Run == nil {
			return miss()
		}
		rr := r.Run
		switch name {
		case "v":
			return rr.Velocity, "", nil
		case "re":
			return rr.Reynolds, "", nil
		case "f":
			return rr.Friction, "", nil
		case "alpha":
			return rr.Alpha, "", nil
		case "major":
			return rr.MajorLoss, "", nil
		case "minor":
			return rr.MinorLoss, "", nil
		case "loss":
			return rr.TotalLoss, "", nil
		case "sumk":
			return rr.SumK, "", nil
		case "d":
			return rr.Diameter, "", nil
		case "regime":
			return 0, rr.Regime.String(), nil
		}
	case "balance":
		b := r.Balance
		if b == nil {
			return miss()
		}
		switch name {
		case "value":
			return b.Value, "", nil
		case "low":
			return b.ValueLow, "", nil
		case "high":
			return b.ValueHigh, "", nil
		case "hp":
			return b.PumpHead, "", nil
		case "ht":
			return b.TurbineHead, "", nil
		case "hf":
			return b.FrictionHead, "", nil
		case "q":
			return b.Q, "", nil
		case "pumppower":
			return b.PumpPower, "", nil
		case "turbinepower":
			return b.TurbinePower, "", nil
		case "v1":
			return b.In.Velocity, "", nil
		case "v2":
			return b.Out.Velocity, "", nil
		case "alpha1":
			return b.In.Alpha, "", nil
		case "alpha2":
			return b.Out.Alpha, "", nil
		case "fullq": // the largest flow the line carries full
			if !b.FullFlowKnown {
				return miss()
			}
			return b.FullFlow, "", nil
		case "highpoints": // how many high points the line has
			return float64(len(b.HighPoints)), "", nil
		}
	case "pump":
		if r.Pump == nil || r.Pump.Operating == nil {
			return miss()
		}
		o := r.Pump.Operating
		switch name {
		case "q":
			return o.Q, "", nil
		case "h":
			return o.H, "", nil
		case "eff":
			return o.Eff, "", nil
		case "shaft":
			return o.ShaftPower, "", nil
		case "npshr":
			return o.NPSHr, "", nil
		}
	case "speed", "speedfor", "bep":
		if r.Pump == nil {
			return miss()
		}
		pr := r.Pump
		switch {
		case part == "speed" && name == "ratio":
			return pr.Speed, "", nil
		case part == "speedfor" && pr.SpeedFor == nil, part == "bep" && pr.BEP == nil:
			return miss()
		case part == "speedfor" && name == "ratio":
			return pr.SpeedFor.Ratio, "", nil
		case part == "speedfor" && name == "h":
			return pr.SpeedFor.H, "", nil
		case part == "speedfor" && name == "q":
			return pr.SpeedFor.Q, "", nil
		case part == "bep" && name == "q":
			return pr.BEP.Q, "", nil
		case part == "bep" && name == "eff":
			return pr.BEP.Eff, "", nil
		case part == "bep" && name == "h":
			return pr.BEP.H, "", nil
		}
	case "accept":
		a := r.Acceptance
		if a == nil {
			return miss()
		}
		switch name {
		case "verdict":
			return 0, a.Verdict.String(), nil
		case "head":
			return 0, a.Head.Verdict.String(), nil
		case "eff":
			return 0, a.Efficiency.Verdict.String(), nil
		case "improve":
			return 0, a.Improve, nil
		case "hlow":
			return a.Head.Low, "", nil
		case "hhigh":
			return a.Head.High, "", nil
		}
	case "energy":
		en := r.Energy
		if en == nil {
			return miss()
		}
		switch name {
		case "vol":
			return en.PerVolume, "", nil
		case "head":
			return en.PerVolumeHead, "", nil
		case "ideal":
			return en.Ideal, "", nil
		case "cost":
			return en.YearCost, "", nil
		}
	case "npsh":
		n := r.NPSH
		if n == nil {
			return miss()
		}
		switch name {
		case "a":
			return n.Available, "", nil
		case "r":
			return n.Required, "", nil
		case "margin":
			return n.Margin, "", nil
		case "ratio":
			return n.Ratio, "", nil
		case "level":
			return 0, n.Level.String(), nil
		case "p":
			return n.PressureHead, "", nil
		case "z":
			return n.StaticHead, "", nil
		case "loss":
			return n.LossHead, "", nil
		case "pv":
			return n.VapourHead, "", nil
		}
	case "runview":
		rv := r.RunView
		if rv == nil || rv.Run == nil {
			return miss()
		}
		switch name {
		case "seg":
			return float64(rv.Segment), "", nil
		case "loss":
			return rv.Run.TotalLoss, "", nil
		case "v":
			return rv.Run.Velocity, "", nil
		case "re":
			return rv.Run.Reynolds, "", nil
		}
	case "sizing":
		// sizing.<nominal size>.<id|v|re|f|grad|loss|mark>
		if r.RunView == nil || r.RunView.Sizing == nil {
			return miss()
		}
		size, field, _ := strings.Cut(name, ".")
		for _, row := range r.RunView.Sizing.Rows {
			if row.Pipe.NPS != size {
				continue
			}
			if row.Err != nil {
				return 0, "", fmt.Errorf("size %s: %v", size, row.Err)
			}
			switch field {
			case "id":
				return row.Pipe.ID, "", nil
			case "v":
				return row.Run.Velocity, "", nil
			case "re":
				return row.Run.Reynolds, "", nil
			case "f":
				return row.Run.Friction, "", nil
			case "grad":
				return row.Gradient, "", nil
			case "loss":
				return row.Run.TotalLoss, "", nil
			case "mark":
				m := "fits"
				switch {
				case !row.InBand && !row.UnderMax:
					m = "velocity and friction"
				case !row.InBand:
					m = "velocity"
				case !row.UnderMax:
					m = "friction"
				}
				return 0, m, nil
			}
		}
	case "field":
		f := r.Field
		if f == nil {
			return miss()
		}
		switch name {
		case "head":
			return f.Head, "", nil
		case "power":
			return f.HydraulicPower, "", nil
		case "eff":
			return f.Efficiency, "", nil
		case "shaft":
			return f.ShaftPower, "", nil
		case "pumpeff":
			return f.PumpEfficiency, "", nil
		case "dev":
			return f.Deviation, "", nil
		case "uhead", "upower", "uwire", "upump", "dominant":
			b := r.FieldBands
			if b == nil {
				return miss()
			}
			switch name {
			case "uhead":
				return b.Head.U, "", nil
			case "upower":
				return b.Power.U, "", nil
			case "uwire":
				return b.Wire.U, "", nil
			case "upump":
				return b.Pump.U, "", nil
			}
			return 0, b.Head.Dominant() + " " + b.Power.Dominant() + " " + b.Wire.Dominant(), nil
		case "effdev":
			if !f.HasEffDeviation {
				return miss()
			}
			return f.EffDeviation, "", nil
		}
	case "turbine", "best":
		t := r.Turbine
		if part == "best" {
			t = r.BestTurbine
		}
		if t == nil {
			return miss()
		}
		switch name {
		case "q":
			return t.Q, "", nil
		case "gross":
			return t.GrossHead, "", nil
		case "net":
			return t.NetHead, "", nil
		case "power":
			return t.Power, "", nil
		case "lossfrac":
			// Share of the gross head lost in the line and at the exit.
			return (t.Losses + t.ExitVelocityHead) / t.GrossHead, "", nil
		case "lossshare":
			return t.LossShare, "", nil
		case "static":
			return t.StaticInlet, "", nil
		}
	case "surge":
		sr := r.Surge
		if sr == nil {
			return miss()
		}
		switch name {
		case "a":
			return sr.WaveSpeed, "", nil
		case "period":
			return sr.Period, "", nil
		case "dp":
			return sr.DeltaP, "", nil
		case "dh":
			return sr.DeltaH, "", nil
		case "static":
			return sr.Static, "", nil
		case "peak":
			// Gauge, as the card shows it.
			return sr.Static + sr.DeltaP, "", nil
		case "fast":
			if sr.Fast {
				return 1, "", nil
			}
			return 0, "", nil
		}
	case "heat":
		h := r.Heat
		if h == nil {
			return miss()
		}
		switch name {
		case "q":
			return h.Flow, "", nil
		case "load":
			return h.Load, "", nil
		case "mass":
			return h.MassFlow, "", nil
		case "rho":
			return h.Props.Density, "", nil
		case "cp":
			return h.Props.HeatCapacity, "", nil
		case "tmean":
			return h.Props.Temperature, "", nil
		}
	case "valve":
		// valve.N.field: the line's Nth control valve, counted from point 1.
		num, field, _ := strings.Cut(name, ".")
		n, err := strconv.Atoi(num)
		if err != nil || n < 1 {
			return 0, "", fmt.Errorf("valve key %q: want valve.N.field", key)
		}
		if n > len(r.Valves) {
			return 0, "", fmt.Errorf("valve %d not computed (%d valves; errors: %v)", n, len(r.Valves), r.Errors)
		}
		v := r.Valves[n-1]
		switch field {
		case "drop":
			return v.Drop, "", nil
		case "head":
			return v.Head, "", nil
		case "circuit":
			return v.CircuitDrop, "", nil
		case "authority":
			return v.Authority.N, "", nil
		case "inlet":
			return v.Inlet, "", nil
		}
		ck := v.Check
		if ck == nil {
			return 0, "", fmt.Errorf("valve %d: no IEC 60534-2-1 check (FL %g, inlet %g Pa; errors: %v)", n, v.FL, v.Inlet, r.Errors)
		}
		yes := func(b bool) (float64, string, error) {
			if b {
				return 1, "", nil
			}
			return 0, "", nil
		}
		switch field {
		case "ff":
			return ck.FF, "", nil
		case "chokeddrop":
			return ck.ChokedDrop, "", nil
		case "chokedflow":
			return ck.ChokedFlow, "", nil
		case "flow":
			return ck.Flow, "", nil
		case "choked":
			return yes(ck.Choked)
		case "incipient":
			return ck.IncipientDrop, "", nil
		case "cavitation":
			return yes(ck.Cavitation)
		}
	case "convert":
		c := r.Convert
		if c == nil {
			return miss()
		}
		switch name {
		case "gauge":
			return c.Gauge, "", nil
		case "abs":
			return c.Absolute, "", nil
		case "head":
			return c.Head, "", nil
		}
	}
	return 0, "", fmt.Errorf("unknown observable %q", key)
}

func loadCases(t *testing.T) []testCase {
	t.Helper()
	files, err := filepath.Glob(filepath.Join("..", "..", "testdata", "cases", "*.case"))
	if err != nil || len(files) == 0 {
		t.Fatalf("no case files found: %v", err)
	}
	var out []testCase
	for _, f := range files {
		out = append(out, parseCaseFile(t, f)...)
	}
	return out
}

func parseCaseFile(t *testing.T, path string) []testCase {
	t.Helper()
	fh, err := os.Open(path)
	if err != nil {
		t.Fatal(err)
	}
	defer fh.Close()
	var cases []testCase
	var fileSource string
	var cur *testCase
	sc := bufio.NewScanner(fh)
	n := 0
	for sc.Scan() {
		n++
		line := strings.TrimSpace(sc.Text())
		if line == "" || strings.HasPrefix(line, "#") {
			continue
		}
		key, val, ok := strings.Cut(line, ":")
		if !ok {
			t.Fatalf("%s:%d: expected 'key: value'", path, n)
		}
		val = strings.TrimSpace(val)
		switch strings.TrimSpace(key) {
		case "source":
			if cur == nil {
				fileSource = val
			} else {
				cur.source = val
			}
		case "case":
			cases = append(cases, testCase{file: filepath.Base(path), name: val, source: fileSource, line: n})
			cur = &cases[len(cases)-1]
		case "query":
			if cur == nil {
				t.Fatalf("%s:%d: query before case", path, n)
			}
			cur.query = val
		case "expect":
			if cur == nil {
				t.Fatalf("%s:%d: expect before case", path, n)
			}
			cur.expects = append(cur.expects, parseExpect(t, path, n, val))
		default:
			t.Fatalf("%s:%d: unknown key %q", path, n, key)
		}
	}
	if err := sc.Err(); err != nil {
		t.Fatal(err)
	}
	for _, c := range cases {
		if c.source == "" || c.query == "" || len(c.expects) == 0 {
			t.Fatalf("%s:%d: case %q needs a source, a query and at least one expect", path, c.line, c.name)
		}
	}
	return cases
}

// parseExpect reads "key = value [unit] ± tol[%| rel| unit]", "key is text"
// or "key ~ text".
func parseExpect(t *testing.T, path string, n int, s string) expectation {
	t.Helper()
	e := expectation{line: n}
	fields := strings.Fields(s)
	if len(fields) < 3 {
		t.Fatalf("%s:%d: expect needs 'key op value'", path, n)
	}
	e.key, e.op = fields[0], fields[1]
	rest := strings.TrimSpace(strings.SplitN(s, e.op, 2)[1])
	switch e.op {
	case "is", "~":
		e.text = rest
		return e
	case "=":
	default:
		t.Fatalf("%s:%d: unknown operator %q", path, n, e.op)
	}
	val, tol, ok := strings.Cut(rest, "±")
	if !ok {
		t.Fatalf("%s:%d: a numeric expect needs a tolerance after ±", path, n)
	}
	// A value with a unit is converted to SI by that unit; a bare number is
	// taken as it is (dimensionless, or already SI).
	parse := func(text string) float64 {
		num, u := Split(text)
		if u == "" {
			v, err := strconv.ParseFloat(num, 64)
			if err != nil {
				t.Fatalf("%s:%d: %v", path, n, err)
			}
			return v
		}
		unit, err := calc.LookupUnit(u)
		if err != nil {
			t.Fatalf("%s:%d: %v", path, n, err)
		}
		v, err := calc.Parse(e.key, text, unit.Dim, "")
		if err != nil {
			t.Fatalf("%s:%d: %v", path, n, err)
		}
		return v
	}
	e.want = parse(val)
	tol = strings.TrimSpace(tol)
	switch {
	case strings.HasSuffix(tol, "%"):
		v, err := strconv.ParseFloat(strings.TrimSuffix(tol, "%"), 64)
		if err != nil {
			t.Fatalf("%s:%d: %v", path, n, err)
		}
		e.tol, e.relative = v/100, true
	case strings.HasSuffix(tol, "rel"):
		v, err := strconv.ParseFloat(strings.TrimSpace(strings.TrimSuffix(tol, "rel")), 64)
		if err != nil {
			t.Fatalf("%s:%d: %v", path, n, err)
		}
		e.tol, e.relative = v, true
	default:
		if _, u := Split(tol); u == "°C" || u == "°F" || u == "C" || u == "F" {
			t.Fatalf("%s:%d: give temperature tolerances as rel or %%", path, n)
		}
		e.tol = parse(tol)
	}
	return e
}

func TestCases(t *testing.T) {
	cases := loadCases(t)
	for _, c := range cases {
		t.Run(c.file+"/"+c.name, func(t *testing.T) {
			s, err := Parse(c.query)
			if err != nil {
				t.Fatalf("%s:%d: the case's link does not parse: %v", c.file, c.line, err)
			}
			r := Evaluate(Read(s))
			for _, e := range c.expects {
				got, text, err := observable(r, e.key)
				if e.op == "is" && e.text == "not computed" {
					if err == nil {
						t.Errorf("%s:%d: %s was computed (%q, %g); want it left out (source: %s)", c.file, e.line, e.key, text, got, c.source)
					}
					continue
				}
				if err != nil {
					t.Errorf("%s:%d: %s: %v (source: %s)", c.file, e.line, e.key, err, c.source)
					continue
				}
				switch e.op {
				case "is":
					if text != e.text {
						t.Errorf("%s:%d: %s is %q, want %q (source: %s)", c.file, e.line, e.key, text, e.text, c.source)
					}
				case "~":
					if !strings.Contains(text, e.text) {
						t.Errorf("%s:%d: %s = %q, want it to contain %q (source: %s)", c.file, e.line, e.key, text, e.text, c.source)
					}
				case "=":
					diff := math.Abs(got - e.want)
					lim := e.tol
					if e.relative {
						lim = e.tol * math.Abs(e.want)
					}
					if !(diff <= lim) {
						t.Errorf("%s:%d: %s = %.10g, want %.10g ± %.3g (off by %.3g) (source: %s)", c.file, e.line, e.key, got, e.want, lim, diff, c.source)
					}
				}
			}
		})
	}
	// The bar the project set itself (issue 10): at least 250 cases from at
	// least 25 distinct sources.
	if len(cases) < 250 || len(distinctSources(cases)) < 25 {
		t.Errorf("%d cases from %d distinct sources; want at least 250 from 25", len(cases), len(distinctSources(cases)))
	}
}

// distinctSources groups sources by the text before the first comma or
// semicolon, so "IAPWS-IF97 (2007), Table 5" and "…, Table 35" count once.
func distinctSources(cases []testCase) map[string]bool {
	m := map[string]bool{}
	for _, c := range cases {
		s := c.source
		if i := strings.IndexAny(s, ",;"); i >= 0 {
			s = s[:i]
		}
		m[strings.TrimSpace(s)] = true
	}
	return m
}
