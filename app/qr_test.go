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

// TestQRDecodes draws links as qrSVG does, paints the drawing's modules
// into a PNG and reads it with an independent decoder, ZBar's zbarimg
// (Debian's zbar-tools): what it reads must be the link, byte for byte.
// The links: both demos' share links as the page makes them, a short one,
// and one long enough to need a large version.
func TestQRDecodes(t *testing.T) {
	zbar, err := exec.LookPath("zbarimg")
	if err != nil {
		if os.Getenv("CI") != "" || os.Getenv("FIELDHEAD_BROWSER") == "1" {
			t.Fatal("zbarimg not found: apt-get install zbar-tools")
		}
		t.Skip("zbarimg not found (apt-get install zbar-tools)")
	}
	links := []string{
		"http://localhost:8000/?" + scenario.Demo().Sign(),
		"https://example.org/tools/fieldhead/?" + scenario.TurbineDemo().Sign(),
		"http://localhost:8000/",
		"http://localhost:8000/?" + strings.Repeat("s1.l=12.5m&", 90) + "ck=1",
	}
	dir := t.TempDir()
	for i, link := range links {
		svg := qrSVG(link, "code")
		if svg == "" {
			t.Errorf("link %d (%d bytes): no code", i, len(link))
			continue
		}
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
		file := filepath.Join(dir, "qr"+strconv.Itoa(i)+".png")
		var buf bytes.Buffer
		if err := png.Encode(&buf, img); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(file, buf.Bytes(), 0o644); err != nil {
			t.Fatal(err)
		}
		out, err := exec.Command(zbar, "--raw", "-q", "-Sdisable", "-Sqrcode.enable", "-Sbinary", file).Output()
		if err != nil {
			t.Errorf("link %d (%d bytes, %d modules a side): zbarimg read nothing: %v", i, len(link), side-8, err)
			continue
		}
		if got := strings.TrimSuffix(string(out), "\n"); got != link {
			t.Errorf("link %d: zbarimg read\n%q\nwant\n%q", i, got, link)
		}
		t.Logf("link %d: %d bytes, %d × %d modules", i, len(link), side-8, side-8)
	}
	if qrSVG(strings.Repeat("x", 2954), "code") != "" {
		t.Error("a text over version 40-L's 2 953 bytes gave a code")
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
