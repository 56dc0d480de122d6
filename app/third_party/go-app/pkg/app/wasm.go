//go:build wasm
// +build wasm

package app

func wasmExecJS() string {
	return ""
}
