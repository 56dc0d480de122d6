//go:build !wasm

package main

import (
	"bytes"
	"image"
	"image/color"
	"image/png"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"rsc.io/qr/coding"

	"fieldhead/calc/scenario"
)

// svgModules reads back the dark modules that qrSVG drew: each path
// command "Mx yhNv1h-Nz" is a run of N modules from (x, y).
func svgModules(t *testing.T, svg string) (side int, dark func(x, y int) bool) {
	t.Helper()
	m := regexp.MustCompile(`viewBox="0 0 (\d+) (\d+)"`).FindStringSubmatch(svg)
	if m == nil || m[1] != m[2] {
		t.Fatalf("no square viewBox in %.80s", svg)
	}
	side, _ = strconv.Atoi(m[1])
	set := make([]bool, side*side)
	for _, r := range regexp.MustCompile(`M(\d+) (\d+)h(\d+)v1h-(\d+)z`).FindAllStringSubmatch(svg, -1) {
		x, _ := strconv.Atoi(r[1])
		y, _ := strconv.Atoi(r[2])
		n, _ := strconv.Atoi(r[3])
		if r[4] != r[3] || x < 4 || y < 4 || x+n > side-4 || y >= side-4 {
			t.Fatalf("a run outside the symbol: %s", r[0])
		}
		for i := 0; i < n; i++ {
			set[y*side+x+i] = true
		}
	}
	return side, func(x, y int) bool { return set[y*side+x] }
}

// zbarRead paints the modules qrSVG drew into a PNG, four pixels a
// module, and reads it with ZBar's zbarimg (Debian's zbar-tools), an
// independent decoder; "" when it reads nothing.
func zbarRead(t *testing.T, zbar, dir, svg string) string {
	t.Helper()
	side, dark := svgModules(t, svg)
	const scale = 4
	img := image.NewGray(image.Rect(0, 0, side*scale, side*scale))
	for y := 0; y < side*scale; y++ {
		for x := 0; x < side*scale; x++ {
			v := uint8(255)
			if dark(x/scale, y/scale) {
				v = 0
			}
			img.SetGray(x, y, color.Gray{Y: v})
		}
	}
	file := filepath.Join(dir, "qr.png")
	var buf bytes.Buffer
	if err := png.Encode(&buf, img); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(file, buf.Bytes(), 0o644); err != nil {
		t.Fatal(err)
	}
	out, err := exec.Command(zbar, "--raw", "-q", "-Sdisable", "-Sqrcode.enable", "-Sbinary", file).Output()
	if err != nil {
		return ""
	}
	return strings.TrimSuffix(string(out), "\n")
}

// needZbar finds zbarimg; without it the check is skipped, or fails in CI
// and under FIELDHEAD_BROWSER=1.
func needZbar(t *testing.T) string {
	t.Helper()
	zbar, err := exec.LookPath("zbarimg")
	if err != nil {
		if os.Getenv("CI") != "" || os.Getenv("FIELDHEAD_BROWSER") == "1" {
			t.Fatal("zbarimg not found: apt-get install zbar-tools")
		}
		t.Skip("zbarimg not found (apt-get install zbar-tools)")
	}
	return zbar
}

// TestQRDecodes draws links as qrSVG does and reads them back with zbarimg:
// what it reads must be the link, byte for byte. The links: both demos'
// share links as the page makes them, a short one, one long enough to need
// a large version, and for each version from 1 to 40 a text that fills it
// at level M (the last ones, past M's 2 331 bytes, at level L).
func TestQRDecodes(t *testing.T) {
	zbar := needZbar(t)
	links := []string{
		"http://localhost:8000/?" + scenario.Demo().Sign(),
		"https://example.org/tools/fieldhead/?" + scenario.TurbineDemo().Sign(),
		"http://localhost:8000/",
		"http://localhost:8000/?" + strings.Repeat("s1.l=12.5m&", 90) + "ck=1",
	}
	for v := 1; v <= 40; v++ {
		links = append(links, qrFill(v, 1))
	}
	links = append(links, qrFill(40, 0))
	dir := t.TempDir()
	for i, link := range links {
		svg := qrSVG(link, "code")
		if svg == "" {
			t.Errorf("text %d (%d bytes): no code", i, len(link))
			continue
		}
		if got := zbarRead(t, zbar, dir, svg); got != link {
			t.Errorf("text %d (%d bytes): zbarimg read\n%.200q\nwant\n%.200q", i, len(link), got, link)
		}
	}
	if qrSVG(strings.Repeat("x", 2954), "code") != "" {
		t.Error("a text over version 40-L's 2 953 bytes gave a code")
	}
}

// qrFill is a text of the most bytes version v holds at level l (0 L, 1 M).
func qrFill(v, l int) string {
	count := 8
	if v >= 10 {
		count = 16
	}
	n := ((qrRawCodewords(v)-int(qrECC[l][v])*int(qrBlocks[l][v]))*8 - 4 - count) / 8
	return strings.Repeat("fieldhead/?q=45L/s&z2=251m&", n/27+1)[:n]
}

// TestQRMatchesReference draws every version at levels L and M with each
// of the eight masks and compares every module with what rsc.io/qr/coding
// (the Go authors' encoder) draws for the same text, version, level and
// mask: the codewords, blocks, function patterns, format and version
// information and masks all agree.
func TestQRMatchesReference(t *testing.T) {
	for l, ref := range []coding.Level{coding.L, coding.M} {
		for v := 1; v <= 40; v++ {
			text := qrFill(v, l)
			words := qrCodewords(text, v, l)
			if words == nil {
				t.Fatalf("version %d level %s: %d bytes do not fit", v, ref, len(text))
			}
			if qrCodewords(text+"x", v, l) != nil {
				t.Errorf("version %d level %s: a byte more than its capacity fits", v, ref)
			}
			for m := 0; m < 8; m++ {
				p, err := coding.NewPlan(coding.Version(v), ref, coding.Mask(m))
				if err != nil {
					t.Fatal(err)
				}
				want, err := p.Encode(coding.String(text))
				if err != nil {
					t.Fatal(err)
				}
				got := qrDraw(words, v, l, m)
				if got.size != want.Size {
					t.Fatalf("version %d: %d modules a side, want %d", v, got.size, want.Size)
				}
				bad := 0
				for y := 0; y < got.size; y++ {
					for x := 0; x < got.size; x++ {
						if got.Black(x, y) != want.Black(x, y) {
							bad++
						}
					}
				}
				if bad > 0 {
					t.Errorf("version %d level %s mask %d: %d modules differ from rsc.io/qr/coding", v, ref, m, bad)
				}
			}
		}
	}
}

// TestShortLink: the printed short form drops the scheme and cuts a long
// query after a whole parameter.
func TestShortLink(t *testing.T) {
	for _, c := range []struct{ in, want string }{
		{"http://localhost:8000/", "localhost:8000/"},
		{"https://example.org/f/?" + strings.Repeat("q=45L/s&", 20), "example.org/f/?q=45L/s&q=45L/s&q=45L/s&q=45L/s&q=45L/s…"},
	} {
		if got := shortLink(c.in); got != c.want {
			t.Errorf("shortLink(%q) = %q, want %q", c.in, got, c.want)
		}
	}
}
