package scenario

import (
	"fmt"
	"math"
	"strconv"
	"strings"
	"unicode"

	"fieldhead/calc"
)

// The data sheet of a pump is edited as a table, one row per point; the
// link holds it as lists (pq=0,20,40L/s).

// ListColumns are the list parameters of the data sheet, in table order.
var ListColumns = []string{"pq", "ph", "peff", "pnpsh"}

// The data sheet has from MinRows to MaxRows points.
const (
	MinRows = calc.PumpMinPoints
	MaxRows = calc.PumpMaxPoints
)

// Cells splits a list parameter's text into its values as typed and the
// unit written after the last one; a unit no picker lists stays in its
// cell.
func (s Scenario) Cells(param string) (cells []string, unit string) {
	text := strings.TrimSpace(s.Get(param))
	if text == "" {
		return nil, ""
	}
	sep := ","
	if strings.Contains(text, ";") {
		sep = ";"
	}
	cells = strings.Split(text, sep)
	for i := range cells {
		cells[i] = strings.TrimSpace(cells[i])
	}
	last := len(cells) - 1
	cells[last], unit = Boxed(param, cells[last])
	return cells, unit
}

// ListUnit is the unit of a data-sheet column: as written in the link,
// else the one picked, else the default.
func (d *Draft) ListUnit(param string) string {
	if _, u := d.Scen.Cells(param); u != "" {
		return u
	}
	if u := d.Unit[param]; u != "" {
		return u
	}
	return DefaultUnit(param, d.US())
}

// RowCount is the number of rows the data-sheet table shows.
func (d *Draft) RowCount() int {
	n := max(MinRows, d.Rows)
	for _, p := range ListColumns {
		cells, _ := d.Scen.Cells(p)
		n = max(n, len(cells))
	}
	return n
}

// padded returns a column's cells, n long.
func (d *Draft) padded(param string, n int) []string {
	cells, _ := d.Scen.Cells(param)
	for len(cells) < n {
		cells = append(cells, "")
	}
	return cells
}

// writeList stores a column's cells as the list: values joined by commas
// (semicolons when a value has a decimal comma), the unit after the last
// value; empty cells at the end are not part of it, and a column with no
// value leaves the link.
func (d *Draft) writeList(param string, cells []string, unit string) bool {
	end := len(cells)
	for end > 0 && strings.TrimSpace(cells[end-1]) == "" {
		end--
	}
	cells = cells[:end]
	sep := ","
	out := make([]string, len(cells))
	for i, c := range cells {
		out[i] = strings.TrimSpace(c)
		if strings.Contains(c, ",") {
			sep = ";"
		}
	}
	text := ""
	if len(out) > 0 {
		last := len(out) - 1
		if num, u := Split(out[last]); num != "" && u == "" {
			out[last] += unit
		}
		text = strings.Join(out, sep)
	}
	return d.set(param, text)
}

// SetCell writes text into row (0-based) of a data-sheet column and
// reports whether the scenario changed. The rows shown stay while the
// lists change.
func (d *Draft) SetCell(param string, row int, text string) bool {
	d.endEdit()
	unit := d.ListUnit(param)
	d.Rows = d.RowCount()
	if row < 0 || row >= d.Rows {
		return false
	}
	cells := d.padded(param, d.Rows)
	cells[row] = text
	return d.writeList(param, cells, unit)
}

// SetListUnit sets the unit of a data-sheet column.
func (d *Draft) SetListUnit(param, unit string) {
	d.endEdit()
	if d.Unit == nil {
		d.Unit = map[string]string{}
	}
	d.Unit[param] = unit
	if cells, _ := d.Scen.Cells(param); len(cells) > 0 {
		d.writeList(param, cells, unit)
	}
}

// AddRow shows one more data-sheet row, up to MaxRows.
func (d *Draft) AddRow() {
	d.endEdit()
	if n := d.RowCount(); n < MaxRows {
		d.Rows = n + 1
	}
}

// RemoveRow removes row (0-based) from every column, down to MinRows rows.
func (d *Draft) RemoveRow(row int) {
	d.endEdit()
	n := d.RowCount()
	if n <= MinRows || row < 0 || row >= n {
		return
	}
	for _, p := range ListColumns {
		if !d.Scen.Has(p) {
			continue
		}
		unit := d.ListUnit(p)
		cells := d.padded(p, n)
		d.writeList(p, append(cells[:row], cells[row+1:]...), unit)
	}
	d.Rows = n - 1
}

