package main

import (
	"strconv"
	"strings"
)

// The share link as a QR code (ISO/IEC 18004:2015), for the printed sheet:
// a phone held over the paper opens the same calculation. A small encoder
// of our own: byte mode, error correction level M or L, versions 1 to 40,
// the mask of least penalty. It adds about 17 KB to the wasm's brotli;
// rsc.io/qr/coding, the Go authors' encoder, added about 24 KB, and is now
// the check in qr_test.go (module for module, every version and mask),
// with ZBar's decoder.

// qrECC and qrBlocks are, for levels L (index 0) and M (1) and each
// version (1–40, index 0 unused), the error correction codewords per
// block and the number of blocks (ISO/IEC 18004:2015 Table 9).
var (
	qrECC = [2][41]uint8{
		{0, 7, 10, 15, 20, 26, 18, 20, 24, 30, 18, 20, 24, 26, 30, 22, 24, 28, 30, 28, 28, 28, 28, 30, 30, 26, 28, 30, 30, 30, 30, 30, 30, 30, 30, 30, 30, 30, 30, 30, 30},
		{0, 10, 16, 26, 18, 24, 16, 18, 22, 22, 26, 30, 22, 22, 24, 24, 28, 28, 26, 26, 26, 26, 28, 28, 28, 28, 28, 28, 28, 28, 28, 28, 28, 28, 28, 28, 28, 28, 28, 28, 28},
	}
	qrBlocks = [2][41]uint8{
		{0, 1, 1, 1, 1, 1, 2, 2, 2, 2, 4, 4, 4, 4, 4, 6, 6, 6, 6, 7, 8, 8, 9, 9, 10, 12, 12, 12, 13, 14, 15, 16, 17, 18, 19, 19, 20, 21, 22, 24, 25},
		{0, 1, 1, 1, 2, 2, 4, 4, 4, 5, 5, 5, 8, 9, 9, 10, 10, 11, 13, 14, 16, 17, 17, 18, 20, 21, 23, 25, 26, 28, 29, 31, 33, 35, 37, 38, 40, 43, 45, 47, 49},
	}
)

// qrRawCodewords is the number of codewords, data and error correction,
// a symbol of version v holds: its modules less the function patterns,
// the format and version information, in bytes.
func qrRawCodewords(v int) int {
	n := (16*v+128)*v + 64
	if v >= 2 {
		align := v/7 + 2
		n -= (25*align-10)*align - 55
		if v >= 7 {
			n -= 36
		}
	}
	return n / 8
}

// qrSymbol is a QR code's modules, row by row: dark, and whether the
// module belongs to a function pattern (finders, timing, alignment,
// format and version information), which data and masks leave alone.
type qrSymbol struct {
	size        int
	dark, fixed []bool
}

// Black reports whether the module in column x, row y is dark.
func (q *qrSymbol) Black(x, y int) bool { return q.dark[y*q.size+x] }

func (q *qrSymbol) set(x, y int, dark bool) {
	q.dark[y*q.size+x], q.fixed[y*q.size+x] = dark, true
}

// qrMul multiplies in GF(2⁸) modulo x⁸ + x⁴ + x³ + x² + 1 (0x11D).
func qrMul(x, y byte) byte {
	z := 0
	for i := 7; i >= 0; i-- {
		z = z<<1 ^ (z>>7)*0x11d
		z ^= int(y>>i&1) * int(x)
	}
	return byte(z)
}

// qrCheck is the Reed–Solomon error correction of data: n codewords, the
// remainder of data·xⁿ by the generator (x − 2⁰)…(x − 2ⁿ⁻¹).
func qrCheck(data []byte, n int) []byte {
	gen := make([]byte, n)
	gen[n-1] = 1
	root := byte(1)
	for i := 0; i < n; i++ {
		for j := range gen {
			gen[j] = qrMul(gen[j], root)
			if j+1 < n {
				gen[j] ^= gen[j+1]
			}
		}
		root = qrMul(root, 2)
	}
	rem := make([]byte, n)
	for _, b := range data {
		f := b ^ rem[0]
		copy(rem, rem[1:])
		rem[n-1] = 0
		for i := range rem {
			rem[i] ^= qrMul(gen[i], f)
		}
	}
	return rem
}

