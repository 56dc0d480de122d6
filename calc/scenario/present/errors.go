package present

import (
	"math"
	"strconv"
	"strings"
	"unicode/utf8"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// The one place where an input error is put into words. calc and scenario
// report what is wrong as data (calc.FieldError: a Kind, a Reason for the
// specific case, the value, limits, choices, counts); ErrorText words it in
// the sheet's units, the field named by its label in the parameter table.

// ErrorText words fe for a sheet in US units (us) or SI. It does not start
// with the field's label when the field is the one fe is about (the box or
// list shows the label); other fields are named by their labels.
func ErrorText(fe *calc.FieldError, us bool) string {
	if fe == nil {
		return ""
	}
	w := wording{fe: fe, us: us}
	t := w.text()
	if pre := w.where(); pre != "" {
		t = pre + t
	}
	return t
}

type wording struct {
	fe *calc.FieldError
	us bool
}

// otherLabels names the fields calc's errors use that are not parameters.
var otherLabels = map[string]string{
	"re": "Reynolds number", "length": "pipe length", "method": "friction method",
	"n": "profile exponent", "line": "line", "unit": "unit",
}

// label is a field's label: the parameter table's, else calc's name.
func label(field string) string {
	if _, _, ok := scenario.Lookup(field); ok {
		return scenario.Label(field)
	}
	if l, ok := otherLabels[field]; ok {
		return l
	}
	return field
}

// subject is the field as the subject of a sentence: "the flow".
func (w wording) subject() string {
	f := w.fe.Field
	if f == "fit" && w.fe.Other != "" {
		f = w.fe.Other
	}
	l := label(f)
	if r, _ := utf8.DecodeRuneInString(l); r >= 'a' && r <= 'z' {
		return "the " + l
	}
	return l
}

// where says which item of a list or which fitting the error is about.
func (w wording) where() string {
	fe := w.fe
	var pre string
	switch {
	case fe.Item > 0 && fe.Kind == calc.Missing:
		// kindText says which value is empty
	case fe.Item > 0 && isSheetList(fe.Field):
		pre = "point " + strconv.Itoa(fe.Item) + ": "
	case fe.Item > 0:
		pre = "value " + strconv.Itoa(fe.Item) + " of the list: "
	}
	if fe.Field == "fit" && fe.Input != "" && fe.Reason != calc.ReasonFittingK && fe.Reason != calc.ReasonFittingCount &&
		fe.Reason != calc.ReasonListedTwice && fe.Kind != calc.UnknownChoice {
		pre += quote(fe.Input) + ": "
	}
	return pre
}

// isSheetList reports whether a field is a list of the data sheet's points.
func isSheetList(field string) bool {
	switch field {
	case "pq", "ph", "peff", "pnpsh":
		return true
	}
	return false
}

// quote quotes text the person typed, shortened if long.
func quote(s string) string {
	if utf8.RuneCountInString(s) > 24 {
		r := []rune(s)
		s = string(r[:24]) + "…"
	}
	return strconv.Quote(s)
}

// fig words a figure in the sheet's units: a plain number with three
// significant digits.
func (w wording) fig(f calc.Figure) string {
	if f.Dim == calc.Dimensionless {
		return plainNumber(f.Value)
	}
	return minus(scenario.Show(f.Value, f.Dim, w.us))
}

// own words a figure of the field fe is about in that field's own unit
// (mm or in for a diameter, % for an efficiency).
func (w wording) own(f calc.Figure) string {
	field := w.fe.Field
	if _, n := scenario.SegmentOf(field); n != "" {
		field = n
	}
	dim, ok := scenario.DimensionOf(field)
	switch {
	case ok && scenario.DefaultUnit(field, w.us) == "%" && f.Dim == calc.Dimensionless:
		return share(f.Value)
	case ok && f.Dim == calc.Dimensionless && dim != calc.Dimensionless && w.fe.Reason == calc.ReasonFarBeyond:
		return minus(scenario.ShowParam(field, f.Value, w.us)) // calc knew only the SI number
	case ok && dim == f.Dim && f.Dim != calc.Dimensionless:
		return minus(scenario.ShowParam(field, f.Value, w.us))
	case f.Dim == calc.Dimensionless:
		return exact(f.Value) // a count, a C factor, hours: as typed
	}
	return w.fig(f)
}

// exact writes a plain number with up to six significant digits; a large
// one (a Reynolds number) is grouped as plainNumber writes it.
func exact(v float64) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return "—"
	}
	if math.Abs(v) >= 1e6 {
		return plainNumber(v)
	}
	s := strconv.FormatFloat(v, 'g', 6, 64)
	if v < 0 {
		s = "−" + s[1:]
	}
	return s
}

// share writes a share (0.76) as a percentage, four digits at most.
func share(v float64) string { return strconv.FormatFloat(v*100, 'g', 4, 64) + " %" }

// pressure writes an absolute pressure with its reference.
func (w wording) absolute(f calc.Figure) string {
	b := builder{us: w.us}
	return b.absolute(f.Value)
}

func (w wording) val() string { return w.ownOf(w.fe.Value) }
func (w wording) min() string { return limit(w.ownOf(w.fe.Min)) }
func (w wording) max() string { return limit(w.ownOf(w.fe.Max)) }

// limit writes a limit without the zeros its figure was padded with:
// a limit is an exact number ("0.6 m", "0 °C", not "0.6000 m", "0.000 °C").
func limit(s string) string {
	num, unit, _ := strings.Cut(s, " ")
	if !strings.Contains(num, ".") || strings.ContainsAny(num, "eE") {
		return s
	}
	num = strings.TrimRight(strings.TrimRight(num, "0"), ".")
	if num == "−0" || num == "-0" {
		num = "0"
	}
	if unit == "" {
		return num
	}
	return num + " " + unit
}

// ownOf words f as own does, "?" when the error lacks it.
func (w wording) ownOf(f *calc.Figure) string {
	if f == nil {
		return "?"
	}
	return w.own(*f)
}

// shareOf words a share (the value or one of the figures) as a percentage,
// "?" when the error lacks it.
func shareOf(f *calc.Figure) string {
	if f == nil {
		return "?"
	}
	return share(f.Value)
}

// figAt is the error's figure i, nil when it has none.
func (w wording) figAt(i int) *calc.Figure {
	if i >= len(w.fe.Figures) {
		return nil
	}
	return &w.fe.Figures[i]
}

// got is "; got …" with the value given (or the text typed), "" if none.
func (w wording) got() string {
	fe := w.fe
	switch {
	case fe.Value != nil && !math.IsNaN(fe.Value.Value) && !math.IsInf(fe.Value.Value, 0):
		return "; got " + w.val()
	case fe.Input != "" && fe.Field != "fit":
		return "; got " + quote(fe.Input)
	}
	return ""
}

// aNumber is "a number " when the text typed could not be read as one.
func (w wording) aNumber() string {
	if w.fe.Value == nil && w.fe.Input != "" {
		return "a number "
	}
	return ""
}

// figs words the reason's figures.
func (w wording) figs(i int) string {
	if i >= len(w.fe.Figures) {
		return "?"
	}
	return w.fig(w.fe.Figures[i])
}

// limits words the limits the error gives: "from a to b", "at most b"…
func (w wording) limits() string {
	fe := w.fe
	switch {
	case fe.Min != nil && fe.Max != nil:
		return "from " + w.min() + " to " + w.max()
	case fe.Max != nil:
		return "at most " + w.max()
	case fe.Min != nil:
		return "at least " + w.min()
	}
	return ""
}

// expected says what a box takes: "expected a length, e.g. 8 in".
func (w wording) expected() string {
	d := w.fe.Dim
	if d == calc.Dimensionless {
		if u := scenario.DefaultUnit(w.fe.Field, w.us); u == "%" {
			return "expected a percentage, e.g. 76 %"
		}
		return "expected a plain number"
	}
	if int(d) < len(dimWords) && dimWords[d].name != "" {
		dw := dimWords[d]
		ex := dw.si
		if w.us {
			ex = dw.us
		}
		return "expected " + dw.name + ", e.g. " + ex
	}
	return "expected a value with its unit"
}

