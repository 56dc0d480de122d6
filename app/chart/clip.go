package chart

// rect is a pixel rectangle: left, top, right, bottom.
type rect struct{ l, t, r, b float64 }

// contains reports whether (x, y) lies in q, allowing half a pixel for
// rounding at the edges.
func (q rect) contains(x, y float64) bool {
	return x >= q.l-0.5 && x <= q.r+0.5 && y >= q.t-0.5 && y <= q.b+0.5
}

// clipSegment clips the segment (x0,y0)–(x1,y1) to q with the
// Liang–Barsky parametric method. ok is false when nothing is left.
func clipSegment(q rect, x0, y0, x1, y1 float64) (ax, ay, bx, by float64, ok bool) {
	dx, dy := x1-x0, y1-y0
	t0, t1 := 0.0, 1.0
	edges := [4][2]float64{{-dx, x0 - q.l}, {dx, q.r - x0}, {-dy, y0 - q.t}, {dy, q.b - y0}}
	for _, e := range edges {
		p, r := e[0], e[1]
		if p == 0 {
			if r < 0 {
				return 0, 0, 0, 0, false
			}
			continue
		}
		u := r / p
		if p < 0 {
			if u > t1 {
				return 0, 0, 0, 0, false
			}
			if u > t0 {
				t0 = u
			}
		} else {
			if u < t0 {
				return 0, 0, 0, 0, false
			}
			if u < t1 {
				t1 = u
			}
		}
	}
	return x0 + t0*dx, y0 + t0*dy, x0 + t1*dx, y0 + t1*dy, true
}

type pt struct{ x, y float64 }

// clipPolygon clips a closed polygon to q (Sutherland–Hodgman).
func clipPolygon(q rect, poly []pt) []pt {
	for edge := 0; edge < 4 && len(poly) > 0; edge++ {
		inside := func(p pt) bool {
			switch edge {
			case 0:
				return p.x >= q.l
			case 1:
				return p.x <= q.r
			case 2:
				return p.y >= q.t
			default:
				return p.y <= q.b
			}
		}
		cross := func(a, b pt) pt {
			var t float64
			switch edge {
			case 0:
				t = (q.l - a.x) / (b.x - a.x)
			case 1:
				t = (q.r - a.x) / (b.x - a.x)
			case 2:
				t = (q.t - a.y) / (b.y - a.y)
			default:
				t = (q.b - a.y) / (b.y - a.y)
			}
			return pt{a.x + t*(b.x-a.x), a.y + t*(b.y-a.y)}
		}
		out := make([]pt, 0, len(poly)+4)
		prev := poly[len(poly)-1]
		for _, cur := range poly {
			ci, pi := inside(cur), inside(prev)
			switch {
			case ci && pi:
				out = append(out, cur)
			case ci:
				out = append(out, cross(prev, cur), cur)
			case pi:
				out = append(out, cross(prev, cur))
			}
			prev = cur
		}
		poly = out
	}
	return poly
}