// qrCodewords is text in byte mode for version v at level l (0 L, 1 M):
// the mode, the count, the bytes, the terminator and padding, split in
// blocks, each with its error correction, interleaved; nil when the text
// does not fit.
func qrCodewords(text string, v, l int) []byte {
	raw, ecc, blocks := qrRawCodewords(v), int(qrECC[l][v]), int(qrBlocks[l][v])
	capacity := raw - ecc*blocks
	count := 8
	if v >= 10 {
		count = 16
	}
	if 4+count+8*len(text) > capacity*8 {
		return nil
	}
	var bits []byte // one bit a byte, then packed
	put := func(x, n int) {
		for i := n - 1; i >= 0; i-- {
			bits = append(bits, byte(x>>i&1))
		}
	}
	put(0b0100, 4) // byte mode
	put(len(text), count)
	for i := 0; i < len(text); i++ {
		put(int(text[i]), 8)
	}
	put(0, min(4, capacity*8-len(bits)))
	put(0, (8-len(bits)%8)%8)
	data := make([]byte, 0, capacity)
	for i := 0; i < len(bits); i += 8 {
		b := byte(0)
		for _, x := range bits[i : i+8] {
			b = b<<1 | x
		}
		data = append(data, b)
	}
	for pad := byte(0xec); len(data) < capacity; pad ^= 0xec ^ 0x11 {
		data = append(data, pad)
	}
	// Blocks: the short ones first, the long ones a data codeword longer.
	short := raw / blocks
	var parts, checks [][]byte
	for i, at := 0, 0; i < blocks; i++ {
		n := short - ecc
		if i >= blocks-raw%blocks {
			n++
		}
		parts = append(parts, data[at:at+n])
		checks = append(checks, qrCheck(data[at:at+n], ecc))
		at += n
	}
	out := make([]byte, 0, raw)
	for i := 0; i <= short-ecc; i++ {
		for _, p := range parts {
			if i < len(p) {
				out = append(out, p[i])
			}
		}
	}
	for i := 0; i < ecc; i++ {
		for _, c := range checks {
			out = append(out, c[i])
		}
	}
	return out
}

// qrBCH appends to data (n bits) the remainder of its division by the
// generator poly of degree deg: the format (15, 5) and version (18, 6)
// codes of ISO/IEC 18004:2015 Annexes C and D.
func qrBCH(data, deg, poly int) int {
	rem := data
	for i := 0; i < deg; i++ {
		rem = rem<<1 ^ (rem>>(deg-1))*poly
	}
	return data<<deg | rem&(1<<deg-1)
}

// qrDraw lays out a symbol of version v at level l with mask m: the
// function patterns, the codewords in their zigzag, the mask over the
// data modules, and the format and version information.
func qrDraw(words []byte, v, l, m int) *qrSymbol {
	n := 4*v + 17
	q := &qrSymbol{size: n, dark: make([]bool, n*n), fixed: make([]bool, n*n)}
	for i := 0; i < n; i++ { // timing
		q.set(6, i, i%2 == 0)
		q.set(i, 6, i%2 == 0)
	}
	square := func(cx, cy, r int, dark func(d int) bool) {
		for dy := -r; dy <= r; dy++ {
			for dx := -r; dx <= r; dx++ {
				if x, y := cx+dx, cy+dy; x >= 0 && x < n && y >= 0 && y < n {
					q.set(x, y, dark(max(dx, -dx, dy, -dy)))
				}
			}
		}
	}
	finder := func(d int) bool { return d != 2 && d != 4 }
	square(3, 3, 4, finder)
	square(n-4, 3, 4, finder)
	square(3, n-4, 4, finder)
	if v >= 2 {
		align := v/7 + 2
		step := 26
		if v != 32 {
			step = (v*4 + align*2 + 1) / (align*2 - 2) * 2
		}
		pos := []int{6}
		for p := n - 7; len(pos) < align; p -= step {
			pos = append(pos[:1], append([]int{p}, pos[1:]...)...)
		}
		for i, y := range pos {
			for j, x := range pos {
				if !(i == 0 && j == 0 || i == 0 && j == align-1 || i == align-1 && j == 0) {
					square(x, y, 2, func(d int) bool { return d != 1 })
				}
			}
		}
	}
	format := qrBCH([2]int{1, 0}[l]<<3|m, 10, 0x537) ^ 0x5412
	bit := func(x, i int) bool { return x>>i&1 != 0 }
	for i := 0; i < 6; i++ {
		q.set(8, i, bit(format, i))
	}
	q.set(8, 7, bit(format, 6))
	q.set(8, 8, bit(format, 7))
	q.set(7, 8, bit(format, 8))
	for i := 9; i < 15; i++ {
		q.set(14-i, 8, bit(format, i))
	}
	for i := 0; i < 8; i++ {
		q.set(n-1-i, 8, bit(format, i))
	}
	for i := 8; i < 15; i++ {
		q.set(8, n-15+i, bit(format, i))
	}
	q.set(8, n-8, true) // the dark module
	if v >= 7 {
		ver := qrBCH(v, 12, 0x1f25)
		for i := 0; i < 18; i++ {
			a, b := n-11+i%3, i/3
			q.set(a, b, bit(ver, i))
			q.set(b, a, bit(ver, i))
		}
	}
	masks := [8]func(x, y int) bool{
		func(x, y int) bool { return (x+y)%2 == 0 },
		func(x, y int) bool { return y%2 == 0 },
		func(x, y int) bool { return x%3 == 0 },
		func(x, y int) bool { return (x+y)%3 == 0 },
		func(x, y int) bool { return (x/3+y/2)%2 == 0 },
		func(x, y int) bool { return x*y%2+x*y%3 == 0 },
		func(x, y int) bool { return (x*y%2+x*y%3)%2 == 0 },
		func(x, y int) bool { return ((x+y)%2+x*y%3)%2 == 0 },
	}
	i := 0
	for right := n - 1; right >= 1; right -= 2 {
		if right == 6 {
			right = 5
		}
		for vert := 0; vert < n; vert++ {
			for j := 0; j < 2; j++ {
				x, y := right-j, vert
				if (right+1)&2 == 0 { // upwards
					y = n - 1 - vert
				}
				if q.fixed[y*n+x] {
					continue
				}
				dark := i < len(words)*8 && words[i>>3]>>(7-i&7)&1 != 0
				i++
				q.dark[y*n+x] = dark != masks[m](x, y)
			}
		}
	}
	return q
}