// dimWords names each dimension, with a typical input in SI and US units.
var dimWords = [...]struct{ name, si, us string }{
	calc.Length:             {"a length", "203 mm", "8 in"},
	calc.Pressure:           {"a pressure", "250 kPa", "36 psi"},
	calc.Velocity:           {"a velocity", "1.5 m/s", "5 ft/s"},
	calc.Flow:               {"a volumetric flow", "45 L/s", "700 gpm"},
	calc.Temperature:        {"a temperature", "18 °C", "64 °F"},
	calc.Density:            {"a density", "998 kg/m³", "62.3 lb/ft³"},
	calc.DynamicViscosity:   {"a dynamic viscosity", "1.0 mPa·s", "1.0 cP"},
	calc.KinematicViscosity: {"a kinematic viscosity", "1.0 mm²/s", "1.0 cSt"},
	calc.Power:              {"a power", "31 kW", "42 hp"},
	calc.Area:               {"an area", "0.03 m²", "0.3 ft²"},
	calc.Mass:               {"a mass", "12 kg", "26 lb"},
	calc.Duration:           {"a duration", "30 s", "30 s"},
	calc.SpecificEnergy:     {"a specific energy", "0.45 kWh/m³", "1.7 kWh/kgal"},
	calc.SpecificEnergyHead: {"an energy per volume and head", "0.4 kWh/(m³·100 m)", "0.5 kWh/(kgal·100 ft)"},
	calc.Frequency:          {"a speed or frequency", "1450 rpm", "1750 rpm"},
}

// dimName is a dimension's name with its article: "a length".
func dimName(d calc.Dimension) string {
	if d != calc.Dimensionless && int(d) < len(dimWords) && dimWords[d].name != "" {
		return dimWords[d].name
	}
	return "another"
}

// choices lists the accepted choices: fe's, else the parameter's with
// their labels; long lists are not spelled out.
func (w wording) choices() string {
	cs, long := w.fe.Choices, 40 // calc's lists (sizes, classes) are spelled out
	if len(cs) == 0 {
		long = 8
		for _, c := range scenario.Choices(w.fe.Field) {
			v := c.Value
			if !strings.EqualFold(c.Label, c.Value) {
				v += " (" + c.Label + ")"
			}
			cs = append(cs, v)
		}
	}
	switch {
	case len(cs) == 0:
		return ""
	case len(cs) > long:
		return "pick one from the list"
	case len(cs) == 1:
		return "use " + cs[0]
	}
	return "use " + strings.Join(cs[:len(cs)-1], ", ") + " or " + cs[len(cs)-1]
}

// itemsOf names the items of a list field, for counts.
func itemsOf(field string) string {
	switch field {
	case "pq", "ph":
		return "data-sheet points"
	case "line":
		return "pipe segments"
	case "q":
		return "flows"
	case "pumps":
		return "identical pumps"
	}
	return "values"
}

// count writes n as a whole number.
func count(f *calc.Figure) string {
	if f == nil {
		return "?"
	}
	return strconv.FormatFloat(f.Value, 'f', -1, 64)
}

// text words the error: its reason's wording, else its kind's.
func (w wording) text() string {
	if r := reasonWording(w.fe.Reason); r != nil && w.fe.Reason != calc.ReasonNone {
		return r(w)
	}
	return w.kindText()
}

// kindText words the error from its kind alone.
func (w wording) kindText() string {
	fe := w.fe
	switch fe.Kind {
	case calc.Missing:
		switch {
		case fe.Other != "":
			return "give the " + label(fe.Other) + " first"
		case fe.Item > 0:
			return "value " + strconv.Itoa(fe.Item) + " of the list is empty"
		}
		if p, _, ok := scenario.Lookup(fe.Field); ok && p.Missing != "" {
			return p.Missing
		}
		return "enter " + w.subject()
	case calc.NotANumber:
		return w.expected() + "; " + quote(fe.Input) + " is not a number"
	case calc.NotFinite:
		if fe.Input != "" {
			return w.expected() + "; " + quote(fe.Input) + " is not a finite number"
		}
		return w.subject() + " must be a finite number"
	case calc.NoUnit:
		return w.expected() + "; add a unit to " + quote(fe.Input)
	case calc.UnknownUnit:
		t := w.expected() + "; unknown unit " + quote(fe.Input)
		if len(fe.Choices) > 0 {
			t += " (use " + strings.Join(fe.Choices, ", ") + ")"
		}
		return t
	case calc.WrongDimension:
		if fe.UnitDim == calc.Dimensionless {
			return w.expected() + "; got " + quote(fe.Input) + ", which is a plain-number unit"
		}
		return w.expected() + "; got " + dimName(fe.UnitDim) + " unit " + quote(fe.Input)
	case calc.NotPositive:
		return w.subject() + " must be " + w.aNumber() + "above zero" + w.got()
	case calc.Negative:
		return w.subject() + " must be " + w.aNumber() + "zero or more" + w.got()
	case calc.OutOfRange, calc.AboveLimit, calc.BelowLimit:
		return w.subject() + " must be " + w.limits() + w.got()
	case calc.UnknownChoice:
		if fe.Input == "" {
			t := "choose " + w.subject()
			if c := w.choices(); c != "" {
				t += " (" + c + ")"
			}
			return t
		}
		t := quote(fe.Input) + " is not one of the choices"
		if fe.Other != "" {
			t += " for this " + label(fe.Other)
		}
		if c := w.choices(); c != "" {
			t += " (" + c + ")"
		}
		return t
	case calc.TooFew, calc.TooMany:
		t := "give "
		switch {
		case fe.Min != nil && fe.Max != nil:
			t += count(fe.Min) + " to " + count(fe.Max)
		case fe.Min != nil:
			t += "at least " + count(fe.Min)
		default:
			t += "at most " + count(fe.Max)
		}
		t += " " + itemsOf(fe.Field)
		if fe.Count > 0 || fe.Kind == calc.TooFew && fe.Max != nil {
			t += "; got " + strconv.Itoa(fe.Count)
		}
		return t
	case calc.WrongCount:
		return strconv.Itoa(fe.Count) + " values for " + count(fe.Max) + " " + label(fe.Other) + "; give one per data-sheet flow"
	case calc.Inconsistent:
		if fe.Other != "" {
			return w.subject() + " does not agree with the " + label(fe.Other)
		}
		return w.subject() + " does not agree with the other inputs" + w.got()
	case calc.NoSolution:
		return "no solution for these inputs: check them and their units"
	case calc.NotConverged:
		return "no answer found: the calculation did not settle on a value; check the inputs and their units"
	case calc.OutsideValidity:
		t := w.subject() + " is outside the range the method holds for"
		if l := w.limits(); l != "" {
			t += " (" + l + ")"
		}
		return t + w.got()
	}
	return fe.Words(w.fig) // a last-resort text (KindOther)
}

// reasonWords words the specific cases.
// reasonWording is the wording of reason r, nil for none.
func reasonWording(r calc.Reason) func(w wording) string {
	if int(r) < len(reasonWords) {
		return reasonWords[r]
	}
	return nil
}

