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

// TestPasteProfileHeaderUnits: a header row that names length units sets
// the columns' units (never a silent reading in the sheet's unit): lengths
// are written in the chainage's unit, elevations in the elevation's, to the
// millimetre. Slope lengths by python3 math.hypot: hypot(100, 11.5) =
// 100.659…; hypot(0.1 km, 3.5 m = 0.0035 km) = 0.1000612… km;
// hypot(30, 1.2) = 30.024.
func TestPasteProfileHeaderUnits(t *testing.T) {
	tests := []struct {
		name, us, text string
		want           map[string]string
		notes          []string
	}{
		{"feet on an SI sheet", "si", "Chainage (ft)\tElevation (ft)\n0\t700\n100\t711.5\n",
			map[string]string{"s1.l": "100.659ft", "s1.z": "711.5ft", "z1": "700ft"},
			[]string{"chainage in ft", "elevation in ft"}},
		{"km and m, semicolons, decimal commas", "si", "Chainage [km];Level [m]\n0;212\n0,1;215,5\n",
			map[string]string{"s1.l": "0.100061km", "s1.z": "215.5m", "z1": "212m"},
			[]string{"chainage in km"}},
		{"metres on a US sheet", "us", "station (m),elevation in m\n0,10\n30,11.2\n",
			map[string]string{"s1.l": "30.024m", "s1.z": "11.2m", "z1": "10m"},
			[]string{"chainage in m", "elevation in m"}},
		{"spaces, one unit for both", "si", "chainage elevation (ft)\n0 700\n100 711.5\n",
			map[string]string{"s1.l": "100.659ft", "s1.z": "711.5ft"}, []string{"chainage in ft", "elevation in ft"}},
		{"the sheet's own unit: no note", "si", "Chainage (m)\tElevation (m)\n0\t700\n100\t711.5\n",
			map[string]string{"s1.l": "100.659m", "s1.z": "711.5m"}, nil},
		{"spaces, units that cannot be told apart", "si", "chainage in ft elevation in ft\n0 700\n100 711.5\n",
			map[string]string{"s1.l": "100.659m", "s1.z": "711.5m"},
			[]string{"line 1: the header names the units in, ft, in, ft and cannot be read column by column"}},
	}
	for _, tt := range tests {
		d := NewDraft(Scenario{})
		_ = d.Scen.Set("units", tt.us)
		if !d.PasteProfile(tt.text) {
			t.Errorf("%s: nothing changed", tt.name)
			continue
		}
		for k, v := range tt.want {
			if got := d.Scen.Get(k); got != v {
				t.Errorf("%s: %s = %q, want %q", tt.name, k, got, v)
			}
		}
		notes := strings.Join(d.SurveyNotes, "|")
		for _, n := range tt.notes {
			if !strings.Contains(notes, n) {
				t.Errorf("%s: notes %q lack %q", tt.name, notes, n)
			}
		}
		if tt.notes == nil && notes != "" {
			t.Errorf("%s: notes %q, want none", tt.name, notes)
		}
	}
}
