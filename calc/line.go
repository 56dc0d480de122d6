package calc

import (
	"errors"
	"fmt"
	"math"
)

// MaxSegments is the largest number of segments a Line may have.
const MaxSegments = 20

// Segment is one piece of a Line: a pipe run of constant inside diameter
// with its fittings (see Run), and the elevation of its end. The segment
// starts where the previous one ends (the first at point 1).
type Segment struct {
	Run
	EndZ float64 // elevation of the segment's end above the datum, m
	// Components are further named losses on the segment (a chiller, a
	// coil, a control valve), taken at the segment's end for the profile.
	Components []Component
}

// Line is an ordered list of segments from point 1 to point 2.
type Line struct {
	Segments []Segment
}

// SegmentResult is one segment of a line evaluated at a flow.
type SegmentResult struct {
	RunResult
	// TransitionLoss is the head lost at the segment's start where its
	// diameter differs from the previous segment's (Borda–Carnot sudden
	// expansion or sudden contraction), m. Zero for the first segment.
	TransitionLoss float64
	// Components are the drops of the segment's components at the flow,
	// in its order; ComponentLoss is their sum, m.
	Components    []ComponentLoss
	ComponentLoss float64
}

// LineResult is a Line evaluated at one flow. Losses are heads in metres of
// the flowing liquid.
type LineResult struct {
	Segments []SegmentResult
	// TotalLoss is the sum of the segments' design losses (TotalLoss of
	// each run, the larger bound in transitional flow) and the transition
	// losses. TotalLossLow and TotalLossHigh sum the segments' bounds; they
	// equal TotalLoss unless some segment is transitional.
	TotalLoss, TotalLossLow, TotalLossHigh float64
	// Transitional is true when any segment is in transitional flow.
	Transitional bool
	// MajorLoss, MinorLoss, TransitionLoss and ComponentLoss split the
	// design TotalLoss into pipe friction, fittings, changes of diameter
	// and the segments' components.
	MajorLoss, MinorLoss, TransitionLoss, ComponentLoss float64
}

// wrapSegmentError marks a segment's *FieldError with the segment it came
// from (i is 0-based) when the field is the segment's own (its length,
// size, wall, fittings); a liquid or flow error keeps its field and says
// which segment it arose in.
func wrapSegmentError(i int, err error) error {
	var fe *FieldError
	if !errors.As(err, &fe) {
		return fmt.Errorf("segment %d: %w", i+1, err)
	}
	c := *fe
	switch fe.Field {
	case "length", "d", "eps", "fit", "k", "method", "chw", "z", "cmp":
		c.Segment = i + 1
	default:
		c.Msg = fmt.Sprintf("segment %d: %s", i+1, fe.Msg)
	}
	return &c
}

// transitionLoss is the head lost where the diameter changes from d1 (mean
// velocity v1) to d2 (velocity v2): a Borda–Carnot sudden expansion, K on
// the upstream velocity head, or a sudden contraction, K on the downstream
// velocity head.
func transitionLoss(d1, v1, d2, v2 float64) (float64, error) {
	g2 := 2 * StandardGravity
	switch {
	case d2 > d1:
		k, err := SuddenExpansionK(d1, d2)
		return k * v1 * v1 / g2, err
	case d2 < d1:
		k, err := SuddenContractionK(d1, d2)
		return k * v2 * v2 / g2, err
	}
	return 0, nil
}

// check validates the number of segments and the elevations.
func (l Line) check() error {
	n := len(l.Segments)
	if n == 0 {
		return NewFieldError("line", TooFew).AtLeast(Num(1))
	}
	if n > MaxSegments {
		return countErr("line", n, 1, MaxSegments)
	}
	for i, s := range l.Segments {
		if math.IsNaN(s.EndZ) || math.IsInf(s.EndZ, 0) {
			return NewFieldError("z", NotFinite).InSegment(i + 1).Because(ReasonSegmentEnd)
		}
	}
	return nil
}

