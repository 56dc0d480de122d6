//go:build !wasm

package errors

import "encoding/json"

func inlineEncoder(v any) ([]byte, error) { return json.Marshal(v) }

func indentEncoder(v any) ([]byte, error) { return json.MarshalIndent(v, "", "  ") }
