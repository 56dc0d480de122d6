package present

import (
	"testing"

	"fieldhead/calc/scenario"
)

// The view model's share of an edit: what the page does in Go after each
// key, natively (the wasm runs it a few times slower). BenchmarkEvaluate
// reads and evaluates the demo; the Build benchmarks word its Balance and
// Line views.

func BenchmarkEvaluate(b *testing.B) {
	s := scenario.Demo()
	for b.Loop() {
		scenario.Evaluate(scenario.Read(s))
	}
}

func BenchmarkBuildBalance(b *testing.B) {
	benchBuild(b, "balance")
}

func BenchmarkBuildLine(b *testing.B) {
	benchBuild(b, "line")
}

func benchBuild(b *testing.B, view string) {
	s := scenario.Demo()
	_ = s.Set("view", view)
	d := scenario.NewDraft(s)
	r := scenario.Evaluate(scenario.Read(s))
	for b.Loop() {
		Build(&d, r)
	}
}
