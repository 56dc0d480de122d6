package scenario

import (
	"testing"
	"time"
)

// The reference is the standard library's own reading of RFC 3339,
// time.Parse(time.RFC3339, …), which sheets files were read with before:
// parseRFC3339 must accept exactly what it accepts and give the same
// instant, so every sheets file keeps reading as it did.
func checkRFC3339(t *testing.T, s string) {
	t.Helper()
	want, err := time.Parse(time.RFC3339, s)
	got, ok := parseRFC3339(s)
	if ok != (err == nil) {
		t.Fatalf("parseRFC3339(%q) ok = %v; time.Parse: %v", s, ok, err)
	}
	if ok && got != want.UTC() {
		t.Fatalf("parseRFC3339(%q) = %v, time.Parse: %v", s, got, want.UTC())
	}
}

func TestParseRFC3339(t *testing.T) {
	for _, s := range []string{
		"2026-12-01T09:40:12Z", // as a sheets file writes it
		"2025-03-10T09:40:00Z",
		"2024-02-29T23:59:59Z", // leap day
		"2023-02-29T10:00:00Z", // no such day
		"2100-02-29T10:00:00Z", // not a leap year (century)
		"2000-02-29T10:00:00Z", // leap (400)
		"0000-01-01T00:00:00Z",
		"9999-12-31T23:59:59Z",
		"2026-04-31T10:00:00Z",
		"2026-00-10T10:00:00Z",
		"2026-13-10T10:00:00Z",
		"2026-12-00T10:00:00Z",
		"2026-12-01T9:40:12Z", // time.Parse's hour takes one digit
		"2026-12-01T24:00:00Z",
		"2026-12-01T23:60:00Z",
		"2026-12-01T23:59:60Z",
		"2026-12-01T09:40:12.5Z",
		"2026-12-01T09:40:12,25Z",
		"2026-12-01T09:40:12.123456789Z",
		"2026-12-01T09:40:12.1234567891234Z", // cut after nine digits
		"2026-12-01T09:40:12.Z",
		"2026-12-01T09:40:12+02:00",
		"2026-12-01T09:40:12-05:30",
		"2026-12-01T00:10:00+24:00",
		"2026-12-01T00:10:00+25:00",
		"2026-12-01T00:10:00+01:60",
		"2026-12-01T00:10:00+01:61",
		"2026-12-01T09:40:12+0200",
		"2026-12-01T09:40:12*02:00",
		"2026-12-01T09:40:12z",
		"2026-12-01t09:40:12Z",
		"2026-12-01T09:40:12",
		"2026-12-01T09:40:12Z ",
		"2026-12-01T09:40:12ZZ",
		"2026-12-1T09:40:12Z",
		"2026-1-01T09:40:12Z",
		"226-12-01T09:40:12Z",
		"+026-12-01T09:40:12Z",
		"20261-12-01T09:40:12Z",
		"2026-12-01 09:40:12Z",
		"2026-12-01T09:4:12Z",
		"2026-12-01T09:40:1Z",
		"",
		"Z",
	} {
		checkRFC3339(t, s)
	}
}

func FuzzParseRFC3339(f *testing.F) {
	f.Add("2026-12-01T09:40:12Z")
	f.Add("2026-12-01T9:40:12.123456789123+24:00")
	f.Add("2024-02-29T23:59:59,5-00:60")
	f.Fuzz(checkRFC3339)
}
