package scenario

import "fieldhead/calc"

// ShownReadings is the number of readings whose boxes are shown: the
// highest reading given, or more when readings were added (AddReading);
// at least 1, the field check's own.
func (d *Draft) ShownReadings() int {
	n := max(1, d.Readings)
	for k := 2; k <= calc.TestMaxReadings; k++ {
		for _, f := range readingFields {
			if d.Scen.Has(ReadingParam(f, k)) {
				n = max(n, k)
			}
		}
	}
	return n
}

// AddReading shows the boxes of one more reading (empty), up to
// calc.TestMaxReadings.
func (d *Draft) AddReading() {
	d.endEdit()
	d.Readings = min(calc.TestMaxReadings, d.ShownReadings()+1)
}

// RemoveReading removes reading k (2 or more; reading 1 is the field
// check's own boxes, cleared by hand): the later readings move up one, so
// the numbers stay without gaps.
func (d *Draft) RemoveReading(k int) {
	n := d.ShownReadings()
	if k < 2 || k > n {
		return
	}
	d.endEdit()
	for j := k; j < n; j++ {
		for _, f := range readingFields {
			d.set(ReadingParam(f, j), d.Scen.Get(ReadingParam(f, j+1)))
		}
	}
	for _, f := range readingFields {
		d.set(ReadingParam(f, n), "")
	}
	d.Readings = n - 1
}
