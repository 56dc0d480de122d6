package scenario

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"fieldhead/calc"
)

// line reads the segments s1…sN into a calc.Line, or returns nil when there
// are none or one is bad (its problems are returned). z2 is the elevation of
// point 2, where the last segment ends unless its sN.z says otherwise.
func (e *eval) line() (*calc.Line, problems) {
	n := e.in.Segments
	if n == 0 {
		return nil, nil
	}
	g := e.gather()
	if e.has("l") {
		g.bad("l", calc.Inconsistent).With("s1.l").Because(calc.ReasonRunOrSegments)
		return nil, g.problems()
	}
	if e.in.Bad("loop") {
		return nil, nil // Read reported it: open or closed decides the levels
	}
	ln := &calc.Line{}
	// A closed loop ends where it starts; a segment whose end is not
	// given is level with the one before.
	loop := e.isLoop()
	prevZ := 0.0
	if loop {
		prevZ = e.loopStartZ(&g)
	}
	startZ := prevZ
	for i := 1; i <= n; i++ {
		pre := fmt.Sprintf("s%d.", i)
		if !e.has(pre + "l") {
			g.bad(pre+"l", calc.Missing).Because(calc.ReasonSegmentGap)
			continue
		}
		spec, _ := e.readRun(&g, pre)
		seg := calc.Segment{Run: spec}
		seg.Components = g.value(pre + "cmp").Components
		zp := pre + "z"
		switch {
		case loop && i == n:
			seg.EndZ = startZ
			if z, typed := e.in.Value(zp); typed && math.Abs(z.SI-startZ) > 0.01 {
				e.warnCalc("line", calc.Warn(zp, calc.CautionLastSegmentEnd, calc.Fig(z.SI, calc.Length), calc.Fig(startZ, calc.Length)))
			}
		case loop && !e.has(zp):
			seg.EndZ = prevZ
		case e.has(zp):
			seg.EndZ = g.quantity(zp)
		case i == n && e.has("z2"):
			seg.EndZ = g.quantity("z2")
		default:
			g.bad(zp, calc.Missing)
		}
		prevZ = seg.EndZ
		ln.Segments = append(ln.Segments, seg)
	}
	if g.failed() {
		return nil, g.problems()
	}
	if !loop && e.has("z2") && e.has(SegmentParam(n, "z")) {
		if z2, ok := e.in.Value("z2"); ok && math.Abs(z2.SI-ln.Segments[n-1].EndZ) > 0.01 {
			e.warnCalc("line", calc.Warn(SegmentParam(n, "z"), calc.CautionLastSegmentEnd, calc.Fig(ln.Segments[n-1].EndZ, calc.Length), calc.Fig(z2.SI, calc.Length)))
		}
	}
	return ln, nil
}

// componentNameMax bounds a component's name, in characters.
const componentNameMax = 40

