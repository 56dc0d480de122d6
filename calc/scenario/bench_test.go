package scenario

import "testing"

// BenchmarkEvaluateDemo is one keystroke's worth of computing: the whole
// demo (balance, line, system curve, operating point, NPSH, field check).
func BenchmarkEvaluateDemo(b *testing.B) {
	s := Demo()
	for i := 0; i < b.N; i++ {
		if r := Evaluate(Read(s)); len(r.Errors) > 0 {
			b.Fatal(r.Errors)
		}
	}
}

// BenchmarkReadDemo is the reading of the inputs alone (every parameter
// parsed once).
func BenchmarkReadDemo(b *testing.B) {
	s := Demo()
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		Read(s)
	}
}

// BenchmarkUsesDemo is the table of what each part reads, asked of every
// part (Evaluate asks it only when an input is in error).
func BenchmarkUsesDemo(b *testing.B) {
	in := Read(Demo())
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		for _, p := range Parts() {
			in.AnyBad(in.Uses(p)...)
		}
	}
}