// SurveyPoint is one row of a pasted survey: a chainage and an elevation,
// as typed, in the units the header row names for their columns (ChainUnit,
// ElevUnit: a length unit's symbol) or, where it names none, in the sheet's
// length unit ("").
type SurveyPoint struct {
	Line                int // 1-based line of the pasted text
	Chainage, Elevation float64
	ChainText, ElevText string
	ChainUnit, ElevUnit string
}

// headerUnit is the length unit a header cell names ("Chainage (ft)",
// "Level [m]", "elevation in ft", "km"): the last of its lengthWords,
// inside brackets if there are any; "" when it names none.
func headerUnit(cell string) string {
	if i := strings.IndexAny(cell, "(["); i >= 0 {
		cell = cell[i+1:]
	}
	us := lengthWords(cell)
	if len(us) == 0 {
		return ""
	}
	return us[len(us)-1]
}

// lengthWords are the words of text that are length units, as symbols.
func lengthWords(text string) []string {
	var us []string
	for _, w := range strings.FieldsFunc(text, func(r rune) bool { return unicode.IsSpace(r) || strings.ContainsRune("()[],;:", r) }) {
		if u, err := calc.LookupUnit(w); err == nil && u.Dim == calc.Length {
			us = append(us, u.Symbol)
		}
	}
	return us
}

// ParseSurvey reads a table of chainage and elevation as a spreadsheet
// copies it: one point a line, the two columns separated by a tab, a
// semicolon or a comma (the first of these the text holds, in that order;
// spaces when it holds none), further columns ignored. Where the
// separator is not a comma a decimal comma is read as a point. A first row
// that is not numbers is a header: the length units its two cells name are
// those of the columns (see headerUnit), and it is skipped; blank lines are
// skipped.
// Each other row that cannot be used is a problem naming its line: a cell
// that is not a number, a missing elevation, a chainage not beyond the
// previous point's. The good rows are returned.
func ParseSurvey(text string) (pts []SurveyPoint, problems []string) {
	lines := strings.Split(strings.ReplaceAll(text, "\r\n", "\n"), "\n")
	sep := ""
	for _, s := range []string{"\t", ";", ","} {
		if strings.Contains(text, s) {
			sep = s
			break
		}
	}
	cells := func(l string) []string {
		if sep == "" {
			return strings.Fields(l)
		}
		return strings.Split(l, sep)
	}
	num := func(c string) (float64, string, bool) {
		c = strings.TrimSpace(strings.ReplaceAll(c, "−", "-"))
		if sep != "," {
			c = strings.ReplaceAll(c, ",", ".")
		}
		v, err := strconv.ParseFloat(c, 64)
		return v, c, err == nil && !math.IsInf(v, 0) && !math.IsNaN(v) && math.Abs(v) < 1e7
	}
	first := true
	var cu, eu string // the header's units
	for i, l := range lines {
		if strings.TrimSpace(l) == "" {
			continue
		}
		cs := cells(l)
		header := first
		first = false
		if len(cs) < 2 || strings.TrimSpace(cs[1]) == "" {
			if header {
				continue
			}
			problems = append(problems, fmt.Sprintf("line %d: %q has no elevation; give chainage and elevation", i+1, strings.TrimSpace(l)))
			continue
		}
		c, ct, okc := num(cs[0])
		z, zt, okz := num(cs[1])
		switch {
		case header && !okc && !okz && sep != "":
			cu, eu = headerUnit(cs[0]), headerUnit(cs[1])
			continue
		case header && !okc && !okz:
			// Spaces part the columns and the words alike: one unit named
			// is both columns', two are each column's, more cannot be told apart.
			switch us := lengthWords(l); len(us) {
			case 0:
			case 1:
				cu, eu = us[0], us[0]
			case 2:
				cu, eu = us[0], us[1]
			default:
				problems = append(problems, fmt.Sprintf("line %d: the header names the units %s and cannot be read column by column; the figures are taken in the sheet's length unit",
					i+1, strings.Join(us, ", ")))
			}
			continue
		case !okc:
			problems = append(problems, fmt.Sprintf("line %d: the chainage %q is not a number", i+1, strings.TrimSpace(cs[0])))
			continue
		case !okz:
			problems = append(problems, fmt.Sprintf("line %d: the elevation %q is not a number", i+1, strings.TrimSpace(cs[1])))
			continue
		case len(pts) > 0 && c <= pts[len(pts)-1].Chainage:
			problems = append(problems, fmt.Sprintf("line %d: the chainage %s is not beyond the previous point's (%s); the points go from point 1 towards point 2",
				i+1, ct, pts[len(pts)-1].ChainText))
			continue
		}
		pts = append(pts, SurveyPoint{Line: i + 1, Chainage: c, Elevation: z, ChainText: ct, ElevText: zt, ChainUnit: cu, ElevUnit: eu})
	}
	return pts, problems
}

