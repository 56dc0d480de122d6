// Package wasmdata rewrites the data section of a WebAssembly module so
// that it compresses better, leaving the memory it sets up unchanged.
//
// Go's linker writes the module's initial memory as one data segment per
// run of bytes between zero runs longer than a few bytes, up to the
// format's limit of 100 000 segments. Each segment carries its own
// address and length, and those headers, all different, are what brotli
// and gzip compress worst: for Fieldhead's wasm about a tenth of its
// brotli size. Merge joins neighbouring segments across short zero runs,
// writing the zeros out: memory starts zeroed, so each byte of memory is
// what it was.
package wasmdata

import (
	"bytes"
	"errors"
	"fmt"
	"sort"
)

// DefaultGap is the longest run of zeros Merge writes out between two
// segments. Measured on Fieldhead's wasm (8.19 MB): a limit of 64 to 100
// bytes leaves about 110 to 190 segments and gives the smallest brotli
// file (1 333 355 -> 1 224 082 B, gzip -9 1 864 819 -> 1 694 663 B), for
// about 1 MB more raw; 1000 or more (one segment) writes the long zero
// runs out too and compresses a little worse.
const DefaultGap = 64

// segment is an active data segment of memory 0: data at address addr.
type segment struct {
	addr uint32
	data []byte
}

// Merge returns wasm with neighbouring data segments joined whenever at
// most gap zero bytes lie between them. The other sections are copied as
// they are. A module without a data section is returned unchanged; one
// whose data section holds anything but active segments of memory 0 at
// constant addresses, or segments that overlap, is refused with an error,
// as is a malformed module.
func Merge(wasm []byte, gap int) ([]byte, error) {
	off, body, end, count, err := dataSection(wasm)
	switch {
	case err != nil:
		return nil, err
	case count: // would have to match the new number of segments
		return nil, errors.New("wasmdata: module has a data count section")
	case off < 0:
		return wasm, nil
	}
	segs, err := readSegments(wasm[body:end])
	if err != nil {
		return nil, err
	}
	sec := writeSegments(merge(segs, gap))
	out := make([]byte, 0, len(wasm)-(end-off)+len(sec)+6)
	out = append(out, wasm[:off]...)
	out = append(out, 11)
	out = appendULEB(out, uint64(len(sec)))
	out = append(out, sec...)
	return append(out, wasm[end:]...), nil
}

// dataSection finds wasm's data section: the offset of its id byte and
// its body's bounds (off -1 when there is none); count reports a data
// count section. A malformed module, or one with two data sections, is
// refused with an error.
func dataSection(wasm []byte) (off, body, end int, count bool, err error) {
	if len(wasm) < 8 || !bytes.Equal(wasm[:4], []byte("\x00asm")) {
		return 0, 0, 0, false, errors.New("wasmdata: not a WebAssembly module")
	}
	off = -1
	for at := 8; at < len(wasm); {
		id := wasm[at]
		size, b, err := uleb(wasm, at+1)
		if err != nil {
			return 0, 0, 0, false, err
		}
		e := b + int(size)
		if e > len(wasm) || e < b {
			return 0, 0, 0, false, fmt.Errorf("wasmdata: section %d at %d runs past the end", id, at)
		}
		switch id {
		case 12:
			count = true
		case 11:
			if off >= 0 {
				return 0, 0, 0, false, errors.New("wasmdata: two data sections")
			}
			off, body, end = at, b, e
		}
		at = e
	}
	return off, body, end, count, nil
}

