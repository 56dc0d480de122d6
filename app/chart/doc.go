// Package chart draws small line charts as self-contained SVG text for the
// Fieldhead sheet: ink on white, one accent colour, dash patterns and marker
// shapes that stay distinct when the sheet is printed in greyscale.
//
// The output is a single <svg> element sized by its viewBox (width 100 %,
// aspect ratio kept), with role="img", a <title> and a <desc>, and fonts
// inherited from the page. It needs no script, stylesheet, font file or
// element id, so several charts can sit on one page and the text can be
// injected as it is (for example with go-app's app.Raw).
//
// The package has no state of its own and never panics on odd input: empty
// series, NaN and ±Inf (skipped, they break a line), a single point,
// all-equal values and extreme magnitudes all give valid SVG; when nothing
// at all is drawable the chart carries a short "no data" note instead.
//
// Two builders, PumpSystemChart and ProfileChart, assemble the charts the
// app shows from plain slices; this package does not import calc.
package chart
