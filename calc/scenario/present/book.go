package present

import (
	"strconv"
	"strings"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// The site book: every sheet kept on this device, newest first.

// Kept is a sheet kept on the device, as the page's store holds it.
type Kept struct {
	ID      string
	Title   string
	Edited  string // when it was last edited, as the page words it; "" when not known (an older sheets file)
	Link    string // its signed query
	Answer  string // its headline answer when last saved
	Current bool   // the sheet open now
}

// BookState is what the page holds for the book besides the kept sheets.
type BookState struct {
	Search   string          // text the titles are searched for
	Selected map[string]bool // sheets ticked for export
	Undo     string          // title of the sheet just deleted, "" for none
	Notice   string          // what the last import or the store said
}

// Headline is a sheet's headline answer in a few words, in its units:
// the balance's unknown, else the field check's head, else NPSH available
// and its margin, else the run's friction, else the conversion; "no answer
// yet" without any.
func Headline(s scenario.Scenario, r scenario.Result) string {
	d := scenario.NewDraft(s)
	b := &builder{d: &d, in: &r.Inputs, r: r, us: r.US, shown: map[string]bool{}, warned: map[string]bool{}}
	switch {
	case r.Balance != nil:
		label := strings.ToLower(solveLabels[b.solve()][:1]) + solveLabels[b.solve()][1:]
		out := label + " " + b.solvedText(r.Balance.Value)
		if pr := r.Pump; pr != nil && pr.Operating != nil {
			out += "; runs at " + b.param("q", pr.Operating.Q) + ", " + b.head(pr.Operating.H)
		}
		return out
	case r.Field != nil:
		return "pump head measured " + b.head(r.Field.Head)
	case r.NPSH != nil:
		out := "NPSH available " + b.head(r.NPSH.Available)
		if r.NPSH.Level != calc.NPSHUnrated {
			out += ", margin " + b.head(r.NPSH.Margin) + " (" + npshWord(r.NPSH.Level) + ")"
		}
		return out
	case theRun(&r) != nil:
		return "friction head of the run " + b.head(theRun(&r).TotalLoss)
	case r.Convert != nil:
		return "converted: " + b.gauge(r.Convert.Gauge)
	}
	return "no answer yet"
}

// editedText says when a kept sheet was last edited.
func editedText(when string) string {
	if when == "" {
		return "edit time not known (from an older sheets file)"
	}
	return "edited " + when
}

// Book is the card of the site book: the search box, each kept sheet whose
// title holds the search text, newest first as given, with its buttons,
// and the export and import actions.
func Book(kept []Kept, st BookState) Card {
	search := Field{Param: "book-search", Kind: FieldPlain, ID: "book-search", Label: "Find a sheet", Hint: "(by its title)", Box: st.Search}
	blocks := []Block{fields(search)}
	if st.Undo != "" {
		blocks = append(blocks, Block{Kind: BlockText, Class: "note-text", ID: "book-undo-note", Text: "Deleted “" + st.Undo + "”.",
			Buttons: []Button{{ID: "book-undo", Text: "Undo", Class: "act", Act: Action{Do: "book-undo"}}}})
	} else {
		blocks = append(blocks, Block{Kind: BlockEmpty})
	}
	if st.Notice != "" {
		blocks = append(blocks, text("note-text", "book-notice", st.Notice))
	} else {
		blocks = append(blocks, Block{Kind: BlockEmpty})
	}
	q := strings.ToLower(strings.TrimSpace(st.Search))
	var rows []Block
	for _, k := range kept {
		if q != "" && !strings.Contains(strings.ToLower(k.Title), q) {
			continue
		}
		title := k.Title
		if title == "" {
			title = "Untitled sheet"
		}
		c := Card{ID: "kept-" + k.ID, Class: "kept", Title: title, Blocks: []Block{
			text("muted", "", editedText(k.Edited)+map[bool]string{true: " · open now", false: ""}[k.Current]),
			text("computed", "", k.Answer),
			{Kind: BlockButtons, Class: "actions", Buttons: []Button{
				{ID: "book-open-" + k.ID, Text: "Open", Class: "act main", Disabled: k.Current, Act: Action{Do: "book-open", Value: k.ID}},
				{ID: "book-dup-" + k.ID, Text: "Duplicate", Class: "act", Act: Action{Do: "book-dup", Value: k.ID}},
				{ID: "book-del-" + k.ID, Text: "Delete", Class: "act", Disabled: k.Current, Act: Action{Do: "book-del", Value: k.ID}},
				{ID: "book-pick-" + k.ID, Text: map[bool]string{true: "✓ Selected", false: "Select"}[st.Selected[k.ID]], Class: "act",
					On: st.Selected[k.ID], Act: Action{Do: "book-pick", Value: k.ID}},
			}},
		}}
		rows = append(rows, Block{Kind: BlockCard, Card: &c})
	}
	count := "No sheet kept on this device yet."
	switch n := len(kept); {
	case n == 1:
		count = "1 sheet kept on this device."
	case n > 1:
		count = strconv.Itoa(n) + " sheets kept on this device, newest first."
	}
	if q != "" {
		count += " " + strconv.Itoa(len(rows)) + " match “" + strings.TrimSpace(st.Search) + "”."
	}
	blocks = append(blocks, text("muted", "book-count", count))
	blocks = append(blocks, rows...)
	sel := 0
	for _, k := range kept {
		if st.Selected[k.ID] {
			sel++
		}
	}
	which := "all"
	if sel > 0 {
		which = "the " + strconv.Itoa(sel) + " selected"
	}
	blocks = append(blocks,
		Block{Kind: BlockHeading, Text: "Take sheets elsewhere"},
		text("muted", "", "A sheets file is plain text: one line per sheet, its title, its link and when it was last edited. The results table opens in any spreadsheet: one row per sheet, every figure in the one unit system picked here, named in its column's head, whatever units each sheet is kept in."),
		Block{Kind: BlockButtons, Class: "actions", Buttons: []Button{
			{ID: "book-export", Text: "Save " + which + " as a sheets file", Class: "act", Disabled: len(kept) == 0, Act: Action{Do: "book-export"}},
			{ID: "book-csv", Text: "Save " + which + " as a results table in SI units (CSV)", Class: "act", Disabled: len(kept) == 0, Act: Action{Do: "book-csv", Value: "si"}},
			{ID: "book-csv-us", Text: "Save " + which + " as a results table in US units (CSV)", Class: "act", Disabled: len(kept) == 0, Act: Action{Do: "book-csv", Value: "us"}},
		}},
		Block{Kind: BlockImport, ID: "book-import", Text: "Add the sheets of a sheets file"},
	)
	return Card{ID: "book", Class: "book", Title: "Site book: the sheets on this device", Blocks: blocks}
}
