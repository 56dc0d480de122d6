package calc

import (
	"errors"
	"math"
	"testing"
)

func TestFittingTable(t *testing.T) {
	tab := FittingTable()
	seen := map[string]bool{}
	for _, f := range tab {
		if seen[f.Key] {
			t.Errorf("duplicate key %q", f.Key)
		}
		seen[f.Key] = true
		for _, r := range f.Key {
			if !(r >= 'a' && r <= 'z' || r >= '0' && r <= '9' || r == '_') {
				t.Errorf("key %q is not a short lowercase ASCII id", f.Key)
				break
			}
		}
		if !(f.K > 0) || f.Name == "" || f.Source == "" {
			t.Errorf("incomplete row %+v", f)
		}
	}
	// The keys the product needs (our own vocabulary).
	for _, k := range []string{"gate", "globe", "ball", "butterfly", "check_swing", "check_lift", "foot", "strainer",
		"elbow90", "elbow90lr", "elbow45", "tee_run", "tee_branch", "entry_sharp", "entry_round", "entry_reentrant", "exit"} {
		if !seen[k] {
			t.Errorf("missing fitting %q", k)
		}
	}
	// Accessor returns a copy: editing it does not change the table.
	tab[0].K = -1
	if FittingTable()[0].K == -1 {
		t.Error("FittingTable shares its backing array")
	}
}

func TestFittingTypicalValues(t *testing.T) {
	// Trade values (common practice): sharp-edged entrance 0.5, exit 1.0;
	// the long-radius elbow loses less than the standard one, the globe
	// valve far more than the gate valve.
	k := func(key string) float64 {
		f, err := LookupFitting(key)
		if err != nil {
			t.Fatal(err)
		}
		return f.K
	}
	if k("entry_sharp") != 0.5 || k("exit") != 1 {
		t.Errorf("entry_sharp %g, exit %g; want 0.5 and 1", k("entry_sharp"), k("exit"))
	}
	if !(k("elbow90lr") < k("elbow90")) || !(k("gate") < k("globe")) || !(k("entry_round") < k("entry_sharp")) || !(k("entry_sharp") < k("entry_reentrant")) {
		t.Error("fitting K values out of their usual order")
	}
}

func TestFittingLookup(t *testing.T) {
	if f, err := LookupFitting(" Gate "); err != nil || f.Key != "gate" {
		t.Errorf("LookupFitting(\" Gate \") = %+v, %v", f, err)
	}
	var fe *FieldError
	if _, err := LookupFitting("valve9"); !errors.As(err, &fe) || fe.Field != "fit" {
		t.Errorf("LookupFitting(\"valve9\"): %v, want *FieldError for \"fit\"", err)
	}
}

func TestFittingSuddenExpansion(t *testing.T) {
	// Borda–Carnot: K = (1 − (d1/d2)²)² on the upstream velocity.
	cases := []struct{ d1, d2, k float64 }{
		{0.1, 0.1, 0},                 // no area change, no loss
		{0.1, 0.2, 0.5625},            // (1 − 1/4)²
		{0.1, 0.1 * math.Sqrt2, 0.25}, // area ratio 1/2: (1 − 1/2)²
	}
	for _, c := range cases {
		k, err := SuddenExpansionK(c.d1, c.d2)
		if err != nil || math.Abs(k-c.k) > 1e-15 {
			t.Errorf("SuddenExpansionK(%g, %g) = %.17g, %v; want %.17g", c.d1, c.d2, k, err, c.k)
		}
	}
	// Expansion into a reservoir: K → 1, the exit loss (Borda–Carnot).
	k, err := SuddenExpansionK(0.1, 1e5)
	exit, _ := LookupFitting("exit")
	if err != nil || math.Abs(k-exit.K) > 1e-9 {
		t.Errorf("SuddenExpansionK(0.1, 1e5) = %.12g, %v; want → %g", k, err, exit.K)
	}
}

func TestFittingSuddenContraction(t *testing.T) {
	// K = 0.5(1 − (d2/d1)²) on the downstream velocity (textbook
	// approximation, from memory): 0 for equal diameters, → the sharp
	// entrance value 0.5 for a large upstream vessel.
	if k, err := SuddenContractionK(0.1, 0.1); err != nil || k != 0 {
		t.Errorf("SuddenContractionK(0.1, 0.1) = %g, %v", k, err)
	}
	if k, err := SuddenContractionK(0.2, 0.1); err != nil || math.Abs(k-0.375) > 1e-15 {
		t.Errorf("SuddenContractionK(0.2, 0.1) = %g, %v; want 0.375", k, err)
	}
	entry, _ := LookupFitting("entry_sharp")
	if k, err := SuddenContractionK(1e5, 0.1); err != nil || math.Abs(k-entry.K) > 1e-9 {
		t.Errorf("SuddenContractionK(1e5, 0.1) = %g, %v; want → %g", k, err, entry.K)
	}
}

func TestFittingAreaChangeValidation(t *testing.T) {
	nan := math.NaN()
	fns := map[string]func(d1, d2 float64) (float64, error){
		"SuddenExpansionK": SuddenExpansionK, "SuddenContractionK": SuddenContractionK,
	}
	cases := []struct {
		d1, d2 float64
		field  string
	}{
		{0, 0.1, "d1"}, {-0.1, 0.1, "d1"}, {nan, 0.1, "d1"}, {math.Inf(1), 0.1, "d1"},
		{0.1, 0, "d2"}, {0.1, nan, "d2"}, {0.1, math.Inf(1), "d2"},
	}
	for name, fn := range fns {
		for _, c := range cases {
			var fe *FieldError
			if k, err := fn(c.d1, c.d2); !errors.As(err, &fe) || fe.Field != c.field {
				t.Errorf("%s(%g, %g) = %g, %v; want *FieldError for %q", name, c.d1, c.d2, k, err, c.field)
			}
		}
	}
	var fe *FieldError
	if _, err := SuddenExpansionK(0.2, 0.1); !errors.As(err, &fe) || fe.Field != "d2" {
		t.Errorf("SuddenExpansionK(0.2, 0.1): %v, want *FieldError for \"d2\"", err)
	}
	if _, err := SuddenContractionK(0.1, 0.2); !errors.As(err, &fe) || fe.Field != "d2" {
		t.Errorf("SuddenContractionK(0.1, 0.2): %v, want *FieldError for \"d2\"", err)
	}
}
