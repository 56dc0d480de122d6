package scenario

import "fieldhead/calc"

// A gather reads the inputs of one evaluator and keeps the problems it
// meets, so that the evaluator reads all it needs and then asks once,
// with failed, whether it can go on. A needed input that is absent is a
// problem recorded here; one in error was recorded by Read, and only
// marks the gathering failed. An evaluator returns its problems with its
// result, and Evaluate adds them to Result.Errors.
type gather struct {
	in     *Inputs
	ps     problems // nil until the first problem
	broken bool
}

// gather starts the gathering of one evaluator's inputs.
func (e *eval) gather() gather { return gather{in: e.in} }

// failed reports whether an input read was absent or unusable, or a
// problem was recorded.
func (g *gather) failed() bool { return g.broken }

// problems are the problems recorded, nil when none was.
func (g *gather) problems() problems { return g.ps }

// fail marks the gathering failed for a problem reported elsewhere (by
// Read, or by the evaluator of an input this one needs).
func (g *gather) fail() { g.broken = true }

// record keeps fe (the first problem of its field) and fails.
func (g *gather) record(fe *calc.FieldError) {
	g.broken = true
	if g.ps == nil {
		g.ps = problems{}
	}
	g.ps.record(fe)
}

// bad records a problem of kind k with param and returns it for its data
// to be added.
func (g *gather) bad(param string, k calc.Kind) *calc.FieldError {
	fe := calc.NewFieldError(param, k)
	g.record(fe)
	return fe
}

// failAt records err under param (see problemAt).
func (g *gather) failAt(param string, err error) { g.record(problemAt(param, err)) }

// failErr records err under the parameter it concerns (see problemOf).
func (g *gather) failErr(param string, err error) { g.record(problemOf(param, err)) }

// quantity is a needed parameter's value in SI (or a plain number's). An
// absent one is a problem that asks for it; a Bad one fails.
func (g *gather) quantity(param string) float64 {
	v, ok := g.in.vals[param]
	if !ok {
		g.bad(param, calc.Missing)
		return 0
	}
	if v.Bad {
		g.fail()
	}
	return v.SI
}

// optional is an optional parameter's value: 0 when absent; a Bad one
// fails.
func (g *gather) optional(param string) float64 { return g.value(param).SI }

// value is an optional parameter as read: the zero Value when absent; a
// Bad one fails.
func (g *gather) value(param string) Value {
	v := g.in.vals[param]
	if v.Bad {
		g.fail()
	}
	return v
}

// list is a needed list parameter's values in SI (pq=0,20,40,55,70L/s, as
// Read made them). An absent one is a problem that asks for it; a Bad one
// fails.
func (g *gather) list(param string) []float64 {
	v, ok := g.in.vals[param]
	if !ok {
		g.bad(param, calc.Missing)
		return nil
	}
	if v.Bad {
		g.fail()
	}
	return v.List
}

// report adds an evaluator's problems to Result.Errors, keeping a
// problem recorded earlier for the same parameter.
func (e *eval) report(ps problems) {
	for k, fe := range ps {
		if _, ok := e.res.Errors[k]; !ok {
			e.res.Errors[k] = fe
		}
	}
}
