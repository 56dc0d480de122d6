package scenario

import "fieldhead/calc"

// ErrorTextForTest words an error as the page does. The view model that
// words errors (present) imports this package, so these tests cannot
// import it; an external test file of this package (words_ext_test.go)
// sets it to present.ErrorText before the tests run.
var ErrorTextForTest = func(fe *calc.FieldError, us bool) string { return fe.Error() }

// WarningTextForTest words a coded warning from calc as the page does (set
// like ErrorTextForTest); "" leaves the warning's own String.
var WarningTextForTest = func(c calc.Caution, figs []calc.Figure, us bool) string { return "" }

// warningWords is a warning as the page words it.
func warningWords(w Warning, us bool) string {
	if t := WarningTextForTest(w.Code, w.Figures, us); t != "" {
		return t
	}
	return w.Words(func(f calc.Figure) string { return Show(f.Value, f.Dim, us) })
}

// worded is an error as the page words it, after its field's name.
func worded(fe *calc.FieldError, us bool) string { return fe.Field + ": " + ErrorTextForTest(fe, us) }

// LinkErrorTextForTest words an error of Parse or of a sheets-file line as
// the page does (set like ErrorTextForTest).
var LinkErrorTextForTest = func(err error) string { return err.Error() }

// linkWorded is a link error as the page words it, "" for none.
func linkWorded(err error) string {
	if err == nil {
		return ""
	}
	return LinkErrorTextForTest(err)
}