// PasteProfile makes the line's segments from a pasted survey table (see
// ParseSurvey): each pair of consecutive good points is a segment whose
// end elevation is the second point's and whose length is the slope
// length between them, sqrt(Δchainage² + Δelevation²), since a surveyor's
// chainage is measured on the horizontal and friction goes with the length
// of pipe laid. Figures are in the sheet's length unit, or in the units the
// survey's header row names: lengths then in the chainage column's unit,
// elevations in the elevation column's, to the millimetre (a note says
// which units were read).
//
// Segment k of the sheet takes the k-th run of the survey: its length and
// end elevation change, its pipe, wall, fittings and components stay. New
// segments take the pipe and wall of the sheet's last segment (as Add a
// segment does); a sheet with a single run makes it segment 1 first. The
// fittings that belong at the line's end (the exit, see lineEnd) leave the
// sheet's last segment for the survey's last, so no exit is left mid-line;
// those of the line's start stay on segment 1. A sheet with more segments
// than the survey keeps the further ones as they are (a note says so).
// Point 1's elevation is set from the first point when the sheet has none;
// one already given is kept (it may be a water surface) and a note says
// so. When segments lack a pipe, GivePipe gives them segment 1's.
//
// It reports whether the scenario changed. SurveyMade says what was made
// (how many segments, which were new, which fittings moved); SurveyNotes
// holds the problems and notes; Survey keeps the pasted text while a row
// could not be used, so nothing pasted is lost. A survey of fewer than two
// good points, or of more than MaxSegments+1, changes nothing.
func (d *Draft) PasteProfile(text string) bool {
	d.endEdit()
	pts, notes := ParseSurvey(text)
	d.Survey, d.SurveyNotes, d.SurveyMade = text, notes, ""
	switch {
	case len(pts) < 2:
		d.SurveyNotes = append(d.SurveyNotes, "a profile needs at least two points (rows of chainage and elevation); nothing was changed")
		return false
	case len(pts)-1 > MaxSegments:
		d.SurveyNotes = append(d.SurveyNotes, fmt.Sprintf("a line has at most %d segments (%d points); this table has %d points: split the survey or merge short runs; nothing was changed",
			MaxSegments, MaxSegments+1, len(pts)))
		return false
	}
	if d.ShownSegments() == 0 && d.Scen.Has("l") {
		d.AddSegment()
	}
	lu, zu := DefaultUnit("l", d.US()), DefaultUnit("z1", d.US())
	if u := pts[0].ChainUnit; u != "" && u != lu {
		lu = u
		d.SurveyNotes = append(d.SurveyNotes, "the header gives the chainage in "+u+": lengths are written in "+u)
	}
	if u := pts[0].ElevUnit; u != "" && u != zu {
		zu = u
		d.SurveyNotes = append(d.SurveyNotes, "the header gives the elevation in "+u+": elevations are written in "+u)
	}
	// The elevation difference in the chainage's unit (a ratio of exactly
	// 1 when the units are the same), and the millimetre in that unit.
	ratio, mm := 1.0, 1000.0
	lunit, errl := calc.LookupUnit(lu)
	zunit, errz := calc.LookupUnit(zu)
	if errl == nil && errz == nil && lunit.Factor > 0 && zunit.Factor > 0 { // always, for units LookupUnit named
		ratio, mm = zunit.Factor/lunit.Factor, math.Pow(10, 3+math.Ceil(math.Log10(lunit.Factor)))
	}
	before := d.Scen.Encode()
	n := len(pts) - 1
	had := d.Scen.SegmentCount()
	for d.ShownSegments() < n {
		d.AddSegment()
	}
	moved := d.moveEndFittings(had, n)
	for k := 1; k <= n; k++ {
		a, b := pts[k-1], pts[k]
		dc, dz := b.Chainage-a.Chainage, (b.Elevation-a.Elevation)*ratio
		l := math.Round(math.Hypot(dc, dz)*mm) / mm
		d.set(SegmentParam(k, "l"), strconv.FormatFloat(l, 'f', -1, 64)+lu)
		d.set(SegmentParam(k, "z"), b.ElevText+zu)
	}
	if !d.Scen.Has("z1") {
		d.set("z1", pts[0].ElevText+zu)
	} else if !sameValue(d.Scen.Get("z1"), pts[0].Elevation, zu) {
		d.SurveyNotes = append(d.SurveyNotes, "point 1's elevation is kept as given ("+d.Scen.Get("z1")+"); the first segment starts there, not at the survey's first point ("+pts[0].ElevText+" "+zu+")")
	}
	if extra := d.ShownSegments() - n; extra > 0 {
		d.SurveyNotes = append(d.SurveyNotes, fmt.Sprintf("segments %d to %d are kept as they were; remove them if the survey replaces them", n+1, n+extra))
	}
	d.SurveyMade = d.madeLine(len(pts), had, n, moved)
	if len(notes) == 0 {
		d.Survey = ""
	}
	return d.Scen.Encode() != before
}

