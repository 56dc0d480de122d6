package scenario

import (
	"strconv"
	"strings"

	"fieldhead/calc"
)

// The readings of a test at several points. Reading 1 is the field
// check's own boxes (qm, ps, pd, pin), so a sheet of one reading reads as
// it always has; reading k from 2 on is qmk, psk, pdk and pink (qm2=38L/s):
// a value each, with its own unit and gauge or absolute suffix, so that a
// comma keeps meaning a decimal comma in every box (qm=41,5L/s is 41.5 L/s
// and stays so) and each value is read, checked for slips and kept like
// any other.

// readingFields are the fields of one reading, in link order.
var readingFields = []string{"qm", "ps", "pd", "pin"}

// ReadingParam names field f ("qm", "ps", "pd", "pin") of reading k
// (1-based): "qm" for reading 1, "qm3" for reading 3.
func ReadingParam(f string, k int) string {
	if k <= 1 {
		return f
	}
	return f + strconv.Itoa(k)
}

// ReadingOf splits a reading's parameter "pd4" into "pd" and 4 ("pd" is
// reading 1); k is 0 for any other parameter.
func ReadingOf(name string) (f string, k int) {
	for _, rf := range readingFields {
		if name == rf {
			return rf, 1
		}
		if rest, ok := strings.CutPrefix(name, rf); ok && len(rest) == 1 && rest[0] >= '2' && rest[0] <= '0'+calc.TestMaxReadings {
			return rf, int(rest[0] - '0')
		}
	}
	return "", 0
}

// init rules the readings' gauges as the first reading's: a pressure
// typed in Pa below 10 kPa is a slip (slips.go).
func init() {
	for k := 2; k <= calc.TestMaxReadings; k++ {
		slipRules[ReadingParam("ps", k)] = slipPascals
		slipRules[ReadingParam("pd", k)] = slipPascals
	}
	slipRules["etag"] = slipShare
}

// isGauge reports whether name is a gauge reading of a field check or a
// test: read as a pressure with its gauge or absolute suffix.
func isGauge(name string) bool {
	f, k := ReadingOf(name)
	return k > 0 && (f == "ps" || f == "pd")
}

// ReadingsGiven lists the readings a sheet holds, by number: 1 when any of
// the field check's boxes is given, then each k from 2 with any of its
// flow or gauges given.
func (in *Inputs) ReadingsGiven() []int {
	var out []int
	for k := 1; k <= calc.TestMaxReadings; k++ {
		for _, f := range readingFields[:3] {
			if in.Given(ReadingParam(f, k)) {
				out = append(out, k)
				break
			}
		}
	}
	return out
}
