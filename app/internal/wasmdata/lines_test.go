package wasmdata

import (
	"bytes"
	"debug/gosym"
	"encoding/binary"
	"strings"
	"testing"
)

// linesProbe exercises what the runtime reads from its function table
// while it runs: stack growth (frame sizes), the garbage collector's scan
// of frames, reflect's call stubs among them (makeFuncStub,
// methodValueCall, which the collector finds by name), a recovered
// panic's trace, and runtime.Caller, whose file and line go.
const linesProbe = `package main

import (
	"fmt"
	"reflect"
	"runtime"
	"runtime/debug"
	"strings"
)

type acc struct{ xs []*int }

func (a *acc) Add(n int) int {
	runtime.GC()
	v := n
	a.xs = append(a.xs, &v)
	return len(a.xs)
}

func deep(n int, keep *[]string) int {
	buf := [256]byte{byte(n)} // 2000 frames of more than 256 B: the stack grows, and is copied, several times
	s := fmt.Sprint(n)
	*keep = append(*keep, s)
	if n == 0 {
		runtime.GC()
		return int(buf[0])
	}
	return deep(n-1, keep) + len(s)
}

func fail() (msg string) {
	defer func() {
		r := recover()
		st := string(debug.Stack())
		msg = fmt.Sprintf("recovered %v; trace names fail: %v", r, strings.Contains(st, "main.fail"))
	}()
	var m map[string]int
	m["x"]++
	return "unreachable"
}

func main() {
	var keep []string
	fmt.Println("deep", deep(2000, &keep), len(keep))
	swap := reflect.MakeFunc(reflect.TypeOf(func(int, string) (string, int) { return "", 0 }),
		func(in []reflect.Value) []reflect.Value {
			runtime.GC()
			return []reflect.Value{in[1], in[0]}
		})
	for i := 0; i < 3; i++ {
		out := swap.Call([]reflect.Value{reflect.ValueOf(i), reflect.ValueOf(strings.Repeat("z", i))})
		fmt.Println("swap", out[0], out[1])
	}
	a := &acc{}
	add := reflect.ValueOf(a).MethodByName("Add").Interface().(func(int) int)
	for i := 0; i < 3; i++ {
		n := add(i * 7)
		fmt.Println("add", n, *a.xs[i])
	}
	done := make(chan int)
	for g := 0; g < 4; g++ {
		go func(g int) { var k []string; done <- deep(100*g, &k) }(g)
	}
	sum := 0
	for g := 0; g < 4; g++ {
		sum += <-done
	}
	fmt.Println("goroutines", sum)
	fmt.Println(fail())
	_, file, line, ok := runtime.Caller(0)
	fmt.Println("caller", strings.HasSuffix(file, "main.go"), line > 0, ok)
}
`

