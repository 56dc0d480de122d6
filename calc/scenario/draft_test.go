package scenario

import (
	"math"
	"strconv"
	"strings"
	"testing"

	"fieldhead/calc"
)

// boxesMatch checks that every box of the sheet shows what the scenario
// holds: the number and unit of each value (Boxed), nothing for a value
// the scenario does not hold. (The rule of the page: a box is always the
// scenario; this project's own contract, no external source.)
func boxesMatch(t *testing.T, what string, d *Draft) {
	t.Helper()
	for _, p := range AllParams() {
		box, unit := d.Box(p)
		raw := d.Scen.Get(p)
		want := raw
		if hasUnits(p) {
			want, _ = Boxed(p, raw)
		}
		if box != want {
			t.Errorf("%s: box %s shows %q, the scenario holds %q", what, p, box, raw)
		}
		if row, _, _ := Lookup(p); raw != "" && row.Kind == KindQuantity {
			// The box and its picker mean the value the scenario holds
			// ("18" with °C for "18C").
			back := compose(p, box, unit)
			a, errA := calc.Parse(p, back, row.Dim, DefaultUnit(p, d.US()))
			b, errB := calc.Parse(p, raw, row.Dim, DefaultUnit(p, d.US()))
			if (errA == nil) != (errB == nil) || a != b {
				t.Errorf("%s: box %s with unit %q reads back as %q, the scenario holds %q", what, p, unit, back, raw)
			}
		}
	}
}

func TestDraftBoxesAreTheScenario(t *testing.T) {
	d := NewDraft(Demo())
	boxesMatch(t, "demo", &d)

	// Typing: the box holds the text as typed until another edit.
	d.Type("q", "4")
	if box, _ := d.Box("q"); box != "4" || d.Scen.Get("q") != "4L/s" {
		t.Errorf("typing 4 in q: box %q, scenario %q", box, d.Scen.Get("q"))
	}
	d.Type("q", "45 L/")
	if box, _ := d.Box("q"); box != "45 L/" {
		t.Errorf("typing a half unit: box %q, want it as typed", box)
	}

	// New sheet: every box empty, nothing held aside.
	var blank Scenario
	_ = blank.Set("units", "si")
	d.Reset(blank)
	boxesMatch(t, "new sheet", &d)
	for _, p := range []string{"z1", "z2", "q", "t", "name"} {
		if box, _ := d.Box(p); box != "" {
			t.Errorf("new sheet: box %s shows %q", p, box)
		}
	}

	// Segments moved, added, removed; data-sheet rows; units switched.
	d.Reset(Demo())
	d.MoveSegment(1, +1)
	boxesMatch(t, "segment moved", &d)
	if d.Scen.Get("s2.l") != "8m" || d.Scen.Get("s1.l") != "632m" {
		t.Errorf("moved: s1.l %q, s2.l %q", d.Scen.Get("s1.l"), d.Scen.Get("s2.l"))
	}
	d.AddSegment()
	boxesMatch(t, "segment added", &d)
	if d.ShownSegments() != 3 || d.Scen.Get("s3.nps") != "8" {
		t.Errorf("added: %d segments, s3.nps %q", d.ShownSegments(), d.Scen.Get("s3.nps"))
	}
	d.RemoveSegment(1)
	boxesMatch(t, "segment removed", &d)
	if d.Scen.Get("s1.l") != "8m" {
		t.Errorf("removed segment 1: s1.l %q, want the old segment 2's 8m", d.Scen.Get("s1.l"))
	}
	d.SetCell("ph", 1, "60")
	boxesMatch(t, "data-sheet cell", &d)
	if d.Scen.Get("ph") != "62,60,52,44,33m" {
		t.Errorf("cell: ph %q", d.Scen.Get("ph"))
	}
	d.RemoveRow(0)
	boxesMatch(t, "data-sheet row removed", &d)
	if d.Scen.Get("pq") != "20,40,55,70L/s" {
		t.Errorf("row removed: pq %q", d.Scen.Get("pq"))
	}
	d.Choose("units", "us")
	boxesMatch(t, "units switched", &d)
	if box, unit := d.Box("q"); box != "713" || unit != "gpm" {
		t.Errorf("after the switch the flow's box shows %q %q, want 713 gpm (45 L/s in the US system's unit; TestUnitSwitchEveryBox)", box, unit)
	}
	if _, unit := d.Box("hp"); unit != "ft" {
		t.Errorf("an empty box takes the new system's unit, got %q", unit)
	}
}

