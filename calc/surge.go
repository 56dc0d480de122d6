package calc

import (
	"math"
)

// Surge on a fast closure: a screening estimate of water hammer.
//
// Sources:
//   - D. J. Korteweg, "Ueber die Fortpflanzungsgeschwindigkeit des Schalles
//     in elastischen Röhren", Annalen der Physik 241 (1878) 525–542: the
//     speed of a pressure wave in a liquid-filled elastic pipe,
//     a = sqrt((K/ρ) / (1 + c·K·D/(E·e))), in the form with the restraint
//     factor c of E. B. Wylie and V. L. Streeter, "Fluid Transients in
//     Systems", Prentice Hall (1993), ch. 2 (thin-walled pipe).
//   - N. Joukowsky, "Über den hydraulischen Stoss in Wasserleitungsröhren",
//     Mém. Acad. Imp. Sci. St.-Pétersbourg (1900; Russian 1898): the
//     pressure rise Δp = ρ·a·Δv when a flow velocity Δv is stopped in less
//     than the wave's round trip 2L/a.
//
// A slower closure lets the reflected wave from the far end arrive while
// the valve still moves, so the rise is smaller; Joukowsky's Δp is then an
// upper bound and this package gives no smaller figure (that needs a
// transient analysis of the valve's closing curve).

// Limits of the surge inputs.
const (
	// surgeMaxRestraint bounds the restraint factor c: Wylie & Streeter's
	// thin-wall factors lie between about 0.75 and 1 (1 − ν/2, 1 − ν², 1
	// for the usual Poisson ratios); up to 2 is accepted, since thick-wall
	// forms exceed 1 slightly.
	surgeMaxRestraint = 2.0
)

// SurgePipe is one pipe of a line for the wave: its length, inside
// diameter, wall thickness and the wall material's elastic modulus, m and
// Pa, its restraint factor c (0 taken as 1) and the steady flow velocity
// in it, m/s.
type SurgePipe struct {
	Length, Diameter, Wall float64
	Modulus                float64 // E of the wall material, Pa
	Restraint              float64 // c; 0 means 1 (Wylie & Streeter: anchored with expansion joints throughout)
	Velocity               float64 // steady mean velocity, m/s
}

// Surge describes a closure at the downstream end of a line of pipes.
type Surge struct {
	Density     float64 // ρ of the liquid, kg/m³
	BulkModulus float64 // K of the liquid, Pa
	// Pipes run from the upstream end to the closing valve; the last one
	// is at the valve.
	Pipes []SurgePipe
	// ClosureTime is the time the valve takes to close, s.
	ClosureTime float64
	// DeltaV is the velocity stopped at the valve, m/s; 0 means the whole
	// steady velocity of the last pipe.
	DeltaV float64
	// Static is the absolute pressure at the valve with the flow stopped,
	// Pa; VapourPressure the liquid's, Pa absolute (for the low swing).
	Static, VapourPressure float64
}

// SurgeResult is the screening estimate of a closure.
type SurgeResult struct {
	WaveSpeeds []float64 // a of each pipe, m/s
	WaveSpeed  float64   // a of the pipe at the valve, m/s
	// Period is the wave's round trip 2·Σ L_i/a_i, s: a closure within it
	// is "fast" and meets the full Joukowsky rise.
	Period      float64
	Length      float64 // total length, m
	DeltaV      float64 // velocity stopped, m/s
	DeltaP      float64 // Joukowsky rise ρ·a·Δv, Pa
	DeltaH      float64 // the same as head of the liquid, a·Δv/g, m
	Fast        bool    // ClosureTime ≤ Period
	Peak        float64 // Static + DeltaP, Pa absolute
	Low         float64 // Static − DeltaP, Pa absolute (may lie below the vapour pressure, even below zero: a parted column)
	ColumnParts bool    // Low is at or below the vapour pressure
	Warnings    []Warning
}

// WaveSpeed returns the speed of a pressure wave in a liquid of bulk
// modulus k (Pa) and density rho (kg/m³) filling a thin-walled elastic pipe
// of inside diameter d and wall thickness wall (m) whose material has the
// elastic modulus e (Pa), with restraint factor c (Korteweg 1878, in the
// form of Wylie & Streeter 1993):
//
//	a = sqrt((K/ρ) / (1 + c·K·D/(E·e)))
//
// c is 1 for a pipe with expansion joints throughout, 1 − ν² for one
// anchored against axial movement and 1 − ν/2 for one anchored at its
// upstream end only (ν the wall's Poisson ratio; Wylie & Streeter). A rigid
// wall (e = +Inf) gives sqrt(K/ρ). The thin-wall form holds for D/e above
// about 25 (Wylie & Streeter's thick-wall factors differ by a few per cent
// below that; common practice). Errors name the field: "kliq" for k ≤ 0,
// "rho" for rho ≤ 0, "d" for d ≤ 0, "wall" for a wall ≤ 0 or at least
// d/2 (NotFinite for one so thin that c·K·D/(E·e) leaves the range of
// numbers), "epipe" for e ≤ 0 and "cr" for c outside (0, 2].
func WaveSpeed(k, rho, d, wall, e, c float64) (float64, error) {
	if err := checkSurgePipe(d, wall, e, c); err != nil {
		return 0, err
	}
	if !(k > 0) || math.IsInf(k, 0) {
		return 0, NewFieldError("kliq", NotPositive).Got(Fig(k, Pressure))
	}
	if !(rho > 0) || math.IsInf(rho, 0) {
		return 0, NewFieldError("rho", NotPositive).Got(Fig(rho, Density))
	}
	a := waveSpeed(k, rho, d, wall, e, c)
	if !(a > 0) {
		return 0, NewFieldError("wall", NotFinite).Got(Fig(wall, Length)).Because(ReasonBeyondNumbers)
	}
	return a, nil
}

