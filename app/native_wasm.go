//go:build wasm

package main

// native does nothing in the browser build.
func native() {}
