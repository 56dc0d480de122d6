package scenario

import (
	"errors"
	"strings"
	"testing"
	"time"
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
	f.Add("Pit\tz1=3m\tedited 2026-12-01T09:40:12.5+02:00\textra\n\tz2=4m\tedited 0001-01-01T00:00:00Z")
	f.Fuzz(func(t *testing.T, text string) {
		got, bad := ReadSheets(text)
		for _, b := range bad {
			if b.Line < 1 || b.Err == nil {
				t.Errorf("a bad line without its number or reason: %+v", b)
			}
		}
		for _, sl := range got {
			back, _ := ReadSheets(WriteKept("", []KeptSheet{{Scen: sl.Scen, Edited: sl.Edited}}))
			if len(back) != 1 || back[0].Scen.Encode() != sl.Scen.Encode() || !back[0].Edited.Equal(sl.Edited.Truncate(time.Second)) {
				t.Errorf("line %d does not read back: %q, edited %v", sl.Line, sl.Scen.Encode(), sl.Edited)
			}
		}
	})
}

// TestSheetsFileEditTime: each sheet's edit time is written after its link
// (RFC 3339, UTC, to the second) and read back; one not known is not
// written; a field that is not an edit time, or fields after it, leave the
// sheet read with its time not known or as given.
func TestSheetsFileEditTime(t *testing.T) {
	at := time.Date(2026, 12, 1, 9, 40, 12, 345e6, time.FixedZone("UTC+2", 2*3600))
	text := WriteKept("note", []KeptSheet{{Scen: Demo(), Edited: at}, {Scen: TurbineDemo()}})
	want := "\t" + Demo().Sign() + "\tedited 2026-12-01T07:40:12Z\n"
	if !strings.Contains(text, want) {
		t.Errorf("the demo's line lacks %q:\n%s", want, text)
	}
	got, bad := ReadSheets(text)
	if len(bad) > 0 || len(got) != 2 {
		t.Fatalf("read %d sheets, problems %v", len(got), bad)
	}
	if w := at.Truncate(time.Second).UTC(); !got[0].Edited.Equal(w) || got[0].Edited.Location() != time.UTC {
		t.Errorf("edited %v, want %v", got[0].Edited, w)
	}
	if !got[1].Edited.IsZero() || strings.Count(text, "\tedited ") != 1 {
		t.Errorf("a sheet without an edit time reads %v:\n%s", got[1].Edited, text)
	}
	for _, c := range []struct {
		line string
		want time.Time
	}{
		{"Pit\tz1=3m\tedited 2026-12-01T09:40:12+02:00", time.Date(2026, 12, 1, 7, 40, 12, 0, time.UTC)},
		{"Pit\tz1=3m\tedited 2026-12-01T09:40:12Z\tlater field", time.Date(2026, 12, 1, 9, 40, 12, 0, time.UTC)},
		{"Pit\tz1=3m\tedited yesterday", time.Time{}},
		{"Pit\tz1=3m\t2026-12-01T09:40:12Z", time.Time{}},
	} {
		got, bad := ReadSheets(c.line)
		if len(bad) > 0 || len(got) != 1 || got[0].Scen.Get("z1") != "3m" || !got[0].Edited.Equal(c.want) {
			t.Errorf("%q: read %+v, problems %v", c.line, got, bad)
		}
	}
}

// TestSheetsFileOlderForms: sheets files written before the edit time was
// kept still read, sheet for sheet, with the edit time not known: the
// form the site book exported (a note, then title, a tab and the link),
// and a file of bare links, one per line.
func TestSheetsFileOlderForms(t *testing.T) {
	demo, turbine := Demo(), TurbineDemo()
	older := "# Fieldhead sheets · 2 · exported 2026-10-02 14:05 · one per line: title, a tab, the link\n" +
		demo.Get("name") + "\t" + demo.Sign() + "\n" +
		turbine.Get("name") + "\t" + turbine.Sign() + "\n"
	bare := "https://example.org/fieldhead/?" + demo.Sign() + "\r\n" + turbine.Encode() + "\r\n"
	for name, text := range map[string]string{"title and link": older, "bare links": bare} {
		got, bad := ReadSheets(text)
		if len(bad) > 0 || len(got) != 2 {
			t.Errorf("%s: read %d sheets, problems %v", name, len(got), bad)
			continue
		}
		for i, want := range []Scenario{demo, turbine} {
			if got[i].Scen.Encode() != want.Encode() || got[i].Err != nil || !got[i].Edited.IsZero() {
				t.Errorf("%s, sheet %d: %+v", name, i+1, got[i])
			}
		}
	}
}