// reasonWords and cautionWords are arrays indexed by the code, not maps:
// the compiler lays them out as data, where a map of this size is built by
// code at start-up (tens of KB of the wasm).
var reasonWords = [...]func(w wording) string{
	calc.ReasonGrouping: func(w wording) string {
		return w.expected() + "; " + quote(w.fe.Input) + " has more than one separator; write the digits without grouping, e.g. 1250.5"
	},
	calc.ReasonAmbiguousComma: func(w wording) string {
		in := w.fe.Input
		mant, exp := in, ""
		if k := strings.IndexAny(in, "eE"); k >= 0 {
			mant, exp = in[:k], in[k:]
		}
		whole, frac, _ := strings.Cut(mant, ",")
		return w.expected() + "; " + quote(in) + " is ambiguous; write " + whole + frac + exp + " (no grouping) or " + whole + "." + frac + exp + " (decimal point)"
	},
	calc.ReasonPressureRef: func(w wording) string {
		return w.expected() + "; " + quote(w.fe.Input) + " names gauge or absolute, which this input does not take"
	},
	calc.ReasonWaterColumn: func(w wording) string {
		return w.expected() + "; got a length unit " + quote(w.fe.Input) + " (a water column as a pressure is written mH2O or ftH2O)"
	},
	calc.ReasonAbsoluteZero: func(w wording) string {
		return w.expected() + "; " + quote(w.fe.Input) + " is below absolute zero"
	},
	calc.ReasonOrHead: func(w wording) string {
		head := "in m or ft"
		if w.us {
			head = "in ft"
		}
		return w.kindText() + " — or a head of the liquid " + head
	},
	calc.ReasonWaterProperties: func(w wording) string {
		return "the water temperature must be " + w.limits() + w.got()
	},
	calc.ReasonSeawaterProperties: func(w wording) string {
		return "the seawater temperature must be " + w.limits() + w.got()
	},
	calc.ReasonIF97: func(w wording) string {
		return w.subject() + " must be " + w.limits() + " for IAPWS-IF97 region 1 (liquid water)" + w.got()
	},
	calc.ReasonIF97Saturation: func(w wording) string {
		return w.subject() + " must be " + w.limits() + " for the IAPWS-IF97 saturation line" + w.got()
	},
	calc.ReasonIAPWSViscosity: func(w wording) string {
		return w.subject() + " must be " + w.limits() + " for the IAPWS 2008 viscosity formulation" + w.got()
	},
	calc.ReasonISA: func(w wording) string {
		return "the altitude must be " + w.limits() + " for the ISO 2533 troposphere" + w.got()
	},
	calc.ReasonBoils: boils,
	calc.ReasonPointsMean: func(w wording) string {
		return boils(w) + "; this is the mean of the points' pressures: state the line pressure"
	},
	calc.ReasonAbsolutePressure: func(w wording) string {
		t := w.subject() + " is an absolute pressure and must be above zero"
		if w.fe.Kind == calc.Negative {
			t = w.subject() + " is an absolute pressure and must be zero or more"
		}
		if v := w.fe.Value; v != nil && !math.IsNaN(v.Value) && !math.IsInf(v.Value, 0) {
			t += "; got " + w.absolute(*v)
		}
		return t
	},
	calc.ReasonBelowVacuum: func(w wording) string {
		t := w.subject() + " must be a gauge pressure not below full vacuum"
		if v := w.fe.Value; v != nil && !math.IsNaN(v.Value) && !math.IsInf(v.Value, 0) {
			b := builder{us: w.us}
			t += "; got " + b.gauge(v.Value)
		}
		return t
	},
	calc.ReasonFarBeyond: func(w wording) string {
		return "a value of " + w.val() + " is far beyond any liquid line (at most " + w.max() + "): check the value and its unit"
	},
	calc.ReasonCheckUnit: func(w wording) string {
		return "a value of " + w.val() + " is below the " + w.min() + " Fieldhead accepts: check the unit"
	},
	calc.ReasonRelativeRoughness: func(w wording) string {
		t := "the relative roughness ε/D"
		if v := w.fe.Value; v != nil {
			t += " = " + plainNumber(v.Value)
		}
		return t + " is above " + w.max() + ", the edge of the Moody chart"
	},
	calc.ReasonHazenViscosity: func(w wording) string {
		return "Hazen–Williams holds for water near ordinary temperatures (kinematic viscosity " + w.limits() + "); this liquid has " + w.val() + ": use Colebrook"
	},
	calc.ReasonTurbulentFriction: func(w wording) string {
		return "the turbulent friction formulas apply for Reynolds numbers " + w.limits() + w.got()
	},
	calc.ReasonLaminarFriction: func(w wording) string {
		return "the laminar friction factor 64/Re applies for Reynolds numbers above 0 and up to " + w.max() + w.got()
	},
	calc.ReasonFrictionReynolds: func(w wording) string {
		t := "at this flow the Reynolds number is " + w.figs(0) + ", outside the friction formula's range"
		if l := w.limits(); l != "" {
			t += " (" + l + ")"
		}
		return t
	},
	calc.ReasonCraneFT: func(w wording) string {
		return "the Crane TP-410 friction factor f_T of the fittings is defined for inside diameters " + w.limits() + w.got()
	},
	calc.ReasonExpansion: func(w wording) string {
		return "an expansion needs the downstream diameter (" + w.val() + ") at least the upstream one (" + w.min() + ")"
	},
	calc.ReasonContraction: func(w wording) string {
		return "a contraction needs the downstream diameter (" + w.val() + ") at most the upstream one (" + w.max() + ")"
	},
	calc.ReasonFittingCount: func(w wording) string {
		t := "the count of " + quote(w.fe.Input) + " must be a whole number "
		if w.fe.Max != nil {
			return t + "from 0 to " + count(w.fe.Max)
		}
		return t + "not below 0" + w.got()
	},
	calc.ReasonFittingK: func(w wording) string {
		key, typed, after := strings.Cut(w.fe.Input, "@")
		t := "the K given for " + quote(key)
		if after {
			t += " after @"
		}
		t += " must be a number from 0"
		if w.fe.Max != nil {
			t += " to " + count(w.fe.Max)
		} else {
			t += " up"
		}
		if after {
			return t + "; got " + quote(typed)
		}
		return t + w.got()
	},
	calc.ReasonListedTwice: func(w wording) string {
		return quote(w.fe.Input) + " is listed twice; give one count"
	},
	calc.ReasonFittingMethod: func(w wording) string {
		return "the fitting " + quote(w.fe.Input) + " has no method of working out its K"
	},
	calc.ReasonPowerLawN: func(w wording) string {
		return "the power-law exponent n must be " + w.limits() + " (n ≈ 7 is usual)" + w.got()
	},
	calc.ReasonProfileAlpha: func(w wording) string {
		if w.fe.Min != nil {
			return "profile-based α needs a centre-line Reynolds number of at least " + w.min() + " (mean Re about 1.6e4)" + w.got()
		}
		return "profile-based α needs a turbulent Reynolds number up to " + w.max() + w.got()
	},
	calc.ReasonProfileExponent: func(w wording) string {
		return "the profile exponent n = " + w.figs(0) + " from Re " + w.val() + " is outside " + w.min() + "…" + w.max()
	},
	calc.ReasonFlowTwice: func(w wording) string {
		return "this reading's flow (" + w.val() + ") is that of reading " + w.figs(0) + ": give each flow once, or drop one of the two"
	},
	calc.ReasonUnitSlip: func(w wording) string {
		typed, meant := w.fe.Input, "?"
		if len(w.fe.Choices) == 2 {
			typed, meant = w.fe.Input+" "+w.fe.Choices[0], w.fe.Input+" "+w.fe.Choices[1]
		}
		return typed + " is only " + w.val() + ", far less than any " + label(w.fe.Field) + ": did you mean " + meant + "? If " + typed + " is right, keep it as typed"
	},
	calc.ReasonAccuracySlip: func(w wording) string {
		return "an accuracy of ±" + shareOf(w.fe.Value) + " is finer than any field instrument's: a fraction was probably typed into the percentage box; did you mean ±" + shareOf(w.figAt(0)) + "? If it is right, keep it as typed"
	},
	calc.ReasonDamagedValue: func(w wording) string {
		return "this value holds a line break or another character no link writes (" + w.fe.Input + "): the link was probably damaged on its way, by a chat or mail program; check it against the sender's and type it again"
	},
	calc.ReasonBothSides: func(w wording) string {
		return "give one of " + w.subject() + " or the " + label(w.fe.Other) + ", not both: switch to the one you mean and clear the other"
	},
	calc.ReasonRunOrSegments: func(w wording) string {
		return "give either a single pipe run (length, diameter…) or a line of segments, not both"
	},
	calc.ReasonHfFromSegments: func(w wording) string {
		return "the friction head is computed from the line's segments; solve for another quantity, or remove the segments to solve for the friction head"
	},
	calc.ReasonHfFromRun: func(w wording) string {
		return "the friction head is computed from the pipe run; solve for another quantity, or remove the run's length to solve for the friction head"
	},
	calc.ReasonFlowIndependent: func(w wording) string {
		return "the balance does not depend on the flow: give a pipe run, or the diameters at the points, to solve for the flow"
	},
	calc.ReasonFlowDirection: func(w wording) string {
		return "the flow must not be negative; number the points so that the liquid flows from 1 to 2"
	},
	calc.ReasonNoFlowPossible: func(w wording) string {
		return "no flow from point 1 to point 2 is possible: even at almost no flow the head at point 1 (with any pump) is below what point 2 needs"
	},
	calc.ReasonNoSolutionBelow: func(w wording) string {
		return "no solution in range: even at " + w.figs(0) + " (" + w.figs(1) + " in the narrowest pipe) the head at point 1 exceeds what the line uses; check the inputs"
	},
	calc.ReasonRegimeJump: func(w wording) string {
		return "no steady flow closes the balance: it jumps across the laminar–turbulent limit near " + w.figs(0)
	},
	calc.ReasonVelocityBand: func(w wording) string {
		low := "?"
		if w.fe.Min != nil {
			low = w.fig(*w.fe.Min)
		}
		return "the velocity band's high end must be above its low end (" + low + ")" + w.got()
	},
	calc.ReasonRunSegment: func(w wording) string {
		return "the line has segments " + count(w.fe.Min) + " to " + count(w.fe.Max) + "; pick one of them (got " + quote(w.fe.Input) + ")"
	},
	calc.ReasonSeawaterSalinity: func(w wording) string {
		return "the salinity must be from " + gPerKg(w.fe.Min) + " to " + gPerKg(w.fe.Max) + ", the range the seawater equations are fitted over; got " + gPerKg(w.fe.Value)
	},
	calc.ReasonNoTemperatureDifference: func(w wording) string {
		return "the supply and return temperatures are both " + w.val() + ": a flow carries heat only across a difference of temperature"
	},
	calc.ReasonValveFactor: func(w wording) string {
		if w.fe.Input != "" {
			name, _, _ := strings.Cut(w.fe.Input, ":")
			return quote(name) + ": the valve's " + valveFactorName(w.fe.Other) + " must be above 0 and at most 1: read it from the valve maker's data sheet" + w.got()
		}
		return w.subject() + " must be above 0 and at most 1: read it from the valve maker's data sheet" + w.got()
	},
	calc.ReasonValveFactorTwice: func(w wording) string {
		name, spec, _ := strings.Cut(w.fe.Input, ":")
		return quote(name) + ": the valve's " + valveFactorName(w.fe.Other) + " is given twice in " + quote(spec) + ": keep the one from its data sheet"
	},
	calc.ReasonBeyondNumbers: func(w wording) string {
		if w.fe.Field == "wall" {
			return w.subject() + " (" + w.val() + ") is too thin for a pressure wave to be worked out: check the wall thickness and its unit"
		}
		return w.subject() + " (" + w.val() + ") puts the line's figures beyond the range of numbers: check its length, bore and flow"
	},
	calc.ReasonBulkSalinity: func(w wording) string {
		return "enter the liquid's bulk modulus for the surge estimate: seawater's is known here only at " + gPerKg(w.figAt(0)) +
			", and this sheet's salinity is " + gPerKg(w.fe.Value)
	},
	calc.ReasonLoopUnknown: func(w wording) string {
		return "a closed loop has no points, levels or static head to solve for: solve for the pump head, or for the flow a pump head gives"
	},
	calc.ReasonHeatLiquid: func(w wording) string {
		return "a heat load and its flow need the liquid's specific heat, which a liquid of typed properties does not give: pick water, seawater or a glycol mix"
	},
	calc.ReasonValveNeedsStatic: func(w wording) string {
		return "a valve's check for choked flow and cavitation needs the pressure at its inlet: enter the loop's static pressure where its expansion vessel or pressurisation unit connects, and that connection's elevation"
	},
	calc.ReasonValveInletBoils: func(w wording) string {
		return "the pressure at the valve inlet (" + w.val() + ") must be above the liquid's vapour pressure (" + w.min() + ")"
	},
	calc.ReasonColumnBreaksNoFlow: func(w wording) string {
		seg := "?"
		if f := w.figAt(0); f != nil {
			seg = plainNumber(f.Value)
		}
		return "no flow keeps this line full: even standing still, the pressure at the high point of segment " + seg + " is down to the liquid's vapour pressure"
	},
	calc.ReasonSizingClass: func(w wording) string {
		return quote(w.fe.Input) + " is not a pipe class of the catalogues; choose a schedule or class listed under Schedule or class"
	},
	calc.ReasonPumpAfter: func(w wording) string {
		t := "the number of the segment the pump follows must be 0 (at point 1) to " + count(w.fe.Max) + " (the last)"
		if w.fe.Value != nil {
			return t + "; got " + count(w.fe.Value)
		}
		if w.fe.Input != "" {
			return t + "; got " + quote(w.fe.Input)
		}
		return t
	},
	calc.ReasonSuctionSegments: func(w wording) string {
		return "the suction losses come from a line of segments with the pump after one of them; give the segments, or type the suction loss"
	},
	calc.ReasonSegmentEnd: func(w wording) string {
		return "the elevation of the segment's end must be a finite number"
	},
	calc.ReasonSegmentGap: func(w wording) string {
		n, _ := scenario.SegmentOf(w.fe.Field)
		return "segment " + strconv.Itoa(n) + " needs its length (segments are numbered from point 1 without gaps)"
	},
	calc.ReasonFlowsRising: func(w wording) string {
		return "the flow (" + w.val() + ") must be above the previous point's (" + w.min() + "); list the points in order of rising flow, each flow once"
	},
	calc.ReasonCurveLevel: func(w wording) string {
		return "the head (" + w.val() + ") equals the previous point's: a data-sheet curve that stays level is not accepted; read the heads off the curve again"
	},
	calc.ReasonCurveMustFall: func(w wording) string {
		return "the head (" + w.val() + ") must be below the previous point's (" + w.max() + "): past its highest point the curve must fall with rising flow"
	},
	calc.ReasonCurveEndsHigh: func(w wording) string {
		return "the curve ends on its highest head; the data sheet must reach the falling part of the curve"
	},
	calc.ReasonZeroFlowEff: func(w wording) string {
		return "at zero flow the efficiency is 0 by definition (no water is delivered)" + w.got()
	},
	calc.ReasonEfficiency: func(w wording) string {
		t := w.subject() + " must be above 0 and at most 100 %" + w.got()
		if w.fe.Field == "peff" {
			t += "; give an efficiency for every point or for none"
		}
		return t
	},
	calc.ReasonTopBelowLine: func(w wording) string {
		return "the curves do not meet: the pump's highest head " + w.figs(0) + " (at " + w.figs(1) + ") is below the " + w.figs(2) + " the line needs there"
	},
	calc.ReasonShutOffBelowLine: func(w wording) string {
		return "the curves do not meet: the pump's shut-off head " + w.figs(0) + " is below the " + w.figs(1) + " the line needs at zero flow"
	},
	calc.ReasonFirstPointBelow: func(w wording) string {
		return "the curves do not meet within the data sheet: at its first point (Q = " + w.figs(0) + ") the pump's head " + w.figs(1) + " is already below the " + w.figs(2) + " the line needs; a point at lower flow may be missing"
	},
	calc.ReasonPumpRunsOut: func(w wording) string {
		return "the curves do not meet within the data sheet: beyond its last point (Q = " + w.figs(0) + ", where the pump still gives " + w.figs(1) + " against the " + w.figs(2) + " the line needs) the pump would run out; add a point or throttle"
	},
	calc.ReasonSpeedBeyondSheet: func(w wording) string {
		return "no speed in range: " + w.figs(0) + " is beyond what the data sheet covers between " + shareOf(w.figAt(1)) + " and " + shareOf(w.figAt(2)) + " speed"
	},
	calc.ReasonSpeedTopShort: func(w wording) string {
		return "no speed in range: even at " + shareOf(w.figAt(0)) + " speed the pumps give only " + w.figs(1) + " at " + w.figs(2) + ", and the line needs " + w.figs(3)
	},
	calc.ReasonSpeedBottomOver: func(w wording) string {
		return "no speed in range: at " + shareOf(w.figAt(0)) + " speed, the lowest at which the data sheet still reaches " + w.figs(1) + ", the pumps already give " + w.figs(2) + " and the line needs only " + w.figs(3) + " (throttling or a smaller impeller, not speed, would meet this duty)"
	},
	calc.ReasonLineHeadNotFinite: func(w wording) string {
		return "the head the line needs at that flow is not a finite number"
	},
	calc.ReasonHeadBelowStatic: func(w wording) string {
		return "the line needs " + w.figs(0) + " even at zero flow (levels and pressures alone): a head of " + w.figs(1) + " moves no liquid"
	},
	calc.ReasonHeadNeverReached: func(w wording) string {
		return "the line needs less than " + w.figs(0) + " at every flow up to " + w.figs(1) + ": no duty at that head in range"
	},
	calc.ReasonHeadForEnergy: func(w wording) string {
		return "the head must be above zero for an energy per volume and head" + w.got()
	},
	calc.ReasonGoTogether: func(w wording) string {
		t := "enter the " + label(w.fe.Field)
		if p, _, ok := scenario.Lookup(w.fe.Field); ok && p.Missing != "" {
			t = p.Missing
		}
		return t + ": a gauge's accuracy class and span go together"
	},
	calc.ReasonNoGrossHead: func(w wording) string {
		return "the gross head is " + w.ownOf(w.fe.Value) + ": point 1 must lie above point 2 in head for a turbine to give output"
	},
	calc.ReasonOutputUnbound: func(w wording) string {
		return "the output keeps rising with flow: the line has no pipe or diameters to limit it; give a pipe or the largest flow"
	},
	calc.ReasonTurbineNoZero: func(w wording) string {
		return "even at " + w.figs(0) + " (" + w.figs(1) + " in the narrowest pipe) the line leaves head for the turbine: give the largest flow to search"
	},
	calc.ReasonSearchLimit: func(w wording) string {
		return "the largest flow to search must be zero (automatic) or more" + w.got()
	},
	calc.ReasonFractionTyped: func(w wording) string {
		got, meant := shareOf(w.fe.Value), shareOf(w.figAt(0))
		if w.fe.Field == "peff" {
			return got + " looks like a fraction typed into the percentage list: did you mean " + meant + "? (give every efficiency in %, e.g. 0,52,71,76,72%)"
		}
		return "a " + label(w.fe.Field) + " of " + got + " is not plausible; a fraction was probably typed into a percentage box: did you mean " + meant + "?"
	},
	calc.ReasonSpeedReference: func(w wording) string {
		what := "the rated speed"
		if w.fe.Other == "fmains" {
			what = "the mains frequency"
		}
		return "a speed in " + w.fe.Input + " needs " + what + " (" + label(w.fe.Other) + ") to compare with; or give the speed in %"
	},
	calc.ReasonTitle: func(w wording) string {
		return "the title must be plain text of at most " + count(w.fe.Max) + " characters"
	},
	calc.ReasonPumpsCount: func(w wording) string {
		return "use 1, or a count and p or s, e.g. 2p for two in parallel, 2s for two in series"
	},
	calc.ReasonComponentFlow: func(w wording) string {
		return quote(w.fe.Input) + ": the rated flow must be " + w.aboveZeroOrLimit() + w.got()
	},
	calc.ReasonComponentDrop: func(w wording) string {
		if w.fe.Kind == calc.AboveLimit {
			return quote(w.fe.Input) + ": the rated drop must be " + w.limits() + w.got()
		}
		return quote(w.fe.Input) + ": the rated drop must not be negative" + w.got()
	},
	calc.ReasonComponentDropBoth: func(w wording) string {
		return quote(w.fe.Input) + ": give the rated drop as a pressure or as a head, not both"
	},
	calc.ReasonValveCoefficient: func(w wording) string {
		if w.fe.Kind == calc.AboveLimit {
			return quote(w.fe.Input) + ": the valve's Cv or Kv is beyond any real valve: check the number"
		}
		return quote(w.fe.Input) + ": the valve's Cv or Kv must be above zero (a shut valve passes no flow)"
	},
	calc.ReasonComponentKind: func(w wording) string {
		return quote(w.fe.Input) + " is of no known kind of component (a drop at a rated flow, or a valve)"
	},
	calc.ReasonComponentSyntax: func(w wording) string {
		return quote(w.fe.Input) + ": write each component as name:drop@flow (chiller:" + w.ratedExample() + ") or name:cv25 / name:kv40, separated by commas (decimals with a point)"
	},
	calc.ReasonComponentName: func(w wording) string {
		return quote(w.fe.Input) + ": a component's name has at most " + count(w.fe.Max) + " characters"
	},
	calc.ReasonComponentSpec: func(w wording) string {
		name, spec, _ := strings.Cut(w.fe.Input, ":")
		return quote(name) + ": " + quote(spec) + " is neither drop@flow (" + w.ratedExample() + ") nor a valve's cv25 or kv40"
	},
	calc.ReasonValveNumber: func(w wording) string {
		name, spec, _ := strings.Cut(w.fe.Input, ":")
		if f := valveFactorName(w.fe.Other); f != "" {
			return quote(name) + ": the valve's " + f + " must be a number above 0 and at most 1 from its data sheet, as in " + name + ":kv40 fl0.9 xfz0.45; got " + quote(spec)
		}
		kv := "kv"
		if strings.HasPrefix(strings.ToLower(spec), "cv") {
			kv = "cv"
		}
		return quote(name) + ": the valve's " + strings.ToUpper(kv[:1]) + "v must be a number, as in " + name + ":" + kv + "25; got " + quote(spec)
	},
	calc.ReasonComponentValue: func(w wording) string {
		name, text, _ := strings.Cut(w.fe.Input, ":")
		what, units, ex := "drop", "pressure or head", "45kPa or 3.2m"
		if w.us {
			ex = "6.5psi or 10ft"
		}
		if w.fe.Dim == calc.Flow {
			what, units, ex = "rated flow", "flow", "12L/s"
			if w.us {
				ex = "190gpm"
			}
		}
		switch w.fe.Kind {
		case calc.NotANumber:
			return quote(name) + ": the " + what + " " + quote(text) + " is not a number (decimals with a point, e.g. " + ex + ")"
		case calc.UnknownUnit:
			return quote(name) + ": the " + what + " " + quote(text) + " is not in a unit of " + units + " (e.g. " + ex + ")"
		}
		return quote(name) + ": the " + what + " needs a number and its unit, e.g. " + ex + "; got " + quote(text)
	},
	calc.ReasonDarbySize: func(w wording) string {
		// in the unit of a diameter, whichever field the error is under
		dia := func(f *calc.Figure) string {
			if f == nil {
				return "?"
			}
			return scenario.ShowParam("d", f.Value, w.us)
		}
		t := "Darby's 3-K method takes the nominal size from the schedule 40 bores, from " + dia(w.fe.Min) + " (NPS 1/8)"
		if w.got() != "" {
			return t + "; got an inside diameter of " + dia(w.fe.Value)
		}
		return t
	},
	calc.ReasonGlycolMass: func(w wording) string {
		return "the glycol share must be between " + w.shareRange() + " by mass" + w.gotShare()
	},
	calc.ReasonGlycolVolume: func(w wording) string {
		return "the glycol share must be between " + w.shareRange() + " by volume (" + shareOf(w.figAt(0)) + " by mass)" + w.gotShare()
	},
	calc.ReasonGlycolTemperature: func(w wording) string {
		return "a glycol mix's temperature must be from its freezing point (" + w.min() + ") to " + w.max() + w.got()
	},
	calc.ReasonGlycolFreezes: func(w wording) string {
		return shareOf(w.figAt(0)) + " " + w.fe.Input + " by mass freezes at " + w.min() + ": the temperature " + w.val() + " is below it (a stronger mix, or a warmer liquid, is needed)"
	},
	calc.ReasonThinWall: func(w wording) string {
		return "a wall thickness of " + w.val() + " is not a pipe of inside diameter " + w.ownOf(w.figAt(0)) + ": the thin-wall wave speed needs a wall well under half the diameter"
	},
	calc.ReasonRestraint: func(w wording) string {
		return "the restraint factor must be a number above 0 and at most " + count(w.fe.Max) + ", near 1 (1 with expansion joints, 1 − ν² anchored throughout)" + w.got()
	},
	calc.ReasonSurgePipe: func(w wording) string {
		return "the surge estimate needs the pipe between the points: describe the pipe run or the line's segments"
	},
	calc.ReasonNoFlowToStop: func(w wording) string {
		return "there is no flow to stop at the valve: give the flow, or the velocity change"
	},
	calc.ReasonSurgeUnbounded: func(w wording) string {
		return "these figures give a surge beyond any number: check the velocity change (" + w.figs(0) + "), the moduli and the closure time"
	},
	calc.ReasonVelocityChange: func(w wording) string {
		return "the velocity change must be above zero (blank: the whole flow velocity)" + w.got()
	},
	calc.ReasonBulkModulus: func(w wording) string {
		near := "20 °C"
		if w.us {
			near = "68 °F"
		}
		return "the bulk modulus must be above zero (water near " + near + ": about " + w.ownOf(w.figAt(0)) + ")" + w.got()
	},
	calc.ReasonBulkUnknown: func(w wording) string {
		return "enter the liquid's bulk modulus for the surge estimate (it is known here only for water and seawater)"
	},
	calc.ReasonWallModulus: func(w wording) string {
		return "the elastic modulus must be above zero (steel about " + w.ownOf(w.figAt(0)) + ", PE about " + w.ownOf(w.figAt(1)) + ")" + w.got()
	},
	calc.ReasonSurgeWall: func(w wording) string {
		return "enter the pipe's wall thickness for the surge estimate (or pick a nominal size and schedule)"
	},
	calc.ReasonSurgeModulus: func(w wording) string {
		return "enter the pipe wall's elastic modulus for the surge estimate (or pick the pipe's material)"
	},
}

