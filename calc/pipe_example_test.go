package calc_test

import (
	"fmt"

	"fieldhead/calc"
)

// The catalogues, each with its notation and classes.
func ExampleCatalogues() {
	for _, c := range calc.Catalogues() {
		fmt.Printf("%s (%s): %v\n", c.Key, c.Notation, c.Classes)
	}
	// Output:
	// steel (NPS): [40 80 STD XS]
	// ss (NPS): [5S 10S 40S 80S]
	// pvc (NPS (IPS)): [PVC40 PVC80 PVC-SDR21 PVC-SDR26]
	// copper (nominal inch): [K L M]
	// pe (OD mm): [SDR9 SDR11 SDR13.6 SDR17 SDR21 SDR26]
	// di (DN): [K9]
}

// Sizes written in each catalogue's own notation.
func ExampleLookupPipe() {
	for _, q := range [][2]string{{"DN 150", "40"}, {"3/4", "type L"}, {"90", "SDR 17"}, {"300", "K9"}} {
		p, err := calc.LookupPipe(q[0], q[1])
		if err != nil {
			fmt.Println(err)
			continue
		}
		fmt.Printf("%s: ID %.2f mm (%s)\n", p.Label(), p.ID*1000, p.Standard)
	}
	// Output:
	// NPS 6 sch 40: ID 154.08 mm (ASME B36.10M)
	// 3/4 in type L: ID 19.94 mm (ASTM B88)
	// OD 90 SDR17: ID 79.20 mm (ISO 4427)
	// DN 300 K9: ID 305.60 mm (ISO 2531 / ISO 4179)
}
