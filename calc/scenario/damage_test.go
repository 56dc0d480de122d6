package scenario

import (
	"errors"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
)

// commissioning is a long sheet with components, the kind of link a chat
// wraps: the demo with a flow meter and a strainer on segment 2.
func commissioning() Scenario {
	s := Demo()
	_ = s.Set("s2.cmp", "flowmeter:20kPa@45L/s,strainer:8kPa@45L/s")
	_ = s.Set("tc", "8s")
	return s
}

// TestDamageLocated: a line break a chat put inside a value keeps the
// value verbatim and flags it at its box; the check names it among the
// values that may be altered, and a value altered without a control
// character is named the same way (the block checks of Sign).
func TestDamageLocated(t *testing.T) {
	signed := commissioning().Sign()
	for _, tc := range []struct {
		name, from, to, param string
		flagged               bool // the value itself is flagged at its box
	}{
		{"LF inside a component", "s2.cmp=flowmeter", "s2.cmp=flow%0Ameter", "s2.cmp", true},
		{"CR LF inside a fitting list", "s2.fit=gate:1", "s2.fit=ga%0D%0Ate:1", "s2.fit", true},
		{"a digit altered", "z2=251m", "z2=215m", "z2", false},
	} {
		damaged := strings.Replace(signed, tc.from, tc.to, 1)
		if damaged == signed {
			t.Fatalf("%s: %q not in the link", tc.name, tc.from)
		}
		s, err := Parse(damaged)
		var d *DamagedLink
		if !errors.As(err, &d) || !d.Mismatch {
			t.Errorf("%s: %v, want a damaged link", tc.name, err)
			continue
		}
		if !slices.Contains(d.Suspect, tc.param) || len(d.Suspect) > 6 {
			t.Errorf("%s: suspects %v, want %s among a handful", tc.name, d.Suspect, tc.param)
		}
		in := Read(s)
		if got := in.Bad(tc.param); got != tc.flagged {
			t.Errorf("%s: %s flagged %v, want %v (%v)", tc.name, tc.param, got, tc.flagged, in.Problems[tc.param])
		}
		if tc.flagged && !strings.Contains(s.Get(tc.param), "\n") {
			t.Errorf("%s: the value was not kept verbatim: %q", tc.name, s.Get(tc.param))
		}
	}
	// A value lost whole: its block fails with none of the values read.
	lost := strings.Replace(signed, "&tc=8s", "", 1)
	var d *DamagedLink
	if _, err := Parse(lost); !errors.As(err, &d) || !d.Lost {
		t.Errorf("a value lost whole: %+v", d)
	}
}

// TestOlderCheckForms: links signed before the block checks (eight hex
// digits alone) and links with no check still open; the older form still
// finds damage, without naming values.
func TestOlderCheckForms(t *testing.T) {
	q := commissioning().Encode()
	old := CheckParam + "=" + checksum(q) + "&" + q // the form Sign wrote until the block checks
	if s, err := Parse(old); err != nil || s.Encode() != q {
		t.Errorf("an older signed link: %v", err)
	}
	var d *DamagedLink
	if _, err := Parse(strings.Replace(old, "z2=251m", "z2=215m", 1)); !errors.As(err, &d) || len(d.Suspect) != 0 {
		t.Errorf("an older signed link, altered: %v", err)
	}
	if s, err := Parse(q); err != nil || s.Encode() != q {
		t.Errorf("an unsigned link: %v", err)
	}
	if s, err := Parse(commissioning().Sign()); err != nil || s.Encode() != q {
		t.Errorf("a link signed now: %v", err)
	}
}

// damageSeeds are valid signed links: the demos, the commissioning sheet
// and every case file's query.
func damageSeeds() []string {
	out := []string{Demo().Sign(), TurbineDemo().Sign(), commissioning().Sign()}
	files, _ := filepath.Glob(filepath.Join("..", "..", "testdata", "cases", "*.case"))
	for _, f := range files {
		b, err := os.ReadFile(f)
		if err != nil {
			continue
		}
		for _, line := range strings.Split(string(b), "\n") {
			if q, ok := strings.CutPrefix(line, "query: "); ok {
				if s, err := Parse(q); err == nil && len(s.raw) > 0 {
					out = append(out, s.Sign())
				}
			}
		}
	}
	return out
}

// damageLink damages a link the ways chats and mail do: a line break, CR
// LF or a space put in at pos, a cut at pos, & written &amp;, percent
// escapes encoded twice, + for a space, quotes made typographic, an
// escaped line break put in, a byte dropped.
func damageLink(q string, op uint8, pos int) string {
	pos %= len(q) + 1
	switch op % 10 {
	case 0:
		return q[:pos] + "\n" + q[pos:]
	case 1:
		return q[:pos] + "\r\n" + q[pos:]
	case 2:
		return q[:pos] + " " + q[pos:]
	case 3:
		return q[:pos]
	case 4:
		return strings.ReplaceAll(q, "&", "&amp;")
	case 5:
		return strings.ReplaceAll(q, "%", "%25")
	case 6:
		return strings.ReplaceAll(q, "%20", "+")
	case 7:
		return strings.NewReplacer("'", "’", `"`, "“", "%22", "%E2%80%9C", "%27", "%E2%80%99").Replace(q)
	case 8:
		return q[:pos] + "%0A" + q[pos:]
	default:
		if pos == len(q) {
			return q
		}
		return q[:pos] + q[pos+1:]
	}
}

// FuzzLinkDamage: a valid link damaged the ways chats and mail damage
// links either reads as the same sheet, or is marked damaged (its figures
// unverified) or refused; never a different sheet read as sound.
func FuzzLinkDamage(f *testing.F) {
	seeds := damageSeeds()
	for op := uint8(0); op < 10; op++ {
		f.Add(uint16(0), op, uint16(200))
		f.Add(uint16(2), op, uint16(1000))
	}
	f.Fuzz(func(t *testing.T, link uint16, op uint8, pos uint16) {
		q := seeds[int(link)%len(seeds)]
		orig, _ := Parse(q)
		damaged := damageLink(q, op, int(pos))
		s, err := Parse(damaged)
		var d *DamagedLink
		var le *LinkError
		switch {
		case errors.As(err, &d), errors.As(err, &le) && (le.Kind == LinkTooLong || le.Kind == LinkTooLongOut):
			return // unverified, or refused whole
		case len(s.raw) == 0:
			return // nothing read: no answer at all
		}
		if s.Encode() != orig.Encode() {
			t.Errorf("op %d at %d: read as sound (%v), but not the sheet sent:\n%.200q\n%.200q", op%10, pos, err, s.Encode(), orig.Encode())
		}
	})
}