// boils words a pressure against the liquid's vapour pressure and range.
func boils(w wording) string {
	fe := w.fe
	if fe.Min == nil || fe.Value == nil {
		return "the absolute pressure is below the liquid's vapour pressure: it would boil"
	}
	t := "the absolute pressure " + w.absolute(*fe.Value)
	if fe.Value.Value < fe.Min.Value {
		t += " is below the liquid's vapour pressure at " + w.figs(0) + " (" + w.absolute(*fe.Min) + "): it would boil"
	} else {
		t += " is outside the range the liquid's properties hold for"
	}
	if fe.Max != nil {
		t += "; give " + w.absolute(*fe.Min) + " to " + w.absolute(*fe.Max)
	}
	return t
}

// aboveZeroOrLimit is "above zero", or the limits of an AboveLimit error.
func (w wording) aboveZeroOrLimit() string {
	if w.fe.Kind == calc.AboveLimit {
		return w.limits()
	}
	return "above zero"
}

// ratedExample is a component's drop at its rated flow in the sheet's units.
func (w wording) ratedExample() string {
	if w.us {
		return "6.5psi@190gpm"
	}
	return "45kPa@12L/s"
}

// shareRange is "0 and 60 %": the limits, shares, as percentages.
func (w wording) shareRange() string {
	lo := "?"
	if w.fe.Min != nil {
		lo = strconv.FormatFloat(w.fe.Min.Value*100, 'g', 4, 64)
	}
	return lo + " and " + shareOf(w.fe.Max)
}

