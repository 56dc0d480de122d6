package chart_test

import (
	"fmt"
	"strings"

	"fieldhead/app/chart"
)

// A chart with one series and a marker, as the app would inject it.
func ExampleChart_SVG() {
	c := chart.Chart{
		Title:   "Head against flow",
		XLabel:  "flow Q (L/s)",
		YLabel:  "head H (m)",
		YMin:    chart.Fix(0),
		Series:  []chart.Series{{Name: "pump", X: []float64{0, 20, 40}, Y: []float64{62, 59, 52}, Accent: true}},
		Markers: []chart.Marker{{X: 30, Y: 56, Label: "duty"}},
	}
	svg := c.SVG()
	fmt.Println(strings.HasPrefix(svg, `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 800 `))
	fmt.Println(strings.Contains(svg, `<title>Head against flow</title>`))
	// Output:
	// true
	// true
}

// The canned pump chart from plain slices (invented demo numbers).
func ExamplePumpSystemChart() {
	c := chart.PumpSystemChart(chart.PumpSystemInput{
		FlowLabel: "flow Q (L/s)",
		HeadLabel: "head H (m)",
		Pumps:     []chart.Curve{{Name: "pump at 100 % speed", X: []float64{0, 20, 40, 55, 70}, Y: []float64{62, 59, 52, 44, 33}}},
		Systems:   []chart.Curve{{Name: "system curve", X: []float64{0, 35, 70}, Y: []float64{39, 44, 60}}},
		Operating: []chart.Marker{{X: 47, Y: 48, Label: "operating point"}},
	})
	fmt.Println(len(c.Series), len(c.Markers), *c.XMin, *c.YMin)
	// Output: 2 1 0 0
}
