//go:build !wasm

package main

import (
	"bytes"
	"image/png"
	"math"
	"testing"
)

// TestIconSafeZone: every paper-coloured pixel of the icon (the mark) lies
// inside the maskable icon's safe zone, a circle centred on the icon with
// a radius of 40 % of its width (W3C Web App Manifest, icon purpose
// "maskable"), so that no launcher's mask cuts it; and the mark is there.
func TestIconSafeZone(t *testing.T) {
	for _, size := range []int{192, 512} {
		b, err := iconPNG(size)
		if err != nil {
			t.Fatal(err)
		}
		img, err := png.Decode(bytes.NewReader(b))
		if err != nil {
			t.Fatal(err)
		}
		c := float64(size) / 2
		marked, farthest := 0, 0.0
		for y := 0; y < size; y++ {
			for x := 0; x < size; x++ {
				r, _, _, _ := img.At(x, y).RGBA()
				if r>>8 != 0xfb { // paper is #fbfaf4, the ground #0f5c7a
					continue
				}
				marked++
				// The pixel's far corner from the centre.
				dx := math.Max(math.Abs(float64(x)-c), math.Abs(float64(x+1)-c))
				dy := math.Max(math.Abs(float64(y)-c), math.Abs(float64(y+1)-c))
				farthest = math.Max(farthest, math.Hypot(dx, dy)/float64(size))
			}
		}
		if marked < size*size/50 {
			t.Errorf("%d px icon: only %d pixels of mark", size, marked)
		}
		if farthest > 0.40 {
			t.Errorf("%d px icon: the mark reaches %.1f %% of the size from the centre, past the 40 %% safe zone", size, 100*farthest)
		}
		t.Logf("%d px icon: the mark reaches %.1f %% of the size from the centre", size, 100*farthest)
	}
}
