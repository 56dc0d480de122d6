package calc

import "math"

// Darby's 3-K method (Darby 1999, 2001):
//
//	K = K1/Re + Ki·(1 + Kd/Dn^0.3)
//
// Dn the nominal size in inches. The constants are those of Silverberg &
// Darby, "Correlate pressure drops through fittings", Chem. Eng. 106(7)
// (July 1999) p. 101, as python3-fluids tabulates them
// (fluids.fittings.Darby); the nominal size is found from the inside
// diameter as fluids.fittings.Darby3K does with Di: linearly along the
// schedule 40 bores of ASME B36.10M, NPS 1/8 to 36 (fluids.fittings.NPS40
// and S40i), extrapolated beyond its ends.

// darbyNPS and darbyBore are the nominal sizes (in) and schedule 40 inside
// diameters (mm) Darby's nominal size is interpolated along
// (python3-fluids fluids.fittings.NPS40, S40i; NPS ½–24 equal this
// package's ASME B36.10M schedule 40 bores, TestDarbyBores).
var (
	darbyNPS  = [...]float64{0.125, 0.25, 0.375, 0.5, 0.75, 1, 1.25, 1.5, 2, 2.5, 3, 3.5, 4, 5, 6, 8, 10, 12, 14, 16, 18, 20, 24, 32, 34, 36}
	darbyBore = [...]float64{6.84, 9.22, 12.48, 15.76, 20.96, 26.64, 35.08, 40.94, 52.48, 62.68, 77.92, 90.12, 102.26, 128.2, 154.08, 202.74, 254.46, 303.18, 333.34, 381, 428.46, 477.82, 575.04, 778.04, 829.04, 875.9}
)

// darbyDMin is the smallest inside diameter Darby's method takes here, m:
// the NPS 1/8 schedule 40 bore, below which the extrapolated nominal size
// soon reaches zero.
const darbyDMin = 6.84e-3

// DarbyNominalSize returns the nominal size, inches, Darby's 3-K method
// uses for inside diameter d (m): linear along the schedule 40 bores of
// NPS 1/8–36, extrapolated beyond them. d must be at least 6.84 mm, the
// NPS 1/8 bore, and finite (field "d").
func DarbyNominalSize(d float64) (float64, error) {
	if math.IsNaN(d) || math.IsInf(d, 0) || d < darbyDMin {
		return 0, NewFieldError("d", BelowLimit).Got(Fig(d, Length)).AtLeast(Fig(darbyDMin, Length)).Because(ReasonDarbySize)
	}
	mm := d * 1e3
	n := len(darbyBore)
	i := 0
	switch {
	case mm >= darbyBore[n-1]:
		i = n - 2
	default:
		for i < n-2 && mm > darbyBore[i+1] {
			i++
		}
	}
	x0, x1 := darbyBore[i], darbyBore[i+1]
	y0, y1 := darbyNPS[i], darbyNPS[i+1]
	return y0 + (y1-y0)*(mm-x0)/(x1-x0), nil
}

// darbyK is Darby's K for valid d and re.
func (f *Fitting) darbyK(d, re float64) (float64, error) {
	dn, err := DarbyNominalSize(d)
	if err != nil {
		return 0, err
	}
	return f.K1/re + f.KInf*(1+f.Kd*math.Pow(dn, -0.3)), nil
}
