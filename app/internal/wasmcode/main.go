//go:build !wasm

// Command wasmcode lists the code of a Go wasm module by package: the
// bytes of the function bodies (the code section) each package holds, the
// same deflated (a rough guide to what it weighs compressed), the data
// section's size and the biggest functions. `go tool nm` does not read
// wasm; this reads the module's name section, which a build without -s
// keeps:
//
//	GOOS=js GOARCH=wasm go build -trimpath -gcflags=all=-l -gcflags=runtime= -gcflags=internal/runtime/maps= -gcflags=syscall/js= -o /tmp/app-sym.wasm ./app
//	go run ./app/internal/wasmcode -top 40 /tmp/app-sym.wasm
//	go run ./app/internal/wasmcode -pkg fieldhead_calc_scenario /tmp/app-sym.wasm
//
// The names are as Go's linker writes them there: '/' and '.' of a
// package path read '_' ("fieldhead_calc_scenario_present").
// (Source: the WebAssembly core specification, binary format, and its
// appendix on the name section.)
package main

import (
	"bytes"
	"compress/flate"
	"encoding/binary"
	"errors"
	"flag"
	"fmt"
	"log"
	"os"
	"sort"
	"strings"
)

// module is what wasmcode reads of a wasm module.
type module struct {
	bodies [][]byte       // the code section's function bodies, in order
	names  map[int]string // function index (imports first) → name
	nimp   int            // imported functions
	data   int            // the data section's size
}

var errShort = errors.New("wasmcode: truncated module")

// uleb reads an unsigned LEB128 number at b[*i:].
func uleb(b []byte, i *int) (int, error) {
	v, n := binary.Uvarint(b[*i:])
	if n <= 0 {
		return 0, errShort
	}
	*i += n
	return int(v), nil
}

// read parses the sections wasmcode needs; others are skipped.
func read(b []byte) (*module, error) {
	if len(b) < 8 || string(b[:4]) != "\x00asm" {
		return nil, errors.New("wasmcode: not a wasm module")
	}
	m := &module{names: map[int]string{}}
	for i := 8; i < len(b); {
		id := b[i]
		i++
		n, err := uleb(b, &i)
		if err != nil || i+n > len(b) {
			return nil, errShort
		}
		sec := b[i : i+n]
		i += n
		switch id {
		case 2: // imports: only functions take function indices
			if err := m.imports(sec); err != nil {
				return nil, err
			}
		case 10: // code
			j := 0
			cnt, err := uleb(sec, &j)
			for k := 0; err == nil && k < cnt; k++ {
				var l int
				if l, err = uleb(sec, &j); err == nil && j+l <= len(sec) {
					m.bodies = append(m.bodies, sec[j:j+l])
					j += l
				} else if err == nil {
					err = errShort
				}
			}
			if err != nil {
				return nil, err
			}
		case 11: // data
			m.data = n
		case 0: // custom: the "name" section's function names (subsection 1)
			j := 0
			l, err := uleb(sec, &j)
			if err != nil || j+l > len(sec) || string(sec[j:j+l]) != "name" {
				continue
			}
			j += l
			for j < len(sec) {
				sub := sec[j]
				j++
				sl, err := uleb(sec, &j)
				if err != nil || j+sl > len(sec) {
					return nil, errShort
				}
				if sub == 1 {
					if err := m.funcNames(sec[j : j+sl]); err != nil {
						return nil, err
					}
				}
				j += sl
			}
		}
	}
	return m, nil
}

func (m *module) imports(sec []byte) error {
	j := 0
	cnt, err := uleb(sec, &j)
	for k := 0; err == nil && k < cnt; k++ {
		for f := 0; f < 2 && err == nil; f++ { // module and field names
			var l int
			l, err = uleb(sec, &j)
			j += l
		}
		if err != nil || j >= len(sec) {
			return errShort
		}
		kind := sec[j]
		j++
		switch kind {
		case 0: // function: a type index
			_, err = uleb(sec, &j)
			m.nimp++
		case 1: // table: element type, limits
			j++
			fallthrough
		case 2: // memory: limits
			if j >= len(sec) {
				return errShort
			}
			flags := sec[j]
			j++
			if _, err = uleb(sec, &j); err == nil && flags&1 != 0 {
				_, err = uleb(sec, &j)
			}
		case 3: // global: value type, mutability
			j += 2
		}
	}
	return err
}

func (m *module) funcNames(b []byte) error {
	j := 0
	cnt, err := uleb(b, &j)
	for k := 0; err == nil && k < cnt; k++ {
		var idx, l int
		if idx, err = uleb(b, &j); err != nil {
			break
		}
		if l, err = uleb(b, &j); err == nil && j+l <= len(b) {
			m.names[idx] = string(b[j : j+l])
			j += l
		} else if err == nil {
			err = errShort
		}
	}
	return err
}

// pkgOf is the package of a function name as the linker writes it: what
// comes before the first '.', after a leading "github.com".
func pkgOf(name string) string {
	host := ""
	if rest, ok := strings.CutPrefix(name, "github.com"); ok {
		host, name = "github.com", rest
	}
	if d := strings.IndexByte(name, '.'); d >= 0 {
		name = name[:d]
	}
	return host + name
}

func deflated(b []byte) int {
	var z bytes.Buffer
	w, _ := flate.NewWriter(&z, flate.BestCompression)
	w.Write(b)
	w.Close()
	return z.Len()
}

func main() {
	top := flag.Int("top", 30, "how many of the biggest functions to list")
	only := flag.String("pkg", "", "list only the functions of packages whose name starts so")
	flag.Parse()
	if flag.NArg() != 1 {
		log.Fatal("usage: wasmcode [-top n] [-pkg prefix] app.wasm (built without -s)")
	}
	b, err := os.ReadFile(flag.Arg(0))
	if err != nil {
		log.Fatal(err)
	}
	m, err := read(b)
	if err != nil {
		log.Fatal(err)
	}
	if len(m.names) == 0 {
		log.Fatal("wasmcode: no name section: build without -ldflags=-s")
	}
	type fn struct {
		name string
		size int
	}
	var fns []fn
	size, code := map[string]int{}, map[string][]byte{}
	total := 0
	for k, body := range m.bodies {
		name := m.names[m.nimp+k]
		p := pkgOf(name)
		size[p] += len(body)
		code[p] = append(code[p], body...)
		total += len(body)
		if *only == "" || strings.HasPrefix(p, *only) {
			fns = append(fns, fn{name, len(body)})
		}
	}
	fmt.Printf("code %d B in %d functions; data section %d B\n", total, len(m.bodies), m.data)
	var pkgs []string
	for p := range size {
		if *only == "" || strings.HasPrefix(p, *only) {
			pkgs = append(pkgs, p)
		}
	}
	sort.Slice(pkgs, func(i, j int) bool { return size[pkgs[i]] > size[pkgs[j]] })
	fmt.Printf("%9s %9s  package\n", "code B", "deflated")
	for _, p := range pkgs[:min(len(pkgs), 30)] {
		fmt.Printf("%9d %9d  %s\n", size[p], deflated(code[p]), p)
	}
	sort.Slice(fns, func(i, j int) bool { return fns[i].size > fns[j].size })
	fmt.Printf("%9s  function\n", "code B")
	for _, f := range fns[:min(len(fns), *top)] {
		fmt.Printf("%9d  %s\n", f.size, f.name)
	}
}