func TestDraftSwitchKeepsTheOtherSide(t *testing.T) {
	// Nothing typed is lost: a value switched away is kept aside and
	// comes back (this project's rule).
	d := NewDraft(Demo())
	d.Switch("site", "baro")
	if d.Scen.Has("alt") || d.SideOf("site") != "baro" {
		t.Fatalf("switched to baro: alt %q, side %q", d.Scen.Get("alt"), d.SideOf("site"))
	}
	d.Switch("site", "alt")
	if d.Scen.Get("alt") != "210m" {
		t.Errorf("switched back: alt %q, want 210m", d.Scen.Get("alt"))
	}
	d.Switch("s1.pipe", "d")
	if d.Scen.Has("s1.nps") || d.SideOf("s1.pipe") != "d" {
		t.Errorf("segment group: nps %q, side %q", d.Scen.Get("s1.nps"), d.SideOf("s1.pipe"))
	}
	d.Switch("s1.pipe", "nps")
	if d.Scen.Get("s1.nps") != "8" || d.Scen.Get("s1.sch") != "40" {
		t.Errorf("segment group back: nps %q sch %q", d.Scen.Get("s1.nps"), d.Scen.Get("s1.sch"))
	}
}

func TestDraftFittingsAndUnits(t *testing.T) {
	d := NewDraft(Demo())
	d.StepFitting("s1.fit", "gate", +1)
	d.StepFitting("s1.fit", "elbow90lr", -1)
	if got := d.Scen.Get("s1.fit"); got != "entry_sharp:1,gate:2" {
		t.Errorf("stepped fittings: %q", got)
	}
	d.PickUnit("q", "gpm")
	if got := d.Scen.Get("q"); got != "45gpm" {
		t.Errorf("picked gpm: q %q", got)
	}
	d.Choose("hp", "")
	d.PickUnit("hp", "ft")
	d.Type("hp", "30")
	if got := d.Scen.Get("hp"); got != "30ft" {
		t.Errorf("a unit picked for an empty box: hp %q, want 30ft", got)
	}
}

func TestSplitUnicodeMinus(t *testing.T) {
	// calc.Parse reads U+2212 as a minus (calc/quantity.go); Split must
	// agree, so the box keeps the sign with the number.
	if n, u := Split("−18kPa"); n != "−18" || u != "kPa" {
		t.Errorf("Split(−18kPa) = %q, %q", n, u)
	}
}

func TestEveryErrorAtOnce(t *testing.T) {
	// Every input that cannot be read is reported in one evaluation, not
	// after the ones read before it are fixed (this project's rule).
	s := Demo()
	_ = s.Set("t", "warm")
	_ = s.Set("q", "45 furlongs")
	_ = s.Set("s2.l", "long")
	_ = s.Set("liq", "mercury")
	_ = s.Set("ph", "62,59,x,44,33m")
	r := Evaluate(Read(s))
	for _, p := range []string{"t", "q", "s2.l", "liq", "ph"} {
		if r.Errors[p] == nil {
			t.Errorf("no problem reported on %s (have %v)", p, r.Errors)
		}
	}
}