// Evaluate computes every segment of the line carrying flow q (m³/s, ≥ 0)
// of liquid fl. Each segment's friction and fittings are taken at that
// segment's own velocity and Reynolds number (Run.Evaluate). Where the
// inside diameter changes from one segment to the next a loss is added
// automatically at the junction, charged to the downstream segment as
// TransitionLoss: the Borda–Carnot sudden-expansion loss (SuddenExpansionK,
// on the upstream velocity head) where the pipe widens, the
// sudden-contraction loss (SuddenContractionK, on the downstream velocity
// head) where it narrows. These are losses of abrupt changes; a gradual
// reducer loses less, so the figure is on the safe side.
//
// Each segment's components (Component.Loss) add their drops at the flow.
//
// Errors are *FieldError values naming the segment's share-link field,
// "sN.l", "sN.d", "sN.eps", "sN.fit", "sN.k", "sN.fm", "sN.chw", "sN.z" or "sN.cmp"
// (N is the 1-based segment number), "line" for no segments or more than
// MaxSegments, and "rho", "mu" or "q" (with the segment named in the
// message) for the liquid and the flow.
func (l Line) Evaluate(fl Fluid, q float64) (LineResult, error) {
	if err := l.check(); err != nil {
		return LineResult{}, err
	}
	res := LineResult{Segments: make([]SegmentResult, len(l.Segments))}
	for i := range l.Segments {
		s := &l.Segments[i]
		rr, err := s.Run.Evaluate(fl, q)
		if err != nil {
			return LineResult{}, wrapSegmentError(i, err)
		}
		sr := &res.Segments[i]
		sr.RunResult = rr
		if i > 0 {
			prev := &res.Segments[i-1]
			tl, err := transitionLoss(l.Segments[i-1].Diameter, prev.Velocity, s.Diameter, rr.Velocity)
			if err != nil {
				return LineResult{}, wrapSegmentError(i, err)
			}
			sr.TransitionLoss = tl
		}
		for _, c := range s.Components {
			cl, err := c.Loss(fl.Density, q)
			if err != nil {
				return LineResult{}, wrapSegmentError(i, err)
			}
			sr.Components = append(sr.Components, cl)
			sr.ComponentLoss += cl.Head
		}
		other := sr.TransitionLoss + sr.ComponentLoss
		res.TotalLoss += rr.TotalLoss + other
		res.TotalLossLow += rr.TotalLossLow + other
		res.TotalLossHigh += rr.TotalLossHigh + other
		res.ComponentLoss += sr.ComponentLoss
		res.MajorLoss += rr.MajorLoss
		res.MinorLoss += rr.MinorLoss
		res.TransitionLoss += sr.TransitionLoss
		if rr.Regime == Transitional && q > 0 {
			res.Transitional = true
		}
	}
	return res, nil
}

// LossThrough returns the design head lost in segments 1 to k (1-based,
// inclusive): their friction, fittings and components and the transitions
// at their starts, but not the transition into segment k+1. k ≤ 0 gives 0; k beyond
// the last segment gives the whole TotalLoss.
func (r LineResult) LossThrough(k int) float64 {
	var h float64
	for i := 0; i < k && i < len(r.Segments); i++ {
		h += r.Segments[i].TotalLoss + r.Segments[i].TransitionLoss + r.Segments[i].ComponentLoss
	}
	return h
}

// Length returns the total length of the line, m.
func (l Line) Length() float64 {
	var s float64
	for _, seg := range l.Segments {
		s += seg.Length
	}
	return s
}

// minDiameter returns the smallest positive segment diameter, or +Inf.
func (l Line) minDiameter() float64 {
	d := math.Inf(1)
	for _, s := range l.Segments {
		if s.Diameter > 0 {
			d = math.Min(d, s.Diameter)
		}
	}
	return d
}

// lineWarnings turns the segments' warnings into balance warnings, each
// naming its segment; at zero flow one warning stands for all.
func lineWarnings(lr *LineResult, q float64) []Warning {
	if q == 0 {
		return []Warning{Warn("q", CautionNoFlow)}
	}
	var out []Warning
	for i, s := range lr.Segments {
		for _, w := range s.Warnings {
			if w.Field != "d" {
				w.Field = "d" // the segment's own input: the pipe it is
			}
			w.Segment = i + 1
			out = append(out, w)
		}
	}
	return out
}

// lumped returns a copy of the line with each segment's fittings folded
// into its ExtraK: the same ΣK to the last bit (Run.SumK adds the fittings
// to ExtraK in the same order), so the same results, without the fitting
// table look-ups on every evaluation (see Run.lumped; with Hooper 2-K
// fittings the ΣK agrees to rounding). A segment whose ΣK cannot be formed
// is left as it is.
func (l Line) lumped() Line {
	out := Line{Segments: make([]Segment, len(l.Segments))}
	copy(out.Segments, l.Segments)
	for i := range out.Segments {
		r := &out.Segments[i].Run
		*r = r.lumped()
	}
	return out
}

// budgetTerm is one of a line's terms in "Where the head goes".
type budgetTerm struct {
	key, label string
	head       float64
}

// budgetTerms splits the line's friction head hf (its design TotalLoss, or
// a bound of it in transitional flow) into pipe friction ("major"),
// fittings and changes of diameter ("minor") and one term per component
// (key "cmpN.K", segment N's K-th component, labelled by its name and
// segment). In transitional flow the bound's difference from TotalLoss is
// shared between friction and fittings in proportion; components take no
// part in it.
func (r *LineResult) budgetTerms(hf float64) []budgetTerm {
	major, minor := r.MajorLoss, r.MinorLoss+r.TransitionLoss
	if r.Transitional && r.TotalLoss-r.ComponentLoss > 0 {
		scale := (hf - r.ComponentLoss) / (r.TotalLoss - r.ComponentLoss)
		major, minor = major*scale, minor*scale
	}
	out := []budgetTerm{{"major", "pipe friction", major}, {"minor", "fittings and changes of diameter", minor}}
	for i, s := range r.Segments {
		for k, c := range s.Components {
			out = append(out, budgetTerm{fmt.Sprintf("cmp%d.%d", i+1, k+1), fmt.Sprintf("%s (segment %d)", c.Name, i+1), c.Head})
		}
	}
	return out
}
