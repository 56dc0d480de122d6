package scenario

import (
	"errors"
	"strings"
	"testing"
)

// TestSheetsFileRoundTrip: sheets written out read back as the same
// scenarios, titles and all (the format documented in sheets.go).
func TestSheetsFileRoundTrip(t *testing.T) {
	in := []Scenario{Demo(), TurbineDemo()}
	text := WriteSheets("Fieldhead sheets · 2 sheets", in)
	if n := strings.Count(text, "\n"); n != 3 {
		t.Errorf("%d lines, want a note and one line per sheet:\n%s", n, text)
	}
	got, bad := ReadSheets(text)
	if len(bad) > 0 || len(got) != 2 {
		t.Fatalf("read %d sheets, problems %v", len(got), bad)
	}
	for i, sl := range got {
		if sl.Scen.Encode() != in[i].Encode() || sl.Title != in[i].Get("name") || sl.Err != nil || sl.Line != i+2 {
			t.Errorf("sheet %d: %+v", i, sl)
		}
	}
}

// TestSheetsFileHashTitles: a title may start with "#" (pit "#3"), which
// starts a note too; a sheet's line holds a tab and a note's does not, so
// the sheet reads back (FuzzSheets found titles lost this way); a note
// given with a tab is written without one.
func TestSheetsFileHashTitles(t *testing.T) {
	s := Demo()
	_ = s.Set("name", "#3 pump, Mill Lane")
	text := WriteSheets("notes	with a tab", []Scenario{s})
	got, bad := ReadSheets(text)
	if len(bad) > 0 || len(got) != 1 || got[0].Scen.Encode() != s.Encode() || got[0].Title != "#3 pump, Mill Lane" {
		t.Errorf("read %+v, problems %v, from:\n%s", got, bad, text)
	}
}

// TestSheetsFileLongTitle: a line's title is the sheet's title only when
// the link then still fits MaxQueryBytes (this project's limit), so every
// sheet read writes out and reads back; the line's title is kept beside it.
// FuzzSheets found a 2.7 KB title that, escaped, made a link too long.
func TestSheetsFileLongTitle(t *testing.T) {
	title := strings.Repeat("<", 2800) // %3C: three bytes each once escaped
	got, bad := ReadSheets(title + "\tz1=3m")
	if len(bad) > 0 || len(got) != 1 || got[0].Title != title || got[0].Scen.Has("name") || got[0].Scen.Get("z1") != "3m" {
		t.Fatalf("read %d sheets, problems %v", len(got), bad)
	}
	if back, _ := ReadSheets(WriteSheets("", []Scenario{got[0].Scen})); len(back) != 1 {
		t.Error("the sheet does not read back")
	}
}

// TestSheetsFileBadLines: a bad line is reported by its number and the
// others are read (this project's rule for imports).
func TestSheetsFileBadLines(t *testing.T) {
	demo := Demo().Encode()
	text := strings.Join([]string{
		"# a note",
		"Pit 4\t" + demo,
		"Pit 5\t",                            // no link
		"",                                   // blank
		"https://example.org/tools/?" + demo, // a whole share link, no title
		"Pit 6\tzz=1&qq=2",                   // nothing of it is Fieldhead's
		"Pit 7\t" + strings.ReplaceAll(demo, "&", "&amp;"),
	}, "\n")
	got, bad := ReadSheets(text)
	if len(got) != 3 {
		t.Errorf("read %d sheets, want 3: %+v", len(got), got)
	}
	var lines []int
	for _, b := range bad {
		lines = append(lines, b.Line)
	}
	if len(lines) != 2 || lines[0] != 3 || lines[1] != 6 {
		t.Errorf("bad lines %v, want 3 and 6", bad)
	}
	for _, sl := range got {
		if sl.Scen.Encode() != demo {
			t.Errorf("line %d read as %q", sl.Line, sl.Scen.Encode())
		}
	}
}

// TestSignedLinks: a signed link reads whole; one altered or cut says it
// arrived damaged and keeps what was read; an unsigned link typed by hand
// reads as before; "&amp;" reads as "&". The check is CRC-32 (IEEE 802.3
// polynomial, as Go's hash/crc32 computes it).
func TestSignedLinks(t *testing.T) {
	signed := Demo().Sign()
	if s, err := Parse(signed); err != nil || s.Encode() != Demo().Encode() {
		t.Fatalf("a signed link: %v", err)
	}
	if s, err := Parse(strings.ReplaceAll(signed, "&", "&amp;")); err != nil || s.Encode() != Demo().Encode() {
		t.Errorf("&amp; for &: %v", err)
	}
	for _, n := range []int{200, 300, 400, len(signed) - 1} {
		s, err := Parse(signed[:n])
		var d *DamagedLink
		if !errors.As(err, &d) {
			t.Errorf("cut at %d: %v, want a damaged link", n, err)
			continue
		}
		if d.Read == 0 || len(s.Encode()) == 0 {
			t.Errorf("cut at %d: nothing kept of what arrived", n)
		}
	}
	altered := strings.Replace(signed, "z2=251m", "z2=215m", 1)
	if _, err := Parse(altered); !strings.Contains(linkWorded(err), "does not match") {
		t.Errorf("altered link: %v", err)
	}
	if _, err := Parse(Demo().Encode()); err != nil {
		t.Errorf("an unsigned link: %v", err)
	}
}

// FuzzSheets: any text reads as a sheets file without a panic; every
// sheet read writes back and reads again as the same scenario.
func FuzzSheets(f *testing.F) {
	f.Add(WriteSheets("note", []Scenario{Demo(), TurbineDemo()}))
	f.Add("Pit\tq=45L/s&amp;t=18C\n\n# x\nhttps://h/?ck=00000000&z1=3m\nbad\t%zz")
	f.Fuzz(func(t *testing.T, text string) {
		got, bad := ReadSheets(text)
		for _, b := range bad {
			if b.Line < 1 || b.Err == nil {
				t.Errorf("a bad line without its number or reason: %+v", b)
			}
		}
		for _, sl := range got {
			back, _ := ReadSheets(WriteSheets("", []Scenario{sl.Scen}))
			if len(back) != 1 || back[0].Scen.Encode() != sl.Scen.Encode() {
				t.Errorf("line %d does not read back: %q", sl.Line, sl.Scen.Encode())
			}
		}
	})
}
