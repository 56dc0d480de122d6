//go:build !wasm

package main

import (
	"bytes"
	"testing"
)

// section frames a section: its id, its size (LEB128, one byte here) and
// its contents. (Source: the WebAssembly core specification, 5.5.2
// Sections.)
func section(id byte, b ...byte) []byte { return append([]byte{id, byte(len(b))}, b...) }

// A module written out by hand from the specification: one imported
// function, two defined ones with bodies of 4 and 2 bytes, a data
// section of 3 bytes, and a name section (appendix 7.4) naming
// functions 1 and 2. The reader must put the names on the defined
// functions past the import.
func TestRead(t *testing.T) {
	var b bytes.Buffer
	b.WriteString("\x00asm\x01\x00\x00\x00")
	b.Write(section(2, 1, 2, 'g', 'o', 1, 'f', 0, 0))  // import go.f, a function of type 0
	b.Write(section(10, 2, 3, 0, 0x01, 0x0b, 1, 0x0b)) // bodies: [0 nop end], [end] with their sizes
	b.Write(section(11, 9, 9, 9))
	names := []byte{4, 'n', 'a', 'm', 'e', 1, 0}
	sub := []byte{2, 1, 9}
	sub = append(sub, "fieldhead_calc.F"...)
	sub = append(sub, 2, 12)
	sub = append(sub, "runtime.main"...)
	sub[2] = byte(len("fieldhead_calc.F"))
	names[6] = byte(len(sub))
	b.Write(section(0, append(names, sub...)...))
	m, err := read(b.Bytes())
	if err != nil {
		t.Fatal(err)
	}
	if m.nimp != 1 || len(m.bodies) != 2 || len(m.bodies[0]) != 3 || len(m.bodies[1]) != 1 || m.data != 3 {
		t.Fatalf("read: %d imports, bodies %v, data %d", m.nimp, m.bodies, m.data)
	}
	if m.names[1] != "fieldhead_calc.F" || m.names[2] != "runtime.main" {
		t.Fatalf("names %v", m.names)
	}
	if _, err := read([]byte("\x00asm\x01\x00\x00\x00\x0a\x05\x01")); err == nil {
		t.Error("a truncated code section read without error")
	}
}

// The packages of names as Go's linker writes them in the name section.
func TestPkgOf(t *testing.T) {
	for name, want := range map[string]string{
		"fieldhead_calc_scenario_present.__builder_.pumpChart":                   "fieldhead_calc_scenario_present",
		"github.com_maxence_charriere_go_app_v10_pkg_app.nodeManager.updateHTML": "github.com_maxence_charriere_go_app_v10_pkg_app",
		"type_.eq._7_fieldhead_calc_scenario_present.Cell":                       "type_",
		"main.__card_.block": "main",
		"runtime.main":       "runtime",
	} {
		if got := pkgOf(name); got != want {
			t.Errorf("pkgOf(%q) = %q, want %q", name, got, want)
		}
	}
}