// ParseComponents reads a segment's components (sN.cmp): items separated
// by commas, each name:spec, where name is the component's name as the
// budget shows it (any text without , : or @) and spec is
//
//   - drop@flow: a drop at a rated flow, scaling with the flow squared;
//     the drop a pressure (45kPa, 6.5psi, 0.3bar) or a head of the flowing
//     liquid (3.2m, 10ft), the flow with its unit (12L/s, 190gpm);
//   - cvN or kvN: a control valve by its flow coefficient at its present
//     opening, Cv in US gal/min at 1 psi or Kv in m³/h at 1 bar (cv25,
//     kv40), followed, space separated, by its data sheet's liquid
//     pressure recovery factor flN and incipient-cavitation factor xfzN
//     when known (kv40 fl0.9 xfz0.45), each above 0 and at most 1, for
//     the IEC 60534-2-1 check.
//
// "chiller:45kPa@12L/s,coil:3.2m@12L/s,valve:kv40" is a chiller, a coil
// and a control valve. Units are required. A comma between two digits is a
// decimal comma, as in every other box ("valve:kv43,2 fl0,9" is Kv 43.2
// and FL 0.9): no item can start with a digit where a name is expected,
// since an item is name:spec and the part after such a comma holds no ":".
// Errors are *calc.FieldError for field "cmp" naming the item.
func ParseComponents(text string) ([]calc.Component, error) {
	var out []calc.Component
	// bad reports the text of component name that could not be read.
	bad := func(k calc.Kind, r calc.Reason, name, text string) error {
		return calc.NewFieldError("cmp", k).Typed(name + ":" + text).Because(r)
	}
	for _, item := range splitComponents(text) {
		item = strings.TrimSpace(item)
		if item == "" {
			continue
		}
		name, spec, ok := strings.Cut(item, ":")
		name, spec = strings.TrimSpace(name), strings.TrimSpace(spec)
		if !ok || name == "" || strings.Contains(name, "@") {
			return nil, calc.NewFieldError("cmp", calc.UnknownChoice).Typed(item).Because(calc.ReasonComponentSyntax)
		}
		if len([]rune(name)) > componentNameMax {
			return nil, calc.NewFieldError("cmp", calc.AboveLimit).Typed(name).AtMost(calc.Num(componentNameMax)).Because(calc.ReasonComponentName)
		}
		c := calc.Component{Name: name}
		low := strings.ToLower(spec)
		switch {
		case strings.HasPrefix(low, "cv") || strings.HasPrefix(low, "kv"):
			// The coefficient, then the data sheet's factors if given:
			// "kv40 fl0.9 xfz0.45" (an older link's bare "kv40" reads the same).
			words := strings.Fields(spec[2:])
			if len(words) == 0 {
				return nil, bad(calc.NotANumber, calc.ReasonValveNumber, name, spec)
			}
			v, err := strconv.ParseFloat(words[0], 64)
			if err != nil {
				return nil, bad(calc.NotANumber, calc.ReasonValveNumber, name, spec)
			}
			c.Kind, c.Kv = calc.ComponentValve, v
			if low[0] == 'c' {
				c.Kv = calc.KvFromCv(v)
			}
			for _, w := range words[1:] {
				lw := strings.ToLower(w)
				var dst *float64
				var num, field string
				switch {
				case strings.HasPrefix(lw, "xfz"):
					dst, num, field = &c.XFz, w[3:], "xfz"
				case strings.HasPrefix(lw, "fl"):
					dst, num, field = &c.FL, w[2:], "fl"
				default:
					return nil, bad(calc.UnknownChoice, calc.ReasonComponentSpec, name, spec)
				}
				// The factor's own name goes with the error (Other), so
				// the words say which one could not be read.
				f, err := strconv.ParseFloat(strings.TrimPrefix(num, "="), 64)
				if err != nil || math.IsNaN(f) || math.IsInf(f, 0) {
					return nil, calc.NewFieldError("cmp", calc.NotANumber).Typed(name + ":" + w).Because(calc.ReasonValveNumber).With(field)
				}
				if *dst != 0 {
					// Typed twice: neither is taken over the other.
					return nil, calc.NewFieldError("cmp", calc.Inconsistent).Typed(name + ":" + spec).Because(calc.ReasonValveFactorTwice).With(field)
				}
				if !(f > 0 && f <= 1) {
					return nil, calc.NewFieldError("cmp", calc.OutOfRange).Typed(name+":"+w).Got(calc.Num(f)).Within(calc.Num(0), calc.Num(1)).Because(calc.ReasonValveFactor).With(field)
				}
				*dst = f
			}
		case strings.Contains(spec, "@"):
			dropText, flowText, _ := strings.Cut(spec, "@")
			drop, dim, err := componentValue(name, dropText, calc.Pressure, calc.Length)
			if err != nil {
				return nil, err
			}
			flow, _, err := componentValue(name, flowText, calc.Flow)
			if err != nil {
				return nil, err
			}
			c.Kind, c.RatedFlow = calc.ComponentRated, flow
			if dim == calc.Length {
				c.RatedHead = drop
			} else {
				c.RatedDrop = drop
			}
		default:
			return nil, bad(calc.UnknownChoice, calc.ReasonComponentSpec, name, spec)
		}
		if _, err := c.Loss(1000, 0); err != nil {
			return nil, err
		}
		out = append(out, c)
	}
	return out, nil
}

// splitComponents splits a components list at its commas, except a comma
// between two digits whose following part up to the next comma holds no
// ":" (no component starts there): that one is a decimal comma, read as a
// point.
func splitComponents(text string) []string {
	parts := strings.Split(text, ",")
	out := parts[:1]
	for _, p := range parts[1:] {
		last := out[len(out)-1]
		if last != "" && p != "" && isDigit(last[len(last)-1]) && isDigit(p[0]) && !strings.Contains(p, ":") {
			out[len(out)-1] = last + "." + p
			continue
		}
		out = append(out, p)
	}
	return out
}

// componentValue reads a number and its unit of one of the dimensions
// dims, in SI: the drop (dims[0] Pressure, or a head) or the rated flow
// of component name. Errors are *calc.FieldError of ReasonComponentValue.
func componentValue(name, text string, dims ...calc.Dimension) (float64, calc.Dimension, error) {
	bad := func(k calc.Kind) error {
		fe := calc.NewFieldError("cmp", k).Typed(name + ":" + strings.TrimSpace(text)).Because(calc.ReasonComponentValue)
		fe.Dim = dims[0]
		return fe
	}
	num, unit := Split(text)
	if num == "" || unit == "" {
		return 0, 0, bad(calc.NoUnit)
	}
	v, err := strconv.ParseFloat(strings.ReplaceAll(num, "−", "-"), 64)
	if err != nil {
		return 0, 0, bad(calc.NotANumber)
	}
	u, err := calc.LookupUnit(unit)
	if err == nil {
		for _, d := range dims {
			if u.Dim == d {
				return u.ToSI(v), d, nil
			}
		}
	}
	return 0, 0, bad(calc.UnknownUnit)
}
