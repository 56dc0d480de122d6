package calc

import (
	"errors"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"
)

// TestNoSentencesInErrors fails on every error in calc or calc/scenario
// still built from a format string of words (the deprecated fieldErrorf
// and FieldErrorf, scenario's e.fail, or a FieldError with a Msg): errors are data here and
// worded by the view model (calc/scenario/present/errors.go). The list it
// prints is what remains to convert.
func TestNoSentencesInErrors(t *testing.T) {
	uses := sentenceUses(t, regexp.MustCompile(`\b(fieldErrorf|FieldErrorf|e\.fail)\(|FieldError\{[^}]*Msg: *(fmt\.|")`), ".", "scenario")
	if len(uses) > 0 {
		t.Errorf("%d errors are still built from sentences; give each a Kind (and a Reason, worded in present/errors.go):\n%s",
			len(uses), strings.Join(uses, "\n"))
	}
}

// TestNoSentencesInWarnings fails on every warning in calc or
// calc/scenario built from a sentence (the deprecated warnf and Warnf,
// scenario's e.warn, or a Warning with a Text): a warning is a Caution and its figures, worded
// by the view model.
func TestNoSentencesInWarnings(t *testing.T) {
	uses := sentenceUses(t, regexp.MustCompile(`\b(warnf|Warnf|e\.warn)\(|Warning\{[^}]*Text: *(fmt\.|")`), ".", "scenario")
	if len(uses) > 0 {
		t.Errorf("%d warnings are still built from sentences; give each a Caution (cautions.go, worded in present/errors.go):\n%s",
			len(uses), strings.Join(uses, "\n"))
	}
}

// sentenceUses lists the lines of the non-test Go files of dirs (but
// errors.go, which declares the old constructors) that match old.
func sentenceUses(t *testing.T, old *regexp.Regexp, dirs ...string) []string {
	var uses []string
	for _, dir := range dirs {
		files, err := filepath.Glob(filepath.Join(dir, "*.go"))
		if err != nil {
			t.Fatal(err)
		}
		for _, f := range files {
			if strings.HasSuffix(f, "_test.go") || f == "errors.go" {
				continue
			}
			b, err := os.ReadFile(f)
			if err != nil {
				t.Fatal(err)
			}
			for i, line := range strings.Split(string(b), "\n") {
				if old.MatchString(line) && !strings.HasPrefix(strings.TrimSpace(line), "//") {
					uses = append(uses, f+":"+strconv.Itoa(i+1)+": "+strings.TrimSpace(line))
				}
			}
		}
	}
	return uses
}

// TestReasonNames keeps the names of Error in step with the constants.
func TestReasonNames(t *testing.T) {
	if len(reasonNames) != int(reasonEnd) {
		t.Errorf("%d reason names for %d reasons", len(reasonNames), reasonEnd)
	}
	if len(kindNames) != int(kindEnd) {
		t.Errorf("%d kind names for %d kinds", len(kindNames), kindEnd)
	}
	if len(cautionNames) != int(cautionEnd) || len(Cautions()) != int(cautionEnd)-1 {
		t.Errorf("%d caution names for %d cautions", len(cautionNames), cautionEnd)
	}
	if len(Reasons()) != int(reasonEnd)-1 || len(Kinds()) != int(kindEnd)-1 {
		t.Errorf("Reasons or Kinds leave one out")
	}
}

// TestFieldErrorData: an error carries what it is about as data, and its
// Error line (for Go callers) quotes the data in SI.
func TestFieldErrorData(t *testing.T) {
	_, err := Water(400, 101325)
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Field != "t" || fe.Kind != OutsideValidity || fe.Reason != ReasonWaterProperties ||
		fe.Value == nil || fe.Value.Value != 400 || fe.Value.Dim != Temperature || fe.Min == nil || fe.Max == nil ||
		fe.Min.Value != WaterMinTemperature || fe.Max.Value != WaterMaxTemperature {
		t.Fatalf("Water(400 K): %#v", err)
	}
	if want := "t: outside validity (water properties) value=126.9 °C min=0.000 °C max=100.0 °C"; err.Error() != want {
		t.Errorf("Error() = %q, want %q", err.Error(), want)
	}
	if e := countErr("pq", 2, 3, 8); e.Kind != TooFew || e.Count != 2 || e.Min.Value != 3 || e.Max.Value != 8 {
		t.Errorf("countErr(2, 3, 8) = %v", e)
	}
	if e := countErr("pq", 9, 3, 8); e.Kind != TooMany {
		t.Errorf("countErr(9, 3, 8) = %v", e)
	}
	// Long input is shortened in the Error line.
	if _, err := Parse("q", strings.Repeat("z", 500), Flow, ""); err == nil || len(err.Error()) > 120 {
		t.Errorf("long input: %v", err)
	}
	// A last-resort KindOther text keeps its words, its figures in SI
	// (45 L/s = 0.045 m³/s).
	if e := (&FieldError{Field: "q", Msg: "flow \uE0000; is odd", Figures: []Figure{Fig(0.045, Flow)}}); e.Error() != "q: flow 45.00 L/s is odd" {
		t.Errorf("KindOther: %q", e.Error())
	}
}
