package main

import (
	"sort"
	"strconv"
	"strings"
	"time"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// The site book: every sheet is kept on this device with an id; each edit
// saves it (keep); New sheet, Demo, a link and an import each make or open
// a sheet and never write over another.

// book is what the page holds of the kept sheets.
type book struct {
	db      app.Value // the open store, nil until open or when refused
	problem string    // why sheets cannot be kept, "" when they can
	kept    []record  // newest first
	id      string    // the open sheet's id ("" until the store has been read)
	created float64
	deleted *record // the sheet deleted last, for Undo
	state   present.BookState
}

// startBook opens the store and reads the kept sheets; the open sheet
// becomes the kept one with the same link, else a new one.
func (s *sheet) startBook(ctx app.Context) {
	openStore(func(db app.Value, problem string) {
		ctx.Dispatch(func(ctx app.Context) {
			defer s.contain("opening the store of kept sheets")
			if problem != "" {
				s.bk.problem = problem
				s.build() // the book says why it keeps nothing
				return
			}
			s.bk.db = db
			storeAll(db, func(recs []record, problem string) {
				ctx.Dispatch(func(ctx app.Context) {
					defer s.contain("reading the sheets kept on this device")
					// Sheets made before the store was read (an import, a
					// duplicate) join the kept ones.
					for _, r := range s.bk.kept {
						found := false
						for _, k := range recs {
							found = found || k.ID == r.ID
						}
						if !found {
							recs = append(recs, r)
							storePut(db, r, func(string) {})
						}
					}
					sortKept(recs)
					s.bk.kept, s.bk.problem = recs, problem
					if s.bk.id == "" {
						s.bk.id, s.bk.created = newID(), nowMs()
						for _, r := range recs {
							if sameSheet(r.Link, s.d.Scen) {
								s.bk.id, s.bk.created = r.ID, r.Created
								break
							}
						}
					}
					// Kept at once, and the book drawn with it: the inputs
					// have not changed, so nothing is worked out again and
					// no save is put off (which, a moment after every
					// load, redrew the sheet and left a write pending).
					s.bk.keep(s.d.Scen, s.res, s.damaged)
					s.build()
				})
			})
		})
	})
}

// sameSheet reports whether a kept link holds the scenario sc (whatever
// view it opens on).
func sameSheet(link string, sc scenario.Scenario) bool {
	k, err := scenario.Parse(link)
	if err != nil {
		return false
	}
	a, b := k.Clone(), sc.Clone()
	_ = a.Set("view", "")
	_ = b.Set("view", "")
	return a.Encode() == b.Encode()
}

// keep saves the open sheet sc with its result (called by evaluate): not
// before the store is read, not an empty sheet, not one opened from a
// damaged link until it is edited.
func (bk *book) keep(open scenario.Scenario, res scenario.Result, damaged bool) {
	if bk.db == nil || bk.id == "" || damaged || blank(open) {
		return
	}
	sc := open.Clone()
	if sc.Get("view") == "book" {
		_ = sc.Set("view", "") // the book is not a view of the sheet
	}
	r := record{ID: bk.id, Title: strings.TrimSpace(sc.Get("name")), Link: sc.Sign(),
		Answer: present.Headline(sc, res), Created: bk.created, Edited: nowMs()}
	if r.Created == 0 {
		r.Created = r.Edited
	}
	for i, k := range bk.kept {
		if k.ID == r.ID {
			if k.Link == r.Link && k.Answer == r.Answer {
				return // nothing new to keep
			}
			bk.kept = append(bk.kept[:i], bk.kept[i+1:]...)
			break
		}
	}
	bk.kept = append([]record{r}, bk.kept...)
	storePut(bk.db, r, func(problem string) {
		if problem != "" {
			bk.problem = problem + "; this sheet still works from its link"
		}
	})
}

// card is the view model of the site book.
func (bk *book) card() present.Card {
	kept := make([]present.Kept, len(bk.kept))
	for i, r := range bk.kept {
		kept[i] = present.Kept{ID: r.ID, Title: r.Title, Edited: localTime(r.Edited), Link: r.Link, Answer: r.Answer, Current: r.ID == bk.id}
	}
	st := bk.state
	if bk.problem != "" {
		st.Notice = "Sheets cannot be kept on this device: " + bk.problem + ". The open sheet still works from its link: copy the link to keep it."
	}
	return present.Book(kept, st)
}

// histories are the history cards of the pump tags among all kept
// sheets, in US customary units or SI.
func (bk *book) histories(us bool) []present.Card {
	var all []scenario.KeptSheet
	for _, r := range bk.kept {
		if sc, err := scenario.Parse(r.Link); err == nil {
			all = append(all, scenario.KeptSheet{Scen: sc, Edited: editedTime(r.Edited)})
		}
	}
	return present.HistoryCards(all, us)
}

// act handles the site book's buttons; a sheet to open is returned (its
// id is then the open one's), nil otherwise. The results table's unit
// system is the button's (a.Value "us" or "si"), never the open sheet's.
func (bk *book) act(a present.Action) *scenario.Scenario {
	find := func(id string) (record, bool) {
		for _, r := range bk.kept {
			if r.ID == id {
				return r, true
			}
		}
		return record{}, false
	}
	switch a.Do {
	case "book-open":
		if r, ok := find(a.Value); ok {
			sc, _ := scenario.Parse(r.Link)
			if v := sc.Get("view"); v == "" || v == "book" {
				_ = sc.Set("view", "balance")
			}
			bk.id, bk.created = r.ID, r.Created
			return &sc
		}
	case "book-dup":
		if r, ok := find(a.Value); ok {
			sc, _ := scenario.Parse(r.Link)
			_ = sc.Set("name", strings.TrimSpace(sc.Get("name")+" (copy)"))
			c := record{ID: newID(), Title: sc.Get("name"), Link: sc.Sign(), Answer: r.Answer, Created: nowMs(), Edited: nowMs()}
			bk.kept = append([]record{c}, bk.kept...)
			if bk.db != nil {
				storePut(bk.db, c, func(string) {})
			}
		}
	case "book-del":
		if r, ok := find(a.Value); ok && r.ID != bk.id {
			for i := range bk.kept {
				if bk.kept[i].ID == r.ID {
					bk.kept = append(bk.kept[:i], bk.kept[i+1:]...)
					break
				}
			}
			bk.deleted, bk.state.Undo = &r, r.Title
			if bk.state.Undo == "" {
				bk.state.Undo = "Untitled sheet"
			}
			if bk.db != nil {
				storeDelete(bk.db, r.ID, func(string) {})
			}
		}
	case "book-undo":
		if r := bk.deleted; r != nil {
			bk.kept = append(bk.kept, *r)
			sortKept(bk.kept)
			if bk.db != nil {
				storePut(bk.db, *r, func(string) {})
			}
			bk.deleted, bk.state.Undo = nil, ""
		}
	case "book-pick":
		if bk.state.Selected == nil {
			bk.state.Selected = map[string]bool{}
		}
		bk.state.Selected[a.Value] = !bk.state.Selected[a.Value]
	case "book-export":
		now := time.Now()
		download("fieldhead-sheets-"+now.Format("2006-01-02")+".txt", "text/plain;charset=utf-8", bk.sheetsFile(now))
	case "book-csv":
		us := a.Value == "us"
		download("fieldhead-results-"+map[bool]string{true: "us", false: "si"}[us]+"-"+time.Now().Format("2006-01-02")+".csv",
			"text/csv;charset=utf-8", bk.resultsTable(us))
	}
	return nil
}

// chosen are the sheets to export, newest first: those selected, or all
// when none is, each with its edit time (zero when not known).
func (bk *book) chosen() []scenario.KeptSheet {
	var out []scenario.KeptSheet
	for _, r := range bk.kept {
		if len(bk.state.Selected) == 0 || bk.state.Selected[r.ID] || noneSelected(bk) {
			if sc, err := scenario.Parse(r.Link); err == nil {
				out = append(out, scenario.KeptSheet{Scen: sc, Edited: editedTime(r.Edited)})
			}
		}
	}
	return out
}

// sheetsFile is the sheets file of the chosen sheets, exported at now.
func (bk *book) sheetsFile(now time.Time) string {
	kept := bk.chosen()
	note := "Fieldhead sheets · " + strconv.Itoa(len(kept)) + " · exported " + now.Format("2006-01-02 15:04") +
		" · one per line: title, a tab, the link, a tab, when it was last edited"
	return scenario.WriteKept(note, kept)
}

// resultsTable is the results table of the chosen sheets, in US customary
// units or SI (present.ResultsCSV): the same text `-eval` writes from
// their sheets file.
func (bk *book) resultsTable(us bool) string { return present.ResultsCSV(bk.chosen(), us) }

// editedTime is a record's edit time (ms since 1970), zero when not known.
func editedTime(ms float64) time.Time {
	if ms <= 0 {
		return time.Time{}
	}
	return time.UnixMilli(int64(ms)).UTC()
}

func noneSelected(bk *book) bool {
	for _, on := range bk.state.Selected {
		if on {
			return false
		}
	}
	return true
}

// sortKept puts the kept sheets newest first; those whose edit time is
// not known (0) last, in the order they came.
func sortKept(rs []record) {
	sort.SliceStable(rs, func(i, j int) bool { return rs[i].Edited > rs[j].Edited })
}

// importSheets adds the sheets of a sheets file: a sheet already kept
// (same link) is not added twice; bad lines are reported by number. Each
// keeps the edit time its line gives (not known, 0, on an older file's
// line), not the time of the import.
func (bk *book) importSheets(text string) {
	lines, bad := scenario.ReadSheets(text)
	added, same := 0, 0
	for _, l := range lines {
		dup := false
		for _, r := range bk.kept {
			if sameSheet(r.Link, l.Scen) {
				dup = true
				break
			}
		}
		if dup {
			same++
			continue
		}
		var edited float64
		if !l.Edited.IsZero() {
			edited = float64(l.Edited.UnixMilli())
		}
		r := record{ID: newID(), Title: strings.TrimSpace(l.Scen.Get("name")), Link: l.Scen.Sign(),
			Answer: present.Headline(l.Scen, scenario.Evaluate(scenario.Read(l.Scen))), Created: nowMs(), Edited: edited}
		bk.kept = append(bk.kept, r)
		if bk.db != nil {
			storePut(bk.db, r, func(problem string) {
				if problem != "" {
					bk.problem = problem
				}
			})
		}
		added++
	}
	sortKept(bk.kept)
	bk.state.Notice = present.ImportNotice(added, same, bad)
}

// blank reports whether a sheet holds nothing but its view and units.
func blank(sc scenario.Scenario) bool {
	c := sc.Clone()
	_ = c.Set("view", "")
	_ = c.Set("units", "")
	return c.Encode() == ""
}