func TestDraftGaugePipeBySize(t *testing.T) {
	// The pipe at a gauge given by size and schedule instead of its inside
	// diameter: switching sides keeps the diameter aside, and the size's
	// inside diameter is the catalogue's (ASME B36.10M, NPS 8 schedule 40:
	// OD 219.1 mm, wall 8.18 mm), giving the same head as the diameter typed.
	d := NewDraft(Demo())
	before := Evaluate(Read(d.Scen)).Field
	d.Switch("gsp", "nps")
	if d.Scen.Has("ds") || d.SideOf("gsp") != "nps" {
		t.Fatalf("switched: ds %q, side %q", d.Scen.Get("ds"), d.SideOf("gsp"))
	}
	d.Choose("dsn", "8")
	d.Choose("dss", "40")
	after := Evaluate(Read(d.Scen))
	if after.Field == nil || before == nil {
		t.Fatalf("no field check: %v", after.Errors)
	}
	// The demo types 202.7 mm; the catalogue's is 202.74 mm: heads agree
	// to the velocity-head change that 0.04 mm makes.
	if diff := after.Field.Head - before.Head; diff < 0 || diff > 1e-4 {
		t.Errorf("head %g by size, %g by diameter", after.Field.Head, before.Head)
	}
	d.Switch("gsp", "d")
	if d.Scen.Get("ds") != "202.7mm" || d.Scen.Has("dsn") {
		t.Errorf("switched back: ds %q, dsn %q", d.Scen.Get("ds"), d.Scen.Get("dsn"))
	}
}

// TestDraftLoopSwitch: the kind-of-line switch (loop) is a choice of the
// Draft. A closed loop leaves the points' values in the link, unread, and
// the head is the loop's losses alone; switching back gives the open line's
// head again. By the energy balance (the brief's, in head form) with equal
// pressures and both points at rest, the open line needs z2 − z1 more than
// the same pipe as a loop.
func TestDraftLoopSwitch(t *testing.T) {
	var blank Scenario
	d := NewDraft(blank)
	for _, kv := range [][2]string{{"liq", "water"}, {"t", "10C"}, {"baro", "101.325kPa"},
		{"p1", "0kPa"}, {"z1", "100m"}, {"v1", "0m/s"}, {"p2", "0kPa"}, {"z2", "112m"}, {"v2", "0m/s"},
		{"q", "12L/s"}, {"s1.l", "120m"}, {"s1.nps", "3"}, {"s1.sch", "40"}, {"s1.mat", "steel"},
		{"s1.fit", "elbow90:4"}, {"s1.cmp", "coil:3.2m@12L/s"}} {
		d.Choose(kv[0], kv[1])
	}
	head := func(what string) (hp, hf float64) {
		t.Helper()
		r := Evaluate(Read(d.Scen))
		if r.Balance == nil {
			t.Fatalf("%s: no balance; errors %v", what, r.Errors)
		}
		return r.Balance.PumpHead, r.Balance.FrictionHead
	}
	open, hf := head("open line")
	if math.Abs(open-(12+hf)) > 1e-9*open {
		t.Errorf("open line: pump head %.9g m, want z2 − z1 + losses = %.9g m", open, 12+hf)
	}

	d.Choose("loop", "1")
	boxesMatch(t, "loop switched on", &d)
	loop, loopHf := head("closed loop")
	if math.Abs(loop-loopHf) > 1e-9*loop || math.Abs(open-loop-12) > 1e-9*open {
		t.Errorf("closed loop: pump head %.9g m (losses %.9g m), want the open line's %.9g m less z2 − z1 = 12 m", loop, loopHf, open)
	}
	for _, p := range []string{"p1", "z1", "v1", "p2", "z2", "v2"} {
		if !d.Scen.Has(p) {
			t.Errorf("closed loop: %s left the link; nothing typed is lost", p)
		}
	}
	if !strings.Contains(d.Scen.Encode(), "loop=1") {
		t.Errorf("closed loop: link %q has no loop=1", d.Scen.Encode())
	}

	// A loop solves for the pump head or the flow only: another unknown is
	// an error on solve, and the choice stays in the link.
	d.Choose("solve", "z2")
	r := Evaluate(Read(d.Scen))
	if m := r.Errors["solve"]; m == nil || m.Reason != calc.ReasonLoopUnknown || d.Scen.Get("solve") != "z2" {
		t.Errorf("loop solving for z2: errors %v, solve %q", r.Errors, d.Scen.Get("solve"))
	}
	d.Choose("solve", "q")
	d.Choose("hp", strconv.FormatFloat(loop, 'g', 17, 64)+"m")
	if r := Evaluate(Read(d.Scen)); r.Balance == nil || math.Abs(r.Balance.Q-0.012) > 1e-9 {
		t.Errorf("loop solving for the flow at its own head: %+v, errors %v", r.Balance, r.Errors)
	}
	d.Choose("solve", "hp")

	d.Choose("loop", "0")
	boxesMatch(t, "loop switched off", &d)
	if back, _ := head("open line again"); back != open {
		t.Errorf("back to an open line: pump head %.12g m, want %.12g m as before", back, open)
	}
	if d.Scen.Get("z2") != "112m" || d.Scen.Get("z1") != "100m" {
		t.Errorf("back to an open line: z1 %q, z2 %q", d.Scen.Get("z1"), d.Scen.Get("z2"))
	}
}

