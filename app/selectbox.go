package main

import (
	"sync"

	"fieldhead/calc/scenario"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// Drawing cost. Every edit draws the whole sheet again and go-app compares
// the new tree with the page, element by element. The pickers' options are
// most of those elements, and the option lists come from the vocabulary,
// which builds them afresh on each call. Two measures (see make bench):
//
//   - each <select> is a go-app component of its own (selectBox): go-app
//     compares its fields with the one on screen and skips it, options and
//     all, unless its list or its choice changed;
//   - the lists are kept once built (choicesOf, unitChoicesOf): they depend
//     on the parameter alone.
//
// The inputs around the pickers and the top bar are components too
// (parts.go).

// selectBox is a <select> drawn as a component.
type selectBox struct {
	app.Compo
	ID, Class string
	Label     string // aria-label ("" when a <label for> names it)
	Options   []selOpt
	Param     string
	Unit      bool   // a unit picker (onPick) rather than a choice (onChoice)
	S         *sheet // the sheet whose handlers it calls (compared by pointer)
}

// selOpt is one option of a selectBox.
type selOpt struct {
	Value, Text string
	Selected    bool
}

// Render draws the select.
func (b *selectBox) Render() app.UI {
	opts := make([]app.UI, len(b.Options))
	for i, o := range b.Options {
		opts[i] = app.Option().Value(o.Value).Selected(o.Selected).Text(o.Text)
	}
	h := b.S.onChoice(b.Param)
	if b.Unit {
		h = b.S.onPick(b.Param)
	}
	sel := app.Select().ID(b.ID).Class(b.Class).OnChange(h, app.EventScope(b.Param, b.Unit))
	if b.Label != "" {
		sel = sel.Aria("label", b.Label)
	}
	return sel.Body(opts...)
}

var (
	listMu    sync.Mutex
	choiceFor = map[string][]scenario.Choice{}
	unitsFor  = map[string][]string{}
)

// choicesOf is scenario.Choices(p), built once. Callers must not change
// the slice.
func choicesOf(p string) []scenario.Choice {
	listMu.Lock()
	defer listMu.Unlock()
	c, ok := choiceFor[p]
	if !ok {
		c = scenario.Choices(p)
		choiceFor[p] = c
	}
	return c
}

// unitChoicesOf is scenario.UnitChoices(p, us), built once. Callers must
// not change the slice.
func unitChoicesOf(p string, us bool) []string {
	k := p + "|si"
	if us {
		k = p + "|us"
	}
	listMu.Lock()
	defer listMu.Unlock()
	c, ok := unitsFor[k]
	if !ok {
		c = scenario.UnitChoices(p, us)
		unitsFor[k] = c
	}
	return c
}
