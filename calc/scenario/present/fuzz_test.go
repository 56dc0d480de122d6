package present

import (
	"reflect"
	"strings"
	"testing"

	"fieldhead/calc/scenario"
)

// FuzzBuild: any link, read, worked out and worded on every view, draws:
// no panic, and no "NaN" or "Inf" in any text of the view model. This
// project's own rule (bad input gets a message, never a crash or a
// number that is not one), no external source. Once, a closed loop of
// water failed here (the pressure of its properties had no words).
func FuzzBuild(f *testing.F) {
	f.Add(scenario.Demo().Encode())
	f.Add(scenario.TurbineDemo().Encode())
	f.Add(scenario.PumpTestDemo().Encode())
	f.Add("name=Loop&loop=1&liq=water&t=7C&q=12L/s&pexp=150kPa&zexp=10m&zp=0m&tc=0.5s" +
		"&s1.l=120m&s1.nps=3&s1.sch=40&s1.mat=steel&s1.fit=elbow90:4&s1.cmp=chiller:45kPa@12L/s,valve:kv40%20fl0.9")
	f.Add("loop=1&liq=pg&gly=30%&t=60C&qby=load&load=250kW&tsup=7C&tret=12C&s1.l=10m&s1.d=50mm")
	f.Add("liq=seawater&sal=120&t=30C&view=convert&cv=1e300kPa")
	f.Add("%zz&name=%3Cb%3E&view=report&units=us")
	f.Fuzz(func(t *testing.T, q string) {
		s, _ := scenario.Parse(q)
		// A link that holds the words itself may show them back (a title, a
		// box as typed).
		lower := strings.ToLower(q)
		typed := strings.Contains(lower, "nan") || strings.Contains(lower, "inf")
		for _, v := range Views {
			sc := s.Clone()
			if err := sc.Set("view", v.Key); err != nil {
				t.Fatal(err)
			}
			d := scenario.NewDraft(sc)
			sh := Build(&d, scenario.Evaluate(scenario.Read(d.Scen)))
			walk(reflect.ValueOf(sh), "", func(name, text string) {
				for _, w := range strings.Fields(text) {
					if !typed && (w == "NaN" || w == "+Inf" || w == "-Inf" || w == "Inf") {
						t.Errorf("%.80q, %s view: %s says %q", q, v.Key, name, text)
					}
				}
			})
		}
	})
}
