package wasmdata

import (
	"bytes"
	"encoding/binary"
	"errors"
	"fmt"
	"sort"
)

// The Go runtime's function table (pclntab), as Go 1.20 to 1.26 lay it
// out for GOARCH=wasm (runtime/symtab.go, cmd/link/internal/ld/pcln.go):
// a header (magic 0xfffffff1, two zero bytes, the PC quantum 1, the
// pointer size 8, then eight 8-byte fields), the function names, the
// compilation units' file indexes (cutab), the file names, the
// PC-value tables (pctab), and the function table: nfunc+1 entries of
// (entry, offset of the function's _func) and the _func records.
const (
	pclnMagic     = 0xfffffff1
	pclnHeader    = 8 + 8*8
	funcPCSP      = 16 // _func's fields (runtime/runtime2.go)
	funcPCFile    = 20
	funcPCLn      = 24
	funcNPCData   = 28
	funcCU        = 32 // the function's compilation unit in cutab: only for its files
	funcStartLine = 36 // only for a Frame's StartLine and profiles
	funcPCData    = 44 // the pcdata offsets follow the fixed fields
	pclnMaxFuncs  = 1 << 24
)

// pcHeader is what DropLines reads of the table's header: the number of
// functions and the offsets, from the header, of the function names, the
// compilation units' file indexes, the file names, the PC-value tables
// and the function table.
type pcHeader struct{ nfunc, names, cu, files, pctab, funcs uint64 }

// readPCHeader reads the header at mem[at:], which holds at least
// pclnHeader bytes.
func readPCHeader(mem []byte, at int) pcHeader {
	h := func(i int) uint64 { return binary.LittleEndian.Uint64(mem[at+8+8*i:]) }
	return pcHeader{nfunc: h(0), names: h(3), cu: h(4), files: h(5), pctab: h(6), funcs: h(7)}
}

// DropLines returns wasm, a module linked by Go 1.20 to 1.26 for
// GOARCH=wasm, without the runtime's file and line tables: each
// function's pcfile and pcln offsets are set to 0, which the runtime
// reads as no table (runtime.funcline1 then reports file "?", line 0),
// as are its compilation unit and first line, which only those tables
// use; the bytes of the tables, of the compilation units' file indexes
// and of the file names are zeroed. On Fieldhead's wasm that is 99 KB
// less brotli (1 281 429 -> 1 182 329 B, December 2026): the tables and
// line numbers differ from function to function and compress poorly.
//
// What the runtime needs to run is left as it is: frame sizes (pcsp),
// stack maps and safe points (pcdata), funcdata, and the function names,
// which it compares in two places (reflect's call stubs, when the
// garbage collector scans their frames) and which a panic's trace still
// prints. Only the module's memory changes, in place: the sections and
// the data segments keep their sizes.
//
// A module without a data section (no Go program) is returned unchanged,
// as Merge returns it. One whose memory holds no such table, or one that
// does not read as described, is refused with an error, so that a
// toolchain whose table differs is noticed rather than shipped broken.
func DropLines(wasm []byte) ([]byte, error) {
	out := bytes.Clone(wasm)
	segs, found, err := dataSegments(out)
	if err != nil {
		return nil, err
	}
	if !found {
		return out, nil
	}
	mem := newMemory(segs)
	p, err := findPCLN(mem.image)
	if err != nil {
		return nil, err
	}
	h := readPCHeader(mem.image, p)
	nfunc, cu, pctab, pcln := h.nfunc, h.cu, h.pctab, h.funcs
	tab := mem.image[p:]
	functab := tab[pcln:]
	pcs := tab[pctab:pcln]
	keep := map[uint32]bool{}
	drop := map[uint32]bool{}
	var fields []int // the fields set to 0 (pcfile, pcln, unit, first line), as offsets in mem
	for i := range nfunc {
		fo := uint64(binary.LittleEndian.Uint32(functab[8*i+4:]))
		if fo+funcPCData > uint64(len(functab)) {
			return nil, fmt.Errorf("wasmdata: function %d's record at %d lies past memory", i, fo)
		}
		f := functab[fo:]
		npc := uint64(binary.LittleEndian.Uint32(f[funcNPCData:]))
		if fo+funcPCData+4*npc > uint64(len(functab)) {
			return nil, fmt.Errorf("wasmdata: function %d has %d pcdata tables, past memory", i, npc)
		}
		keep[binary.LittleEndian.Uint32(f[funcPCSP:])] = true
		for k := range npc {
			keep[binary.LittleEndian.Uint32(f[funcPCData+4*k:])] = true
		}
		for _, off := range []int{funcPCFile, funcPCLn} {
			drop[binary.LittleEndian.Uint32(f[off:])] = true
		}
		for _, off := range []int{funcPCFile, funcPCLn, funcCU, funcStartLine} {
			fields = append(fields, p+int(pcln+fo)+off)
		}
	}
	kept := make([]int, 0, len(keep))
	for off := range keep {
		kept = append(kept, int(off))
	}
	sort.Ints(kept)
	var zero [][2]int // ranges of mem to zero
	for off := range drop {
		if off == 0 || keep[off] { // 0: no table; a table shared with pcsp or pcdata stays
			continue
		}
		n, err := pcvalueLen(pcs, off)
		if err != nil {
			return nil, err
		}
		// A table read past its end would run into the next one: none
		// that the runtime needs may start inside it.
		if k := sort.SearchInts(kept, int(off)); k < len(kept) && kept[k] < int(off)+n {
			return nil, fmt.Errorf("wasmdata: line table at %d runs into the table at %d", off, kept[k])
		}
		zero = append(zero, [2]int{p + int(pctab) + int(off), p + int(pctab) + int(off) + n})
	}
	zero = append(zero, [2]int{p + int(cu), p + int(pctab)}) // cutab and filetab: only the dropped tables index them
	for _, f := range fields {
		zero = append(zero, [2]int{f, f + 4})
	}
	for _, r := range zero {
		mem.zero(r[0], r[1])
	}
	return out, nil
}

