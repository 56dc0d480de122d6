//go:build wasm

package errors

import (
	"fmt"
	"sort"
	"strings"
)

// The browser build links no encoding/json: an Error reads as one line of
// text, "message (type, line) key=value …: wrapped error", for the console.

func inlineEncoder(v any) ([]byte, error) {
	e, ok := v.(Error)
	if !ok {
		return []byte(fmt.Sprint(v)), nil
	}
	var b strings.Builder
	b.WriteString(e.Message)
	if e.DefinedType != "" || e.Line != "" {
		b.WriteString(" (" + strings.Trim(e.DefinedType+", "+e.Line, ", ") + ")")
	}
	keys := make([]string, 0, len(e.Tags))
	for k := range e.Tags {
		keys = append(keys, k)
	}
	// Fieldhead: sort.Slice, whose code the wasm has already, not a
	// sort of its own for strings.
	sort.Slice(keys, func(i, j int) bool { return keys[i] < keys[j] })
	for _, k := range keys {
		fmt.Fprintf(&b, " %s=%v", k, e.Tags[k])
	}
	if e.WrappedErr != nil {
		b.WriteString(": " + e.WrappedErr.Error())
	}
	return []byte(b.String()), nil
}

func indentEncoder(v any) ([]byte, error) { return inlineEncoder(v) }
