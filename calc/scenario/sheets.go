package scenario

import (
	"fmt"
	"strings"
	"time"
	"unicode/utf8"
)

// The sheets file: sheets kept on a device, exported to one text file a
// person can read and any machine can import. Its format, Fieldhead's own:
//
//	# Fieldhead sheets · 3 sheets · exported 2026-12-02 14:05
//	Alder Flats BS-3, wet well to Crest reservoir	view=balance&units=si&name=…&ck=1a2b3c4d	edited 2026-12-01T09:40:12Z
//	Larkspur Hollow spring box to turbine	view=pump&units=si&name=…	edited 2026-11-28T16:02:55Z
//
// One sheet per line: its title, a tab, its link — the query string, or a
// whole share link (https://…/?…) from which the query is taken — and,
// since the edit time is kept, a tab and "edited " with the time the sheet
// was last edited (RFC 3339, UTC, whole seconds). Older files have no edit
// time: a line of title and link, or a line without a tab, which is a link
// alone; both keep reading, with the edit time not known. Fields after the
// third are left for later forms and skipped. Lines that start with # and hold no
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
	// Edited is when the sheet was last edited, UTC; zero when the line
	// does not say (an older file) or says it in a form not understood.
	Edited time.Time
	Err    error // what was wrong with a link read only in part (nil when whole), worded by present
}

// KeptSheet is a sheet to write to a sheets file: its scenario and when it
// was last edited (zero: not known, and not written).
type KeptSheet struct {
	Scen   Scenario
	Edited time.Time
}

// editedPrefix starts a line's edit-time field.
const editedPrefix = "edited "

// editedLayout is the edit time's form in a sheets file: RFC 3339 in UTC,
// to the second.
const editedLayout = "2006-01-02T15:04:05Z"

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
		fields := strings.Split(line, "\t")
		title, link := "", line
		var edited time.Time
		if len(fields) > 1 {
			title, link = fields[0], fields[1]
		}
		if len(fields) > 2 {
			edited = readEdited(fields[2])
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
		sl := SheetLine{Line: n, Title: strings.TrimSpace(title), Scen: sc, Edited: edited}
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

// readEdited reads a line's edit-time field; zero when it is not one.
func readEdited(f string) time.Time {
	v, ok := strings.CutPrefix(strings.TrimSpace(f), editedPrefix)
	if !ok {
		return time.Time{}
	}
	t, ok := parseRFC3339(strings.TrimSpace(v))
	if !ok {
		return time.Time{}
	}
	return t.UTC()
}

// WriteSheets writes sheets as a sheets file, after a first note line,
// without edit times.
func WriteSheets(note string, sheets []Scenario) string {
	kept := make([]KeptSheet, len(sheets))
	for i, s := range sheets {
		kept[i].Scen = s
	}
	return WriteKept(note, kept)
}

// WriteKept writes sheets as a sheets file, after a first note line, each
// with its edit time when known.
func WriteKept(note string, sheets []KeptSheet) string {
	var b strings.Builder
	if note != "" {
		b.WriteString("# " + oneLine(note) + "\n")
	}
	for _, k := range sheets {
		s := k.Scen
		b.WriteString(oneLine(strings.TrimSpace(s.Get("name"))) + "\t" + s.Sign()) // an untitled sheet's line starts with the tab
		if !k.Edited.IsZero() {
			b.WriteString("\t" + editedPrefix + EditedText(k.Edited))
		}
		b.WriteString("\n")
	}
	return b.String()
}

// EditedText writes an edit time as a sheets file does: RFC 3339, UTC, to
// the second.
func EditedText(t time.Time) string { return t.UTC().Format(editedLayout) }

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
