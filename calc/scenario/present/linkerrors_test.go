package present

import (
	"errors"
	"strings"
	"testing"

	"fieldhead/calc/scenario"
)

// TestLinkErrorWords: every kind of link error has words of its own (not
// the fallback), names its parameter and quotes its sizes; several
// problems are listed, and a sheets-file line is named by its number.
func TestLinkErrorWords(t *testing.T) {
	seen := map[string]scenario.LinkKind{}
	for _, k := range scenario.LinkKinds {
		e := &scenario.LinkError{Kind: k, Name: "zz", Size: 9001, Limit: scenario.MaxQueryBytes}
		w := LinkErrorText(e)
		if w == "" || strings.Contains(w, "could not be read") || w == e.Error() {
			t.Errorf("kind %d has no wording of its own: %q", k, w)
		}
		if o, dup := seen[w]; dup {
			t.Errorf("kinds %d and %d are worded alike: %q", o, k, w)
		}
		seen[w] = k
		switch k {
		case scenario.LinkTooLong, scenario.LinkTooLongOut:
			if !strings.Contains(w, "9001") || !strings.Contains(w, "8192") {
				t.Errorf("kind %d: %q does not quote the size and the limit", k, w)
			}
		case scenario.LinkNone, scenario.LinkEmpty:
		default:
			if !strings.Contains(w, `"zz"`) {
				t.Errorf("kind %d: %q does not name the parameter", k, w)
			}
		}
	}
	if w := LinkErrorText(&scenario.LinkError{Kind: 255}); !strings.Contains(w, "could not be read") {
		t.Errorf("an unknown kind: %q", w)
	}

	tests := []struct {
		query string
		want  string
	}{
		{"zz=1&z1=3m&z1=4m", `"zz": not a Fieldhead parameter; "z1" (` + scenario.Label("z1") + `): given twice; keep one`},
		{"z1=3m&=5", "a parameter with no readable name: not a Fieldhead parameter"},
		{"z1=3m&" + strings.Repeat("a", scenario.MaxQueryBytes), "the link is 8198 bytes, longer than the 8192 a link may hold"},
	}
	for _, tc := range tests {
		_, err := scenario.Parse(tc.query)
		if w := LinkErrorText(err); w != tc.want {
			t.Errorf("Parse(%.30q): %q, want %q", tc.query, w, tc.want)
		}
	}

	// A damaged link says why, what was kept and what to do.
	signed := scenario.Demo().Sign()
	_, err := scenario.Parse(signed[:len(signed)-1])
	w := LinkErrorText(err)
	for _, want := range []string{"arrived damaged", "values were read", "Ask for the link again"} {
		if !strings.Contains(w, want) {
			t.Errorf("damaged link: %q lacks %q", w, want)
		}
	}
	_, err = scenario.Parse(strings.Replace(signed, "z2=251m", "z2=215m", 1))
	if w := LinkErrorText(err); !strings.Contains(w, "check does not match") {
		t.Errorf("altered link: %q", w)
	}

	_, bad := scenario.ReadSheets("Pit\t\nTank\t&\nWell\tzz=1")
	want := []string{"line 1: no link after the title", "line 2: the link holds no value of a sheet", `line 3: "zz": not a Fieldhead parameter`}
	if len(bad) != len(want) {
		t.Fatalf("bad lines %v, want %d", bad, len(want))
	}
	for i, b := range bad {
		if w := LinkErrorText(b); w != want[i] {
			t.Errorf("bad line %d: %q, want %q", b.Line, w, want[i])
		}
	}
	if LinkErrorText(nil) != "" {
		t.Error("no error should give no words")
	}
}

// TestLinkNotices: the page's notices around a link error keep its words
// and say what the page did about it.
func TestLinkNotices(t *testing.T) {
	_, bad := scenario.ReadSheets("Pit\t\nWell\tzz=1")
	if got, want := ImportNotice(2, 1, bad), `Added 2 sheets; 1 were kept already. Line 1 not read: no link after the title. Line 2 not read: "zz": not a Fieldhead parameter.`; got != want {
		t.Errorf("import notice %q, want %q", got, want)
	}
	signed := scenario.Demo().Sign()
	_, err := scenario.Parse(signed[:len(signed)-1])
	if got := ImportNotice(0, 0, []scenario.LineError{{Line: 4, Err: err}}); strings.Contains(got, "..") || !strings.Contains(got, "Line 4 not read: the link arrived damaged") {
		t.Errorf("import notice of a damaged line: %q", got)
	}
	if got := LinkBanner("x", false); got != "Part of the link was not understood and was left out: x" {
		t.Errorf("banner %q", got)
	}
	if got := LinkBanner(LinkErrorText(err), true); !strings.HasPrefix(got, "the link arrived damaged") || !strings.HasSuffix(got, "until you edit this one.") {
		t.Errorf("damaged banner %q", got)
	}
	if got := LinkRefused("y", true); got != "the link could not be used (y); this is the sheet saved on this device" {
		t.Errorf("refused %q", got)
	}
	if got := LinkRefused("y", false); !strings.HasSuffix(got, "this is the demo") {
		t.Errorf("refused %q", got)
	}
}

// TestUnverifiedSheet: a sheet opened from a damaged link says so, with
// the button that confirms its values, and marks the values its check
// suspects at their boxes; confirming clears both.
func TestUnverifiedSheet(t *testing.T) {
	sc := scenario.Demo()
	_ = sc.Set("view", "line")
	s, err := scenario.Parse(strings.Replace(sc.Sign(), "s2.fit=gate", "s2.fit=ga%0Ate", 1))
	var dl *scenario.DamagedLink
	if !errors.As(err, &dl) {
		t.Fatalf("not damaged: %v", err)
	}
	d := scenario.NewDraft(s)
	d.Damaged(dl)
	sh := Build(&d, scenario.Evaluate(scenario.Read(s)))
	if sh.Unverified == "" || sh.Verify.Act.Do != "verify" {
		t.Errorf("no unverified notice or confirm button: %q %+v", sh.Unverified, sh.Verify)
	}
	if f, ok := fieldOf(sh, "s2.fit"); !ok || f.Suspect == "" || f.Error == "" {
		t.Errorf("segment 2's fittings are not marked at their box: %+v", f)
	}
	d.Verify()
	if sh := Build(&d, scenario.Evaluate(scenario.Read(s))); sh.Unverified != "" {
		t.Error("still unverified after the values were confirmed")
	}
}

// fieldOf finds the box of param on a built sheet.
func fieldOf(sh Sheet, param string) (Field, bool) {
	var in func(c Card) (Field, bool)
	in = func(c Card) (Field, bool) {
		for _, b := range c.Blocks {
			fs := b.Fields
			if b.Fittings != nil {
				fs = append(fs, b.Fittings.AsText)
			}
			for _, f := range fs {
				if f.Param == param {
					return f, true
				}
			}
			if b.Card != nil {
				if f, ok := in(*b.Card); ok {
					return f, true
				}
			}
		}
		return Field{}, false
	}
	for _, c := range sh.Cards {
		if f, ok := in(c); ok {
			return f, true
		}
	}
	return Field{}, false
}
