//go:build !wasm

package main

import (
	"bytes"
	"image"
	"image/color"
	"image/png"
)

// Colours of the page chrome, shared by the manifest and the icon. The
// stylesheet repeats them (web/fieldhead.css).
const (
	colourPaper  = "#fbfaf4"
	colourInk    = "#14181c"
	colourAccent = "#0f5c7a"
)

// iconPNG draws the Fieldhead mark at size×size pixels: on the accent
// ground, a low water level at the left, a high one at the right, and an
// upward arrow between them, the head a pump adds. The mark is drawn at
// markScale about the centre so that all of it lies within the maskable
// icon's safe zone, a circle of radius 40 % of the size (W3C Web App
// Manifest, "purpose: maskable"); the same PNG serves as the plain icon.
func iconPNG(size int) ([]byte, error) {
	img := image.NewRGBA(image.Rect(0, 0, size, size))
	ground := color.RGBA{0x0f, 0x5c, 0x7a, 0xff}
	paper := color.RGBA{0xfb, 0xfa, 0xf4, 0xff}
	s := float64(size)
	for y := 0; y < size; y++ {
		for x := 0; x < size; x++ {
			u, v := (float64(x)+0.5)/s, (float64(y)+0.5)/s
			c := ground
			if markAt(u, v) {
				c = paper
			}
			img.Set(x, y, c)
		}
	}
	var buf bytes.Buffer
	if err := png.Encode(&buf, img); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}

// markScale shrinks the mark about the icon's centre: its farthest corner,
// 41.2 % of the size from the centre at full scale, comes to 37.9 %.
const markScale = 0.92

// markAt reports whether the point (u, v) of the unit square, y downwards,
// is paper-coloured. It matches web/icon.svg and the brand mark
// (app/chrome.go), which draw the same shapes scaled by markScale.
func markAt(u, v float64) bool {
	u, v = 0.5+(u-0.5)/markScale, 0.5+(v-0.5)/markScale
	in := func(x0, y0, x1, y1 float64) bool { return u >= x0 && u <= x1 && v >= y0 && v <= y1 }
	switch {
	case in(0.18, 0.70, 0.42, 0.76): // low level
		return true
	case in(0.58, 0.26, 0.82, 0.32): // high level
		return true
	case in(0.465, 0.36, 0.535, 0.78): // arrow shaft
		return true
	}
	// Arrow head: triangle with apex (0.5, 0.18), base from 0.38 to 0.62 at 0.40.
	if v >= 0.18 && v <= 0.40 {
		half := (v - 0.18) / (0.40 - 0.18) * 0.12
		return u >= 0.5-half && u <= 0.5+half
	}
	return false
}
