package scenario

import (
	"fmt"
	"strings"
	"testing"
)

// TestPasteProfile: a survey pasted as a spreadsheet copies it becomes the
// segments. Each segment's length is the slope length between its points,
// sqrt(Δchainage² + Δelevation²) (Pythagoras), rounded to the thousandth:
// sqrt(100² + 3.5²) = 100.0612…, sqrt(150² + 2.5²) = 150.0208… (python3 math.hypot).
func TestPasteProfile(t *testing.T) {
	d := NewDraft(Scenario{})
	_ = d.Scen.Set("q", "45L/s")
	if !d.PasteProfile("Chainage\tElevation\r\n0\t212,0\r\n100\t215,5\r\n\r\n250\t213\r\n") {
		t.Fatal("nothing changed")
	}
	want := map[string]string{"s1.l": "100.061m", "s1.z": "215.5m", "s2.l": "150.021m", "s2.z": "213m", "z1": "212.0m", "q": "45L/s"}
	for k, v := range want {
		if got := d.Scen.Get(k); got != v {
			t.Errorf("%s = %q, want %q", k, got, v)
		}
	}
	if len(d.SurveyNotes) != 0 || d.Survey != "" || d.ShownSegments() != 2 {
		t.Errorf("notes %q, kept %q, %d segments", d.SurveyNotes, d.Survey, d.ShownSegments())
	}

	// A US sheet: feet; semicolons with a bad row, which is named and kept.
	d = NewDraft(Scenario{})
	_ = d.Scen.Set("units", "us")
	text := "0;100\n50;abc\n120;98\n90;97\n200\n"
	d.PasteProfile(text)
	if d.Scen.Get("s1.l") != "120.017ft" || d.Scen.Get("s1.z") != "98ft" || d.ShownSegments() != 1 {
		t.Errorf("US paste: %q", d.Scen.Encode())
	}
	notes := strings.Join(d.SurveyNotes, "|")
	for _, w := range []string{`line 2: the elevation "abc" is not a number`, "line 4: the chainage 90 is not beyond the previous point's (120)", `line 5: "200" has no elevation`} {
		if !strings.Contains(notes, w) {
			t.Errorf("notes %q lack %q", notes, w)
		}
	}
	if d.Survey != text {
		t.Errorf("the pasted text is not kept: %q", d.Survey)
	}
}

// TestPasteProfileKeepsTheSheet: pasted onto the demo (two segments), a
// three-segment survey changes lengths and end elevations only, the new
// segment takes the last one's pipe, and point 1's elevation stays as
// given (a water surface) with a note; a shorter survey keeps the further
// segments as they were; a longer one than a line allows changes nothing.
func TestPasteProfileKeepsTheSheet(t *testing.T) {
	d := NewDraft(Demo())
	d.PasteProfile("0,214\n8,214.5\n300,230\n640,251\n")
	checks := map[string]string{"s1.l": "8.016m", "s1.fit": "entry_sharp:1,elbow90lr:1,gate:1", "s1.nps": "8",
		"s2.z": "230m", "s2.fit": "gate:1,elbow90lr:5,check_swing:1,exit:1", "s3.nps": "8", "s3.sch": "40", "s3.mat": "steel",
		"s3.z": "251m", "s3.l": "340.648m", "z1": "212m"}
	for k, v := range checks {
		if got := d.Scen.Get(k); got != v {
			t.Errorf("%s = %q, want %q", k, got, v)
		}
	}
	if n := strings.Join(d.SurveyNotes, "|"); !strings.Contains(n, "point 1's elevation is kept") {
		t.Errorf("notes %q", n)
	}

	d = NewDraft(Demo())
	d.PasteProfile("0\t212\n8\t214.5\n")
	if d.Scen.Get("s2.l") != "632m" || !strings.Contains(strings.Join(d.SurveyNotes, "|"), "segments 2 to 2 are kept") {
		t.Errorf("s2.l %q, notes %q", d.Scen.Get("s2.l"), d.SurveyNotes)
	}

	var rows []string
	for i := 0; i <= MaxSegments+1; i++ {
		rows = append(rows, fmt.Sprintf("%d\t%d", i*10, 200+i))
	}
	d = NewDraft(Demo())
	before := d.Scen.Encode()
	if d.PasteProfile(strings.Join(rows, "\n")) || d.Scen.Encode() != before {
		t.Error("a survey of too many points changed the sheet")
	}
	if n := strings.Join(d.SurveyNotes, "|"); !strings.Contains(n, "at most 20 segments (21 points); this table has 22 points") {
		t.Errorf("notes %q", n)
	}
	d = NewDraft(Demo())
	if d.PasteProfile("chainage,elevation\n10,200\n") || d.Scen.Encode() != before || len(d.SurveyNotes) != 1 {
		t.Errorf("one point: notes %q", d.SurveyNotes)
	}
}
