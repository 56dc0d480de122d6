package scenario

import (
	"strings"

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
