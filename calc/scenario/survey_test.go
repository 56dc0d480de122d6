package scenario

import (
	"fmt"
	"strings"
	"testing"

	"fieldhead/calc"
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
// segment takes the last one's pipe and the exit (the line's end), and
// point 1's elevation stays as given (a water surface) with a note; a
// shorter survey keeps the further segments as they were; a longer one
// than a line allows changes nothing.
func TestPasteProfileKeepsTheSheet(t *testing.T) {
	d := NewDraft(Demo())
	d.PasteProfile("0,214\n8,214.5\n300,230\n640,251\n")
	checks := map[string]string{"s1.l": "8.016m", "s1.fit": "entry_sharp:1,elbow90lr:1,gate:1", "s1.nps": "8",
		"s2.z": "230m", "s2.fit": "gate:1,elbow90lr:5,check_swing:1", "s3.nps": "8", "s3.sch": "40", "s3.mat": "steel",
		"s3.z": "251m", "s3.l": "340.648m", "z1": "212m", "s3.fit": "exit:1"}
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

// survey12 is a survey of 12 points, 11 runs of 50 m rising 1 m each.
func survey12() string {
	var b strings.Builder
	b.WriteString("Chainage\tElevation\n")
	for i := 0; i < 12; i++ {
		fmt.Fprintf(&b, "%d\t%d\n", i*50, 200+i)
	}
	return b.String()
}

// TestPasteProfileEndFittings: a single run with an entrance, a gate and
// an exit, pasted over with 11 runs, keeps the entrance and the gate on
// segment 1 (the segment they belonged to, the line's start) and moves the
// exit to segment 11, the line's end (common practice: the exit loss is
// where the line enters the receiving tank); no segment between has an
// exit, and the line says what was made.
func TestPasteProfileEndFittings(t *testing.T) {
	d := NewDraft(Scenario{})
	for _, kv := range [][2]string{{"q", "45L/s"}, {"t", "18C"}, {"z1", "200m"}, {"z2", "211m"}, {"p1", "0kPa"}, {"p2", "0kPa"}, {"v1", "0m/s"}, {"v2", "0m/s"}, {"solve", "hp"}, {"l", "550m"},
		{"nps", "8"}, {"sch", "40"}, {"mat", "steel"}, {"fit", "entry_sharp:1,gate:1,exit:1"}} {
		_ = d.Scen.Set(kv[0], kv[1])
	}
	d.PasteProfile(survey12())
	if n := d.ShownSegments(); n != 11 {
		t.Fatalf("%d segments, want 11", n)
	}
	if got := d.Scen.Get("s1.fit"); got != "entry_sharp:1,gate:1" {
		t.Errorf("segment 1's fittings %q, want the entrance and the gate", got)
	}
	if got := d.Scen.Get("s11.fit"); got != "exit:1" {
		t.Errorf("segment 11's fittings %q, want the exit", got)
	}
	for k := 2; k <= 10; k++ {
		if f := d.Scen.Get(SegmentParam(k, "fit")); f != "" {
			t.Errorf("segment %d has fittings %q mid-line", k, f)
		}
		if d.Scen.Get(SegmentParam(k, "nps")) != "8" || d.Scen.Get(SegmentParam(k, "mat")) != "steel" {
			t.Errorf("segment %d lacks the pipe of segment 1", k)
		}
	}
	want := "Made 11 segments from the survey's 12 points: segment 1 took new lengths and ends, keeping its pipe and fittings; segments 2 to 11 are new, with the pipe of segment 1. The line's end fittings (1 exit) moved from segment 1 to segment 11, the last."
	if d.SurveyMade != want {
		t.Errorf("made:\n got %q\nwant %q", d.SurveyMade, want)
	}
	r := Evaluate(Read(d.Scen))
	if len(r.Errors) != 0 || r.Balance == nil {
		t.Errorf("the line does not evaluate: %v", r.Errors)
	}
}

// TestPasteProfileGivePipe: pasted onto a sheet with no pipe, 12 points
// make 11 segments that each lack a bore and a roughness (22 problems,
// two per segment); the line says so. Once segment 1 has a pipe and a
// material, GivePipe gives them to the other ten and no segment lacks
// one; a segment with a pipe of its own keeps it.
func TestPasteProfileGivePipe(t *testing.T) {
	d := NewDraft(Scenario{})
	for _, kv := range [][2]string{{"q", "45L/s"}, {"z2", "211m"}, {"view", "line"}} {
		_ = d.Scen.Set(kv[0], kv[1])
	}
	d.PasteProfile(survey12())
	if d.SurveyMade != "Made 11 segments from the survey's 12 points, segments 1 to 11 are new." ||
		!strings.HasPrefix(d.PipeStatus(), "11 segments have no pipe yet: give segment 1 its pipe") {
		t.Errorf("made %q, %q", d.SurveyMade, d.PipeStatus())
	}
	missing := func() int {
		n := 0
		for k, fe := range Evaluate(Read(d.Scen)).Errors {
			if _, f := SegmentOf(k); (f == "d" || f == "eps") && fe.Kind == calc.Missing {
				n++
			}
		}
		return n
	}
	if n := missing(); n != 22 {
		t.Errorf("%d missing pipes and walls before, want 22 (the issue's count)", n)
	}
	if got := d.GivePipe(); got != nil {
		t.Errorf("segment 1 has no pipe, yet GivePipe gave one to %v", got)
	}
	d.Choose("s1.nps", "8")
	d.Choose("s1.sch", "40")
	d.Choose("s1.mat", "steel")
	// The status follows the edits, not the paste: segment 1 now has its
	// pipe, so ten lack one and the button completes them.
	if got := d.PipeStatus(); got != "10 segments have no pipe yet: “Give segment 1's pipe to the others” completes them." {
		t.Errorf("after segment 1's pipe: %q", got)
	}
	d.Type("s5.d", "150mm")
	done := d.GivePipe()
	if len(done) != 10 || d.SurveyMade != "Segment 1's pipe given to 10 segments without one." || d.PipeStatus() != "" {
		t.Errorf("gave to %v: %q, %q", done, d.SurveyMade, d.PipeStatus())
	}
	if n := missing(); n != 0 {
		t.Errorf("%d missing pipes and walls after GivePipe, want 0", n)
	}
	if d.Scen.Get("s5.d") != "150mm" || d.Scen.Has("s5.nps") || d.Scen.Get("s5.mat") != "steel" {
		t.Errorf("segment 5's own bore: d %q, nps %q, mat %q; want its 150mm kept and segment 1's material", d.Scen.Get("s5.d"), d.Scen.Get("s5.nps"), d.Scen.Get("s5.mat"))
	}
	if len(d.WithoutPipe()) != 0 {
		t.Errorf("segments without a pipe after GivePipe: %v", d.WithoutPipe())
	}
}
