package chart

import (
	"math"
	"sort"
)

// placer puts label boxes on a plot, greedily in the order they are
// asked for: each takes the first of its candidate spots, in order of
// preference, that stays inside the bounds and overlaps no label placed
// before it and no symbol, preferring among those a spot that crosses no
// line. A label that finds no free spot is not placed (the caller writes
// it under the plot instead), so no two placed labels ever overlap.
type placer struct {
	bounds rect
	taken  []rect       // labels placed; never overlapped
	marks  []rect       // symbols and boxes, avoided when possible
	segs   [][4]float64 // line pieces, avoided when possible
	// leaders drawn so far, from a point to its label: a later leader
	// that crosses one pairs two labels with the wrong marks at a glance.
	leaders [][4]float64
}

func (a rect) overlaps(b rect) bool { return a.l < b.r && a.r > b.l && a.t < b.b && a.b > b.t }

func (a rect) inside(b rect) bool { return a.l >= b.l && a.r <= b.r && a.t >= b.t && a.b <= b.b }

// place picks the best free spot among cands and marks it taken. It
// returns the spot's index, or −1 when every spot leaves the bounds or
// overlaps a placed label.
//
// With a finite point (x, y), a spot farther than leaderReach from it
// will get a leader line to it, so a spot whose leader would cross a
// placed label is not free either, and the leader chosen becomes a line
// for later labels to avoid.
func (pl *placer) place(cands []rect, x, y float64) int {
	best, bestCost := -1, math.Inf(1)
	for i, c := range cands {
		if 0.04*float64(i) >= bestCost {
			break // every later spot costs at least this much
		}
		if !c.inside(pl.bounds) {
			continue
		}
		free := true
		for _, o := range pl.taken {
			if c.overlaps(o) {
				free = false
				break
			}
		}
		if lx, ly, far := c.leader(x, y); free && far {
			for _, o := range pl.taken {
				if _, _, _, _, hit := clipSegment(o, x, y, lx, ly); hit {
					free = false
					break
				}
			}
		}
		if !free {
			continue
		}
		// Later spots are farther from their point: a small price each,
		// so a spot that crosses one line more still beats one far off.
		cost := 0.04 * float64(i)
		cost += pl.misleads(c, x, y)
		for _, m := range pl.marks {
			if c.overlaps(m) {
				free = false // a label never hides a mark
				break
			}
		}
		if !free {
			continue
		}
		for _, g := range pl.segs {
			if cost >= bestCost {
				break // no better than the best so far
			}
			if math.Max(g[0], g[2]) < c.l || math.Min(g[0], g[2]) > c.r || math.Max(g[1], g[3]) < c.t || math.Min(g[1], g[3]) > c.b {
				continue // far from the box
			}
			if _, _, _, _, hit := clipSegment(c, g[0], g[1], g[2], g[3]); hit {
				cost++
			}
		}
		if cost < bestCost {
			best, bestCost = i, cost
		}
		if cost < 0.04*float64(i)+1e-9 {
			break // a clear spot: no later one can be cheaper
		}
	}
	if best >= 0 {
		pl.taken = append(pl.taken, cands[best])
		if lx, ly, far := cands[best].leader(x, y); far {
			pl.segs = append(pl.segs, [4]float64{x, y, lx, ly})
			pl.leaders = append(pl.leaders, [4]float64{x, y, lx, ly})
		}
	}
	return best
}

// misleads is the price of a spot c for the label of the point (x, y)
// that a reader could pair with another mark: 2 for each leader drawn
// before that its own leader would cross, and 1 for each other mark
// nearer to the box than its own point (the label reads as that mark's).
// Nothing for a label of no point (a NaN x or y).
func (pl *placer) misleads(c rect, x, y float64) float64 {
	if !finite(x) || !finite(y) {
		return 0
	}
	cost := 0.0
	nx, ny := c.nearest(x, y)
	own := math.Hypot(nx-x, ny-y)
	if lx, ly, far := c.leader(x, y); far {
		for _, g := range pl.leaders {
			if crosses(x, y, lx, ly, g[0], g[1], g[2], g[3]) {
				cost += 2
			}
		}
	}
	for _, m := range pl.marks {
		if x >= m.l && x <= m.r && y >= m.t && y <= m.b {
			continue // its own mark
		}
		mx, my := (m.l+m.r)/2, (m.t+m.b)/2
		ox, oy := c.nearest(mx, my)
		if math.Hypot(ox-mx, oy-my)+4 < own {
			cost++
		}
	}
	return cost
}

