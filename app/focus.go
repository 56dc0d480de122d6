package main

import (
	"strconv"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// Where the keyboard's focus goes when a button's action redraws the part
// of the page it sat in: a person working without a mouse must not be sent
// back to the top of the page (WCAG 2.1 SC 2.4.3 Focus Order).

// focusTargets are the ids to focus after action a, the first one on the
// page and enabled wins; follow says whether they take the focus even when
// the focused element is still on the page (a moved segment is followed:
// the button pressed now belongs to the segment that took its place).
func (s *sheet) focusTargets(a present.Action) (ids []string, follow bool) {
	num := strconv.Itoa
	switch a.Do {
	case "seg-move":
		n := num(a.N + a.Step)
		if a.Step < 0 {
			return []string{"seg-up-" + n, "seg-down-" + n}, true
		}
		return []string{"seg-down-" + n, "seg-up-" + n}, true
	case "seg-remove": // the same button of the segment that comes next, else of the one before
		return []string{"seg-del-" + num(a.N), "seg-del-" + num(a.N-1), "seg-add"}, true
	case "seg-add": // the new segment's first box
		n := num(s.d.ShownSegments())
		return []string{"in-s" + n + "-l", "seg-add"}, true
	case "row-add":
		return []string{"in-" + scenario.ListColumns[0] + "-" + num(s.d.RowCount()-1), "row-add"}, true
	case "row-remove":
		return []string{"row-del-" + num(a.N+1), "row-del-" + num(a.N), "row-add"}, true
	case "fit-step": // its row goes at a count of nought: the picker that adds one
		p := a.Param
		if p == "fit" {
			return []string{"add-fit"}, false
		}
		return []string{"add-" + present.DomID(p)}, false
	}
	return nil, false
}

// refocus runs once the page is drawn after an action: a view opened by it
// is shown from its top, with the focus on its tab when the focused
// control has gone; otherwise the focus goes to the first of ids on the
// page (always when follow, else only when the focused control has gone).
func (s *sheet) refocus(newView bool, view string, ids []string, follow bool) {
	if !app.IsClient || s.ctx.Src() == nil {
		return
	}
	// The sheet's context: a Defer on the pressed button's own context is
	// dropped when the button is drawn anew (go-app runs it only while its
	// source is mounted).
	s.ctx.Defer(func(ctx app.Context) {
		doc := app.Window().Get("document")
		if newView {
			app.Window().Call("scrollTo", 0, 0)
			ids = append(ids, "view-"+view)
		}
		ae := doc.Get("activeElement")
		lost := !ae.Truthy() || ae.Equal(doc.Get("body")) || !ae.Get("isConnected").Bool()
		if !follow && !lost {
			return
		}
		for _, id := range ids {
			el := doc.Call("getElementById", id)
			if el.Truthy() && !el.Get("disabled").Bool() {
				el.Call("focus")
				return
			}
		}
	})
}

// The picker that adds a fitting adds one only on an explicit choice: a
// pick from its open list (mouse, touch, or the keys of the open list,
// which the page does not see), or Enter on the closed picker. Arrow keys and letters on the closed
// picker only browse: the browser sends a change for each of them, which
// once added a fitting per key. After an addition, or when the focus
// leaves it, the picker shows its placeholder again.

// browseWindow is how close, in ms, a change follows a key on the closed
// picker to be that key's browsing; a pick from the open list follows no
// key the page sees (the list takes the keys).
const browseWindow = 100

// fitKeyDown sees each key on the fitting picker as it happens (a
// listener of its own, selectBox.OnMount: go-app runs its handlers later,
// too late to stop the browser's own action): it notes the key for
// onFitChange, and Enter on a picker that shows a fitting adds it, without
// the list opening as well. The key is the picker's own state.
func (b *selectBox) fitKeyDown(e, el app.Value) {
	s, p := b.S, b.Param
	defer s.contain("choosing a fitting to add")
	if e.Get("type").String() == "keypress" { // the older event of the same Enter also opens the list
		if e.Get("key").String() == "Enter" {
			e.Call("preventDefault")
		}
		return
	}
	b.fitKey, b.fitKeyAt = e.Get("key").String(), e.Get("timeStamp").Float()
	v := el.Get("value").String()
	if b.fitKey != "Enter" || v == "" || s.ctx.Src() == nil {
		return
	}
	e.Call("preventDefault")
	id := el.Get("id").String()
	b.fitKey = ""
	s.ctx.Dispatch(func(ctx app.Context) {
		defer s.contain("adding a fitting to " + scenario.Label(p))
		s.addFitting(id, p, v)
	})
}

// onFitChange adds the fitting picked, unless the change came from
// browsing with the keys.
func (b *selectBox) onFitChange(ctx app.Context, e app.Event) {
	defer b.S.contain("adding a fitting to " + scenario.Label(b.Param))
	v := ctx.JSSrc().Get("value").String()
	browsing := b.fitKey != "" && b.fitKey != "Enter" && e.Get("timeStamp").Float()-b.fitKeyAt < browseWindow
	if v == "" || browsing {
		ctx.PreventUpdate()
		return
	}
	b.fitKey = ""
	b.S.addFitting(ctx.JSSrc().Get("id").String(), b.Param, v)
}

// onFitBlur puts the placeholder back on a picker left after browsing.
func (b *selectBox) onFitBlur(ctx app.Context, e app.Event) {
	defer b.S.contain("leaving the fitting picker")
	ctx.JSSrc().Set("value", "")
	b.fitKey = ""
	ctx.PreventUpdate()
}

// addFitting adds one fitting of kind key to param's list, then shows the
// picker (element id) with its placeholder and the focus on it.
func (s *sheet) addFitting(id, p, key string) {
	s.d.StepFitting(p, key, +1)
	s.copyNote = ""
	s.evaluate()
	s.ctx.Defer(func(ctx app.Context) { // the sheet's: the picker may be drawn anew
		el := app.Window().Get("document").Call("getElementById", id)
		if el.Truthy() {
			el.Set("value", "")
			el.Call("focus")
		}
	})
}