// lineEnd says where a fitting belongs on a line: −1 at its start (an
// entrance from the source, a foot valve on the suction's inlet), +1 at
// its end (the exit into a reservoir), 0 anywhere (common practice: an
// entrance and a foot valve are where the line leaves its source, the
// exit loss where it enters the receiving tank).
func lineEnd(key string) int {
	switch key {
	case "entry_sharp", "entry_round", "entry_reentrant", "foot", "foot_hinged":
		return -1
	case "exit":
		return +1
	}
	return 0
}

// moveEndFittings moves the fittings of the line's end from segment from
// (the sheet's last before a paste) to segment to (the survey's last),
// adding them to any it has; it returns those moved, worded ("1 exit").
// A fitting list that cannot be read stays as it is (its box says why).
func (d *Draft) moveEndFittings(from, to int) []string {
	if from < 1 || to <= from {
		return nil
	}
	src, dst := SegmentParam(from, "fit"), SegmentParam(to, "fit")
	list, err := ParseFittings(d.Scen.Get(src))
	there, err2 := ParseFittings(d.Scen.Get(dst))
	if err != nil || err2 != nil {
		return nil
	}
	var keep []calc.FittingCount
	var moved []string
	for _, f := range list {
		if lineEnd(f.Key) <= 0 {
			keep = append(keep, f)
			continue
		}
		there = append(there, f)
		moved = append(moved, fmt.Sprintf("%d %s", f.Count, f.Key))
	}
	if len(moved) > 0 {
		d.set(src, FormatFittings(keep))
		d.set(dst, FormatFittings(there))
	}
	return moved
}

// madeLine says what a paste of points points made of a sheet that had
// segments before it: the segments set and added, and the line-end
// fittings moved to segment n, the last. What still lacks a pipe is
// PipeStatus, worked out anew on each edit.
func (d *Draft) madeLine(points, had, n int, moved []string) string {
	s := fmt.Sprintf("Made %s from the survey's %d points", plural(n, "segment"), points)
	kept := min(had, n)
	if kept > 0 {
		s += fmt.Sprintf(": %s took new lengths and ends, keeping %s pipe and fittings", span(1, kept), its(kept))
	}
	if kept < n {
		sep := ", "
		if kept > 0 {
			sep = "; "
		}
		s += sep + span(kept+1, n) + is(n-kept) + " new"
		if kept > 0 && d.HasPipe(kept) {
			s += fmt.Sprintf(", with the pipe of segment %d", kept)
		}
	}
	s += "."
	if len(moved) > 0 {
		s += fmt.Sprintf(" The line's end fittings (%s) moved from segment %d to segment %d, the last.", strings.Join(moved, ", "), had, n)
	}
	return s
}

