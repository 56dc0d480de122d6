package scenario

import (
	"fmt"
	"math"

	"fieldhead/calc"
)

// line reads the segments s1…sN into a calc.Line, or returns nil when there
// are none or one is bad (its errors are recorded). z2 is the elevation of
// point 2, where the last segment ends unless its sN.z says otherwise.
func (e *eval) line() *calc.Line {
	n := e.s.SegmentCount()
	if n == 0 {
		return nil
	}
	if e.s.Has("l") {
		e.bad("l", calc.Inconsistent).With("s1.l").Because(calc.ReasonRunOrSegments)
		return nil
	}
	ln := &calc.Line{}
	ok := true
	for i := 1; i <= n; i++ {
		pre := fmt.Sprintf("s%d.", i)
		if !e.s.Has(pre + "l") {
			e.bad(pre+"l", calc.Missing).Because(calc.ReasonSegmentGap)
			ok = false
			continue
		}
		spec, _, good := e.readRun(pre)
		seg := calc.Segment{Run: spec}
		zp := pre + "z"
		switch {
		case e.s.Has(zp):
			z, g := e.quantity(zp)
			good = good && g
			seg.EndZ = z
		case i == n && e.s.Has("z2"):
			z, g := e.quantity("z2")
			good = good && g
			seg.EndZ = z
		default:
			e.bad(zp, calc.Missing)
			good = false
		}
		ok = ok && good
		ln.Segments = append(ln.Segments, seg)
	}
	if !ok {
		return nil
	}
	if e.s.Has("z2") && e.s.Has(fmt.Sprintf("s%d.z", n)) {
		if z2, good := e.quantity("z2"); good && math.Abs(z2-ln.Segments[n-1].EndZ) > 0.01 {
			e.warnCalc("line", calc.Warn(SegmentParam(n, "z"), calc.CautionLastSegmentEnd, calc.Fig(ln.Segments[n-1].EndZ, calc.Length), calc.Fig(z2, calc.Length)))
		}
	}
	return ln
}
