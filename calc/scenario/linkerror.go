package scenario

import (
	"strconv"
	"strings"
)

// LinkKind says what is wrong with a link, or with a line of a sheets
// file, as a whole. The set is closed: present words each kind.
type LinkKind uint8

const (
	LinkTooLong       LinkKind = iota + 1 // the query is longer than Limit (Size: its length in bytes)
	LinkTooLongOut                        // the canonical query, once escaped, is longer than Limit (Size)
	LinkNameEncoding                      // a parameter name is not valid percent-encoding (Name: the raw name)
	LinkValueEncoding                     // a value is not valid percent-encoding
	LinkNotUTF8                           // a name or value is not valid UTF-8
	LinkControl                           // a value holds control characters
	LinkUnknown                           // the name is not a parameter
	LinkTwice                             // the parameter is given more than once
	LinkNone                              // a sheets-file line has no link after its title
	LinkEmpty                             // a sheets-file line's link holds no value of a sheet
)

// LinkKinds lists every LinkKind, for the tests that each is worded.
var LinkKinds = []LinkKind{LinkTooLong, LinkTooLongOut, LinkNameEncoding, LinkValueEncoding,
	LinkNotUTF8, LinkControl, LinkUnknown, LinkTwice, LinkNone, LinkEmpty}

// LinkError is a problem with a link as a whole, as data: present words it
// (present.LinkErrorText). Name is the parameter's name as it arrived,
// cut to 24 bytes (with "…"), or "" when it is not valid UTF-8 text.
type LinkError struct {
	Kind  LinkKind
	Name  string
	Size  int // bytes, for LinkTooLong and LinkTooLongOut
	Limit int // bytes, for LinkTooLong and LinkTooLongOut
}

// Error is a terse form for logs and tests; what users read comes from
// present.
func (e *LinkError) Error() string {
	n := "link"
	if e.Name != "" {
		n = strconv.Quote(e.Name)
	}
	switch e.Kind {
	case LinkTooLong, LinkTooLongOut:
		return "link: " + strconv.Itoa(e.Size) + " bytes, over the limit of " + strconv.Itoa(e.Limit)
	case LinkNameEncoding:
		return "link: bad percent-encoding in the name " + n
	case LinkValueEncoding:
		return n + ": bad percent-encoding"
	case LinkNotUTF8:
		return n + ": not UTF-8"
	case LinkControl:
		return n + ": control characters"
	case LinkUnknown:
		return n + ": unknown parameter"
	case LinkTwice:
		return n + ": given twice"
	case LinkNone:
		return "no link"
	case LinkEmpty:
		return "no value of a sheet"
	}
	return n + ": link error " + strconv.Itoa(int(e.Kind))
}

// LinkErrors is every problem Parse found in one link, in link order.
type LinkErrors []*LinkError

func (l LinkErrors) Error() string {
	s := make([]string, len(l))
	for i, e := range l {
		s[i] = e.Error()
	}
	return strings.Join(s, "; ")
}

// Unwrap gives the problems, so that errors.As finds the first of a kind.
func (l LinkErrors) Unwrap() []error {
	e := make([]error, len(l))
	for i, x := range l {
		e[i] = x
	}
	return e
}
