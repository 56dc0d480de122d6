package present

import (
	"os"
	"strings"
	"testing"
)

// TestREADMEMethods: the README's "Methods and sources" holds each method
// exactly as the page and the printed sheet word it, and no other (the
// list is kept in one place: Methods).
func TestREADMEMethods(t *testing.T) {
	data, err := os.ReadFile("../../../README.md")
	if err != nil {
		t.Fatal(err)
	}
	readme := string(data)
	for _, m := range Methods {
		if line := "- **" + m.What + "**: " + m.How; !strings.Contains(readme, line) {
			t.Errorf("the README lacks the method line\n%s", line)
		}
	}
	_, section, _ := strings.Cut(readme, "Methods and sources")
	section, _, _ = strings.Cut(section, "\n## ")
	n := strings.Count(section, "\n- **")
	if n != len(Methods) {
		t.Errorf("the README lists %d methods, Methods %d", n, len(Methods))
	}
}
