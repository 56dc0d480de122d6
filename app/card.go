package main

import (
	"strconv"

	"fieldhead/calc/scenario/present"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// card is one card of a view, drawn from its part of the view model. go-app
// compares C with the card on screen and draws the card again only when
// its part changed, so an edit redraws the cards whose figures moved.
type card struct {
	app.Compo
	S *sheet
	C present.Card
	W int // the charts' width: a resize redraws a card with a chart

	ctx app.Context // from OnMount: redrawCards redraws the card alone

	// same, from redrawCards, says which of C's blocks are as drawn: the
	// next Render puts those subtrees back as they are on the page
	// (Compo.Drawn, our go-app copy), so go-app neither builds nor
	// compares them (an edit changes one figure of the line's card, whose
	// boxes, pickers and buttons were drawn again and compared for it).
	// sameAt is the first block it was made for: a card given another part
	// since ignores it.
	same   []bool
	sameAt *present.Block
}

// OnMount lists the card among the sheet's cards on the page.
func (c *card) OnMount(ctx app.Context) {
	c.ctx = ctx
	if c.S.mounted == nil {
		c.S.mounted = map[*card]bool{}
	}
	c.S.mounted[c] = true
}

// OnDismount takes the card off the list.
func (c *card) OnDismount() { delete(c.S.mounted, c) }

// Render draws the card: its title, its controls and its blocks.
func (c *card) Render() (ui app.UI) {
	defer containPart(c.S, "the card “"+c.C.Title+"”", &ui)
	x := c.C
	var title app.UI
	if x.Title != "" {
		h := app.H2()
		if x.Num != "" {
			title = h.Body(spanText("num", x.Num), app.Text(" "+x.Title))
		} else {
			title = h.Text(x.Title)
		}
	}
	if len(x.Controls) > 0 {
		title = divBody("seghead", title, divBody("segctl", c.buttons(x.Controls)...))
	}
	body := append([]app.UI{title}, c.blocks(title != nil)...)
	cls := "card"
	if x.Class != "" {
		cls += " " + x.Class
	}
	if c.S != nil && c.S.vm.View == "report" {
		cls += " rsec"
	}
	return app.Section().Class(cls).ID(x.ID).Body(body...)
}

// blocks draws the card's blocks, putting back as they are on the page
// those redrawCards found unchanged (same), and forgets what it said.
func (c *card) blocks(titled bool) []app.UI {
	bs := c.C.Blocks
	drawn := c.drawnBlocks(titled)
	out := make([]app.UI, len(bs))
	for i := range bs {
		if drawn != nil && c.same[i] {
			out[i] = drawn[i]
		} else {
			out[i] = c.block(&bs[i])
		}
	}
	c.same, c.sameAt = nil, nil
	return out
}

// drawnBlocks is the blocks' subtrees on the page, when redrawCards has
// said which are unchanged (same) for the part the card now holds, and
// the page holds one per block after the title (titled: the card has one).
func (c *card) drawnBlocks(titled bool) []app.UI {
	bs := c.C.Blocks
	if len(c.same) != len(bs) || len(bs) == 0 || c.sameAt != &bs[0] {
		return nil
	}
	d := c.Drawn()
	lead := 0
	if titled {
		lead = 1
	}
	if len(d) != lead+len(bs) {
		return nil
	}
	return d[lead:]
}

// block draws one block of the card.
func (c *card) block(b *present.Block) app.UI {
	switch b.Kind {
	case present.BlockFields:
		if len(b.Fields) == 1 {
			return &field{S: c.S, F: b.Fields[0]}
		}
		fs := make([]app.UI, len(b.Fields))
		for i, f := range b.Fields {
			fs[i] = &field{S: c.S, F: f}
		}
		return divBody("row2", fs...)
	case present.BlockSwitch:
		return divBody("switch",
			spanText("switch-label", b.Switch.Label),
			app.Div().Class("segs").Attr("role", "group").Aria("label", b.Switch.Label).Body(c.buttons(b.Switch.Sides)...))
	case present.BlockText:
		if b.Text == "" && len(b.Buttons) == 0 {
			return app.Div().Class("slot")
		}
		if b.ID == "report-url" {
			return linkRecord(b.Text)
		}
		if b.Class == "rtitle" {
			return app.H1().ID(b.ID).Text(b.Text)
		}
		p := app.P().Class(b.Class).Text(b.Text)
		if b.ID != "" {
			p = p.ID(b.ID)
		}
		if len(b.Buttons) > 0 {
			return divBody("field", append([]app.UI{p}, c.buttons(b.Buttons)...)...)
		}
		return p
	case present.BlockHeading:
		return app.H3().Text(b.Text)
	case present.BlockAnswer:
		return answer(b)
	case present.BlockFacts:
		return facts(b)
	case present.BlockLevel:
		return app.Div().Class("level "+b.Class).ID(b.ID).Attr("role", "status").Text(b.Text)
	case present.BlockWarnings:
		return warnings(b.Items, "Read before using the result")
	case present.BlockTable:
		return table(b.Table)
	case present.BlockChart:
		w := c.W
		if w == 0 {
			w = chartWidth()
		}
		return chartFigure(b.Chart, w, c.S != nil && c.S.vm.View == "report")
	case present.BlockButtons:
		cls := b.Class
		if cls == "" {
			cls = "actions"
		}
		return divBody(cls, c.buttons(b.Buttons)...)
	case present.BlockFittings:
		return c.fittings(b.Fittings)
	case present.BlockDataSheet:
		return c.dataSheet(b.DataSheet)
	case present.BlockBudget:
		return budget(b.Budget)
	case present.BlockNode:
		n := b.Node
		return app.Div().Class(classIf("node", n.Pump, "pump-node")).ID(n.ID).Body(
			spanText("num", n.Num), app.Strong().Text(" "+n.Title), spanText("muted", " "+n.Detail))
	case present.BlockCard:
		return &card{S: c.S, C: *b.Card}
	case present.BlockImport:
		// The browser's own file input is a small button with its own words;
		// it lies, transparent, over a face of ours that shows the label at
		// touch size (as a picker lies over .pickface).
		return formBody("field filepick", "",
			app.Input().Type("file").ID(b.ID).Class("file").Accept(".txt,text/plain").OnChange(c.S.onImport),
			app.Label().For(b.ID).Class("fileface").Text(b.Text))
	case present.BlockSurvey:
		return &survey{S: c.S, V: *b.Survey}
	case present.BlockList:
		items := make([]app.UI, len(b.Items))
		for i, t := range b.Items {
			items[i] = app.Li().Text(t)
		}
		return app.Ul().Class(b.Class).ID(b.ID).Body(items...)
	}
	return app.Div().Class("slot")
}

// buttons draws push buttons; a button whose text is a symbol says its
// name to screen readers instead.
func (c *card) buttons(bs []present.Button) []app.UI {
	out := make([]app.UI, len(bs))
	for i, b := range bs {
		out[i] = button(c.S, b)
	}
	return out
}

func button(s *sheet, b present.Button) app.UI {
	el := app.Button().Type("button").Class(classIf(b.Class, b.On, "on")).Disabled(b.Disabled)
	if b.ID != "" {
		el = el.ID(b.ID)
	}
	if b.Class == "seg" || b.Class == "tab" {
		el = el.Aria("pressed", b.On)
	}
	switch {
	case b.Label != "":
		el = el.Body(app.Span().Aria("hidden", true).Text(b.Text), spanText("sr", b.Label))
	case b.Hint != "":
		el = el.Body(spanText("tab-name", b.Text), spanText("tab-hint", b.Hint))
	default:
		el = el.Text(b.Text)
	}
	a := b.Act
	return el.OnClick(s.onConfirmed(a, b.Confirm), app.EventScope(a.Do, a.Param, a.Value, a.N, a.Step))
}

// answer draws a card's headline figure, or why there is none.
func answer(b *present.Block) app.UI {
	a := b.Answer
	var body []app.UI
	if a.Label != "" {
		body = append(body, app.Div().Class("answer-label").Text(a.Label))
	}
	if a.None {
		body = append(body, app.Div().Class("answer-value none").ID(a.NoneID).Text("—"),
			app.Div().Class("answer-sub").ID("answer-why").Text(a.Why))
	}
	cls := "answer-value"
	if len(a.Values) > 1 {
		cls += " op"
	}
	for _, v := range a.Values {
		body = append(body, app.Div().Class(cls).ID(v.ID).Attr("elementtiming", v.ID).Text(v.Text)) // its paint is timed by make bench
	}
	if a.Badge != "" {
		body = append(body, app.Div().Class("regime regime-"+firstWord(a.Badge)).ID(a.BadgeID).Text(a.Badge))
	}
	for _, s := range a.Subs {
		body = append(body, app.Div().Class("answer-sub").Text(s))
	}
	return app.Div().Class("answer").ID(b.ID).Body(body...)
}

func firstWord(s string) string {
	for i, r := range s {
		if r == ' ' {
			return s[:i]
		}
	}
	return s
}

// facts draws a definition list.
func facts(b *present.Block) app.UI {
	items := make([]app.UI, len(b.Facts))
	for i, f := range b.Facts {
		dd := app.Dd().Text(f.Value)
		if f.ID != "" {
			dd = dd.ID(f.ID)
		}
		items[i] = divBody(classIf("fact", f.Key, "key"), app.Dt().Text(f.Label), dd)
	}
	dl := app.Dl().Class("facts")
	if b.ID != "" {
		dl = dl.ID(b.ID)
	}
	return dl.Body(items...)
}

// warnings draws a boxed list of warnings, or an empty place for it.
func warnings(items []string, head string) app.UI {
	if len(items) == 0 {
		return app.Div().Class("slot")
	}
	lis := make([]app.UI, len(items))
	for i, t := range items {
		lis[i] = app.Li().Text(t)
	}
	return app.Div().Class("warnbox").Attr("role", "note").Body(
		divBody("warnhead", spanText("tag", "Warning"), app.Text(" "+head)),
		app.Ul().Body(lis...))
}

// table draws a table of figures; wide ones scroll inside a focusable box.
func table(t *present.Table) app.UI {
	var head []app.UI
	for _, h := range t.Head {
		head = append(head, app.Th().Scope("col").Text(h))
	}
	rows := func(rs []present.Row) []app.UI {
		out := make([]app.UI, len(rs))
		for i, r := range rs {
			th := app.Th().Scope("row").Text(r.Head)
			if r.HeadSpan > 1 {
				th = th.ColSpan(r.HeadSpan)
			}
			tr := []app.UI{th}
			for _, c := range r.Cells {
				td := app.Td()
				if c.ID != "" {
					td = td.ID(c.ID)
				}
				if c.Label != "" {
					td = td.DataSet("label", c.Label)
				}
				if c.Span > 1 {
					td = td.ColSpan(c.Span)
				}
				var body []app.UI
				if c.Badge != "" {
					body = append(body, spanText(c.Badge, c.Text))
				} else {
					body = append(body, app.Text(c.Text))
				}
				if c.Error != "" {
					body = append(body, app.Div().Class("msg err").ID(c.ErrorID).Body(spanText("tag", "Check"), app.Text(" "+c.Error)))
				}
				tr = append(tr, td.Body(body...))
			}
			out[i] = app.Tr().Class(r.Class).Body(tr...)
		}
		return out
	}
	parts := []app.UI{}
	if len(head) > 0 {
		parts = append(parts, app.THead().Body(app.Tr().Body(head...)))
	}
	parts = append(parts, app.TBody().Body(rows(t.Rows)...))
	if len(t.Foot) > 0 {
		parts = append(parts, app.TFoot().Body(rows(t.Foot)...))
	}
	tb := app.Table().Class(t.Class).ID(t.ID).Body(parts...)
	if t.Class == "conv" {
		return tb
	}
	return app.Div().Class("tablewrap").Attr("tabindex", 0).Attr("role", "region").Aria("label", "table "+t.ID).Body(tb)
}

// budget draws where the head goes as bars.
func budget(bu *present.Budget) app.UI {
	var sides []app.UI
	for _, sd := range bu.Sides {
		var rows []app.UI
		for _, r := range sd.Rows {
			cls := "hbar"
			if r.Negative {
				cls += " neg"
			}
			if r.Unknown {
				cls += " unknown"
			}
			rows = append(rows, app.Li().Class(classIf("brow", r.Unknown, "is-unknown")).Body(
				app.Div().Class("blabel").Text(r.Label),
				divBody("btrack", app.Div().Class(cls).DataSet("w", r.Width)),
				divBody("bval", app.Strong().Text(r.Head), spanText("bpa", r.Pressure)),
			))
		}
		if len(rows) == 0 {
			rows = append(rows, app.Li().Class("brow muted").Text("nothing on this side"))
		}
		sides = append(sides, divBody("bside",
			app.H3().Body(app.Text(sd.Title), spanText("btotal", " "+sd.Total)),
			app.Ul().Class("bars").Body(rows...)))
	}
	return app.Div().Body(append(sides, app.P().Class("muted small").Text(bu.Note))...)
}

// fittings draws the fitting editor: one line per kind with − and +, a
// picker that adds a kind, and the list as text.
func (c *card) fittings(f *present.Fittings) app.UI {
	body := []app.UI{app.Div().Class("lbl").Text("Fittings")}
	if len(f.Items) > 0 {
		var rows []app.UI
		for _, it := range f.Items {
			rows = append(rows, app.Li().Class("fit").Body(
				app.Span().Class("fit-name").Body(app.Text(it.Name), spanText("fit-k", " "+it.K)),
				divBody("stepper", button(c.S, it.Less), spanText("count", strconv.Itoa(it.Count)), button(c.S, it.More)),
			))
		}
		body = append(body, app.Ul().Class("fits").Body(rows...))
	}
	if f.Usable {
		body = append(body, formBody("", "", &selectBox{ID: f.AddID, Class: "pick add-fit", Label: "add a fitting", Options: f.Add, Param: f.Param, Fit: true, S: c.S}))
	}
	body = append(body, app.Details().Class("astext").Open(f.Open).Body(
		app.Summary().Text("Fittings as text"), &field{S: c.S, F: f.AsText}))
	return divBody("field fittings", body...)
}

// dataSheet draws the pump's data-sheet table.
func (c *card) dataSheet(d *present.DataSheet) app.UI {
	head := []app.UI{app.Th().Scope("col").Text("#")}
	for _, col := range d.Columns {
		label := []app.UI{spanText("colname", col.Head)}
		if col.Optional {
			label = append(label, spanText("hint", " optional"))
		}
		head = append(head, app.Th().Scope("col").Body(app.Div().Body(label...),
			formBody("", "", &selectBox{ID: col.UnitID, Class: "unit", Label: "unit of the " + col.Name, Options: col.Units, Param: col.Param, List: true, S: c.S})))
	}
	head = append(head, app.Th().Scope("col").Body(spanText("sr", "remove")))
	var rows []app.UI
	for _, r := range d.Rows {
		tr := []app.UI{app.Th().Scope("row").Text(r.Num)}
		for _, cell := range r.Cells {
			tr = append(tr, app.Td().Body(formBody("", "", app.Input().Type("text").ID(cell.ID).Class(classIf("box cell", cell.Bad, "bad")).
				Attr("inputmode", "decimal").Attr("autocomplete", "off").Attr("spellcheck", "false").
				Aria("label", cell.Label).Aria("invalid", cell.Bad).
				Value(cell.Text).OnInput(c.S.onCell(cell.Param, cell.Row), app.EventScope(cell.Param, cell.Row)))))
		}
		tr = append(tr, app.Td().Body(button(c.S, r.Remove)))
		rows = append(rows, app.Tr().Body(tr...))
	}
	body := []app.UI{
		app.P().Class("muted small").Text(d.Note),
		app.Div().Class("tablewrap").Attr("tabindex", 0).Attr("role", "region").Aria("label", "data sheet").Body(
			app.Table().Class("grid datasheet").ID("datasheet").Body(
				app.THead().Body(app.Tr().Body(head...)), app.TBody().Body(rows...))),
	}
	for _, col := range d.Columns {
		if col.Error != "" {
			body = append(body, app.P().ID("err-"+col.Param).Class("msg err").Attr("role", "alert").Body(
				spanText("tag", "Check"), app.Text(" "+col.Error)))
		} else {
			body = append(body, app.Div().Class("slot"))
		}
	}
	body = append(body, button(c.S, d.Add))
	var text []app.UI
	for _, f := range d.AsText {
		text = append(text, &field{S: c.S, F: f})
	}
	body = append(body, app.Details().Class("astext").Body(append([]app.UI{app.Summary().Text("Data sheet as text")}, text...)...))
	return divBody("datasheet-wrap", body...)
}
