package main

import (
	"strconv"
	"strings"

	"rsc.io/qr/coding"
)

// The share link as a QR code (ISO/IEC 18004), for the printed sheet: a
// phone held over the paper opens the same calculation. The encoding is
// rsc.io/qr/coding (the Go authors' encoder, without its PNG writer, which
// would bring image/png into the wasm); this file picks the size, the
// error correction and the mask and draws the modules as SVG.

// qrCode encodes text in byte mode at error correction level M (about 15 %
// of the code may be lost), else L when it needs more room, in the
// smallest version that holds it, with the mask of the lowest penalty
// (ISO/IEC 18004:2015, 7.8.3). ok is false when even version 40 at level L
// cannot hold the text (2 953 bytes).
func qrCode(text string) (c *coding.Code, ok bool) {
	defer func() { // the encoder panics on an internal inconsistency: no code then, not a failed page
		if recover() != nil {
			c, ok = nil, false
		}
	}()
	enc := coding.String(text)
	for _, l := range []coding.Level{coding.M, coding.L} {
		for v := coding.Version(coding.MinVersion); v <= coding.MaxVersion; v++ {
			if enc.Bits(v) > v.DataBytes(l)*8 {
				continue
			}
			best, score := (*coding.Code)(nil), 0
			for m := coding.Mask(0); m < 8; m++ {
				p, err := coding.NewPlan(v, l, m)
				if err != nil {
					return nil, false
				}
				cc, err := p.Encode(enc)
				if err != nil {
					return nil, false
				}
				if s := qrPenalty(cc); best == nil || s < score {
					best, score = cc, s
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
func qrPenalty(c *coding.Code) int {
	n, score, dark := c.Size, 0, 0
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
	side := strconv.Itoa(c.Size + 8)
	var b strings.Builder
	b.WriteString(`<svg class="qr" viewBox="0 0 ` + side + ` ` + side + `" role="img" aria-label="` + label + `" shape-rendering="crispEdges"><rect width="` + side + `" height="` + side + `" fill="#fff"/><path fill="#000" d="`)
	for y := 0; y < c.Size; y++ {
		for x := 0; x < c.Size; {
			if !c.Black(x, y) {
				x++
				continue
			}
			run := 1
			for x+run < c.Size && c.Black(x+run, y) {
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
