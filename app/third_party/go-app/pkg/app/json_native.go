//go:build !wasm

package app

import (
	"encoding/json"

	"github.com/google/uuid"
)

// The JSON and identifier helpers of the native build: encoding/json and
// uuid, as upstream. json_wasm.go is the browser's side.

type jsonRawMessage = json.RawMessage

func jsonMarshal(v any) ([]byte, error) { return json.Marshal(v) }

func jsonUnmarshal(b []byte, v any) error { return json.Unmarshal(b, v) }

func newID() string { return uuid.NewString() }
