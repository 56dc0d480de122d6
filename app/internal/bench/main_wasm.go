//go:build wasm

// Command bench runs natively only: it drives Chromium and go test.
package main

func main() {}
