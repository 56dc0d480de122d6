package calc

import (
	"fmt"
	"strconv"
	"strings"
)

// FieldError reports an input that cannot be used. Field names the input as
// the user knows it (a share-link parameter such as "d1", or a descriptive
// name such as "diameter"); Msg says what is wrong and what was expected.
//
// Figures that depend on a unit (a temperature limit, the value given) are
// not written into Msg: Msg holds a mark for each, and Figures holds the
// value in SI with its dimension, so that a caller can word the message in
// the units its reader uses (Words). Error writes them in SI.
type FieldError struct {
	Field   string
	Segment int // the 1-based segment of a line the input belongs to, 0 none
	Msg     string
	Figures []Figure
}

// Figure is a value quoted by a message: SI, with its dimension.
type Figure struct {
	Value float64
	Dim   Dimension
}

// Fig makes a Figure, for the arguments of a message.
func Fig(v float64, dim Dimension) Figure { return Figure{v, dim} }

// SI writes the figure in its dimension's SI display unit, four digits.
func (f Figure) SI() string {
	return DefaultUnit(f.Dim, false).Format(f.Value, 4)
}

// figureMark stands for figure i in a message: a private-use character and
// the index, which no input can put there (links refuse control and
// private-use characters are never typed into a number).
const figureMark = '\uE000'

func (e *FieldError) Error() string {
	if e.Segment > 0 {
		return "segment " + strconv.Itoa(e.Segment) + " " + e.Field + ": " + e.Words(Figure.SI)
	}
	return e.Field + ": " + e.Words(Figure.SI)
}

// Words writes Msg with each figure written by show.
func (e *FieldError) Words(show func(Figure) string) string {
	return wordFigures(e.Msg, e.Figures, show)
}

// fieldErrorf builds a *FieldError with a formatted message; Figure
// arguments (formatted with %v) become the error's Figures.
func fieldErrorf(field, format string, args ...any) error {
	msg, figs := sprintFigures(format, args)
	return &FieldError{Field: field, Msg: msg, Figures: figs}
}

// sprintFigures formats a message, replacing each Figure argument by its
// mark.
func sprintFigures(format string, args []any) (string, []Figure) {
	var figs []Figure
	out := make([]any, len(args))
	for i, a := range args {
		if f, ok := a.(Figure); ok {
			out[i] = string(figureMark) + strconv.Itoa(len(figs)) + ";"
			figs = append(figs, f)
			continue
		}
		out[i] = a
	}
	return fmt.Sprintf(format, out...), figs
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
// then being that segment's field ("d", "z"). Text quotes its figures the
// way FieldError.Msg does.
type Warning struct {
	Field   string
	Segment int
	Text    string
	Figures []Figure
}

// Warnf builds a Warning with a formatted text; Figure arguments
// (formatted with %v) become its Figures.
func Warnf(field, format string, args ...any) Warning {
	t, figs := sprintFigures(format, args)
	return Warning{Field: field, Text: t, Figures: figs}
}

// warnf is Warnf, for this package's own use.
func warnf(field, format string, args ...any) Warning { return Warnf(field, format, args...) }

// FieldErrorf builds a *FieldError as fieldErrorf does, for callers that
// word their own checks.
func FieldErrorf(field, format string, args ...any) *FieldError {
	msg, figs := sprintFigures(format, args)
	return &FieldError{Field: field, Msg: msg, Figures: figs}
}

// Words writes the warning's text with each figure written by show.
func (w Warning) Words(show func(Figure) string) string { return wordFigures(w.Text, w.Figures, show) }

// String writes the warning with its figures in SI.
func (w Warning) String() string { return w.Words(Figure.SI) }
