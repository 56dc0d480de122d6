package scenario

import (
	"fmt"
	"strings"
	"unicode/utf8"
)

// The sheets file: sheets kept on a device, exported to one text file a
// person can read and any machine can import. Its format, Fieldhead's own:
//
//	# Fieldhead sheets · 3 sheets · exported 2026-12-02 14:05
//	Alder Flats BS-3, wet well to Crest reservoir	view=balance&units=si&name=…&ck=1a2b3c4d
//	Larkspur Hollow spring box to turbine	view=pump&units=si&name=…
//
// One sheet per line: its title, a tab, and its link — the query string,
// or a whole share link (https://…/?…) from which the query is taken. A
// line without a tab is a link alone. Lines that start with # and hold no
// tab are notes (a sheet's line always holds one, so a title may start
// with #), and blank lines are skipped. The title is for the reader: the sheet's
// own title is the name parameter of its link (a link without one takes
// the line's title). Text is UTF-8; a title
// holds no tab (a link cannot hold one either).

// SheetLine is one sheet of a sheets file.
type SheetLine struct {
	Line  int    // 1-based line number in the file
	Title string // the title written before the tab
	Scen  Scenario
	Err   error // what was wrong with a link read only in part (nil when whole), worded by present
}

// LineError is a line of a sheets file that could not be read at all:
// Err is a *LinkError (LinkNone, LinkEmpty) or what Parse returned.
type LineError struct {
	Line int
	Err  error
}

func (e LineError) Error() string { return fmt.Sprintf("line %d: %v", e.Line, e.Err) }

// ReadSheets reads a sheets file. Every line that holds a usable link is
// returned (with Err saying what of it was not understood); every line
// that holds none is reported by its number, and the others are read all
// the same.
func ReadSheets(text string) ([]SheetLine, []LineError) {
	var out []SheetLine
	var bad []LineError
	for i, line := range strings.Split(strings.ReplaceAll(text, "\r\n", "\n"), "\n") {
		n := i + 1
		line = strings.TrimRight(line, "\r")
		if t := strings.TrimSpace(line); t == "" || strings.HasPrefix(t, "#") && !strings.Contains(line, "\t") {
			continue
		}
		title, link, hasTab := strings.Cut(line, "\t")
		if !hasTab {
			title, link = "", line
		}
		q := QueryOf(link)
		if q == "" {
			bad = append(bad, LineError{n, &LinkError{Kind: LinkNone}})
			continue
		}
		sc, err := Parse(q)
		if sc.Encode() == "" {
			if err == nil {
				err = &LinkError{Kind: LinkEmpty}
			}
			bad = append(bad, LineError{n, err})
			continue
		}
		sl := SheetLine{Line: n, Title: strings.TrimSpace(title), Scen: sc}
		if !sc.Has("name") && sl.Title != "" && utf8.ValidString(sl.Title) && printable(sl.Title) {
			_ = sl.Scen.Set("name", sl.Title)          // a link without a title takes the line's
			if len(sl.Scen.Encode()) > MaxQueryBytes { // unless the link could then not be shared
				_ = sl.Scen.Set("name", "")
			}
		}
		sl.Err = err
		out = append(out, sl)
	}
	return out, bad
}

// QueryOf takes the query string out of a share link, a bare query or a
// link whose "&" a mail program wrote as "&amp;".
func QueryOf(link string) string {
	link = strings.TrimSpace(link)
	if i := strings.IndexByte(link, '?'); i >= 0 && (strings.Contains(link[:i], "/") || strings.Contains(link[:i], ":") || i == 0) {
		link = link[i+1:]
	}
	if i := strings.IndexByte(link, '#'); i >= 0 {
		link = link[:i]
	}
	return strings.ReplaceAll(link, "&amp;", "&")
}

// WriteSheets writes sheets as a sheets file, after a first note line.
func WriteSheets(note string, sheets []Scenario) string {
	var b strings.Builder
	if note != "" {
		b.WriteString("# " + oneLine(note) + "\n")
	}
	for _, s := range sheets {
		b.WriteString(oneLine(strings.TrimSpace(s.Get("name"))) + "\t" + s.Sign() + "\n") // an untitled sheet's line starts with the tab
	}
	return b.String()
}

// oneLine writes tabs and line breaks as spaces: a note or a title is one
// field of one line.
func oneLine(s string) string {
	return strings.Map(func(r rune) rune {
		if r == '\t' || r == '\n' || r == '\r' {
			return ' '
		}
		return r
	}, s)
}