// TestDraftLoadSwitch: the flow is given as a flow or as a heat load
// (group qby). Switching keeps the other side's value aside and brings it
// back; the flow a load needs is Q = P/(ρ·cp·|ΔT|) (the steady-flow energy
// balance of a liquid), so the load the worked-out flow carries is the load
// typed.
func TestDraftLoadSwitch(t *testing.T) {
	var blank Scenario
	d := NewDraft(blank)
	for _, kv := range [][2]string{{"loop", "1"}, {"liq", "water"}, {"t", "7C"}, {"baro", "101.325kPa"},
		{"q", "12L/s"}, {"tsup", "7C"}, {"tret", "12C"}, {"l", "120m"}, {"nps", "3"}, {"sch", "40"}, {"mat", "steel"}} {
		d.Choose(kv[0], kv[1])
	}
	r := Evaluate(Read(d.Scen))
	if r.Heat == nil || r.Heat.FromLoad || r.Balance == nil {
		t.Fatalf("flow typed: heat %+v, errors %v", r.Heat, r.Errors)
	}
	carried := r.Heat.Load // the load 12 L/s carries from 7 to 12 °C

	d.Switch("qby", "load")
	boxesMatch(t, "switched to a load", &d)
	if d.Scen.Has("q") || d.SideOf("qby") != "load" {
		t.Fatalf("switched to a load: q %q, side %q", d.Scen.Get("q"), d.SideOf("qby"))
	}
	// No load yet: with neither side given the link cannot say which was
	// meant, so the flow is missing, in words that offer the load too.
	r = Evaluate(Read(d.Scen))
	if m := r.Errors["q"]; m == nil || !strings.Contains(worded(m, false), "heat load") || r.Balance != nil {
		t.Errorf("no load typed: errors %v, balance %+v", r.Errors, r.Balance)
	}
	d.Type("load", strconv.FormatFloat(carried/1000, 'g', 17, 64))
	if got := d.Scen.Get("load"); !strings.HasSuffix(got, "kW") {
		t.Errorf("a load typed takes the default unit: %q", got)
	}
	r = Evaluate(Read(d.Scen))
	if r.Heat == nil || !r.Heat.FromLoad || r.Balance == nil {
		t.Fatalf("load typed: heat %+v, errors %v", r.Heat, r.Errors)
	}
	if math.Abs(r.Heat.Flow-0.012) > 1e-12 || math.Abs(r.Balance.Q-r.Heat.Flow) > 1e-15 {
		t.Errorf("the load 12 L/s carries gives back %.15g m³/s (balance %.15g), want 0.012", r.Heat.Flow, r.Balance.Q)
	}
	if h := r.Heat; math.Abs(h.Load-h.Flow*h.Props.Density*h.Props.HeatCapacity*5) > 1e-9*h.Load {
		t.Errorf("P = ρ·Q·cp·ΔT does not hold: %+v", h)
	}

	d.Switch("qby", "q")
	boxesMatch(t, "switched back to a flow", &d)
	if d.Scen.Get("q") != "12L/s" || d.Scen.Has("load") {
		t.Errorf("back to a flow: q %q, load %q", d.Scen.Get("q"), d.Scen.Get("load"))
	}
	d.Switch("qby", "load")
	if !strings.HasSuffix(d.Scen.Get("load"), "kW") || d.Scen.Has("q") {
		t.Errorf("the load again: load %q, q %q", d.Scen.Get("load"), d.Scen.Get("q"))
	}
}