// qrCode encodes text in byte mode at error correction level M (about 15 %
// of the code may be lost), else L when it needs more room, in the
// smallest version that holds it, with the mask of the lowest penalty
// (ISO/IEC 18004:2015, 7.8.3). ok is false when even version 40 at level L
// cannot hold the text (2 953 bytes).
func qrCode(text string) (best *qrSymbol, ok bool) {
	for _, l := range []int{1, 0} {
		for v := 1; v <= 40; v++ {
			words := qrCodewords(text, v, l)
			if words == nil {
				continue
			}
			score := 0
			for m := 0; m < 8; m++ {
				q := qrDraw(words, v, l, m)
				if s := qrPenalty(q); best == nil || s < score {
					best, score = q, s
				}
			}
			return best, true
		}
	}
	return nil, false
}

// qrPenalty scores a masked symbol by the four rules of ISO/IEC
// 18004:2015, 7.8.3.1 (weights N1 = 3, N2 = 3, N3 = 40, N4 = 10): runs of
// five or more modules of one colour, 2 × 2 blocks of one colour, the
// finder-like pattern 1:1:3:1:1 with four light modules on a side, and the
// share of dark modules away from one half. A scanner reads the code of
// the lowest score most easily.
func qrPenalty(c *qrSymbol) int {
	n, score, dark := c.size, 0, 0
	at := func(x, y int, rows bool) bool {
		if rows {
			return c.Black(x, y)
		}
		return c.Black(y, x)
	}
	finder := [11]bool{true, false, true, true, true, false, true, false, false, false, false}
	for _, rows := range []bool{true, false} {
		for y := 0; y < n; y++ {
			run := 1
			for x := 1; x <= n; x++ {
				if x < n && at(x, y, rows) == at(x-1, y, rows) {
					run++
					continue
				}
				if run >= 5 {
					score += 3 + run - 5
				}
				run = 1
			}
			for x := 0; x+11 <= n; x++ {
				fwd, back := true, true
				for i := 0; i < 11; i++ {
					b := at(x+i, y, rows)
					fwd = fwd && b == finder[i]
					back = back && b == finder[10-i]
				}
				if fwd {
					score += 40
				}
				if back {
					score += 40
				}
			}
		}
	}
	for y := 0; y < n; y++ {
		for x := 0; x < n; x++ {
			b := c.Black(x, y)
			if b {
				dark++
			}
			if x+1 < n && y+1 < n && b == c.Black(x+1, y) && b == c.Black(x, y+1) && b == c.Black(x+1, y+1) {
				score += 3
			}
		}
	}
	dev := dark*100/(n*n) - 50
	if dev < 0 {
		dev = -dev
	}
	return score + dev/5*10
}

// qrSVG draws text as a QR code in SVG, dark modules on white with the
// quiet zone of four modules the standard asks for; "" when the text is
// too long for any code. Each row's runs of dark modules are one path
// command, which keeps the markup short.
func qrSVG(text, label string) string {
	c, ok := qrCode(text)
	if !ok {
		return ""
	}
	side := strconv.Itoa(c.size + 8)
	var b strings.Builder
	b.WriteString(`<svg class="qr" viewBox="0 0 ` + side + ` ` + side + `" role="img" aria-label="` + label + `" shape-rendering="crispEdges"><rect width="` + side + `" height="` + side + `" fill="#fff"/><path fill="#000" d="`)
	for y := 0; y < c.size; y++ {
		for x := 0; x < c.size; {
			if !c.Black(x, y) {
				x++
				continue
			}
			run := 1
			for x+run < c.size && c.Black(x+run, y) {
				run++
			}
			b.WriteString("M" + strconv.Itoa(x+4) + " " + strconv.Itoa(y+4) + "h" + strconv.Itoa(run) + "v1h-" + strconv.Itoa(run) + "z")
			x += run
		}
	}
	b.WriteString(`"/></svg>`)
	return b.String()
}

// shortLink is the link as a person can read it off the paper: without
// its scheme, the query cut after its first few parameters.
func shortLink(link string) string {
	s := link
	if i := strings.Index(s, "://"); i >= 0 {
		s = s[i+3:]
	}
	const keep = 56
	if len(s) <= keep+8 {
		return s
	}
	cut := strings.LastIndexByte(s[:keep], '&')
	if cut < strings.IndexByte(s, '?') {
		cut = keep
	}
	return s[:cut] + "…"
}
