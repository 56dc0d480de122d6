package scenario

import (
	"math"
	"strconv"
	"strings"

	"fieldhead/calc"
)

// fitMaxCount and fitMaxK bound a fitting list's counts and given K values.
const (
	fitMaxCount = 1000
	fitMaxK     = 10000
)

// ParseFittings reads a fitting list such as "gate:2,elbow90lr:6,exit".
// Each item is key[:count][@K]: a count of 1 may be left out, and @K gives
// the loss coefficient of each of these fittings instead of the table's
// method (a figure from the maker's data sheet): "gate:2@0.12" is two gate
// valves of K 0.12 each. K is a plain number with a decimal point, from 0
// to 10000. A key may appear once; a count of 0 drops the item. Errors are
// *calc.FieldError for field "fit".
func ParseFittings(text string) ([]calc.FittingCount, error) {
	var out []calc.FittingCount
	seen := map[string]bool{}
	for _, item := range strings.Split(text, ",") {
		item = strings.TrimSpace(item)
		if item == "" {
			continue
		}
		item, kText, hasK := strings.Cut(item, "@")
		key, cnt, hasCount := strings.Cut(item, ":")
		key = strings.TrimSpace(key)
		if _, err := calc.LookupFitting(key); err != nil {
			return nil, err
		}
		key = strings.ToLower(key)
		if seen[key] {
			return nil, calc.NewFieldError("fit", calc.Inconsistent).Typed(key).Because(calc.ReasonListedTwice)
		}
		seen[key] = true
		fc := calc.FittingCount{Key: key, Count: 1}
		if hasCount {
			c, err := strconv.Atoi(strings.TrimSpace(cnt))
			if err != nil || c < 0 || c > fitMaxCount {
				return nil, calc.NewFieldError("fit", calc.OutOfRange).Typed(key).Within(calc.Num(0), calc.Num(fitMaxCount)).Because(calc.ReasonFittingCount)
			}
			fc.Count = c
		}
		if hasK {
			k, err := strconv.ParseFloat(strings.TrimSpace(kText), 64)
			if err != nil || math.IsNaN(k) || k < 0 || k > fitMaxK {
				return nil, calc.NewFieldError("fit", calc.OutOfRange).Typed(key+"@"+kText).Within(calc.Num(0), calc.Num(fitMaxK)).Because(calc.ReasonFittingK)
			}
			fc.K, fc.Override = k, true
		}
		if fc.Count > 0 {
			out = append(out, fc)
		}
	}
	return out, nil
}

// FormatFittings writes a fitting list in the form ParseFittings reads:
// "key:count" items, with "@K" where a K is given.
func FormatFittings(list []calc.FittingCount) string {
	items := make([]string, 0, len(list))
	for _, fc := range list {
		s := fc.Key + ":" + strconv.Itoa(fc.Count)
		if fc.Override {
			s += "@" + strconv.FormatFloat(fc.K, 'g', -1, 64)
		}
		items = append(items, s)
	}
	return strings.Join(items, ",")
}