// gotShare is "; got …" with the value, a share, as a percentage.
func (w wording) gotShare() string {
	if v := w.fe.Value; v != nil && !math.IsNaN(v.Value) && !math.IsInf(v.Value, 0) {
		return "; got " + share(v.Value)
	}
	return ""
}

// WarningText words a warning from calc of caution c quoting figs (SI) for
// a sheet in US units (us) or SI; "" for CautionText, whose sentence the
// caller words with Words.
func WarningText(c calc.Caution, figs []calc.Figure, us bool) string {
	return warningText(c, figs, us, "")
}

// warningText is WarningText on a sheet open on view, where a pointer to
// another view words the place on this one instead.
func warningText(c calc.Caution, figs []calc.Figure, us bool, view string) string {
	if int(c) >= len(cautionWords) || cautionWords[c] == nil {
		return ""
	}
	cw := cautionWords[c]
	return cw(cautioning{figs: figs, w: wording{fe: &calc.FieldError{}, us: us}, view: view})
}

type cautioning struct {
	figs []calc.Figure
	w    wording
	view string // the view the sheet is open on ("" when unknown)
}

// npsh points to the suction card: on the Pump view, or on this one.
func (c cautioning) npsh() string {
	if c.view == "pump" {
		return "the cavitation check (NPSH) on this view says whether the pump has margin"
	}
	return "check the NPSH on the Pump view"
}

