package wasmdata

import (
	"bytes"
	"os"
	"os/exec"
	"path/filepath"
	"runtime"
	"testing"
)

// image lays out a module's data segments as memory would hold them at
// start (zero where no segment writes), and counts the segments.
func image(t *testing.T, wasm []byte) ([]byte, int) {
	t.Helper()
	segs, found, err := dataSegments(wasm)
	if err != nil || !found {
		t.Fatalf("the module's data: %v (a data section: %v)", err, found)
	}
	return newMemory(segs).image, len(segs)
}

// module is a WebAssembly module with one memory and the given data
// section body, hand-assembled after the WebAssembly core specification
// (binary format, sections 5.5.2, 5.5.8 and 5.5.14).
func module(data []byte) []byte {
	m := []byte("\x00asm\x01\x00\x00\x00")
	m = append(m, 5, 3, 1, 0, 1) // memory section: one memory, at least 1 page
	m = append(m, 11)
	m = appendULEB(m, uint64(len(data)))
	m = append(m, data...)
	return append(m, 0, 4, 3, 'x', 'y', 'z') // a custom section after it
}

// TestMergeSynthetic: segments written out of address order, 3, 10 and
// 300 bytes apart (one at an address whose LEB128 form needs the sign
// bit's extra byte), merge into the same memory; the custom section after
// the data section is kept.
func TestMergeSynthetic(t *testing.T) {
	segs := []segment{{0x40, []byte("mno")}, {0x10, []byte("abc")}, {0x16, []byte("de")}, {0x22, []byte("fgh")}, {0x16e, []byte("z")}}
	in := module(writeSegments(segs))
	for _, tc := range []struct{ gap, segments int }{{0, 5}, {3, 4}, {10, 3}, {29, 2}, {300, 1}} {
		out, err := Merge(in, tc.gap)
		if err != nil {
			t.Fatal(err)
		}
		want, _ := image(t, in)
		got, n := image(t, out)
		if !bytes.Equal(got, want) {
			t.Errorf("gap %d: memory differs from the segments' (%d bytes, want %d)", tc.gap, len(got), len(want))
		}
		if n != tc.segments {
			t.Errorf("gap %d: %d segments, want %d", tc.gap, n, tc.segments)
		}
		if !bytes.HasSuffix(out, []byte{0, 4, 3, 'x', 'y', 'z'}) {
			t.Errorf("gap %d: the custom section after the data is lost", tc.gap)
		}
	}
	overlap := module(writeSegments([]segment{{0x10, []byte("abcd")}, {0x12, []byte("x")}}))
	if _, err := Merge(overlap, DefaultGap); err == nil {
		t.Error("overlapping segments merged without an error")
	}
	if _, err := Merge([]byte("not wasm"), DefaultGap); err == nil {
		t.Error("a file that is no module merged without an error")
	}
	noData := []byte("\x00asm\x01\x00\x00\x00")
	if out, err := Merge(noData, DefaultGap); err != nil || !bytes.Equal(out, noData) {
		t.Errorf("a module without data: %v, %q", err, out)
	}
}

// TestMergeGoProgram: a Go program built for the browser by the Go
// toolchain runs under Node.js with Go's own wasm_exec.js and prints the
// same after Merge, whose memory image is the linker's byte for byte, in
// fewer segments.
func TestMergeGoProgram(t *testing.T) {
	src := `package main

import (
	"fmt"
	"strings"
	"unicode"
)

var table = [...]float64{1.5, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 2.25, -0.125}

func main() {
	fmt.Println(strings.ToUpper("wasm data"), table, unicode.IsUpper('Q'), strings.Repeat("ab", 3))
}
`
	in := buildProbe(t, src)
	out, err := Merge(in, DefaultGap)
	if err != nil {
		t.Fatal(err)
	}
	want, nIn := image(t, in)
	got, nOut := image(t, out)
	if !bytes.Equal(got, want) {
		t.Fatal("the merged module's memory image differs from the linker's")
	}
	if nOut >= nIn {
		t.Errorf("%d segments merged into %d", nIn, nOut)
	}
	const printed = "WASM DATA [1.5 0 0 0 0 0 0 0 0 0 0 0 0 0 2.25 -0.125] true ababab\n"
	if a, b := runProbe(t, in), runProbe(t, out); a != printed || b != printed {
		t.Errorf("printed %q as built and %q merged, want %q", a, b, printed)
	}
}

// buildProbe builds the Go program src for GOOS=js GOARCH=wasm, as the
// site's wasm is built (-trimpath, -s -w), and returns the module; it
// skips the test in -short mode or where Node.js, which runs it, is
// missing.
func buildProbe(t *testing.T, src string) []byte {
	t.Helper()
	if testing.Short() {
		t.Skip("builds a Go program for wasm")
	}
	if _, err := exec.LookPath("node"); err != nil {
		t.Skip("no node")
	}
	dir := t.TempDir()
	if err := os.WriteFile(filepath.Join(dir, "main.go"), []byte(src), 0o644); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(filepath.Join(dir, "go.mod"), []byte("module probe\n\ngo 1.22\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	wasm := filepath.Join(dir, "probe.wasm")
	build := exec.Command("go", "build", "-trimpath", "-ldflags=-s -w", "-o", wasm, ".")
	build.Dir = dir
	build.Env = append(os.Environ(), "GOOS=js", "GOARCH=wasm", "GOFLAGS=")
	if out, err := build.CombinedOutput(); err != nil {
		t.Fatalf("building the probe: %v\n%s", err, out)
	}
	in, err := os.ReadFile(wasm)
	if err != nil {
		t.Fatal(err)
	}
	return in
}

// runProbe runs the module under Node.js with Go's wasm_exec_node.js and
// returns what it printed (both streams).
func runProbe(t *testing.T, wasm []byte) string {
	t.Helper()
	path := filepath.Join(t.TempDir(), "probe.wasm")
	if err := os.WriteFile(path, wasm, 0o644); err != nil {
		t.Fatal(err)
	}
	cmd := exec.Command("node", filepath.Join(runtime.GOROOT(), "lib", "wasm", "wasm_exec_node.js"), path)
	b, err := cmd.CombinedOutput()
	if err != nil {
		t.Fatalf("running the probe: %v\n%s", err, b)
	}
	return string(b)
}
