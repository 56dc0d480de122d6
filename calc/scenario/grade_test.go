package scenario

import (
	"regexp"
	"strings"
	"testing"
)

// TestGradeLabels: the grade picker writes each tolerance as a person
// would (0.07·100 is 7.000000000000001 in binary floating point), with a
// true minus sign; 3B's head and efficiency tolerances are ±7 % and −7 %
// (ISO 9906:2012 grade 3B as present's Methods quote it, from memory).
func TestGradeLabels(t *testing.T) {
	hyphenMinus := regexp.MustCompile(`-[0-9]`)
	var b3 string
	for _, c := range Choices("grade") {
		if strings.Contains(c.Label, "0000") || strings.Contains(c.Label, "9999") || hyphenMinus.MatchString(c.Label) {
			t.Errorf("grade %s reads %q", c.Value, c.Label)
		}
		if c.Value == "3B" {
			b3 = c.Label
		}
	}
	if !strings.HasPrefix(b3, "grade 3B: H ±7 %, η −7 % (") {
		t.Errorf("grade 3B reads %q", b3)
	}
}