// readSegments reads a data section's segments, sorted by address.
func readSegments(sec []byte) ([]segment, error) {
	count, off, err := uleb(sec, 0)
	if err != nil {
		return nil, err
	}
	segs := make([]segment, 0, min(count, uint64(len(sec))))
	for i := uint64(0); i < count; i++ {
		// Flag 0: an active segment of memory 0, its address an i32.const
		// expression (0x41 value 0x0b).
		if off+2 > len(sec) || sec[off] != 0 || sec[off+1] != 0x41 {
			return nil, fmt.Errorf("wasmdata: segment %d is not an active segment at a constant address", i)
		}
		addr, next, err := sleb32(sec, off+2)
		if err != nil {
			return nil, err
		}
		if next >= len(sec) || sec[next] != 0x0b {
			return nil, fmt.Errorf("wasmdata: segment %d's address is not a lone i32.const", i)
		}
		n, data, err := uleb(sec, next+1)
		if err != nil {
			return nil, err
		}
		if data+int(n) > len(sec) || data+int(n) < data {
			return nil, fmt.Errorf("wasmdata: segment %d runs past its section", i)
		}
		segs = append(segs, segment{uint32(addr), sec[data : data+int(n)]})
		off = data + int(n)
	}
	if off != len(sec) {
		return nil, errors.New("wasmdata: bytes after the last data segment")
	}
	sort.SliceStable(segs, func(i, j int) bool { return segs[i].addr < segs[j].addr })
	for i := 1; i < len(segs); i++ {
		if uint64(segs[i-1].addr)+uint64(len(segs[i-1].data)) > uint64(segs[i].addr) {
			return nil, fmt.Errorf("wasmdata: data segments at %#x and %#x overlap", segs[i-1].addr, segs[i].addr)
		}
	}
	return segs, nil
}

// merge joins segments (sorted, not overlapping) at most gap bytes apart.
func merge(segs []segment, gap int) []segment {
	var out []segment
	for _, s := range segs {
		if k := len(out) - 1; k >= 0 {
			last := &out[k]
			end := uint64(last.addr) + uint64(len(last.data))
			if uint64(s.addr)-end <= uint64(gap) {
				last.data = append(last.data, make([]byte, uint64(s.addr)-end)...)
				last.data = append(last.data, s.data...)
				continue
			}
		}
		out = append(out, segment{s.addr, append([]byte(nil), s.data...)})
	}
	return out
}

// writeSegments writes a data section's contents.
func writeSegments(segs []segment) []byte {
	out := appendULEB(nil, uint64(len(segs)))
	for _, s := range segs {
		out = append(out, 0, 0x41)
		out = appendSLEB(out, int64(int32(s.addr)))
		out = append(out, 0x0b)
		out = appendULEB(out, uint64(len(s.data)))
		out = append(out, s.data...)
	}
	return out
}

// uleb reads an unsigned LEB128 number at b[off:]; next is the offset
// after it.
func uleb(b []byte, off int) (v uint64, next int, err error) {
	for shift := uint(0); off < len(b) && shift < 64; shift += 7 {
		c := b[off]
		off++
		v |= uint64(c&0x7f) << shift
		if c < 0x80 {
			return v, off, nil
		}
	}
	return 0, 0, errors.New("wasmdata: malformed LEB128 number")
}

// sleb32 reads a signed LEB128 number of at most 32 bits.
func sleb32(b []byte, off int) (v int32, next int, err error) {
	var x int64
	for shift := uint(0); off < len(b) && shift < 35; shift += 7 {
		c := b[off]
		off++
		x |= int64(c&0x7f) << shift
		if c < 0x80 {
			if shift+7 < 64 && c&0x40 != 0 {
				x |= -1 << (shift + 7)
			}
			return int32(x), off, nil
		}
	}
	return 0, 0, errors.New("wasmdata: malformed i32.const")
}

func appendULEB(b []byte, v uint64) []byte {
	for {
		c := byte(v & 0x7f)
		v >>= 7
		if v == 0 {
			return append(b, c)
		}
		b = append(b, c|0x80)
	}
}

func appendSLEB(b []byte, v int64) []byte {
	for {
		c := byte(v & 0x7f)
		v >>= 7
		if (v == 0 && c&0x40 == 0) || (v == -1 && c&0x40 != 0) {
			return append(b, c)
		}
		b = append(b, c|0x80)
	}
}
