package chart

import (
	"encoding/xml"
	"io"
	"math"
	"strconv"
	"strings"
	"testing"
)

// parsed is what the tests read back from a rendered SVG.
type parsed struct {
	root     xml.StartElement
	text     string // all character data, joined by "|"
	elements map[string]int
	attrs    []xml.Attr
	w, h     float64
}

// readSVG decodes s to the end with encoding/xml (the well-formedness check
// of the XML 1.0 specification as Go's decoder implements it) and fails the
// test on any error.
func readSVG(t *testing.T, s string) parsed {
	t.Helper()
	d := xml.NewDecoder(strings.NewReader(s))
	d.Strict = true
	var p parsed
	p.elements = map[string]int{}
	var text []string
	depth, roots := 0, 0
	for {
		tok, err := d.Token()
		if err == io.EOF {
			break
		}
		if err != nil {
			t.Fatalf("not well-formed XML: %v\n%s", err, s)
		}
		switch v := tok.(type) {
		case xml.StartElement:
			if depth == 0 {
				roots++
				p.root = v.Copy()
			}
			depth++
			p.elements[v.Name.Local]++
			p.attrs = append(p.attrs, v.Attr...)
		case xml.EndElement:
			depth--
		case xml.CharData:
			if depth > 0 && strings.TrimSpace(string(v)) != "" {
				text = append(text, string(v))
			}
		}
	}
	if roots != 1 || p.root.Name.Local != "svg" {
		t.Fatalf("want one <svg> root element, got %d roots, first %q", roots, p.root.Name.Local)
	}
	p.text = strings.Join(text, "|")
	for _, a := range p.root.Attr {
		if a.Name.Local == "viewBox" {
			f := strings.Fields(a.Value)
			if len(f) == 4 {
				p.w, _ = strconv.ParseFloat(f[2], 64)
				p.h, _ = strconv.ParseFloat(f[3], 64)
			}
		}
	}
	if !(p.w > 0 && p.h > 0) {
		t.Fatalf("no usable viewBox in %q", s[:min(len(s), 200)])
	}
	return p
}

func (p parsed) attr(name string) string {
	for _, a := range p.root.Attr {
		if a.Name.Local == name {
			return a.Value
		}
	}
	return ""
}

// coordinates returns every absolute coordinate the SVG uses: the x, y, cx,
// cy attributes and the numbers after absolute M, L, H, V in path data.
func (p parsed) coordinates() (xs, ys []float64) {
	for _, a := range p.attrs {
		switch a.Name.Local {
		case "x", "cx":
			if v, err := strconv.ParseFloat(a.Value, 64); err == nil {
				xs = append(xs, v)
			}
		case "y", "cy":
			if v, err := strconv.ParseFloat(a.Value, 64); err == nil {
				ys = append(ys, v)
			}
		case "d":
			x, y := pathAbs(a.Value)
			xs = append(xs, x...)
			ys = append(ys, y...)
		}
	}
	return xs, ys
}

// pathAbs reads the absolute commands M, L, H, V of path data.
func pathAbs(d string) (xs, ys []float64) {
	var cmd byte
	var nums []float64
	flush := func() {
		switch cmd {
		case 'M', 'L':
			for i := 0; i+1 < len(nums); i += 2 {
				xs = append(xs, nums[i])
				ys = append(ys, nums[i+1])
			}
		case 'H':
			xs = append(xs, nums...)
		case 'V':
			ys = append(ys, nums...)
		}
		nums = nums[:0]
	}
	i := 0
	for i < len(d) {
		c := d[i]
		switch {
		case c >= 'A' && c <= 'Z' || c >= 'a' && c <= 'z':
			flush()
			cmd = c
			i++
		case c == ' ' || c == ',':
			i++
		default:
			j := i + 1
			for j < len(d) && (d[j] >= '0' && d[j] <= '9' || d[j] == '.' || d[j] == 'e') {
				j++
			}
			if v, err := strconv.ParseFloat(d[i:j], 64); err == nil {
				nums = append(nums, v)
			}
			i = j
		}
	}
	flush()
	return xs, ys
}

// checkInside fails if any coordinate is non-finite or far outside the
// viewBox (a few px of slack for stroke ends and label halos).
func checkInside(t *testing.T, p parsed) {
	t.Helper()
	xs, ys := p.coordinates()
	for _, x := range xs {
		if math.IsNaN(x) || x < -2 || x > p.w+2 {
			t.Errorf("x coordinate %v outside viewBox width %v", x, p.w)
			return
		}
	}
	for _, y := range ys {
		if math.IsNaN(y) || y < -2 || y > p.h+2 {
			t.Errorf("y coordinate %v outside viewBox height %v", y, p.h)
			return
		}
	}
}
