package calc

import (
	"errors"
	"strconv"
	"strings"
)

// FieldError reports an input that cannot be used, as data: what is wrong
// (Kind, and Reason when the kind alone does not say enough) and the
// figures, limits, choices or counts involved. It holds no sentence for
// people: the view model words it in the reader's units and names the
// field by its label. Field names the input (a share-link parameter such as
// "d1", or a name of this package such as "length" or "method").
//
// Figures are SI values with their dimension (Figure), so that a caller can
// word them in the units its reader uses; Error writes a terse line in SI
// for Go callers and logs.
type FieldError struct {
	Field   string
	Segment int // the 1-based segment of a line the input belongs to, 0 none
	Kind    Kind
	Reason  Reason // the specific case, ReasonNone when Kind says it all

	Value    *Figure  // the value given, nil when none was read
	Min, Max *Figure  // the limits the value had to keep, nil when not bounded there
	Input    string   // the text given, when it could not be read (not a number, an unknown unit or choice)
	Choices  []string // the choices (or unit symbols) accepted, for UnknownChoice and UnknownUnit
	Other    string   // the other field involved, for Inconsistent
	Item     int      // the 1-based item of a list the error is about (a data-sheet point), 0 none
	Count    int      // how many items were given, for TooFew, TooMany and WrongCount
	Figures  []Figure // further figures a Reason quotes, in the order its doc comment lists them
	// Dim is the dimension the field takes, for an error in reading a
	// value; UnitDim that of the unit typed, for WrongDimension.
	Dim, UnitDim Dimension

	// Msg is the text of an error of Kind KindOther: the Go text of an
	// error that was not a *FieldError, kept as a last resort (scenario's
	// recordOther), with a mark for each of Figures if it quotes any.
	// Build errors with NewFieldError and its methods.
	Msg string
}

// Kind is what is wrong with an input, in general terms. The set is
// closed: the view model has a wording for each.
type Kind uint8

// The kinds of input error.
const (
	KindOther       Kind = iota // a last-resort text (Msg) of an error that was not a *FieldError
	Missing                     // no value was given and one is needed
	NotANumber                  // Input is not a number
	NotFinite                   // Input (or the value computed from it) is not a finite number
	NoUnit                      // Input has no unit and the field has no default one
	UnknownUnit                 // Input names no known unit; Choices lists those of the dimension
	WrongDimension              // Input's unit measures UnitDim, not Dim
	NotPositive                 // Value must be above zero
	Negative                    // Value must be zero or more
	OutOfRange                  // Value must lie from Min to Max
	AboveLimit                  // Value must be at most Max
	BelowLimit                  // Value must be at least Min
	UnknownChoice               // Input is not one of Choices
	TooFew                      // Count items given, at least Min needed
	TooMany                     // Count items given, at most Max accepted
	WrongCount                  // Count items given where one per item of Other (Max items) is needed
	Inconsistent                // the value contradicts another field (Other)
	NoSolution                  // no value of the unknown satisfies the inputs
	NotConverged                // a solver stopped without an answer
	OutsideValidity             // the value lies outside the range a formulation was published for (Min, Max)
	kindEnd
)

// Kinds lists every Kind but KindOther, for tests of their wording.
func Kinds() []Kind {
	out := make([]Kind, 0, kindEnd-1)
	for k := Missing; k < kindEnd; k++ {
		out = append(out, k)
	}
	return out
}

var kindNames = [...]string{"other", "missing", "not a number", "not finite", "no unit", "unknown unit",
	"wrong dimension", "not positive", "negative", "out of range", "above limit", "below limit",
	"unknown choice", "too few", "too many", "wrong count", "inconsistent", "no solution",
	"not converged", "outside validity"}

// String is a short name of the kind, for Error and logs.
func (k Kind) String() string {
	if int(k) < len(kindNames) {
		return kindNames[k]
	}
	return "kind " + strconv.Itoa(int(k))
}

// Figure is a value quoted by a message: SI, with its dimension.
type Figure struct {
	Value float64
	Dim   Dimension
}

// Fig makes a Figure, for the arguments of a message.
func Fig(v float64, dim Dimension) Figure { return Figure{v, dim} }

// Num makes a Figure of a plain number (a count, a ratio, a Reynolds
// number).
func Num(v float64) Figure { return Figure{v, Dimensionless} }

// SI writes the figure in its dimension's SI display unit, four digits.
func (f Figure) SI() string {
	return DefaultUnit(f.Dim, false).Format(f.Value, 4)
}

// NewFieldError starts an error of kind k about field; its methods add the
// data the kind needs.
func NewFieldError(field string, k Kind) *FieldError { return &FieldError{Field: field, Kind: k} }

// Got records the value given.
func (e *FieldError) Got(v Figure) *FieldError { e.Value = &v; return e }

// Within records both limits of the value.
func (e *FieldError) Within(min, max Figure) *FieldError { e.Min, e.Max = &min, &max; return e }

// AtLeast records the lower limit.
func (e *FieldError) AtLeast(min Figure) *FieldError { e.Min = &min; return e }

// AtMost records the upper limit.
func (e *FieldError) AtMost(max Figure) *FieldError { e.Max = &max; return e }

// Because records the specific case and the figures it quotes.
func (e *FieldError) Because(r Reason, figs ...Figure) *FieldError {
	e.Reason, e.Figures = r, append(e.Figures, figs...)
	return e
}

