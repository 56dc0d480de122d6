package chart

import "math"

// Style selects how a series is drawn. Line styles differ by dash pattern so
// that series remain distinguishable without colour.
type Style int

const (
	// Solid draws an unbroken line.
	Solid Style = iota
	// Dashed draws medium dashes.
	Dashed
	// Dotted draws round dots.
	Dotted
	// DashDot draws alternating long dashes and dots.
	DashDot
	// LongDash draws long dashes with short gaps.
	LongDash
	// Area fills the region between the line and y = 0 (or the nearer
	// edge of the plot when 0 is outside the y range) in light grey, with
	// a thin solid edge.
	Area
	// Points draws only a marker shape at each point, with no line.
	Points
)

// Shape is the symbol drawn for a Marker or for a Points series.
type Shape int

const (
	// AutoShape lets the chart choose: a ringed dot (Target) for a
	// Marker, and the next unused of square, triangle, diamond, circle for
	// a Points series.
	AutoShape Shape = iota
	// Target is a ring with a filled centre, meant for an answer such as
	// an operating point.
	Target
	// Circle is an open circle.
	Circle
	// Square is an open square.
	Square
	// Triangle is an open upward triangle.
	Triangle
	// Diamond is an open diamond.
	Diamond
	// Cross is a diagonal cross.
	Cross
	// Dot is a small filled disc: a figure given on paper (a data-sheet
	// point).
	Dot
	// Ring is a small open circle: a reading taken on site (drawn inside
	// its uncertainty box).
	Ring
	// Peak is a filled triangle standing on the point: the top of a curve
	// (the best-efficiency point).
	Peak
	// Gem is a filled diamond: a figure given on paper that is a target
	// (a contract's guarantee point).
	Gem
)

// Series is one named polyline. X and Y are paired by index (the shorter
// slice sets the length); a NaN or ±Inf in either breaks the line there.
type Series struct {
	// Name labels the series in the legend; an empty name leaves it out.
	Name string
	// X and Y are the data, in the caller's display units.
	X, Y []float64
	// Style is the dash pattern, Area or Points.
	Style Style
	// Shape is the symbol of a Points series (AutoShape picks one).
	Shape Shape
	// Accent draws the series in the accent colour instead of ink.
	Accent bool
	// Heavy draws a thicker line.
	Heavy bool
	// Y2 plots the series against the chart's second (right) y axis.
	Y2 bool
	// Key names the series in the SVG (data-series), for tests and styles.
	Key string
	// Tag is a short name written on the line itself, at its last point in
	// the plot: above the line, or below it when TagBelow is set. Two lines
	// that run close together (the energy and hydraulic grade lines) are
	// told apart by it in print and in greyscale.
	Tag      string
	TagBelow bool
}

// Marker is a single labelled point, for example an operating point.
type Marker struct {
	// X and Y locate the marker in data units.
	X, Y float64
	// Label is written beside the marker; a newline starts a second line.
	Label string
	// Shape is the symbol (AutoShape means Target).
	Shape Shape
	// Accent draws the marker and its label in the accent colour.
	Accent bool
	// Drop draws thin dotted lines from the marker to the x and y axes.
	Drop bool
	// Y2 places the marker against the second (right) y axis.
	Y2 bool
	// DX and DY, when either is above zero, are the ± of a measurement in
	// data units: a box of 2·DX by 2·DY is drawn around the mark, with
	// whiskers from the mark to its sides (data-mark="uncertainty").
	DX, DY float64
	// Key names the mark in the SVG (data-mark), for tests and styles.
	Key string
}

// Band is a shaded, hatched x-range across the plot, for example the flows
// beyond the data sheet. X0 or X1 may be ±Inf to reach the plot's edge. A
// band with X0 == X1 is drawn as a dashed vertical guide line.
type Band struct {
	X0, X1 float64
	// Label is written at the top of the band (or beside the guide).
	Label string
	// Tint fills the band with a flat tint instead of hatching: a range
	// to keep to (hatching marks a range to distrust or avoid).
	Tint bool
}

// Axis describes a second y axis on the right of the plot.
type Axis struct {
	// Label is the axis title, with its unit, e.g. "efficiency η (%)".
	Label string
	// Min and Max fix the axis limits; nil means automatic.
	Min, Max *float64
}

// Chart is a complete line chart. The zero value is a valid, empty chart.
type Chart struct {
	// Title is drawn at the top and used for the accessible title.
	Title string
	// Desc is the accessible description; empty means one is composed
	// from the axis titles, series names and marker labels.
	Desc string
	// XLabel and YLabel are the axis titles, with units given by the caller.
	XLabel, YLabel string
	// Series are drawn in order; the legend lists them in the same order.
	Series []Series
	// Direct names each series on the plot, at the free spot nearest its
	// right end, instead of in a legend above it.
	Direct bool
	// Markers are drawn on top of the series.
	Markers []Marker
	// Bands are drawn beneath the series.
	Bands []Band
	// Width and Height set the viewBox in px (default 800 × 480). The
	// SVG scales to its container's width; text sizes are fixed in viewBox
	// px (≥ 14 px at Width 800), so a smaller Width gives relatively
	// larger text, which suits phones. Height grows if the content needs it.
	Width, Height int
	// XMin, XMax, YMin and YMax fix axis limits; nil means automatic
	// ("nice" limits that enclose the data). See Fix.
	XMin, XMax, YMin, YMax *float64
	// YSpan is the least span of an automatic y axis (0: none): data
	// closer together than that are drawn on an axis this wide about their
	// middle, and not below 0 when none of them is, so that a small drift
	// shows as small.
	YSpan float64
	// Y2 adds a second y axis on the right for series and markers with Y2 set.
	Y2 *Axis
	// Lower is an optional panel drawn below this one, sharing the x axis
	// (its own X limits, Title, Accent and Width are ignored; its Height,
	// default 1/2 of this chart's, sets the panel's height). A Lower's own
	// Lower is drawn below it, and so on: a stack of strips.
	Lower *Chart
	// Accent is the one accent colour as a CSS colour ("" = DefaultAccent).
	Accent string
	// FontFamily is the CSS font family ("" = inherit from the page).
	FontFamily string
	// NoData replaces the note shown when nothing is drawable.
	NoData string
}

// DefaultAccent is the accent colour used when Chart.Accent is empty: a deep
// blue-green that reads as dark grey in greyscale print.
const DefaultAccent = "#0f5c7a"

// Ink is the colour of lines and text that are not accented.
const Ink = "#14181c"

// Fix returns a pointer to v, for fixing an axis limit:
// Chart{YMin: chart.Fix(0)}.
func Fix(v float64) *float64 { return &v }

// SVG renders the chart as a complete <svg> element.
func (c Chart) SVG() string { return string(c.AppendSVG(nil)) }

// AppendSVG appends the rendered <svg> element to b and returns the result.
func (c Chart) AppendSVG(b []byte) []byte {
	r := newRenderer(&c)
	return r.render(b)
}

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