// TestDropLinesGoProgram: a Go program built by the Go toolchain runs under
// Node.js with Go's wasm_exec.js and prints the same with its line tables
// dropped, but for runtime.Caller's file and line; the standard library's
// reader of the same table (debug/gosym) finds every function, by name and
// entry, as before, and no file or line for any.
func TestDropLinesGoProgram(t *testing.T) {
	in := buildProbe(t, linesProbe)
	out, err := DropLines(in)
	if err != nil {
		t.Fatal(err)
	}
	// deep's sums of digit counts (1..2000; 1..100g for g < 4) are
	// Python's: sum(len(str(k)) for k in range(1, n+1)).
	const want = "deep 6893 2001\n" +
		"swap  0\nswap z 1\nswap zz 2\n" +
		"add 1 0\nadd 2 7\nadd 3 14\n" +
		"goroutines 1476\n" +
		"recovered assignment to entry in nil map; trace names fail: true\n"
	if got := runProbe(t, in); got != want+"caller true true true\n" {
		t.Errorf("as built, printed\n%s\nwant\n%scaller true true true", got, want)
	}
	if got := runProbe(t, out); got != want+"caller false false true\n" {
		t.Errorf("lines dropped, printed\n%s\nwant\n%scaller false false true", got, want)
	}
	merged, err := Merge(out, DefaultGap)
	if err != nil {
		t.Fatal(err)
	}
	if got := runProbe(t, merged); got != want+"caller false false true\n" {
		t.Errorf("lines dropped and merged, printed\n%s", got)
	}

	before, after := funcTable(t, in), funcTable(t, out)
	if len(before.Funcs) < 1000 || len(after.Funcs) != len(before.Funcs) {
		t.Fatalf("debug/gosym reads %d functions as built, %d after", len(before.Funcs), len(after.Funcs))
	}
	withLines := 0
	for i, f := range before.Funcs {
		g := after.Funcs[i]
		if g.Name != f.Name || g.Entry != f.Entry {
			t.Fatalf("function %d: %s at %#x, was %s at %#x", i, g.Name, g.Entry, f.Name, f.Entry)
		}
		if file, line, _ := before.PCToLine(f.Entry); file != "" && line > 0 {
			withLines++
		}
		if file, line, _ := after.PCToLine(f.Entry); file != "" || line > 0 { // gosym reads no table as line -1
			t.Errorf("%s still at %s:%d", f.Name, file, line)
		}
	}
	if withLines < len(before.Funcs)/2 {
		t.Errorf("as built, only %d of %d functions had a line: the check reads nothing", withLines, len(before.Funcs))
	}

	// Only the table's file and line parts changed.
	memIn, _ := image(t, in)
	memOut, _ := image(t, out)
	p, err := findPCLN(memIn)
	if err != nil {
		t.Fatal(err)
	}
	h := readPCHeader(memIn, p)
	if !bytes.Equal(memIn[:p+int(h.cu)], memOut[:p+int(h.cu)]) {
		t.Error("the header or the function names changed")
	}
	// Each function record: pcsp, the pcdata and funcdata as they were;
	// pcfile, pcln, the unit and the first line 0.
	ftab := int(h.funcs)
	for i := range int(h.nfunc) {
		fo := p + ftab + int(binary.LittleEndian.Uint32(memIn[p+ftab+8*i+4:]))
		rec := func(m []byte, off int) uint32 { return binary.LittleEndian.Uint32(m[fo+off:]) }
		for _, off := range []int{funcPCFile, funcPCLn, funcCU, funcStartLine} {
			if rec(memOut, off) != 0 {
				t.Fatalf("function %d: field at %d is %d, not 0", i, off, rec(memOut, off))
			}
		}
		n := funcPCData + 4*int(rec(memIn, funcNPCData)) + 4*int(memIn[fo+43]) // nfuncdata, the record's last byte
		if !bytes.Equal(memIn[fo:fo+funcPCFile], memOut[fo:fo+funcPCFile]) || !bytes.Equal(memIn[fo+funcNPCData:fo+funcCU], memOut[fo+funcNPCData:fo+funcCU]) ||
			!bytes.Equal(memIn[fo+40:fo+n], memOut[fo+40:fo+n]) {
			t.Fatalf("function %d: a field the runtime runs on changed", i)
		}
	}
	if again, err := DropLines(out); err != nil || !bytes.Equal(again, out) {
		t.Errorf("dropping the lines twice: %v, or a different module", err)
	}
}

// funcTable reads the module's function table with debug/gosym.
func funcTable(t *testing.T, wasm []byte) *gosym.Table {
	t.Helper()
	mem, _ := image(t, wasm)
	p, err := findPCLN(mem)
	if err != nil {
		t.Fatal(err)
	}
	tab, err := gosym.NewTable(nil, gosym.NewLineTable(mem[p:], 0))
	if err != nil {
		t.Fatal(err)
	}
	return tab
}

// TestDropLinesRefused: a module with no Go function table, and one whose
// table's header is damaged, are refused rather than changed; one with no
// data at all is left as it is.
func TestDropLinesRefused(t *testing.T) {
	plain := module(writeSegments([]segment{{0x10, []byte("no table here")}}))
	if _, err := DropLines(plain); err == nil || !strings.Contains(err.Error(), "no Go") {
		t.Errorf("a module without a function table: %v", err)
	}
	if _, err := DropLines([]byte("not wasm")); err == nil {
		t.Error("a file that is no module: no error")
	}
	noData := []byte("\x00asm\x01\x00\x00\x00") // an empty module (WebAssembly core specification, 5.5.16)
	if out, err := DropLines(noData); err != nil || !bytes.Equal(out, noData) {
		t.Errorf("a module without data: %v, %q", err, out)
	}
	// A header whose offsets run backwards is no table.
	var h [pclnHeader]byte
	binary.LittleEndian.PutUint32(h[:], pclnMagic)
	copy(h[4:], []byte{0, 0, 1, 8})
	binary.LittleEndian.PutUint64(h[8:], 1)      // nfunc
	binary.LittleEndian.PutUint64(h[8+3*8:], 72) // names
	binary.LittleEndian.PutUint64(h[8+4*8:], 60) // cutab before the names
	binary.LittleEndian.PutUint64(h[8+7*8:], 72) // functab
	damaged := module(writeSegments([]segment{{0x10, append(h[:], make([]byte, 16)...)}}))
	if _, err := DropLines(damaged); err == nil {
		t.Error("a damaged table: no error")
	}
}
