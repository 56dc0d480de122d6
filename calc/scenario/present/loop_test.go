package present

import (
	"strings"
	"testing"

	"fieldhead/calc/scenario"
)

// TestSolveGridOfALoop: the solve-for row offers every unknown on a line
// between two points and only the pump head and the flow on a closed loop
// (a loop has no points or static head to solve for), laid out two to a
// row so that no empty cell sits inside the frame (web/fieldhead.css
// .solve-grid.two). This project's own layout rule, no external source.
func TestSolveGridOfALoop(t *testing.T) {
	grid := func(sc scenario.Scenario) Block {
		t.Helper()
		sh, _ := sheetOf(t, sc, "balance")
		for _, bl := range card(t, sh.Cards, "answer-card").Blocks {
			if bl.Kind == BlockButtons && strings.HasPrefix(bl.Class, "solve-grid") {
				return bl
			}
		}
		t.Fatal("no solve-for row")
		return Block{}
	}
	ids := func(bl Block) string {
		var out []string
		for _, b := range bl.Buttons {
			out = append(out, b.ID)
		}
		return strings.Join(out, " ")
	}
	open := grid(scenario.Demo())
	if open.Class != "solve-grid" || len(open.Buttons)%4 != 0 || len(open.Buttons) != len(scenario.Choices("solve")) {
		t.Errorf("open line: class %q, %d buttons (%s): want every unknown, rows of four filled", open.Class, len(open.Buttons), ids(open))
	}
	loop := grid(with(t, scenario.Demo(), "loop", "1"))
	if loop.Class != "solve-grid two" || ids(loop) != "solve-hp solve-q" {
		t.Errorf("closed loop: class %q, buttons %s; want solve-grid two with solve-hp solve-q", loop.Class, ids(loop))
	}
	if !loop.Buttons[0].On {
		t.Errorf("closed loop: the pump head (the demo's unknown) is not the one chosen")
	}
}

// TestTemperatureHints: with a flow given, the supply and return
// temperatures only add the load the flow carries, and their boxes say
// they may stay blank; with a heat load given they are needed (the
// parameter table's Missing for tsup and tret) and keep the table's hints.
// This project's own wording rule, no external source.
func TestTemperatureHints(t *testing.T) {
	hints := func(sc scenario.Scenario) (sup, ret string) {
		t.Helper()
		sh, _ := sheetOf(t, sc, "balance")
		s, ok1 := fieldOf(sh, "tsup")
		r, ok2 := fieldOf(sh, "tret")
		if !ok1 || !ok2 {
			t.Fatal("no supply or return temperature box on the Balance view")
		}
		return s.Hint, r.Hint
	}
	sup, ret := hints(scenario.Demo())
	if !strings.Contains(sup, "optional") || !strings.Contains(ret, "optional") {
		t.Errorf("flow given: hints %q and %q, want both to say the boxes are optional", sup, ret)
	}
	tsup, _, _ := scenario.Lookup("tsup")
	tret, _, _ := scenario.Lookup("tret")
	sup, ret = hints(with(t, scenario.Demo(), "q", "", "load", "300kW"))
	if sup != tsup.Hint || ret != tret.Hint {
		t.Errorf("heat load given: hints %q and %q, want the table's %q and %q", sup, ret, tsup.Hint, tret.Hint)
	}
}