// f words figure i in the sheet's units, "?" if absent.
func (c cautioning) f(i int) string {
	if i >= len(c.figs) {
		return "?"
	}
	return c.w.fig(c.figs[i])
}

// rough words figure i, a rule of thumb's limit, in the sheet's units to
// two significant figures, trailing zeros dropped: 0.3 m/s is "0.3 m/s"
// on an SI sheet and "0.98 ft/s" on a US one, not "0.9843 ft/s", a
// precision the rule never had. With param, in that parameter's own unit
// (mm or in for "d"). "?" if absent.
func (c cautioning) rough(i int, param string) string {
	if i >= len(c.figs) {
		return "?"
	}
	u := calc.DefaultUnit(c.figs[i].Dim, c.w.us).Symbol
	if param != "" {
		u = scenario.DefaultUnit(param, c.w.us)
	}
	return limit(minus(calc.FormatValue(c.figs[i].Value, u, 2)))
}

// in words figure i in param's own unit (mm or in for "d"), "?" if absent.
func (c cautioning) in(i int, param string) string {
	if i >= len(c.figs) {
		return "?"
	}
	return minus(scenario.ShowParam(param, c.figs[i].Value, c.w.us))
}

// num words figure i, a plain number (an authority, a ratio).
func (c cautioning) num(i int) string {
	if i >= len(c.figs) {
		return "?"
	}
	return plainNumber(c.figs[i].Value)
}

// gPerKg words a salinity (kg/kg) in g/kg, "?" when the error lacks it.
// valveFactorName names a control valve's data-sheet factor by its field
// ("fl" or "xfz") as the words of an error do; "" for another field.
func valveFactorName(field string) string {
	switch field {
	case "fl":
		return "FL (the liquid pressure recovery factor)"
	case "xfz":
		return "xFz (the incipient-cavitation factor)"
	}
	return ""
}

func gPerKg(f *calc.Figure) string {
	if f == nil {
		return "?"
	}
	return plainNumber(f.Value*1000) + " g/kg"
}

// pc words figure i, a share (0.76), as a percentage.
func (c cautioning) pc(i int) string {
	if i >= len(c.figs) {
		return "?"
	}
	return strconv.FormatFloat(c.figs[i].Value*100, 'f', 0, 64) + " %"
}

// abs words figure i, an absolute pressure, with its reference.
func (c cautioning) abs(i int) string {
	if i >= len(c.figs) {
		return "?"
	}
	return c.w.absolute(c.figs[i])
}

// gauge words figure i, a gauge pressure, with its reference.
func (c cautioning) gauge(i int) string {
	if i >= len(c.figs) {
		return "?"
	}
	b := builder{us: c.w.us}
	return b.gauge(c.figs[i].Value)
}

// npshGuidance is the margin guidance the NPSH notes rest on.
func (c cautioning) npshGuidance(least int) string {
	return "margin guidance: NPSHa/NPSHr at least 1.1 (the low end of the 1.1–2.0 range by application in ANSI/HI 9.6.1, from memory) and at least " +
		limit(c.f(least)) + " (common practice, from memory); large, high-energy or hot-liquid pumps need more"
}