// findPCLN returns the offset in mem of the only pclntab header: the
// magic, its fixed bytes and offsets that lie in order within memory.
func findPCLN(mem []byte) (int, error) {
	var magic [8]byte
	binary.LittleEndian.PutUint32(magic[:], pclnMagic)
	copy(magic[4:], []byte{0, 0, 1, 8})
	found := -1
	for i := 0; ; {
		j := bytes.Index(mem[i:], magic[:])
		if j < 0 {
			break
		}
		at := i + j
		i = at + 1
		if !validPCLN(mem, at) {
			continue
		}
		if found >= 0 {
			return 0, errors.New("wasmdata: two function tables in memory")
		}
		found = at
	}
	if found < 0 {
		return 0, errors.New("wasmdata: no Go 1.20+ function table (pclntab) for wasm in memory")
	}
	return found, nil
}

// validPCLN reports whether a header at mem[at:] has its tables in order
// within memory and a function table sorted by entry.
func validPCLN(mem []byte, at int) bool {
	if at+pclnHeader > len(mem) {
		return false
	}
	h := readPCHeader(mem, at)
	size := uint64(len(mem) - at)
	if h.nfunc == 0 || h.nfunc > pclnMaxFuncs || h.names != pclnHeader ||
		!(h.names <= h.cu && h.cu <= h.files && h.files <= h.pctab && h.pctab <= h.funcs) || h.funcs+8*(h.nfunc+1) > size {
		return false
	}
	ft := mem[at+int(h.funcs):]
	for i := range h.nfunc {
		if binary.LittleEndian.Uint32(ft[8*i:]) > binary.LittleEndian.Uint32(ft[8*i+8:]) {
			return false
		}
	}
	return true
}

// pcvalueLen is the length of the PC-value table at tab[off:]: pairs of
// a zig-zag value delta and a PC delta, varints, ended by a zero value
// delta after the first pair (runtime.step).
func pcvalueLen(tab []byte, off uint32) (int, error) {
	p := int(off)
	for first := true; ; first = false {
		if p >= len(tab) {
			return 0, fmt.Errorf("wasmdata: PC-value table at %d runs past the tables", off)
		}
		if tab[p] == 0 && !first {
			return p + 1 - int(off), nil
		}
		for k := 0; k < 2; k++ { // value delta, PC delta: unsigned LEB128, as uleb reads
			_, next, err := uleb(tab, p)
			if err != nil {
				return 0, fmt.Errorf("wasmdata: PC-value table at %d: %w", off, err)
			}
			p = next
		}
	}
}

// dataSegments returns the segments of wasm's data section, their data
// aliasing wasm, and whether it has one.
func dataSegments(wasm []byte) ([]segment, bool, error) {
	off, body, end, _, err := dataSection(wasm)
	if err != nil || off < 0 {
		return nil, false, err
	}
	segs, err := readSegments(wasm[body:end])
	return segs, true, err
}

// memory is the module's initial memory: an image to read, and the
// segments, which zero writes through to.
type memory struct {
	image []byte
	segs  []segment // sorted by address, not overlapping (readSegments)
}

func newMemory(segs []segment) *memory {
	var n int
	if len(segs) > 0 {
		last := segs[len(segs)-1]
		n = int(last.addr) + len(last.data)
	}
	m := &memory{image: make([]byte, n), segs: segs}
	for _, s := range segs {
		copy(m.image[s.addr:], s.data)
	}
	return m
}

// zero clears mem[from:to] in the image and in every segment that holds
// part of it; memory no segment holds is zero already.
func (m *memory) zero(from, to int) {
	clear(m.image[from:to])
	i := sort.Search(len(m.segs), func(i int) bool { return int(m.segs[i].addr)+len(m.segs[i].data) > from })
	for ; i < len(m.segs) && int(m.segs[i].addr) < to; i++ {
		s := m.segs[i]
		a, b := max(from, int(s.addr)), min(to, int(s.addr)+len(s.data))
		clear(s.data[a-int(s.addr) : b-int(s.addr)])
	}
}
