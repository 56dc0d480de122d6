package chart

import (
	"flag"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// -charts=DIR writes the demo charts as SVG files and an HTML preview into
// DIR (e.g. go test ./app/chart -run Canned -args -charts=../../build/charts).
var chartsDir = flag.String("charts", "", "write demo charts into this directory")

// The demo numbers below are the invented booster-station scenario of the
// product brief; they illustrate the drawing and are not check values.

// demoPump fits H = a + b·Q + c·Q² through the data-sheet points by least
// squares (normal equations, solved by Cramer's rule).
func demoPump() (q, h []float64, fit func(float64) float64) {
	q = []float64{0, 20, 40, 55, 70}
	h = []float64{62, 59, 52, 44, 33}
	var s [5]float64 // Σq^k, k = 0..4
	var t [3]float64 // Σh·q^k
	for i := range q {
		p := 1.0
		for k := 0; k < 5; k++ {
			s[k] += p
			if k < 3 {
				t[k] += h[i] * p
			}
			p *= q[i]
		}
	}
	det3 := func(m [3][3]float64) float64 {
		return m[0][0]*(m[1][1]*m[2][2]-m[1][2]*m[2][1]) - m[0][1]*(m[1][0]*m[2][2]-m[1][2]*m[2][0]) + m[0][2]*(m[1][0]*m[2][1]-m[1][1]*m[2][0])
	}
	m := [3][3]float64{{s[0], s[1], s[2]}, {s[1], s[2], s[3]}, {s[2], s[3], s[4]}}
	d := det3(m)
	var coef [3]float64
	for j := 0; j < 3; j++ {
		mj := m
		for i := 0; i < 3; i++ {
			mj[i][j] = t[i]
		}
		coef[j] = det3(mj) / d
	}
	return q, h, func(x float64) float64 { return coef[0] + coef[1]*x + coef[2]*x*x }
}

func sample(x0, x1 float64, n int, f func(float64) float64) (x, y []float64) {
	for i := 0; i <= n; i++ {
		v := x0 + (x1-x0)*float64(i)/float64(n)
		x = append(x, v)
		y = append(y, f(v))
	}
	return x, y
}

func demoPumpInput() PumpSystemInput {
	dq, dh, pump := demoPump()
	system := func(q float64) float64 { return 39 + 0.0042*q*q } // static lift 251 − 212 m
	// Operating point by bisection on pump − system.
	lo, hi := 0.0, 80.0
	for i := 0; i < 60; i++ {
		mid := (lo + hi) / 2
		if pump(mid) > system(mid) {
			lo = mid
		} else {
			hi = mid
		}
	}
	qop := (lo + hi) / 2
	pq, ph := sample(0, 75, 60, pump)
	sq, sh := sample(0, 75, 60, system)
	// 90 % speed by the affinity laws: Q ∝ n, H ∝ n².
	var q9, h9 []float64
	for i := range pq {
		q9 = append(q9, 0.9*pq[i])
		h9 = append(h9, 0.81*ph[i])
	}
	eq, eh := sample(0, 75, 60, func(q float64) float64 { return math.Max(0, 78*(1-math.Pow((q-48)/48, 2))) })
	rq, rh := sample(5, 75, 40, func(q float64) float64 { return 1.6 + 0.0011*q*q })
	aq, ah := sample(0, 75, 40, func(q float64) float64 { return 7.9 - 0.0004*q*q })
	return PumpSystemInput{
		Title:     "BS-3 duty pump against the Crest line",
		FlowLabel: "flow Q (L/s)",
		HeadLabel: "head H (m)",
		Pumps: []Curve{
			{Name: "pump at 100 % speed", X: pq, Y: ph},
			{Name: "pump at 90 % speed", X: q9, Y: h9},
		},
		DataPoints: Curve{Name: "data-sheet points", X: dq, Y: dh},
		Systems:    []Curve{{Name: "system curve", X: sq, Y: sh}},
		Operating: []Marker{{X: qop, Y: pump(qop),
			Label: "operating point\n" + tickLabel(math.Round(qop*10)/10, 0.1, 100) + " L/s, " + tickLabel(math.Round(pump(qop)*10)/10, 0.1, 100) + " m"}},
		Bands:           []Band{{X0: 70, X1: math.Inf(1), Label: "beyond data sheet"}},
		Efficiency:      Curve{Name: "efficiency", X: eq, Y: eh},
		EfficiencyLabel: "efficiency η (%)",
		NPSHRequired:    Curve{Name: "NPSH required", X: rq, Y: rh},
		NPSHAvailable:   Curve{Name: "NPSH available", X: aq, Y: ah},
		NPSHLabel:       "NPSH (m)",
		FlowMax:         75,
	}
}

func demoProfileInput() ProfileInput {
	// Stations: wet-well intake, pump (suction then discharge side), the
	// rising main, the Crest reservoir inlet.
	x := []float64{0, 6, 6, 80, 200, 320, 450, 560, 646}
	z := []float64{211.0, 214.5, 214.5, 218.0, 226.0, 231.5, 240.0, 245.5, 249.0}
	hgl := make([]float64, len(x))
	egl := make([]float64, len(x))
	vap := make([]float64, len(x))
	const vh = 0.1      // velocity head, m
	const pvLine = -9.9 // (p_v − p_site)/(ρg), m, invented demo value
	hgl[0], hgl[1] = 212.0-vh, 211.6
	for i := 2; i < len(x); i++ {
		hgl[i] = 259.6 - (259.6-251.1)*(x[i]-6)/(646-6)
	}
	for i := range x {
		egl[i] = hgl[i] + vh
		vap[i] = z[i] + pvLine
	}
	return ProfileInput{
		Title:         "Intake to Crest reservoir, 45 L/s",
		DistanceLabel: "distance along the line (m)",
		HeadLabel:     "elevation, head (m)",
		Distance:      x, Pipe: z, EGL: egl, HGL: hgl, Vapour: vap,
		Nodes: []Marker{{X: 0, Y: 212, Label: "wet well"}, {X: 6, Y: 214.5, Label: "pump"}, {X: 646, Y: 251, Label: "Crest"}},
	}
}

func TestCannedCharts(t *testing.T) {
	cases := []struct {
		file string
		c    Chart
		want []string
	}{
		{"pump-system", PumpSystemChart(demoPumpInput()), []string{
			"flow Q (L/s)", "head H (m)", "pump at 100 % speed", "pump at 90 % speed", "system curve",
			"efficiency", "efficiency η (%)", "NPSH (m)", "NPSH required",
			"NPSH available", "operating point", "beyond data sheet"}},
		{"pump-system-bare", PumpSystemChart(PumpSystemInput{FlowLabel: "flow (gpm)", HeadLabel: "head (ft)",
			Pumps:   []Curve{{Name: "pump", X: []float64{0, 500, 1000}, Y: []float64{200, 180, 120}}},
			Systems: []Curve{{Name: "system", X: []float64{0, 500, 1000}, Y: []float64{120, 140, 200}}}, Width: 480}),
			[]string{"flow (gpm)", "head (ft)", "pump", "system"}},
		{"pump-system-phone", PumpSystemChart(func() PumpSystemInput { in := demoPumpInput(); in.Width = 480; return in }()),
			[]string{"pump at 100 % speed", "NPSH (m)", "operating point"}},
		{"profile", ProfileChart(demoProfileInput()), []string{
			"distance along the line (m)", "elevation, head (m)", "pipe", "energy grade line (EGL)",
			"hydraulic grade line (HGL)", "vapour-pressure line", "wet well", "Crest"}},
		{"profile-empty", ProfileChart(ProfileInput{Title: "no stations yet"}), []string{"no data to plot"}},
	}
	var html strings.Builder
	for _, tc := range cases {
		s := tc.c.SVG()
		p := readSVG(t, s)
		checkInside(t, p)
		for _, w := range tc.want {
			if !strings.Contains(p.text, w) {
				t.Errorf("%s: %q missing", tc.file, w)
			}
		}
		if *chartsDir != "" {
			if err := os.MkdirAll(*chartsDir, 0o755); err != nil {
				t.Fatal(err)
			}
			// Stand-alone files name a generic family, since there is no page to inherit from.
			alone := strings.Replace(s, `font-family="inherit"`, `font-family="sans-serif"`, 1)
			if err := os.WriteFile(filepath.Join(*chartsDir, tc.file+".svg"), []byte(alone), 0o644); err != nil {
				t.Fatal(err)
			}
			html.WriteString(`<div class="card">` + s + "</div>\n")
		}
	}
	if *chartsDir != "" {
		page := func(extra string) string {
			return "<!doctype html><meta charset=utf-8><title>charts</title><style>body{margin:0;padding:12px;background:#fbfaf4;color:#14181c;" +
				`font-family:system-ui,-apple-system,"Segoe UI","Noto Sans","DejaVu Sans",sans-serif;` + extra +
				"}.card{max-width:800px;margin:0 0 16px;border:2px solid #14181c;border-radius:6px;background:#fff}</style>\n" + html.String()
		}
		for name, extra := range map[string]string{"preview.html": "", "preview-grey.html": "filter:grayscale(1)"} {
			if err := os.WriteFile(filepath.Join(*chartsDir, name), []byte(page(extra)), 0o644); err != nil {
				t.Fatal(err)
			}
		}
	}
}

func BenchmarkPumpSystemChart(b *testing.B) {
	in := demoPumpInput()
	b.ReportAllocs()
	for b.Loop() {
		_ = PumpSystemChart(in).SVG()
	}
}

func BenchmarkProfileChart(b *testing.B) {
	in := demoProfileInput()
	b.ReportAllocs()
	for b.Loop() {
		_ = ProfileChart(in).SVG()
	}
}

func BenchmarkDenseSeries(b *testing.B) {
	// 4 series × 2000 points, more than the app draws.
	var c Chart
	for k := 0; k < 4; k++ {
		x, y := sample(0, 100, 2000, func(v float64) float64 { return math.Sin(v/7+float64(k)) * 10 })
		c.Series = append(c.Series, Series{Name: "s", X: x, Y: y, Style: Style(k)})
	}
	buf := make([]byte, 0, 1<<16)
	b.ReportAllocs()
	for b.Loop() {
		buf = c.AppendSVG(buf[:0])
	}
}