// cautionWords words each caution.
var cautionWords = [...]func(c cautioning) string{
	calc.CautionValveAuthorityLow: func(c cautioning) string {
		return "the control valve's authority is " + c.num(0) + ", below " + c.num(1) + ", the least usually accepted (common practice, from memory): it will control poorly over much of its travel; a valve with a larger drop when fully open raises it"
	},
	calc.CautionValveAuthorityBelowAim: func(c cautioning) string {
		return "the control valve's authority is " + c.num(0) + ", short of the usual aim of about " + c.num(1) + " (common practice, from memory)"
	},
	calc.CautionValveChoked: func(c cautioning) string {
		return "the drop across the control valve (" + c.f(0) + ") reaches the drop at which its flow chokes (" + c.f(1) + ", IEC 60534-2-1): the flow through it cannot rise above " + c.f(2) + " at this opening; expect cavitation, noise and erosion, and ask the valve's maker"
	},
	calc.CautionValveCavitation: func(c cautioning) string {
		return "the drop across the control valve (" + c.f(0) + ") is past the drop at which cavitation begins (" + c.f(1) + ", from the valve's xFz, IEC 60534-2-1): expect noise and wear, and ask the valve's maker"
	},
	calc.CautionNoFlow: func(c cautioning) string { return "no flow: all losses are zero" },
	calc.CautionFittingSizes: func(c cautioning) string {
		return "inside diameter " + c.in(0, "d") + " is outside the sizes the fitting methods were published for (about " + c.rough(1, "d") + "–" + c.rough(2, "d") + "): their K values are extrapolated"
	},
	calc.CautionLaminarHazen: func(c cautioning) string {
		return "laminar flow: friction from 64/Re; Hazen–Williams does not apply"
	},
	calc.CautionLaminarFittings: func(c cautioning) string {
		return "laminar flow: the fitting K values (Crane TP-410 and fixed ones) are turbulent-flow figures; real fitting losses are higher"
	},
	calc.CautionSwameeJainRange: func(c cautioning) string {
		return "Swamee–Jain is used outside its fitted range (Re 5000–1e8, ε/D 1e-6–0.01; here Re " + c.f(0) + ", ε/D " + c.f(1) + "): prefer Colebrook"
	},
	calc.CautionTransitionalRun: func(c cautioning) string {
		return "transitional flow (Re " + ratio(c.figs, 0, 0) + ", between 2300 and 4000): the loss lies between the laminar (64/Re) and turbulent bounds; the larger is used"
	},
	calc.CautionHazenSmallPipe: func(c cautioning) string {
		return "Hazen–Williams is meant for pipes of about " + c.rough(0, "d") + " and larger: prefer Colebrook"
	},
	calc.CautionVelocityLow: func(c cautioning) string {
		return "velocity " + c.f(0) + " is low for a liquid line (usual range about " + c.rough(1, "") + "–" + c.rough(2, "") + ", common practice)"
	},
	calc.CautionVelocityHigh: func(c cautioning) string {
		return "velocity " + c.f(0) + " is high for a liquid line (usual range about " + c.rough(1, "") + "–" + c.rough(2, "") + ", common practice)"
	},
	calc.CautionColumnBreaks: func(c cautioning) string {
		return "the absolute pressure in the pipe falls to " + c.abs(0) + " at " + c.f(1) + " from point 1, at or below the liquid's vapour pressure (" + c.f(2) +
			"): the liquid column would break there (vapour pockets, cavitation); lower the pipe, reduce the losses upstream or raise the pressure"
	},
	calc.CautionTransitionalBalance: func(c cautioning) string {
		return "transitional flow (Re 2300–4000): the result lies between the laminar and turbulent bounds, shown as a range; the design value uses the turbulent bound"
	},
	calc.CautionAlphaUnity: func(c cautioning) string {
		return "α taken as 1 (turbulent): give the diameter at this point to find its regime"
	},
	calc.CautionPumpHeadNegative: func(c cautioning) string {
		return "the pump head comes out negative: no pump is needed, point 1 alone drives this flow (a valve or turbine would have to take the surplus)"
	},
	calc.CautionTurbineHeadNegative: func(c cautioning) string {
		return "the turbine head comes out negative: at this flow the line cannot drive a turbine; it needs a pump"
	},
	calc.CautionFrictionHeadNegative: func(c cautioning) string {
		return "the friction head comes out negative, which no real line does: check the readings and the direction of flow"
	},
	calc.CautionNoAbsolutePressure: func(c cautioning) string {
		return "the absolute pressure at this point is zero or negative, which a liquid cannot sustain: the column breaks and the liquid vaporises"
	},
	calc.CautionBelowVapourPressure: func(c cautioning) string {
		return "the absolute pressure at this point (" + c.abs(0) + ") is at or below the liquid's vapour pressure (" + c.f(1) + "): expect cavitation or flashing"
	},
	calc.CautionPointVelocityHigh: func(c cautioning) string {
		return "a velocity of " + c.f(0) + " is unusually high for a liquid line (common practice keeps below about " + c.rough(1, "") + "): erosion, noise and water-hammer risk"
	},
	calc.CautionNPSHNone: func(c cautioning) string {
		return "NPSH available is " + c.f(0) + ", not above zero: the liquid boils at the pump inlet whatever the pump"
	},
	calc.CautionNPSHUnrated: func(c cautioning) string {
		return "NPSH available is " + c.f(0) + "; give the pump's NPSH required at this flow to judge the margin (" + c.npshGuidance(1) + ")"
	},
	calc.CautionNPSHBelow: func(c cautioning) string {
		return "NPSH available " + c.f(0) + " is below the " + c.f(1) + " required: the pump will cavitate (lost head, noise, damage); raise the source, lower the pump, cut the suction losses or cool the liquid"
	},
	calc.CautionNPSHLowMargin: func(c cautioning) string {
		return "NPSH available " + c.f(0) + " exceeds the " + c.f(1) + " required by only " + c.f(2) + " (ratio " + ratio(c.figs, 3, 2) + "): expect some cavitation; " + c.npshGuidance(4)
	},
	calc.CautionNPSHMargin: func(c cautioning) string {
		return "NPSH available " + c.f(0) + " against " + c.f(1) + " required: margin " + c.f(2) + ", ratio " + ratio(c.figs, 3, 2) + "; " + c.npshGuidance(4)
	},
	calc.CautionNoGrossHead: func(c cautioning) string {
		return "the gross head is " + c.f(0) + ": point 1 does not lie above point 2 in head, so there is nothing for a turbine to take"
	},
	calc.CautionNoOutput: func(c cautioning) string {
		return "at this flow the line's losses (" + c.f(0) + ") and the exit velocity head use up the whole gross head (" + c.f(1) + "): no output; lower the flow or enlarge the pipe"
	},
	calc.CautionHeadNotPositive: func(c cautioning) string {
		return "the readings give a pump head of " + c.f(0) + ", which a running pump does not: check that the gauges are the right way round and read in the same units"
	},
	calc.CautionWireAbove100: func(c cautioning) string {
		return "the wire-to-water efficiency comes out at " + c.pc(0) + ", above 100 %: the readings are inconsistent (check the flow, the gauges, the power reading and its unit)"
	},
	calc.CautionWireLow: func(c cautioning) string {
		return "the wire-to-water efficiency is only " + c.pc(0) + " (below " + c.pc(1) + "): look for wear, a throttled or recirculating pump, a motor problem, or a reading error"
	},
	calc.CautionWireAbovePump: func(c cautioning) string {
		return "the wire-to-water efficiency (" + c.pc(0) + ") is above the data sheet's efficiency of the pump alone at this flow (" + c.pc(1) +
			"), which the motor's losses make impossible: check the power reading and its unit (kW or hp), the flow and the gauges"
	},
	calc.CautionFlowOffSheet: func(c cautioning) string {
		return "the measured flow (" + c.f(0) + ") lies outside the data sheet's flows (" + c.f(1) + " to " + c.f(2) + "): no curve head to compare with"
	},
	calc.CautionPumpEffAbove100: func(c cautioning) string {
		return "the pump's own efficiency comes out at " + c.pc(0) + ", above 100 %: the readings or the motor efficiency are wrong"
	},
	calc.CautionPumpEffHigh: func(c cautioning) string {
		return "the pump's own efficiency comes out at " + c.pc(0) + ", above the " + c.pc(1) + " that even the largest pumps hardly reach: check the power reading, the motor efficiency, the flow and the gauges"
	},
	calc.CautionDroopingCurve: func(c cautioning) string {
		return "the data sheet's head rises with flow up to " + c.f(0) + " (a drooping curve): below that flow the pump can run unstably, hunting between two points where a line of high static head crosses the curve twice; pumps of such curves in parallel may not share the flow"
	},
	calc.CautionOperatingNeedsHp: func(c cautioning) string {
		return "the operating point needs the balance solved for the pump head (solve=hp)"
	},
	calc.CautionOperatingUnstable: func(c cautioning) string {
		return "the operating point (" + c.f(0) + ") lies where the head rises with flow (up to " + c.f(1) + "): expect unstable running"
	},
	calc.CautionOperatingOffRegion: func(c cautioning) string { return c.offRegion("the operating point") },
	calc.CautionMeasuredOffRegion:  func(c cautioning) string { return c.offRegion("the measured flow") },
	calc.CautionSuctionLossZero: func(c cautioning) string {
		return "no suction loss typed and no line of segments: the suction losses are taken as zero; type the suction loss, or describe the suction pipe as segment 1 with the pump after it"
	},
	calc.CautionNPSHCurveCut: func(c cautioning) string {
		return "the NPSH available cannot be worked out from " + c.f(0) + " on (the suction side's losses are out of their method's range there): its curve stops at that flow"
	},
	calc.CautionMotorEffHigh: func(c cautioning) string {
		return "a motor efficiency of " + c.sh(0) + " is above the " + c.sh(1) + " that even the best large motors hardly reach: check the nameplate"
	},
	calc.CautionTurbineNeedsHt: func(c cautioning) string {
		return "the turbine's output needs the balance solved for the turbine head (solve=ht)"
	},
	calc.CautionLastSegmentEnd: func(c cautioning) string {
		return "the last segment ends at " + c.f(0) + " but point 2 is at " + c.f(1) + ": the profile follows the segments"
	},
	calc.CautionStandardAtmosphere: func(c cautioning) string {
		return "no site altitude or barometer reading: the standard sea-level pressure " + c.abs(0) + " is used for gauge ↔ absolute and the vapour-pressure check"
	},
	calc.CautionBoilingAtSite: func(c cautioning) string {
		return "the water is at or above its boiling point at the site pressure; its properties are taken at the saturation pressure"
	},
	calc.CautionSheetEffHigh: func(c cautioning) string {
		return "point " + ratio(c.figs, 0, 0) + ": a data-sheet efficiency of " + c.sh(1) + " is above the " + c.sh(2) + " that even the largest pumps hardly reach: check the list"
	},
	calc.CautionOverspeed: func(c cautioning) string {
		return "a speed of " + c.sh(0) + " of the data sheet's overspeeds the pump: the maker must confirm the pump, its bearings, seal and motor are fit for it (the power rises with the cube of the speed)"
	},
	calc.CautionBEPAtEnd: func(c cautioning) string {
		return "the data sheet's highest efficiency is at its first or last point: the best-efficiency point may lie beyond the sheet, and the region drawn from it is uncertain"
	},
	calc.CautionDutyOverspeed: func(c cautioning) string {
		return "this flow needs " + c.sh(0) + " of the data sheet's speed: overspeed, which the maker must approve"
	},
	calc.CautionPowerAccuracyUnused: func(c cautioning) string {
		return "a power meter's accuracy without its reading (motor electrical input) is not used"
	},
	calc.CautionNoAccuracy: func(c cautioning) string {
		return "no instrument accuracy is given: the verdict takes every reading as exact, which no field test is; give the gauges' classes and spans and the meters' accuracies"
	},
	calc.CautionGradeNeedsSheet: func(c cautioning) string {
		return "the acceptance grade needs the data sheet's head at the measured flow: give the data sheet, covering that flow"
	},
	calc.CautionGuaranteeNoFlow: func(c cautioning) string {
		return "a grade is chosen but there is no flow to judge the test at: give the guarantee flow, or the duty flow on the Balance view"
	},
	calc.CautionGuaranteeNoHead: func(c cautioning) string {
		return "no guarantee head at " + c.f(0) + ": type it, or give a data sheet that covers that flow"
	},
	calc.CautionConvertBelowZero: func(c cautioning) string {
		return "this is at or below absolute zero pressure, which no liquid can sustain: check the value and whether it is gauge or absolute"
	},
	calc.CautionInletBreaks: func(c cautioning) string {
		return c.inlet() + c.breaks("the column breaks and the pump cavitates. The suction side stays full", "",
			"raise the supply, enlarge or shorten the suction line, move losses to the delivery side or set the pump lower")
	},
	calc.CautionInletBreaksStill: func(c cautioning) string {
		return c.inlet() + stillBreaks + "the column breaks and the pump cannot prime or run; set the pump lower or raise the supply"
	},
	calc.CautionInletSuction: func(c cautioning) string {
		return c.inlet() + c.belowCrown("the suction is below atmospheric pressure: air leaks in at joints and seals; "+c.npsh())
	},
	calc.CautionHighPointBreaks: func(c cautioning) string {
		return c.highPoint() + c.breaks("the column breaks (vapour pockets, a siphon that stops, cavitation and hammer when it rejoins). The pipe runs full",
			" (with the surplus head taken by a valve at point 2)", "lower the pipe, reduce the losses upstream or raise the pressure")
	},
	calc.CautionHighPointStill: func(c cautioning) string {
		return c.highPoint() + stillBreaks + "the column breaks, the pipe cannot run full past it at any flow; lower the pipe or raise the pressure upstream"
	},
	calc.CautionHighPointAir: func(c cautioning) string {
		return c.highPoint() + c.belowCrown("the pipe is below atmospheric pressure there: an air valve would draw air in and dissolved air comes out; keeping the grade line above the pipe is common practice")
	},
	calc.CautionSurgeNoLength: func(c cautioning) string {
		return "the line has no length: the wave's round trip is zero and any closure counts as slow"
	},
	calc.CautionSurgeSlow: func(c cautioning) string {
		return "the closure (" + c.f(0) + ") is slower than the wave's round trip 2L/a (" + c.f(1) + "): the rise is smaller than Joukowsky's " + c.f(2) +
			", which is then an upper bound; only a transient analysis of the valve's closing curve gives the actual figure"
	},
	calc.CautionSurgeColumnParts: func(c cautioning) string {
		return "the low swing after the closure reaches the vapour pressure: the liquid column may part and rejoin with a blow larger than Joukowsky's figure"
	},
	calc.CautionSurgeColumnUnknown: func(c cautioning) string {
		return "the static pressure at the valve is not known: unless it is above " + c.gauge(0) + " (Joukowsky's rise plus the vapour pressure), the low swing after the closure reaches the vapour pressure and the liquid column may part"
	},
	calc.CautionSurgeDvAboveFlow: func(c cautioning) string {
		return "the velocity change (" + c.f(0) + ") is larger than the flow velocity at the valve (" + c.f(1) + ")"
	},
	calc.CautionBoilingAtLine: func(c cautioning) string {
		return "the water is at or above its boiling point at the pressure taken for its properties (" + c.abs(0) + "); they are taken at the saturation pressure (" + c.abs(1) + ")"
	},
	calc.CautionGlycolBoiling: func(c cautioning) string {
		return "the glycol mix is at or above its boiling point at the site pressure; its properties are taken at its vapour pressure"
	},
	calc.CautionGlycolInhibitors: func(c cautioning) string {
		return "commercial glycols carry inhibitors and dyes and differ from the pure mixes computed here (Melinder's published fits): the maker's data sheet governs density, viscosity and freezing point"
	},
	calc.CautionGlycolExtrapolated: func(c cautioning) string {
		return "at " + c.f(0) + " the glycol mix is above " + c.f(1) + ", where the published tables stop: its density and viscosity are the fits carried beyond their range: estimates, to be checked against the maker's data"
	},
}

