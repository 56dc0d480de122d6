package calc

import (
	"strings"
	"sync"
)

// Catalogue is a family of pipe sizes under one standard, written in its
// own notation.
type Catalogue struct {
	Key      string   // "steel", "ss", "pvc", "copper", "pe", "di"
	Name     string   // human label
	Standard string   // the dimension standard(s)
	Notation string   // how sizes are written: "NPS", "NPS (IPS)", "nominal inch", "OD mm", "DN"
	Classes  []string // schedules, types, SDRs or wall classes, as LookupPipe takes them
	Material string   // key of the usual Material
	Source   string   // where the figures come from, and what is from memory
}

// catalogueTable holds the catalogues, in the order Catalogues reports
// them.
var catalogueTable = [...]Catalogue{
	{Key: "steel", Name: "carbon steel pipe", Standard: StandardB3610M, Notation: "NPS", Material: "steel",
		Source: "ASME B36.10M via python3-fluids fluids.piping (schedules 40, 80, STD, XS); DN beside NPS from memory"},
	{Key: "ss", Name: "stainless steel pipe", Standard: StandardB3619M, Notation: "NPS", Material: "ss",
		Source: "ASME B36.19M via python3-fluids fluids.piping (5S, 10S, 40S, 80S); DN beside NPS from memory"},
	{Key: "pvc", Name: "PVC pressure pipe", Standard: StandardD1785 + ", " + StandardD2241, Notation: "NPS (IPS)", Material: "pvc",
		Source: "ASTM D1785 schedules 40 and 80, ASTM D2241 SDR 21 and 26, via python3-fluids fluids.piping"},
	{Key: "copper", Name: "copper water tube", Standard: StandardB88, Notation: "nominal inch", Material: "copper",
		Source: "ASTM B88 types K, L, M from memory; outside diameters agree with python3-fluids' copper tube sizes (ASTM D2241 CTS) for 1–2 in"},
	{Key: "pe", Name: "polyethylene pipe", Standard: StandardPE, Notation: "OD mm", Material: "pe",
		Source: "ISO 4427 OD series and SDR 9–26, from memory; wall OD/(2S + 1) with S the exact ISO 4065 R10 series value, rounded up to 0.1 mm (ISO 4065 calculation, from memory)"},
	{Key: "di", Name: "ductile iron pipe, cement-mortar lined", Standard: StandardDI, Notation: "DN", Material: "ductile",
		Source: "ISO 2531 outside diameters and class K9 walls, ISO 4179 lining thickness, all from memory"},
}

// Catalogues returns every pipe catalogue with its classes. The slice is
// freshly built.
func Catalogues() []Catalogue {
	out := make([]Catalogue, len(catalogueTable))
	copy(out, catalogueTable[:])
	for i := range out {
		for _, c := range frClasses {
			if c.cat == out[i].Key {
				out[i].Classes = append(out[i].Classes, c.name)
			}
		}
	}
	return out
}

// LookupCatalogue returns the catalogue with the given key (case
// insensitive); an unknown key gives a *FieldError for field "cat".
func LookupCatalogue(key string) (Catalogue, error) {
	k := strings.ToLower(strings.TrimSpace(key))
	var keys []string
	for _, c := range Catalogues() {
		if c.Key == k {
			return c, nil
		}
		keys = append(keys, c.Key)
	}
	return Catalogue{}, NewFieldError("cat", UnknownChoice).Typed(key).OneOf(keys...)
}

// Sizes returns the sizes of one class of the catalogue, smallest first.
// An unknown class gives a *FieldError for field "sch".
func (c Catalogue) Sizes(class string) ([]PipeSize, error) {
	sch := frNormSchedule(class)
	for _, name := range c.Classes {
		if name == sch {
			return frClassPipes(sch), nil
		}
	}
	return nil, NewFieldError("sch", UnknownChoice).Typed(class).OneOf(c.Classes...).With("cat")
}

// SteelDN returns the DN that ASME B36.10M lists beside nominal pipe
// size nps ("8" → 200; from memory), or 0 for a size not listed.
func SteelDN(nps string) int {
	v, ok := frNPSValue(nps)
	if !ok {
		return 0
	}
	return steelDN(v)
}

// steelDN is SteelDN of a size read as a number.
func steelDN(v float64) int {
	for i, w := range frNPSValues() {
		if w == v {
			return frSteelDN[i]
		}
	}
	return 0
}

// frNPSValues is frNPS read as numbers, once: the pipe tables ask
// SteelDN for every steel row as a page opens, and reading the list anew
// each time made that first look-up cost ten times as much.
var frNPSValues = sync.OnceValue(func() []float64 {
	out := make([]float64, len(frNPS))
	for i, n := range frNPS {
		out[i], _ = frNPSValue(n)
	}
	return out
})

// SteelNPS returns the nominal pipe size ASME B36.10M lists beside DN dn
// (200 → "8"; from memory), or "" for a DN not listed.
func SteelNPS(dn int) string {
	for i, d := range frSteelDN {
		if d == dn {
			return frNPS[i]
		}
	}
	return ""
}
