package chart

import (
	"math"
	"strconv"
	"unicode/utf8"
)

// appendNum appends a pixel coordinate rounded to 0.1 px.
func appendNum(b []byte, v float64) []byte {
	t := math.Round(v * 10)
	if !(math.Abs(t) < 1e15) {
		return strconv.AppendFloat(b, t/10, 'f', -1, 64)
	}
	n := int64(t)
	if n < 0 {
		b = append(b, '-')
		n = -n
	}
	b = strconv.AppendInt(b, n/10, 10)
	if f := n % 10; f != 0 {
		b = append(b, '.', byte('0'+f))
	}
	return b
}

// tickLabel formats tick value v for an axis whose ticks are step apart and
// whose largest magnitude is big: plain decimals with as many places as the
// step needs (Heckbert's rule, one more for a step of 2.5 × 10^k), or m×10ⁿ
// for very large or small numbers. Negative numbers get a true minus sign.
func tickLabel(v, step, big float64) string {
	if v == 0 {
		return "0"
	}
	neg := v < 0
	a := math.Abs(v)
	var s string
	places := 0
	if step > 0 {
		places = int(math.Max(-math.Floor(math.Log10(step)+1e-9), 0))
		// A step of 2.5 × 10^k needs one place more (0, 2.5, 5, 7.5).
		if m := step * math.Pow(10, float64(places)); places < 6 && math.Abs(m-math.Round(m)) > 1e-6*m {
			places++
		}
	} else {
		places = 3
	}
	if big >= 1e6 || big < 1e-3 || places > 6 {
		e := math.Floor(math.Log10(a))
		m := a / math.Pow(10, e)
		digits := 3
		if step > 0 {
			digits = int(math.Floor(math.Log10(a)+1e-9) - math.Floor(math.Log10(step)+1e-9))
			if digits < 0 {
				digits = 0
			}
			if digits > 6 {
				digits = 6
			}
		}
		ms := strconv.FormatFloat(m, 'f', digits, 64)
		if len(ms) >= 2 && ms[0] == '1' && (len(ms) == 2 || ms[2] == '.') && ms[1] == '0' {
			// Rounding carried the mantissa up to 10.
			e++
			ms = strconv.FormatFloat(m/10, 'f', digits, 64)
		}
		ms = trimZeros(ms)
		if ms == "1" {
			s = "10" + superscript(int(e))
		} else {
			s = ms + "×10" + superscript(int(e))
		}
	} else {
		s = strconv.FormatFloat(a, 'f', places, 64)
	}
	if neg {
		s = "−" + s
	}
	return s
}

func trimZeros(s string) string {
	for i := 0; i < len(s); i++ {
		if s[i] == '.' {
			j := len(s)
			for j > i && (s[j-1] == '0') {
				j--
			}
			if j == i+1 {
				j = i
			}
			return s[:j]
		}
	}
	return s
}

var supDigits = [...]string{"⁰", "¹", "²", "³", "⁴", "⁵", "⁶", "⁷", "⁸", "⁹"}

func superscript(n int) string {
	s := strconv.Itoa(n)
	out := make([]byte, 0, 3*len(s))
	for i := 0; i < len(s); i++ {
		if s[i] == '-' {
			out = append(out, "⁻"...)
			continue
		}
		out = append(out, supDigits[s[i]-'0']...)
	}
	return string(out)
}

// appendText appends s escaped for XML character data or a quoted
// attribute value. Characters that XML 1.0 forbids (most C0 controls,
// U+FFFE, U+FFFF, broken UTF-8) become U+FFFD; tabs and newlines become
// spaces.
func appendText(b []byte, s string) []byte {
	for i := 0; i < len(s); {
		c := s[i]
		if c < utf8.RuneSelf {
			switch {
			case c == '&':
				b = append(b, "&amp;"...)
			case c == '<':
				b = append(b, "&lt;"...)
			case c == '>':
				b = append(b, "&gt;"...)
			case c == '"':
				b = append(b, "&quot;"...)
			case c == '\'':
				b = append(b, "&#39;"...)
			case c == '\t' || c == '\n' || c == '\r':
				b = append(b, ' ')
			case c < 0x20 || c == 0x7f:
				b = append(b, "\uFFFD"...)
			default:
				b = append(b, c)
			}
			i++
			continue
		}
		r, n := utf8.DecodeRuneInString(s[i:])
		if r == utf8.RuneError || r == 0xFFFE || r == 0xFFFF || (r >= 0x80 && r <= 0x9f) {
			b = append(b, "\uFFFD"...)
		} else {
			b = append(b, s[i:i+n]...)
		}
		i += n
	}
	return b
}

// textWidth estimates the advance width of s in a proportional sans-serif
// face at the given size. It errs on the wide side (DejaVu Sans and
// similar generous system faces) so that layouts do not collide.
func textWidth(s string, size float64) float64 {
	w := 0.0
	for _, r := range s {
		switch {
		case r == ' ' || r == '.' || r == ',' || r == ':' || r == ';' || r == '\'' || r == '|' || r == 'i' || r == 'l' || r == 'j' || r == '!' || r == '(' || r == ')' || r == '[' || r == ']':
			w += 0.34
		case r == 'f' || r == 't' || r == 'r' || r == 'I' || r == '/' || r == '-':
			w += 0.42
		case r == 'm' || r == 'w' || r == 'M' || r == 'W' || r == '%' || r == '—':
			w += 0.9
		case r >= 'A' && r <= 'Z':
			w += 0.7
		case r >= 0x2070 && r <= 0x209f: // super- and subscripts
			w += 0.4
		default:
			w += 0.62
		}
	}
	return w * size
}