// stillBreaks says the column breaks at a place even with no flow.
const stillBreaks = ": the hydraulic grade line falls below the vapour-pressure line even with no flow — "

// breaks says the column breaks at a place (what follows), the pipe full
// only up to Figures[4] (how) and not at the balance's Figures[5], and what
// to do.
func (c cautioning) breaks(what, how, do string) string {
	return ": the hydraulic grade line falls below the vapour-pressure line, so the pressure there would be below the liquid's vapour pressure — " +
		what + " only up to " + c.f(4) + how + ", not the " + c.f(5) + " of the balance; " + do
}

// belowCrown says the grade line is Figures[4] below the pipe crown, so
// (what follows).
func (c cautioning) belowCrown(so string) string {
	return ": the hydraulic grade line is " + c.f(4) + " below the pipe crown, so " + so
}

// inlet says where the pump's inlet is on a line: Figures[0] the segment,
// Figures[2] the distance from point 1, Figures[3] the elevation.
func (c cautioning) inlet() string {
	return "at the pump's inlet, the end of segment " + ratio(c.figs, 0, 0) + " (" + c.f(2) + " from point 1, elevation " + c.f(3) + ")"
}

// highPoint says where a high point is, as inlet, Figures[1] 1 at the
// segment's end, 0 at its start.
func (c cautioning) highPoint() string {
	where := "start"
	if len(c.figs) > 1 && c.figs[1].Value != 0 {
		where = "end"
	}
	return "high point at the " + where + " of segment " + ratio(c.figs, 0, 0) + " (" + c.f(2) + " from point 1, elevation " + c.f(3) + ")"
}

// sh words figure i, a share, as a percentage of up to four digits.
func (c cautioning) sh(i int) string {
	if i >= len(c.figs) {
		return "?"
	}
	return share(c.figs[i].Value)
}

// offRegion words a flow outside the preferred operating region.
func (c cautioning) offRegion(what string) string {
	side := "below"
	if len(c.figs) > 2 && c.figs[0].Value > c.figs[2].Value {
		side = "above"
	}
	lo, hi := "?", "?"
	if len(c.figs) > 4 {
		lo, hi = strconv.FormatFloat(c.figs[3].Value*100, 'g', 4, 64), strconv.FormatFloat(c.figs[4].Value*100, 'g', 4, 64)
	}
	return what + " (" + c.f(0) + ") lies " + side + " the preferred operating region (" + c.f(1) + " to " + c.f(2) + ", " + lo + "–" + hi +
		" % of the best-efficiency flow, after ANSI/HI 9.6.3 from memory): expect more vibration, recirculation or wear; ask the maker about the allowable region"
}

// ratio writes figure i, a plain number, with the given decimals.
func ratio(figs []calc.Figure, i, decimals int) string {
	if i >= len(figs) {
		return "?"
	}
	return strconv.FormatFloat(figs[i].Value, 'f', decimals, 64)
}
