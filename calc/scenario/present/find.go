package present

// Text returns the text the page shows in the element with the given id
// (a figure, a fact's value, a paragraph, a verdict, a table cell), and
// whether the view model has such an element. Tests of the page compare
// what it shows with it.
func (sh Sheet) Text(id string) (string, bool) {
	for i := range sh.Cards {
		if t, ok := sh.Cards[i].text(id); ok {
			return t, true
		}
	}
	return "", false
}

func (c *Card) text(id string) (string, bool) {
	for i := range c.Blocks {
		b := &c.Blocks[i]
		if b.ID == id && b.Kind != BlockAnswer && b.Kind != BlockFacts && b.Kind != BlockTable {
			return b.Text, true
		}
		if a := b.Answer; a != nil {
			if a.None && a.NoneID == id {
				return "—", true
			}
			for _, v := range a.Values {
				if v.ID == id {
					return v.Text, true
				}
			}
			if a.BadgeID == id && a.BadgeID != "" {
				return a.Badge, true
			}
			if a.None && id == "answer-why" {
				return a.Why, true
			}
		}
		for _, f := range b.Facts {
			if f.ID == id && id != "" {
				return f.Value, true
			}
		}
		if t := b.Table; t != nil {
			for _, rows := range [][]Row{t.Rows, t.Foot} {
				for _, r := range rows {
					for _, cl := range r.Cells {
						if cl.ID == id && id != "" {
							return cl.Text, true
						}
					}
				}
			}
		}
		if b.Card != nil {
			if t, ok := b.Card.text(id); ok {
				return t, true
			}
		}
	}
	return "", false
}

// SetText puts text into the paragraph with the given id, for what only
// the page knows (the link of the sheet, the date it is printed).
func (sh *Sheet) SetText(id, text string) {
	for i := range sh.Cards {
		sh.Cards[i].setText(id, text)
	}
}

func (c *Card) setText(id, text string) {
	for i := range c.Blocks {
		b := &c.Blocks[i]
		if b.ID == id && b.Kind == BlockText {
			b.Text = text
		}
		if b.Card != nil {
			b.Card.setText(id, text)
		}
	}
}

// Boxes returns the text of every box of the sheet (its inputs and the
// data sheet's cells), by element id: what each box must show.
func (sh Sheet) Boxes() map[string]string {
	out := map[string]string{}
	add := func(f Field) {
		if f.Kind == FieldQuantity || f.Kind == FieldPlain {
			out[f.ID] = f.Box
		}
	}
	add(sh.Title)
	var walk func(c *Card)
	walk = func(c *Card) {
		for i := range c.Blocks {
			b := &c.Blocks[i]
			for _, f := range b.Fields {
				add(f)
			}
			if b.Fittings != nil {
				add(b.Fittings.AsText)
			}
			if d := b.DataSheet; d != nil {
				for _, r := range d.Rows {
					for _, cl := range r.Cells {
						out[cl.ID] = cl.Text
					}
				}
				for _, f := range d.AsText {
					add(f)
				}
			}
			if b.Card != nil {
				walk(b.Card)
			}
		}
	}
	for i := range sh.Cards {
		walk(&sh.Cards[i])
	}
	return out
}
