//go:build !wasm

package main

import (
	"reflect"
	"slices"
	"testing"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// lineCard is a card like the line's: a box's block, then the line's total.
func lineCard(total string) present.Card {
	return present.Card{ID: "between", Title: "Between the points", Blocks: []present.Block{
		{Kind: present.BlockText, ID: "a-note", Class: "muted", Text: "a note"},
		{Kind: present.BlockText, ID: "line-total", Class: "computed", Text: total},
	}}
}

// TestSameBlocks: what redrawCards hands a changed card, by what changed.
// (This project's rule for drawing an edit; no external source.)
func TestSameBlocks(t *testing.T) {
	retitled := lineCard("4.6 m")
	retitled.Title = "Line"
	fewer := lineCard("4.5 m")
	fewer.Blocks = fewer.Blocks[:1]
	for _, tc := range []struct {
		name string
		b    present.Card
		same []bool
		all  bool
	}{
		{"nothing", lineCard("4.5 m"), nil, true},
		{"one figure", lineCard("4.6 m"), []bool{true, false}, false},
		{"the title too", retitled, nil, false},
		{"a block fewer", fewer, nil, false},
	} {
		same, all := sameBlocks(lineCard("4.5 m"), tc.b)
		if all != tc.all || !slices.Equal(same, tc.same) {
			t.Errorf("%s: same %v all %v, want %v %v", tc.name, same, all, tc.same, tc.all)
		}
	}
}

// TestDrawnBlocks: a redrawn card puts back, as they are on the page, the
// blocks redrawCards found unchanged, and only for the part it was told
// about; the changed block is drawn anew and reaches the page.
func TestDrawnBlocks(t *testing.T) {
	e := app.NewTestEngine()
	c := &card{S: &sheet{}, C: lineCard("4.5 m")}
	if err := e.Load(c); err != nil {
		t.Fatal(err)
	}
	e.ConsumeAll()
	drawn := c.Drawn()
	if len(drawn) != 3 { // the title, then a subtree per block
		t.Fatalf("the card drew %d children, want 3", len(drawn))
	}
	if c.drawnBlocks(true) != nil {
		t.Error("with no word from redrawCards the card reused its blocks")
	}

	c.C = lineCard("4.6 m")
	c.same = []bool{true, false}
	other := lineCard("4.6 m")
	c.sameAt = &other.Blocks[0] // told about another part
	if c.drawnBlocks(true) != nil {
		t.Error("the card reused its blocks for a part it was not told about")
	}
	c.sameAt = &c.C.Blocks[0]
	got := c.drawnBlocks(true)
	if len(got) != 2 || got[0] != drawn[1] || got[1] != drawn[2] {
		t.Fatalf("drawnBlocks %v, want the drawn blocks %v", got, drawn[1:])
	}
	if c.drawnBlocks(false) != nil {
		t.Error("a card drawn with a title reused its blocks as if it had none")
	}

	c.same, c.sameAt = []bool{true, false}, &c.C.Blocks[0]
	bs := c.blocks(true)
	if len(bs) != 2 || bs[0] != drawn[1] || bs[1] == drawn[2] || bs[1].Mounted() {
		t.Errorf("blocks gave %v: want the first block as drawn (%v), the second drawn anew", bs, drawn[1])
	}
	if c.same != nil || c.sameAt != nil {
		t.Error("the card kept redrawCards' word after drawing")
	}
}

// BenchmarkEditModel is the Go of an edit typed into the flow box, the
// page's calls outside go-app: the box's text into the draft, the inputs
// read and evaluated, the view model built and compared card by card with
// the one before (redrawCards). The keys alternate as make bench's do
// (45 → 4 → 45 L/s). Natively; the wasm runs it a few times slower.
func BenchmarkEditModel(b *testing.B) {
	d := scenario.NewDraft(scenario.Demo())
	vm := present.Build(&d, scenario.Evaluate(scenario.Read(d.Scen)))
	texts := [2]string{"4", "45"}
	if !d.Type("q", "4") || reflect.DeepEqual(present.Build(&d, scenario.Evaluate(scenario.Read(d.Scen))).Cards, vm.Cards) {
		b.Fatal("typing 4 into the flow box changed no card")
	}
	d.Type("q", "45")
	b.ReportAllocs()
	i := 0
	for b.Loop() {
		d.Type("q", texts[i%2])
		i++
		next := present.Build(&d, scenario.Evaluate(scenario.Read(d.Scen)))
		for k := range next.Cards {
			sameBlocks(vm.Cards[k], next.Cards[k])
		}
		vm = next
	}
}