// crosses reports whether the segments a0–a1 and b0–b1 cross at a point
// inside both (touching ends do not count).
func crosses(ax0, ay0, ax1, ay1, bx0, by0, bx1, by1 float64) bool {
	side := func(px, py, qx, qy, rx, ry float64) float64 { return (qx-px)*(ry-py) - (qy-py)*(rx-px) }
	d1 := side(bx0, by0, bx1, by1, ax0, ay0)
	d2 := side(bx0, by0, bx1, by1, ax1, ay1)
	d3 := side(ax0, ay0, ax1, ay1, bx0, by0)
	d4 := side(ax0, ay0, ax1, ay1, bx1, by1)
	return d1*d2 < 0 && d3*d4 < 0
}

// labelReach is the farthest a marker's label may sit from its mark
// (viewBox px, box edge to point); farther, it is numbered at the mark and
// written under the plot.
const labelReach = 100

// markLabel is a marker's label as placed: its mark (x, y) and its box,
// or numbered under the plot.
type markLabel struct {
	x, y     float64
	box      rect
	text     string
	numbered bool
}

// leaderReach is how far a label may sit from its point without a leader.
const leaderReach = 24

// leader returns where a leader from (x, y) meets the box a, and whether
// the box is far enough to need one (never for a NaN point).
func (a rect) leader(x, y float64) (float64, float64, bool) {
	if !finite(x) || !finite(y) {
		return 0, 0, false
	}
	nx, ny := a.nearest(x, y)
	return nx, ny, math.Hypot(nx-x, ny-y) > leaderReach
}

// pointSpots are the candidate boxes, w × h, for a label of the point
// (x, y): the eight spots around it at increasing distances, nearest
// first.
func pointSpots(x, y, w, h float64) []rect {
	var out []rect
	for _, d := range [...]float64{12, 26, 44, 70, 100, 140} {
		for _, o := range [...][2]float64{
			{d, -d - h},          // above right
			{d, d - 2},           // below right
			{-d - w, -d - h},     // above left
			{-d - w, d - 2},      // below left
			{-w / 2, -d - 4 - h}, // above
			{-w / 2, d + 4},      // below
			{d + 4, -h / 2},      // right
			{-d - 4 - w, -h / 2}, // left
		} {
			out = append(out, rect{x + o[0], y + o[1], x + o[0] + w, y + o[1] + h})
		}
	}
	return out
}

// nearest returns the point of r closest to (x, y).
func (a rect) nearest(x, y float64) (float64, float64) {
	return math.Max(a.l, math.Min(x, a.r)), math.Max(a.t, math.Min(y, a.b))
}

// scan is the last resort: boxes w × h at every 12 px across the bounds,
// nearest to (x, y) first.
func (pl *placer) scan(x, y, w, h float64) []rect {
	var out []rect
	q := pl.bounds
	for t := q.t; t+h <= q.b; t += 12 {
		for l := q.l; l+w <= q.r; l += 12 {
			out = append(out, rect{l, t, l + w, t + h})
		}
	}
	d := make([]float64, len(out))
	for i, a := range out {
		nx, ny := a.nearest(x, y)
		d[i] = math.Hypot(nx-x, ny-y)
	}
	idx := make([]int, len(out))
	for i := range idx {
		idx[i] = i
	}
	sort.SliceStable(idx, func(i, j int) bool { return d[idx[i]] < d[idx[j]] })
	sorted := make([]rect, len(out))
	for i, k := range idx {
		sorted[i] = out[k]
	}
	return sorted
}
