package scenario

import "time"

// parseRFC3339 reads an RFC 3339 date and time exactly as
// time.Parse(time.RFC3339, s) does: it accepts the same texts (a
// one-digit hour, a fraction of a second written with '.' or ',' and
// cut after nine digits, an offset of up to 24 h 60 min) and gives the
// same instant, in UTC. ok is false for any text time.Parse rejects.
//
// It exists to keep time.Parse out of the wasm: its general layout
// parser is about 45 KB of the wasm (8 KB of brotli) that nothing else
// there needs.
// TestParseRFC3339 and FuzzParseRFC3339 hold it to time.Parse.
func parseRFC3339(s string) (t time.Time, ok bool) {
	year, s, ok := digits(s, 4, 4)
	var month, day, hour, min, sec, nsec int
	if ok {
		s, ok = lit(s, '-')
	}
	if ok {
		month, s, ok = digits(s, 2, 2)
		ok = ok && 1 <= month && month <= 12
	}
	if ok {
		s, ok = lit(s, '-')
	}
	if ok {
		day, s, ok = digits(s, 2, 2)
	}
	if ok {
		s, ok = lit(s, 'T')
	}
	if ok {
		hour, s, ok = digits(s, 1, 2) // time.Parse's "15" takes one digit too
		ok = ok && hour < 24
	}
	if ok {
		s, ok = lit(s, ':')
	}
	if ok {
		min, s, ok = digits(s, 2, 2)
		ok = ok && min < 60
	}
	if ok {
		s, ok = lit(s, ':')
	}
	if ok {
		sec, s, ok = digits(s, 2, 2)
		ok = ok && sec < 60
	}
	if !ok {
		return time.Time{}, false
	}
	if len(s) >= 2 && (s[0] == '.' || s[0] == ',') && isDigit(s[1]) {
		n := 1
		for n < len(s) && isDigit(s[n]) {
			n++
		}
		for i := 1; i < 10; i++ {
			nsec *= 10
			if i < n {
				nsec += int(s[i] - '0')
			}
		}
		s = s[n:]
	}
	offset := 0
	switch {
	case len(s) >= 1 && s[0] == 'Z':
		s = s[1:]
	case len(s) >= 6 && (s[0] == '+' || s[0] == '-') && s[3] == ':':
		hh, _, ok1 := digits(s[1:3], 2, 2)
		mm, _, ok2 := digits(s[4:6], 2, 2)
		if !ok1 || !ok2 || hh > 24 || mm > 60 {
			return time.Time{}, false
		}
		offset = (hh*60 + mm) * 60
		if s[0] == '-' {
			offset = -offset
		}
		s = s[6:]
	default:
		return time.Time{}, false
	}
	// The day is checked last, as time.Parse does, against its month
	// and year (29 February only in a leap year).
	if s != "" || day < 1 || day > time.Date(year, time.Month(month)+1, 0, 0, 0, 0, 0, time.UTC).Day() {
		return time.Time{}, false
	}
	t = time.Date(year, time.Month(month), day, hour, min, sec, nsec, time.UTC)
	return t.Add(-time.Duration(offset) * time.Second), true
}

// digits reads from min to max decimal digits at the start of s.
func digits(s string, min, max int) (n int, rest string, ok bool) {
	i := 0
	for i < max && i < len(s) && isDigit(s[i]) {
		n = n*10 + int(s[i]-'0')
		i++
	}
	return n, s[i:], i >= min
}

// lit reads the byte c at the start of s.
func lit(s string, c byte) (rest string, ok bool) {
	if s == "" || s[0] != c {
		return s, false
	}
	return s[1:], true
}
