package scenario

import "fieldhead/calc"

// ErrorTextForTest words an error as the page does. The view model that
// words errors (present) imports this package, so these tests cannot
// import it; an external test file of this package (words_ext_test.go)
// sets it to present.ErrorText before the tests run.
var ErrorTextForTest = func(fe *calc.FieldError, us bool) string { return fe.Error() }

// worded is an error as the page words it, after its field's name.
func worded(fe *calc.FieldError, us bool) string { return fe.Field + ": " + ErrorTextForTest(fe, us) }
