//go:build !wasm

package main

import (
	"bytes"
	"encoding/binary"
	"errors"
	"fmt"
	"regexp"
	"sort"
	"strings"
)

// `go tool nm` does not read WebAssembly, so the composition of app.wasm
// is read here from the module itself: the code section gives the size of
// every function body, the "name" custom section (present unless the build
// strips it with -ldflags=-s) gives each function's Go name, and so its
// package. Go's data (strings, tables, type data) sits in the data section
// and is reported as one figure.

// wasmParts is the composition of a wasm module.
type wasmParts struct {
	total    int
	data     int            // data section
	code     int            // code section
	other    int            // everything else (types, imports, names, …)
	packages map[string]int // code bytes per Go package
	funcs    map[string]int // code bytes per function
}

// readUvarint reads an unsigned LEB128.
func readUvarint(b []byte) (uint64, int, error) {
	v, n := binary.Uvarint(b)
	if n <= 0 {
		return 0, 0, errors.New("bad LEB128")
	}
	return v, n, nil
}

// analyseWasm splits a module into sections and its code into packages.
func analyseWasm(mod []byte) (wasmParts, error) {
	p := wasmParts{total: len(mod), packages: map[string]int{}}
	if len(mod) < 8 || !bytes.Equal(mod[:4], []byte("\x00asm")) {
		return p, errors.New("not a WebAssembly module")
	}
	var imported int
	var bodies []int
	names := map[int]string{}
	for off := 8; off < len(mod); {
		id := mod[off]
		size, n, err := readUvarint(mod[off+1:])
		if err != nil {
			return p, err
		}
		start := off + 1 + n
		end := start + int(size)
		if end > len(mod) {
			return p, errors.New("section runs past the end")
		}
		sec := mod[start:end]
		switch id {
		case 2: // imports: count the imported functions
			cnt, k, err := readUvarint(sec)
			if err != nil {
				return p, err
			}
			q := k
			for i := 0; i < int(cnt); i++ {
				for j := 0; j < 2; j++ { // module and field names
					l, k, err := readUvarint(sec[q:])
					if err != nil {
						return p, err
					}
					q += k + int(l)
				}
				kind := sec[q]
				q++
				switch kind {
				case 0: // function: type index
					_, k, _ := readUvarint(sec[q:])
					q += k
					imported++
				case 1: // table: elem type, limits
					q++
					q += skipLimits(sec[q:])
				case 2: // memory: limits
					q += skipLimits(sec[q:])
				case 3: // global: type, mutability
					q += 2
				}
			}
			p.other += end - off
		case 10: // code
			cnt, k, err := readUvarint(sec)
			if err != nil {
				return p, err
			}
			q := k
			for i := 0; i < int(cnt); i++ {
				l, k, err := readUvarint(sec[q:])
				if err != nil {
					return p, err
				}
				bodies = append(bodies, k+int(l))
				q += k + int(l)
			}
			p.code += end - off
		case 11:
			p.data += end - off
		case 0: // custom: read "name"
			l, k, err := readUvarint(sec)
			if err == nil && string(sec[k:k+int(l)]) == "name" {
				readNames(sec[k+int(l):], names)
			}
			p.other += end - off
		default:
			p.other += end - off
		}
		off = end
	}
	if len(names) == 0 {
		return p, errors.New("no function names: build without -ldflags=-s to see the packages")
	}
	p.funcs = map[string]int{}
	for i, size := range bodies {
		p.packages[goPackage(names[imported+i])] += size
		p.funcs[names[imported+i]] += size
	}
	return p, nil
}

func skipLimits(b []byte) int {
	flag := b[0]
	n := 1
	_, k, _ := readUvarint(b[n:])
	n += k
	if flag&1 != 0 {
		_, k, _ = readUvarint(b[n:])
		n += k
	}
	return n
}

// readNames reads the function-name subsection (id 1) of a name section.
func readNames(b []byte, names map[int]string) {
	for len(b) > 0 {
		id := b[0]
		size, n, err := readUvarint(b[1:])
		if err != nil || 1+n+int(size) > len(b) {
			return
		}
		sub := b[1+n : 1+n+int(size)]
		b = b[1+n+int(size):]
		if id != 1 {
			continue
		}
		cnt, k, _ := readUvarint(sub)
		q := k
		for i := 0; i < int(cnt) && q < len(sub); i++ {
			idx, k, _ := readUvarint(sub[q:])
			q += k
			l, k, _ := readUvarint(sub[q:])
			q += k
			names[int(idx)] = string(sub[q : q+int(l)])
			q += int(l)
		}
	}
}

// domain matches the host part of a module path as the wasm linker
// writes it ("github.com_…", "golang.org_…").
var domain = regexp.MustCompile(`^[a-z0-9-]+\.(com|org|net|io|in|dev|dk)_`)

// goPackage is the package of a symbol as the wasm linker names it: the
// package path with "/" written "_", then "." and the symbol
// ("github.com_maxence_charriere_go_app_v10_pkg_app.__htmlLabel_.Body").
func goPackage(sym string) string {
	if sym == "" {
		return "(unnamed)"
	}
	from := 0
	if m := domain.FindString(sym); m != "" {
		from = len(m)
	}
	if dot := strings.IndexByte(sym[from:], '.'); dot >= 0 {
		return sym[:from+dot]
	}
	return sym
}

// topPackages lists the n largest packages by code size.
func (p wasmParts) topPackages(n int) []string {
	type kv struct {
		k string
		v int
	}
	var all []kv
	for k, v := range p.packages {
		all = append(all, kv{k, v})
	}
	sort.Slice(all, func(i, j int) bool { return all[i].v > all[j].v })
	var out []string
	for i, e := range all {
		if i == n {
			break
		}
		out = append(out, fmt.Sprintf("%-58s %8.1f KiB", e.k, float64(e.v)/1024))
	}
	return out
}
