package wasmflags

import (
	"os"
	"reflect"
	"strings"
	"testing"
)

// TestMakefile holds the Makefile's wasm build to GC: the site make builds
// and the sites the tests and the bench build are the same program.
func TestMakefile(t *testing.T) {
	b, err := os.ReadFile("../../../Makefile")
	if err != nil {
		t.Fatal(err)
	}
	for _, line := range strings.Split(string(b), "\n") {
		if v, ok := strings.CutPrefix(line, "WASM_GCFLAGS := "); ok {
			if got := strings.Fields(v); !reflect.DeepEqual(got, GC) {
				t.Errorf("Makefile's WASM_GCFLAGS = %q, wasmflags.GC = %q", got, GC)
			}
			return
		}
	}
	t.Fatal("no WASM_GCFLAGS := line in the Makefile")
}