// PipeStatus says, while a paste or GivePipe has left its line
// (SurveyMade), how many segments still have no pipe and what completes
// them; "" when every segment has one or nothing was pasted. It is worked
// out from the sheet as it is now, so an edit after the paste shows.
func (d *Draft) PipeStatus() string {
	if d.SurveyMade == "" {
		return ""
	}
	without := len(d.WithoutPipe())
	if !d.complete(1) {
		without++
	}
	if without == 0 {
		return ""
	}
	s := plural(without, "segment") + " have no pipe yet"
	if without == 1 {
		s = "1 segment has no pipe yet"
	}
	if d.HasPipe(1) {
		return s + ": “Give segment 1's pipe to the others” completes them."
	}
	return s + ": give segment 1 its pipe, then “Give segment 1's pipe to the others”."
}

// plural is "1 segment" or "11 segments".
func plural(n int, what string) string {
	if n == 1 {
		return "1 " + what
	}
	return strconv.Itoa(n) + " " + what + "s"
}

// span is "segment 3" or "segments 3 to 11".
func span(a, b int) string {
	if a == b {
		return "segment " + strconv.Itoa(a)
	}
	return "segments " + strconv.Itoa(a) + " to " + strconv.Itoa(b)
}

func its(n int) string {
	if n == 1 {
		return "its"
	}
	return "their"
}

func is(n int) string {
	if n == 1 {
		return " is"
	}
	return " are"
}

// pipeFields and wallFields are a segment's either/or groups of its pipe
// (a bore, or a nominal size and schedule) and of its wall (a material or
// a roughness).
var pipeFields, wallFields = []string{"d", "nps", "sch"}, []string{"mat", "eps"}

// given reports whether segment n holds any of fields.
func (d *Draft) given(n int, fields []string) bool {
	for _, f := range fields {
		if d.Scen.Has(SegmentParam(n, f)) {
			return true
		}
	}
	return false
}

// HasPipe reports whether segment n has a pipe (a bore or a nominal size)
// or a wall (a material or a roughness) to give.
func (d *Draft) HasPipe(n int) bool { return d.given(n, pipeFields) || d.given(n, wallFields) }

// complete reports whether segment n has both a pipe and a wall.
func (d *Draft) complete(n int) bool { return d.given(n, pipeFields) && d.given(n, wallFields) }

// WithoutPipe lists the segments after the first that lack a pipe or a
// wall: those GivePipe would complete.
func (d *Draft) WithoutPipe() []int {
	var out []int
	for k := 2; k <= d.ShownSegments(); k++ {
		if !d.complete(k) {
			out = append(out, k)
		}
	}
	return out
}

// GivePipe gives segment 1's pipe (bore, or nominal size and schedule)
// to every later segment that has none, and its wall (material or
// roughness) to every later segment that has none, with the sides picked;
// a pipe or wall already given is never replaced. It returns the segments
// completed, and says so in SurveyMade.
func (d *Draft) GivePipe() []int {
	d.endEdit()
	var done []int
	if !d.HasPipe(1) {
		return nil
	}
	for _, k := range d.WithoutPipe() {
		changed := false
		for _, g := range []struct {
			name   string
			fields []string
		}{{"pipe", pipeFields}, {"rough", wallFields}} {
			if d.given(k, g.fields) || !d.given(1, g.fields) {
				continue
			}
			for _, f := range g.fields {
				changed = d.set(SegmentParam(k, f), d.Scen.Get(SegmentParam(1, f))) || changed
			}
			if side := d.Side[SegmentParam(1, g.name)]; side != "" {
				d.Side[SegmentParam(k, g.name)] = side
			}
		}
		if changed {
			done = append(done, k)
		}
	}
	if len(done) > 0 {
		d.SurveyMade = fmt.Sprintf("Segment 1's pipe given to %s without one.", plural(len(done), "segment"))
	}
	return done
}

// sameValue reports whether text ("212.0m", "212") is the value v in unit
// u (a number without a unit is taken in u).
func sameValue(text string, v float64, u string) bool {
	num, unit := Split(text)
	x, err := strconv.ParseFloat(strings.ReplaceAll(num, ",", "."), 64)
	return err == nil && (unit == "" || unit == u) && x == v
}