// waveSpeed is Korteweg's formula without checks.
func waveSpeed(k, rho, d, wall, e, c float64) float64 {
	return math.Sqrt(k / rho / (1 + c*k*d/(e*wall)))
}

// checkSurgePipe checks a pipe's figures for the wave speed.
func checkSurgePipe(d, wall, e, c float64) error {
	switch {
	case !(d > 0) || math.IsInf(d, 0):
		return NewFieldError("d", NotPositive).Got(Fig(d, Length))
	case !(wall > 0) || math.IsInf(wall, 0):
		return NewFieldError("wall", NotPositive).Got(Fig(wall, Length))
	case wall >= d/2:
		return NewFieldError("wall", AboveLimit).Got(Fig(wall, Length)).Because(ReasonThinWall, Fig(d, Length))
	case !(e > 0):
		return NewFieldError("epipe", NotPositive).Got(Fig(e, Pressure))
	case !(c > 0 && c <= surgeMaxRestraint):
		return NewFieldError("cr", OutOfRange).Got(Num(c)).Within(Num(0), Num(surgeMaxRestraint)).Because(ReasonRestraint)
	}
	return nil
}

// Evaluate works out the surge of a closure at the end of the last pipe:
// each pipe's wave speed (WaveSpeed), the round trip 2L/a = 2·Σ L_i/a_i,
// the velocity stopped Δv, the Joukowsky rise Δp = ρ·a·Δv with a of the
// pipe at the valve, its head a·Δv/g, and the peak and low pressures
// Static ± Δp of the first swing at the valve. A closure slower than 2L/a
// gets a warning that Δp is then an upper bound; a low swing at or below
// the vapour pressure one that the column may part.
//
// Pipes of different sizes in series reflect part of the wave at each
// junction; the figure uses the pipe at the valve for the first wave and
// is a screening value only. Errors name the field: "tc" for a closure
// time ≤ 0, "dv" for a velocity change ≤ 0 (or no flow to stop), "q" for
// no pipes, "wall" (NotFinite) for a wall so thin against the others that
// the wave speed leaves the range of numbers, and those of WaveSpeed; a
// pipe's error carries its 1-based Segment when there are several.
func (s Surge) Evaluate() (SurgeResult, error) {
	if len(s.Pipes) == 0 {
		return SurgeResult{}, NewFieldError("q", Missing).Because(ReasonSurgePipe)
	}
	if !(s.ClosureTime > 0) || math.IsInf(s.ClosureTime, 0) {
		return SurgeResult{}, NewFieldError("tc", NotPositive).Got(Fig(s.ClosureTime, Duration))
	}
	if math.IsNaN(s.DeltaV) || s.DeltaV < 0 || math.IsInf(s.DeltaV, 0) {
		return SurgeResult{}, NewFieldError("dv", Negative).Got(Fig(s.DeltaV, Velocity))
	}
	if !(s.BulkModulus > 0) || math.IsInf(s.BulkModulus, 0) {
		return SurgeResult{}, NewFieldError("kliq", NotPositive).Got(Fig(s.BulkModulus, Pressure))
	}
	if !(s.Density > 0) || math.IsInf(s.Density, 0) {
		return SurgeResult{}, NewFieldError("rho", NotPositive).Got(Fig(s.Density, Density))
	}
	r := SurgeResult{}
	for i, p := range s.Pipes {
		c := p.Restraint
		if c == 0 {
			c = 1
		}
		if err := checkSurgePipe(p.Diameter, p.Wall, p.Modulus, c); err != nil {
			if fe, ok := err.(*FieldError); ok && len(s.Pipes) > 1 {
				fe.Segment = i + 1
			}
			return SurgeResult{}, err
		}
		if !(p.Length >= 0) || math.IsInf(p.Length, 0) {
			return SurgeResult{}, NewFieldError("length", Negative).Got(Fig(p.Length, Length))
		}
		a := waveSpeed(s.BulkModulus, s.Density, p.Diameter, p.Wall, p.Modulus, c)
		if !(a > 0) {
			// c·K·D/(E·e) beyond float64 (a wall of 1e-309 m): no wave
			// speed to work with, and 2L/a would be 0/0 for a zero length.
			fe := NewFieldError("wall", NotFinite).Got(Fig(p.Wall, Length)).Because(ReasonBeyondNumbers)
			if len(s.Pipes) > 1 {
				fe.Segment = i + 1
			}
			return SurgeResult{}, fe
		}
		r.WaveSpeeds = append(r.WaveSpeeds, a)
		r.Period += 2 * p.Length / a
		r.Length += p.Length
	}
	last := s.Pipes[len(s.Pipes)-1]
	r.WaveSpeed = r.WaveSpeeds[len(r.WaveSpeeds)-1]
	r.DeltaV = s.DeltaV
	if r.DeltaV == 0 {
		r.DeltaV = math.Abs(last.Velocity)
	}
	if !(r.DeltaV > 0) {
		return SurgeResult{}, NewFieldError("dv", Missing).Because(ReasonNoFlowToStop)
	}
	r.DeltaP = s.Density * r.WaveSpeed * r.DeltaV
	r.DeltaH = r.WaveSpeed * r.DeltaV / StandardGravity
	if math.IsInf(r.DeltaP+s.Static, 0) || math.IsInf(r.Period, 0) {
		return SurgeResult{}, NewFieldError("dv", NotFinite).Because(ReasonSurgeUnbounded, Fig(r.DeltaV, Velocity))
	}
	r.Fast = s.ClosureTime <= r.Period
	r.Peak = s.Static + r.DeltaP
	r.Low = s.Static - r.DeltaP
	r.ColumnParts = r.Low <= s.VapourPressure
	if r.Length == 0 {
		r.Warnings = append(r.Warnings, Warn("tc", CautionSurgeNoLength))
	}
	if !r.Fast {
		r.Warnings = append(r.Warnings, Warn("tc", CautionSurgeSlow, Fig(s.ClosureTime, Duration), Fig(r.Period, Duration), Fig(r.DeltaP, Pressure)))
	}
	if r.ColumnParts {
		r.Warnings = append(r.Warnings, Warn("tc", CautionSurgeColumnParts))
	}
	if last.Velocity != 0 && s.DeltaV > math.Abs(last.Velocity)*1.0001 {
		r.Warnings = append(r.Warnings, Warn("dv", CautionSurgeDvAboveFlow, Fig(s.DeltaV, Velocity), Fig(math.Abs(last.Velocity), Velocity)))
	}
	return r, nil
}

