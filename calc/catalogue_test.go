package calc

import (
	"errors"
	"strings"
	"testing"
)

func TestCatalogues(t *testing.T) {
	// Each catalogue in its own notation, with its classes and material.
	want := map[string]struct {
		notation string
		classes  []string
	}{
		"steel":  {"NPS", []string{"40", "80", "STD", "XS"}},
		"ss":     {"NPS", []string{"5S", "10S", "40S", "80S"}},
		"pvc":    {"NPS (IPS)", []string{"PVC40", "PVC80", "PVC-SDR21", "PVC-SDR26"}},
		"copper": {"nominal inch", []string{"K", "L", "M"}},
		"pe":     {"OD mm", []string{"SDR9", "SDR11", "SDR13.6", "SDR17", "SDR21", "SDR26"}},
		"di":     {"DN", []string{"K9"}},
	}
	cats := Catalogues()
	if len(cats) != len(want) {
		t.Fatalf("%d catalogues, want %d", len(cats), len(want))
	}
	total := 0
	for _, c := range cats {
		w := want[c.Key]
		if c.Notation != w.notation || strings.Join(c.Classes, ",") != strings.Join(w.classes, ",") || c.Source == "" {
			t.Errorf("catalogue %+v, want notation %q classes %v", c, w.notation, w.classes)
		}
		if _, err := LookupMaterial(c.Material); err != nil {
			t.Errorf("catalogue %s: material %v", c.Key, err)
		}
		got, err := LookupCatalogue(strings.ToUpper(c.Key))
		if err != nil || got.Key != c.Key {
			t.Errorf("LookupCatalogue(%q) = %+v, %v", c.Key, got, err)
		}
		for _, cl := range c.Classes {
			sizes, err := c.Sizes(cl)
			if err != nil || len(sizes) < 5 {
				t.Errorf("%s %s: %d sizes, %v", c.Key, cl, len(sizes), err)
			}
			for _, p := range sizes {
				// Only the catalogues checked against python3-fluids are
				// free of the "from memory" mark.
				memo := c.Key == "copper" || c.Key == "pe" || c.Key == "di"
				if p.Catalogue != c.Key || p.FromMemory != memo {
					t.Errorf("%+v in catalogue %s", p, c.Key)
				}
			}
			total += len(sizes)
		}
		if _, err := c.Sizes("nonesuch"); err == nil {
			t.Errorf("%s: unknown class accepted", c.Key)
		}
	}
	if total != len(PipeSizes()) {
		t.Errorf("catalogues list %d sizes, PipeSizes %d", total, len(PipeSizes()))
	}
	var fe *FieldError
	if _, err := LookupCatalogue("brass"); !errors.As(err, &fe) || fe.Field != "cat" {
		t.Errorf("LookupCatalogue(\"brass\"): %v", err)
	}
}

func TestPipeLabelsAndDN(t *testing.T) {
	// DN beside NPS, ASME B36.10M (from memory): NPS 8 is DN 200, NPS 1-1/2
	// is DN 40.
	for nps, dn := range map[string]int{"8": 200, "1-1/2": 40, "24": 600, "3-1/2": 90} {
		if got := SteelDN(nps); got != dn {
			t.Errorf("SteelDN(%q) = %d, want %d", nps, got, dn)
		}
		if got := SteelNPS(dn); got != nps {
			t.Errorf("SteelNPS(%d) = %q, want %q", dn, got, nps)
		}
	}
	if SteelDN("7") != 0 || SteelNPS(210) != "" {
		t.Error("unlisted sizes should give 0 and \"\"")
	}
	byDN, err := LookupPipe("DN 200", "40")
	byNPS, _ := LookupPipe("8", "40")
	if err != nil || byDN != byNPS || byDN.DN != 200 {
		t.Errorf("LookupPipe(\"DN 200\", \"40\") = %+v, %v", byDN, err)
	}
	for _, c := range []struct{ nps, sch, label string }{
		{"8", "40", "NPS 8 sch 40"}, {"2", "pvc sdr 21", "NPS 2 PVC-SDR21"}, {"1/2", "type L", "1/2 in type L"},
		{"160", "SDR 13.6", "OD 160 SDR13.6"}, {"DN200", "K9", "DN 200 K9"},
	} {
		p, err := LookupPipe(c.nps, c.sch)
		if err != nil || p.Label() != c.label {
			t.Errorf("LookupPipe(%q, %q).Label() = %q, %v; want %q", c.nps, c.sch, p.Label(), err, c.label)
		}
	}
}

// BenchmarkPipeTables is the first look-up of a pipe size in a page's
// life: every class's table built (frBuild), as the page does on opening
// a sheet with a pipe from the catalogue.
func BenchmarkPipeTables(b *testing.B) {
	for b.Loop() {
		frBuild()
	}
}
