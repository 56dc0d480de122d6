package present

import (
	"testing"

	"fieldhead/calc/scenario"
)

func BenchmarkZZEvaluate(b *testing.B) {
	s := scenario.Demo()
	for i := 0; i < b.N; i++ {
		scenario.Evaluate(scenario.Read(s))
	}
}

func BenchmarkZZBuildBalance(b *testing.B) {
	s := scenario.Demo()
	d := scenario.NewDraft(s)
	r := scenario.Evaluate(scenario.Read(s))
	for i := 0; i < b.N; i++ {
		Build(&d, r)
	}
}

func BenchmarkZZBuildLine(b *testing.B) {
	s := scenario.Demo()
	_ = s.Set("view", "line")
	d := scenario.NewDraft(s)
	r := scenario.Evaluate(scenario.Read(s))
	for i := 0; i < b.N; i++ {
		Build(&d, r)
	}
}