// WaterBulkModulus returns the isentropic bulk modulus K_s = ρ·w² of
// liquid water, Pa, at temperature tK (K) and absolute pressure pPa (Pa),
// with the density ρ and the speed of sound w of the IAPWS-IF97 region 1
// fundamental equation (2007 revision, Table 3). The range and errors are
// those of Water. It is the modulus of a pressure wave (a fast, adiabatic
// compression).
func WaterBulkModulus(tK, pPa float64) (float64, error) {
	f, err := Water(tK, pPa)
	if err != nil {
		return 0, err
	}
	w := if97Region1Properties(f.Temperature, math.Max(pPa, f.VapourPressure)).w
	return f.Density * w * w, nil
}

// SeawaterBulkModulus returns K_s = ρ·c² of seawater of 35 g/kg, Pa, at
// temperature tK (K) and absolute pressure pPa (Pa) (range and errors as
// Seawater): ρ from Seawater and the speed of sound c from K. V. Mackenzie,
// "Nine-term equation for sound speed in the oceans", J. Acoust. Soc. Am.
// 70(3) (1981) 807–812, at the surface (depth 0), with the practical
// salinity 35·35/35.16504 that an absolute salinity of 35 g/kg stands for
// (TEOS-10's reference-composition ratio). Mackenzie's coefficients were
// compared term by term with the equation as the National Physical
// Laboratory's technical guide "Speed of sound in sea-water" (its page on
// the underlying physics) prints it: 1448.96, 4.591, −5.304e-2, 2.374e-4,
// 1.340, −1.025e-2; the depth terms vanish at the surface. His stated
// range is 2–30 °C, and from 0 to 40 °C they agree with TEOS-10
// (python3-gsw's sound_speed) to within 0.5 m/s, which the tests check.
func SeawaterBulkModulus(tK, pPa float64) (float64, error) {
	f, err := Seawater(tK, pPa)
	if err != nil {
		return 0, err
	}
	c := mackenzieSoundSpeed(f.Temperature-273.15, SeawaterSalinity*1000*35/35.16504)
	return f.Density * c * c, nil
}

// mackenzieSoundSpeed is Mackenzie's (1981) equation at depth 0, t in °C
// and sp the practical salinity, m/s.
func mackenzieSoundSpeed(t, sp float64) float64 {
	return 1448.96 + t*(4.591+t*(-5.304e-2+t*2.374e-4)) + 1.340*(sp-35) - 1.025e-2*t*(sp-35)
}
