// Package wasmflags holds the compiler flags of the page's wasm build, for
// the Go programs and tests that build it as the Makefile does (its
// WASM_GCFLAGS, which a test holds to these).
package wasmflags

// GC is the build's -gcflags, in order: for one package the last pattern
// it matches wins. Inlining is off (all=-l): the module compresses far
// better without it (brotli about 195 KB smaller in all). It is back on
// where it buys the most Go time for the fewest bytes: the runtime (the
// allocator, the scheduler, write barriers), Go's maps and syscall/js,
// whose small functions every edit and every start calls thousands of
// times. Measured (make bench, this machine, 4× CPU, alternated five
// times): an edit's Go phase 16.4 → 13.5 ms and its p50 41.0 → 36.5 ms,
// for 34 494 B more brotli (1 239 293 → 1 273 787). Adding reflect cost
// 15 KB more for no gain beyond the noise; inlining everything, 199 KB.
var GC = []string{
	"-gcflags=all=-l",
	"-gcflags=runtime=",
	"-gcflags=internal/runtime/maps=",
	"-gcflags=syscall/js=",
}
