package calc

import "fmt"

// FieldError reports an input that cannot be used. Field names the input as
// the user knows it (a share-link parameter such as "d1", or a descriptive
// name such as "diameter"); Msg says what is wrong and what was expected.
type FieldError struct {
	Field string
	Msg   string
}

func (e *FieldError) Error() string { return e.Field + ": " + e.Msg }

// fieldErrorf builds a *FieldError with a formatted message.
func fieldErrorf(field, format string, args ...any) error {
	return &FieldError{Field: field, Msg: fmt.Sprintf(format, args...)}
}
