//go:build !wasm

package main

import (
	"math"
	"reflect"
	"testing"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"
)

// viewModels are the view model of every view of both demos, in SI and in
// US units, and of the demo with the flow typed as make bench types it.
func viewModels() []present.Sheet {
	var out []present.Sheet
	for _, sc := range []scenario.Scenario{scenario.Demo(), scenario.TurbineDemo()} {
		for _, units := range []string{"si", "us"} {
			for _, view := range []string{"balance", "convert", "regime", "line", "pump", "report", "book"} {
				s := sc.Clone()
				_ = s.Set("units", units)
				_ = s.Set("view", view)
				d := scenario.NewDraft(s)
				for _, q := range []string{"", "4", "45"} {
					if q != "" {
						d.Type("q", q)
					}
					out = append(out, present.Build(&d, scenario.Evaluate(scenario.Read(d.Scen))))
				}
			}
		}
	}
	return out
}

// TestSameIsDeepEqual holds same to reflect.DeepEqual (the Go standard
// library's definition of deep equality) on every pair of cards, of blocks
// and of sheets the demos' views give, and on values made to differ in one
// place each.
func TestSameIsDeepEqual(t *testing.T) {
	vms := viewModels()
	var cards []present.Card
	var blocks []present.Block
	for _, vm := range vms {
		cards = append(cards, vm.Cards...)
		for _, c := range vm.Cards {
			blocks = append(blocks, c.Blocks...)
		}
	}
	n, equal := 0, 0
	check := func(what string, got, want bool) {
		t.Helper()
		n++
		if want {
			equal++
		}
		if got != want {
			t.Errorf("%s: same %v, reflect.DeepEqual %v", what, got, want)
		}
	}
	for i := range vms {
		for j := range vms {
			check("sheets", same(&vms[i], &vms[j]), reflect.DeepEqual(vms[i], vms[j]))
		}
	}
	for i := range cards {
		for j := i; j < len(cards) && j < i+40; j++ {
			check("cards "+cards[i].ID+", "+cards[j].ID, same(&cards[i], &cards[j]), reflect.DeepEqual(cards[i], cards[j]))
		}
	}
	for i := range blocks {
		for j := i; j < len(blocks) && j < i+40; j++ {
			check("blocks", same(&blocks[i], &blocks[j]), reflect.DeepEqual(blocks[i], blocks[j]))
		}
	}
	// A copy equal but for one deep value, which each pass must find.
	for _, c := range cards {
		for bi := range c.Blocks {
			d := cloneCard(c)
			b := &d.Blocks[bi]
			switch {
			case b.Answer != nil && len(b.Answer.Values) > 0:
				b.Answer.Values[0].Text += "0"
			case b.Budget != nil && len(b.Budget.Sides) > 0 && len(b.Budget.Sides[0].Rows) > 0:
				b.Budget.Sides[0].Rows[0].Width++
			case b.Card != nil:
				b.Card.Title += "!"
			case len(b.Fields) > 0:
				b.Fields[0].Box += " "
			default:
				b.Text += "."
			}
			check("a card changed in block "+b.ID, same(&c, &d), reflect.DeepEqual(c, d))
		}
	}
	if equal == 0 || equal == n {
		t.Fatalf("%d pairs, %d equal: the pairs should hold both", n, equal)
	}
	t.Logf("%d pairs, %d equal", n, equal)

	// The edges of DeepEqual's definition.
	type edge struct {
		F  float64
		S  []string
		P  *int
		M  map[string]int
		Fn func()
	}
	one, other := 1, 1
	for _, c := range []struct {
		name string
		a, b edge
	}{
		{"NaN", edge{F: math.NaN()}, edge{F: math.NaN()}},
		{"signed zeros", edge{F: math.Copysign(0, -1)}, edge{F: 0}},
		{"nil and empty slice", edge{S: nil}, edge{S: []string{}}},
		{"empty slices", edge{S: []string{}}, edge{S: []string{}}},
		{"pointers to equal values", edge{P: &one}, edge{P: &other}},
		{"nil and a pointer", edge{}, edge{P: &one}},
		{"a func", edge{Fn: func() {}}, edge{}},
		{"no func", edge{}, edge{}},
	} {
		if got, want := same(&c.a, &c.b), reflect.DeepEqual(c.a, c.b); got != want {
			t.Errorf("%s: same %v, reflect.DeepEqual %v", c.name, got, want)
		}
	}
	// A map is equal only to itself (the view model holds none).
	m := map[string]int{"a": 1}
	if a, b := (edge{M: m}), (edge{M: m}); !same(&a, &b) {
		t.Error("a map is not the same as itself")
	}
	if a, b := (edge{M: m}), (edge{M: map[string]int{"a": 1}}); same(&a, &b) {
		t.Error("two maps counted the same: same compares no map's entries")
	}
}

// cloneCard copies a card deeply enough that changing one value of the
// copy leaves the card as it was.
func cloneCard(c present.Card) present.Card {
	d := c
	d.Blocks = append([]present.Block(nil), c.Blocks...)
	for i := range d.Blocks {
		b := &d.Blocks[i]
		if b.Answer != nil {
			a := *b.Answer
			a.Values = append(a.Values[:0:0], a.Values...)
			b.Answer = &a
		}
		if b.Budget != nil {
			bu := *b.Budget
			bu.Sides = append(bu.Sides[:0:0], bu.Sides...)
			if len(bu.Sides) > 0 {
				bu.Sides[0].Rows = append(bu.Sides[0].Rows[:0:0], bu.Sides[0].Rows...)
			}
			b.Budget = &bu
		}
		if b.Card != nil {
			cc := *b.Card
			b.Card = &cc
		}
		b.Fields = append(b.Fields[:0:0], b.Fields...)
	}
	return d
}

// BenchmarkSame and BenchmarkDeepEqual compare the Balance view's cards
// with the cards after a flow typed, as redrawCards does after each edit.
func BenchmarkSame(b *testing.B) {
	benchCompare(b, func(x, y *present.Card) bool { return same(x, y) })
}

func BenchmarkDeepEqual(b *testing.B) {
	benchCompare(b, func(x, y *present.Card) bool { return reflect.DeepEqual(*x, *y) })
}

func benchCompare(b *testing.B, eq func(x, y *present.Card) bool) {
	d := scenario.NewDraft(scenario.Demo())
	before := present.Build(&d, scenario.Evaluate(scenario.Read(d.Scen)))
	d.Type("q", "4")
	after := present.Build(&d, scenario.Evaluate(scenario.Read(d.Scen)))
	b.ReportAllocs()
	for b.Loop() {
		for i := range after.Cards {
			eq(&before.Cards[i], &after.Cards[i])
		}
	}
}
