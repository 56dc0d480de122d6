package present

import (
	"encoding/csv"
	"strings"
	"testing"
)

// TestWriteCSV checks writeCSV against the standard library's
// encoding/csv Writer with its defaults, which it stands in for.
func TestWriteCSV(t *testing.T) {
	records := [][]string{
		{"plain", "", "two words", " leading space", "\tleading tab", "trailing "},
		{"a,b", `say "hi"`, "line\nbreak", "cr\rhere", "crlf\r\nhere", `\.`, `\.x`, "\u00a0nbsp first"},
		{"µ m³/h", "−18 kPa", "https://x.example/?q=1&h=2", ""},
		{},
		{""},
	}
	for _, rec := range records {
		var want strings.Builder
		w := csv.NewWriter(&want)
		if err := w.Write(rec); err != nil {
			t.Fatal(err)
		}
		w.Flush()
		var got strings.Builder
		writeCSV(&got, rec)
		if got.String() != want.String() {
			t.Errorf("writeCSV(%q) = %q, encoding/csv writes %q", rec, got.String(), want.String())
		}
	}
}
