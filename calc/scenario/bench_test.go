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