// Typed records the text given.
func (e *FieldError) Typed(s string) *FieldError { e.Input = s; return e }

// OneOf records the choices accepted.
func (e *FieldError) OneOf(choices ...string) *FieldError { e.Choices = choices; return e }

// With records the other field involved.
func (e *FieldError) With(other string) *FieldError { e.Other = other; return e }

// At records the 1-based item of a list the error is about.
func (e *FieldError) At(item int) *FieldError { e.Item = item; return e }

// Given records how many items were given.
func (e *FieldError) Given(n int) *FieldError { e.Count = n; return e }

// InSegment records the 1-based segment of a line.
func (e *FieldError) InSegment(n int) *FieldError { e.Segment = n; return e }

// figureMark stands for figure i in a KindOther message: a private-use
// character and the index, which no input can put there (links refuse
// control and private-use characters are never typed into a number).
const figureMark = '\uE000'

// Error is a terse line for Go callers and logs, figures in SI: the field,
// the kind, the reason and the data. People read the view model's wording.
func (e *FieldError) Error() string {
	var b strings.Builder
	if e.Segment > 0 {
		b.WriteString("segment " + strconv.Itoa(e.Segment) + " ")
	}
	b.WriteString(e.Field + ": ")
	if e.Kind == KindOther {
		b.WriteString(e.Words(Figure.SI))
		return b.String()
	}
	b.WriteString(e.Kind.String())
	if e.Reason != ReasonNone {
		b.WriteString(" (" + e.Reason.String() + ")")
	}
	add := func(k, v string) { b.WriteString(" " + k + "=" + v) }
	if e.Item > 0 {
		add("item", strconv.Itoa(e.Item))
	}
	if e.Input != "" {
		add("input", quoteInput(e.Input))
	}
	if e.Value != nil {
		add("value", e.Value.SI())
	}
	if e.Min != nil {
		add("min", e.Min.SI())
	}
	if e.Max != nil {
		add("max", e.Max.SI())
	}
	if e.Count > 0 || e.Kind == TooFew || e.Kind == WrongCount {
		add("count", strconv.Itoa(e.Count))
	}
	if e.Other != "" {
		add("other", e.Other)
	}
	if len(e.Choices) > 0 {
		add("choices", strings.Join(e.Choices, ","))
	}
	for i, f := range e.Figures {
		add("f"+strconv.Itoa(i), f.SI())
	}
	return b.String()
}

// Words writes Msg, the text of a KindOther error, with each
// figure written by show; "" for a structured error.
func (e *FieldError) Words(show func(Figure) string) string {
	return wordFigures(e.Msg, e.Figures, show)
}

// wordFigures replaces the marks of msg by the figures written by show.
func wordFigures(msg string, figs []Figure, show func(Figure) string) string {
	if !strings.ContainsRune(msg, figureMark) {
		return msg
	}
	var b strings.Builder
	for {
		i := strings.IndexRune(msg, figureMark)
		if i < 0 {
			b.WriteString(msg)
			return b.String()
		}
		b.WriteString(msg[:i])
		rest := msg[i+len(string(figureMark)):]
		j := strings.IndexByte(rest, ';')
		n, err := strconv.Atoi(rest[:max(j, 0)])
		if j < 0 || err != nil || n < 0 || n >= len(figs) {
			b.WriteString("?")
			msg = rest
			continue
		}
		b.WriteString(show(figs[n]))
		msg = rest[j+1:]
	}
}

// Warning is a caution about a result. Field names the input it concerns;
// Segment is the 1-based segment of a line it is about (0 none), Field
// then being that segment's field ("d", "z"). Code says what it is about
// and Figures holds the figures it quotes (SI, with their dimension); the
// view model words it. A warning of CautionText (no Code) holds a text in
// Text, with a mark for each of Figures; nothing in calc or calc/scenario
// builds one any more (TestNoSentencesInWarnings).
type Warning struct {
	Field   string
	Segment int
	Code    Caution
	Text    string
	Figures []Figure
}

// Words writes the text of a CautionText warning with each figure written
// by show; "" for a coded one.
func (w Warning) Words(show func(Figure) string) string {
	if w.Code != CautionText {
		return ""
	}
	return wordFigures(w.Text, w.Figures, show)
}

// String is a line for logs and Go callers: a coded warning's name and
// figures in SI, or the text with its figures in SI.
func (w Warning) String() string {
	if w.Code != CautionText {
		return w.terse()
	}
	return w.Words(Figure.SI)
}

// fittingErr reports err, met while working out the K of fitting key, under
// the field "fit": Input is the key and Other the field err named.
func fittingErr(key string, err error) *FieldError {
	var fe *FieldError
	if !errors.As(err, &fe) {
		return NewFieldError("fit", NotConverged).Typed(key)
	}
	c := *fe
	c.Field, c.Other, c.Input = "fit", fe.Field, key
	return &c
}

// frictionRangeErr reports that at this flow the Reynolds number re lies
// outside the range of the friction formula that refused it with err.
func frictionRangeErr(re float64, err error) *FieldError {
	out := NewFieldError("q", OutsideValidity).Because(ReasonFrictionReynolds, Num(re))
	var fe *FieldError
	if errors.As(err, &fe) && fe.Field == "re" {
		out.Min, out.Max = fe.Min, fe.Max
		return out
	}
	if errors.As(err, &fe) {
		c := *fe
		return &c
	}
	return NewFieldError("q", NotConverged)
}
