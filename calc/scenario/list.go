package scenario

import "fieldhead/calc"

// list is a needed list parameter's values in SI (pq=0,20,40,55,70L/s, as
// Read made them). An absent one is an error that asks for it; a Bad
// one's problem is already recorded.
func (e *eval) list(param string) ([]float64, bool) {
	v, ok := e.in.vals[param]
	if !ok {
		e.bad(param, calc.Missing)
		return nil, false
	}
	return v.List, !v.Bad
}
