package scenario

import (
	"strings"

	"fieldhead/calc"
)

// list parses a list parameter such as pq=0,20,40,55,70L/s: values
// separated by commas (or by semicolons, when decimals are written with a
// comma), one unit after the last value for the whole list, or a unit on
// each value. It returns nil and records the error when the list is bad.
func (e *eval) list(param string) ([]float64, bool) {
	text := strings.TrimSpace(e.s.Get(param))
	if text == "" {
		e.bad(param, calc.Missing)
		return nil, false
	}
	sep := ","
	if strings.Contains(text, ";") {
		sep = ";"
	}
	items := strings.Split(text, sep)
	_, unit := Split(items[len(items)-1])
	dim, _ := DimensionOf(param)
	out := make([]float64, 0, len(items))
	for i, it := range items {
		it = strings.TrimSpace(it)
		if it == "" {
			e.bad(param, calc.Missing).At(i + 1)
			return nil, false
		}
		if _, u := Split(it); u == "" {
			it += unit
		}
		v, err := calc.Parse(param, it, dim, DefaultUnit(param, e.us))
		if err != nil {
			e.failErr(param, atItem(err, i+1))
			return nil, false
		}
		out = append(out, v)
	}
	return out, true
}
